import {
  Box,
  Button,
  Flex,
  HStack,
  IconButton,
  Input,
  InputGroup,
  Table,
  Text,
} from '@chakra-ui/react';
import {
  columnFilteringFeature,
  createColumnHelper,
  createFilteredRowModel,
  createPaginatedRowModel,
  createSortedRowModel,
  filterFn_includesString,
  globalFilteringFeature,
  rowPaginationFeature,
  rowSortingFeature,
  sortFn_alphanumeric,
  sortFn_basic,
  sortFn_text,
  tableFeatures,
  useTable,
  type ColumnDef,
  type RowData,
} from '@tanstack/react-table';
import { useId } from 'react';
import {
  ArrowDownIcon,
  ArrowUpIcon,
  ChevronLeftIcon,
  ChevronRightIcon,
  SearchIcon,
  SortIcon,
} from '../../../components/ui/icons';

/**
 * Every Kitchen list: searched, sorted and paged in the browser (TanStack Table v9). The lists
 * are loaded whole (see fetch-all-pages.ts): the editors compute with the whole catalogue, and
 * some columns (price per kg) exist only after computing, so the server could not sort by them.
 */
export const kitchenTableFeatures = tableFeatures({
  rowSortingFeature,
  sortedRowModel: createSortedRowModel(),
  sortFns: { alphanumeric: sortFn_alphanumeric, text: sortFn_text, basic: sortFn_basic },
  columnFilteringFeature,
  globalFilteringFeature,
  filteredRowModel: createFilteredRowModel(),
  filterFns: { includesString: filterFn_includesString },
  rowPaginationFeature,
  paginatedRowModel: createPaginatedRowModel(),
});

export type KitchenTableFeatures = typeof kitchenTableFeatures;

export const kitchenColumnHelper = <Row extends RowData>() =>
  createColumnHelper<KitchenTableFeatures, Row>();

export const KITCHEN_TABLE_PAGE_SIZE = 20;

export interface CatalogueTableProps<Row extends RowData> {
  data: Row[];
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- columns of mixed value types
  columns: ColumnDef<KitchenTableFeatures, Row, any>[];
  /** Read by screen readers as the table's name. */
  caption: string;
  /** The column ids the search box looks in. */
  searchColumns: readonly string[];
  searchLabel: string;
  /** Columns left out on a phone. */
  hideOnPhone?: readonly string[];
  /** "ingredient" → "Showing 1–20 of 45 ingredients". */
  noun: [singular: string, plural: string];
  getRowId: (row: Row) => string;
}

export function CatalogueTable<Row extends RowData>({
  data,
  columns,
  caption,
  searchColumns,
  searchLabel,
  hideOnPhone = [],
  noun,
  getRowId,
}: CatalogueTableProps<Row>) {
  const searchId = useId();
  const table = useTable({
    features: kitchenTableFeatures,
    columns,
    data,
    getRowId,
    initialState: {
      sorting: [{ id: 'name', desc: false }],
      pagination: { pageIndex: 0, pageSize: KITCHEN_TABLE_PAGE_SIZE },
      globalFilter: '',
    },
    globalFilterFn: 'includesString',
    getColumnCanGlobalFilter: (column) => searchColumns.includes(column.id),
    enableSortingRemoval: false,
  });

  const search = String(table.state.globalFilter ?? '');
  const { pageIndex, pageSize } = table.state.pagination;
  const matching = table.getFilteredRowModel().rows.length;
  const rows = table.getRowModel().rows;
  const first = matching === 0 ? 0 : pageIndex * pageSize + 1;
  const last = pageIndex * pageSize + rows.length;
  const hidden = (id: string) => (hideOnPhone.includes(id) ? 'md' : undefined);

  return (
    <Box>
      <Box role="search" mb="4" maxW={{ base: 'full', sm: 'sm' }}>
        <label htmlFor={searchId}>
          <Text as="span" srOnly>
            {searchLabel}
          </Text>
        </label>
        <InputGroup startElement={<SearchIcon boxSize="4" color="fg.muted" aria-hidden />}>
          <Input
            id={searchId}
            type="search"
            placeholder={searchLabel}
            value={search}
            onChange={(e) => table.setGlobalFilter(e.target.value)}
          />
        </InputGroup>
      </Box>
      <Table.ScrollArea borderWidth="1px" borderColor="border" borderRadius="l3" bg="bg.panel">
        <Table.Root size="md" interactive>
          <Table.Caption srOnly>{caption}</Table.Caption>
          <Table.Header>
            {table.getHeaderGroups().map((group) => (
              <Table.Row key={group.id} bg="bg.muted">
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const canSort = header.column.getCanSort();
                  return (
                    <Table.ColumnHeader
                      key={header.id}
                      color="fg.muted"
                      fontWeight="semibold"
                      hideBelow={hidden(header.column.id)}
                      aria-sort={
                        sorted === 'asc'
                          ? 'ascending'
                          : sorted === 'desc'
                            ? 'descending'
                            : undefined
                      }
                      whiteSpace="nowrap"
                    >
                      {header.isPlaceholder ? null : canSort ? (
                        <Button
                          variant="plain"
                          size="sm"
                          px="0"
                          h="auto"
                          color="inherit"
                          fontWeight="inherit"
                          onClick={header.column.getToggleSortingHandler()}
                        >
                          <table.FlexRender header={header} />
                          {sorted === 'asc' ? (
                            <ArrowUpIcon aria-hidden />
                          ) : sorted === 'desc' ? (
                            <ArrowDownIcon aria-hidden />
                          ) : (
                            <SortIcon aria-hidden opacity="0.5" />
                          )}
                        </Button>
                      ) : (
                        <table.FlexRender header={header} />
                      )}
                    </Table.ColumnHeader>
                  );
                })}
              </Table.Row>
            ))}
          </Table.Header>
          <Table.Body>
            {rows.map((row) => (
              <Table.Row key={row.id} bg="bg.panel">
                {row.getAllCells().map((cell) => (
                  <Table.Cell key={cell.id} hideBelow={hidden(cell.column.id)} verticalAlign="top">
                    <table.FlexRender cell={cell} />
                  </Table.Cell>
                ))}
              </Table.Row>
            ))}
            {rows.length === 0 && (
              <Table.Row bg="bg.panel">
                <Table.Cell colSpan={columns.length}>
                  <Text color="fg.muted">Nothing matches “{search}”.</Text>
                </Table.Cell>
              </Table.Row>
            )}
          </Table.Body>
        </Table.Root>
      </Table.ScrollArea>
      <Flex
        mt="3"
        direction={{ base: 'column', sm: 'row' }}
        justify="space-between"
        align={{ base: 'start', sm: 'center' }}
        gap="3"
      >
        <Text color="fg.muted" textStyle="sm" aria-live="polite">
          {matching === 0
            ? `No ${noun[1]} match.`
            : `Showing ${first}–${last} of ${matching} ${matching === 1 ? noun[0] : noun[1]}`}
        </Text>
        {table.getPageCount() > 1 && (
          <HStack gap="1">
            <IconButton
              aria-label="Previous page"
              variant="ghost"
              size="sm"
              disabled={!table.getCanPreviousPage()}
              onClick={() => table.previousPage()}
            >
              <ChevronLeftIcon />
            </IconButton>
            <Text textStyle="sm" px="2">
              Page {pageIndex + 1} of {table.getPageCount()}
            </Text>
            <IconButton
              aria-label="Next page"
              variant="ghost"
              size="sm"
              disabled={!table.getCanNextPage()}
              onClick={() => table.nextPage()}
            >
              <ChevronRightIcon />
            </IconButton>
          </HStack>
        )}
      </Flex>
    </Box>
  );
}
