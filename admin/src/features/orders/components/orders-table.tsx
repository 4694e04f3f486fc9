import { Box, Button, Flex, HStack, Link, Skeleton, Table, Text } from '@chakra-ui/react';
import { formatMoney, type OrderStatus, type OrderSummary } from '@nappe/shared';
import {
  columnFilteringFeature,
  createColumnHelper,
  functionalUpdate,
  globalFilteringFeature,
  rowPaginationFeature,
  tableFeatures,
  useTable,
  type ColumnFiltersState,
  type PaginationState,
  type Updater,
} from '@tanstack/react-table';
import { useMemo, type ReactNode } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router';
import { shortDate } from '../lib/format';
import { ORDERS_PAGE_SIZE, type OrderFilters } from '../lib/order-filters';
import { OrderStatusBadge } from './order-status-badge';

/**
 * The Orders inbox's table (TanStack Table v9). Filtering and paging happen on the server: the
 * table's filter and pagination state is read from the address bar (`filters`) and every change
 * goes back there through `onFiltersChange`, which the screen turns into a new request.
 */
export const ordersTableFeatures = tableFeatures({
  rowPaginationFeature,
  columnFilteringFeature,
  globalFilteringFeature,
});

export type OrdersTable = ReturnType<typeof useOrdersTable>;

const column = createColumnHelper<typeof ordersTableFeatures, OrderSummary>();

/** Columns left out on a phone; the reference cell then carries the date, client and guests. */
const HIDE_ON_PHONE = new Set(['eventDate', 'clientName', 'menuName', 'guestCount', 'money']);

function columnsFor(hrefOf: (id: string) => string) {
  return column.columns([
    column.accessor('reference', {
      header: 'Reference',
      cell: (info) => {
        const order = info.row.original;
        return (
          <>
            <Link
              asChild
              fontWeight="semibold"
              color="fg"
              textDecoration="underline"
              textUnderlineOffset="3px"
              whiteSpace="nowrap"
            >
              <RouterLink to={hrefOf(order.id)}>{info.getValue()}</RouterLink>
            </Link>
            <Text hideFrom="md" textStyle="sm" mt="1">
              {shortDate(order.eventDate)}, {order.serviceTime}
            </Text>
            <Text hideFrom="md" textStyle="xs" color="fg.muted">
              {order.clientName} · {order.guestCount} guests
            </Text>
          </>
        );
      },
    }),
    column.accessor('eventDate', {
      header: 'Event',
      cell: (info) => (
        <>
          <Text whiteSpace="nowrap">{shortDate(info.getValue())}</Text>
          <Text textStyle="sm" color="fg.muted">
            {info.row.original.serviceTime}
          </Text>
        </>
      ),
    }),
    column.accessor('clientName', { header: 'Client' }),
    column.accessor('menuName', { header: 'Menu' }),
    column.accessor('guestCount', {
      header: 'Guests',
      cell: (info) => <Text fontVariantNumeric="tabular-nums">{info.getValue()}</Text>,
    }),
    column.accessor('status', {
      header: 'Status',
      cell: (info) => <OrderStatusBadge status={info.getValue()} />,
    }),
    column.display({
      id: 'money',
      header: 'Paid / total',
      cell: ({ row }) => {
        const o = row.original;
        return (
          <Text fontVariantNumeric="tabular-nums" whiteSpace="nowrap">
            {formatMoney(o.paidMinor, o.currency)}
            <Text as="span" color="fg.muted">
              {' / '}
              {formatMoney(o.totalMinor, o.currency)}
            </Text>
          </Text>
        );
      },
    }),
  ]);
}

const NO_ROWS: OrderSummary[] = [];

/** Filters worked out from the latest ones (two quick changes in a row both count). */
export type FiltersUpdate = (update: (latest: OrderFilters) => OrderFilters) => void;

function columnFiltersOf(filters: OrderFilters): ColumnFiltersState {
  const list: ColumnFiltersState = [];
  if (filters.status) list.push({ id: 'status', value: filters.status });
  if (filters.from || filters.to) list.push({ id: 'eventDate', value: [filters.from, filters.to] });
  return list;
}

/** The table instance over one page of orders; its filter state is the address bar's. */
export function useOrdersTable({
  page,
  filters,
  onFiltersChange,
  hrefOf,
}: {
  page: { items: OrderSummary[]; total: number } | undefined;
  filters: OrderFilters;
  onFiltersChange: FiltersUpdate;
  hrefOf: (id: string) => string;
}) {
  const columns = useMemo(() => columnsFor(hrefOf), [hrefOf]);
  const columnFilters = useMemo(() => columnFiltersOf(filters), [filters]);
  const pagination: PaginationState = { pageIndex: filters.page - 1, pageSize: ORDERS_PAGE_SIZE };

  return useTable({
    features: ordersTableFeatures,
    columns,
    data: page?.items ?? NO_ROWS,
    rowCount: page?.total ?? 0,
    getRowId: (row) => row.id,
    manualPagination: true,
    manualFiltering: true,
    autoResetPageIndex: false,
    state: { pagination, columnFilters, globalFilter: filters.q },
    onPaginationChange: (updater: Updater<PaginationState>) =>
      onFiltersChange((latest) => ({
        ...latest,
        page:
          functionalUpdate(updater, { pageIndex: latest.page - 1, pageSize: ORDERS_PAGE_SIZE })
            .pageIndex + 1,
      })),
    onColumnFiltersChange: (updater: Updater<ColumnFiltersState>) =>
      onFiltersChange((latest) => {
        const next = functionalUpdate(updater, columnFiltersOf(latest));
        const status = next.find((f) => f.id === 'status')?.value as OrderStatus | undefined;
        const range = next.find((f) => f.id === 'eventDate')?.value as
          [string | null, string | null] | undefined;
        // A new filter starts from the first page.
        return {
          ...latest,
          status: status ?? null,
          from: range?.[0] || null,
          to: range?.[1] || null,
          page: 1,
        };
      }),
    onGlobalFilterChange: (updater: Updater<string>) =>
      onFiltersChange((latest) => ({
        ...latest,
        q: String(functionalUpdate(updater, latest.q)),
        page: 1,
      })),
  });
}

/** Sets one column's filter from its latest value, keeping the others. */
export function setColumnFilter<V>(
  table: OrdersTable,
  id: string,
  value: (latest: V | undefined) => V | null,
): void {
  table.setColumnFilters((current) => {
    const next = value(current.find((f) => f.id === id)?.value as V | undefined);
    const others = current.filter((f) => f.id !== id);
    const empty = next === null || next === '' || (Array.isArray(next) && !next.some(Boolean));
    return empty ? others : [...others, { id, value: next }];
  });
}

function Frame({ busy, children }: { busy?: boolean; children: ReactNode }) {
  return (
    <Table.ScrollArea
      borderWidth="1px"
      borderColor="border"
      borderRadius="l3"
      bg="bg.panel"
      aria-busy={busy || undefined}
    >
      {children}
    </Table.ScrollArea>
  );
}

/** The page of orders; a row opens the order (the reference is the keyboard's link). */
export function OrdersTableView({
  table,
  busy,
  hrefOf,
}: {
  table: OrdersTable;
  busy?: boolean;
  hrefOf: (id: string) => string;
}) {
  const navigate = useNavigate();
  const hidden = (id: string) => (HIDE_ON_PHONE.has(id) ? 'md' : undefined);
  return (
    <Frame busy={busy}>
      <Table.Root size="md" interactive opacity={busy ? 0.6 : 1} transition="opacity 0.2s">
        <Table.Caption srOnly>Orders, newest booking first</Table.Caption>
        <Table.Header>
          {table.getHeaderGroups().map((group) => (
            <Table.Row key={group.id} bg="bg.muted">
              {group.headers.map((header) => (
                <Table.ColumnHeader
                  key={header.id}
                  color="fg.muted"
                  fontWeight="semibold"
                  whiteSpace="nowrap"
                  hideBelow={hidden(header.column.id)}
                >
                  {header.isPlaceholder ? null : <table.FlexRender header={header} />}
                </Table.ColumnHeader>
              ))}
            </Table.Row>
          ))}
        </Table.Header>
        <Table.Body>
          {table.getRowModel().rows.map((row) => (
            <Table.Row
              key={row.id}
              bg="bg.panel"
              cursor="pointer"
              onClick={(e) => {
                // The reference is the link (and the keyboard's way in); a click anywhere else
                // on the row opens the order too.
                if ((e.target as HTMLElement).closest('a, button')) return;
                void navigate(hrefOf(row.original.id));
              }}
            >
              {row.getAllCells().map((cell) => (
                <Table.Cell key={cell.id} verticalAlign="top" hideBelow={hidden(cell.column.id)}>
                  <table.FlexRender cell={cell} />
                </Table.Cell>
              ))}
            </Table.Row>
          ))}
        </Table.Body>
      </Table.Root>
    </Frame>
  );
}

/** Grey rows in the table's shape while the first page loads. */
export function OrdersTableSkeleton({ rows = 6 }: { rows?: number }) {
  return (
    <Box role="status">
      <Text srOnly>Loading orders…</Text>
      <Frame>
        <Table.Root size="md" aria-hidden>
          <Table.Body>
            {Array.from({ length: rows }, (_, i) => (
              <Table.Row key={i} bg="bg.panel">
                {[24, 28, 32, 32, 10, 24, 28].map((w, j) => (
                  <Table.Cell key={j} hideBelow={j !== 0 && j !== 5 ? 'md' : undefined}>
                    <Skeleton height="4" width={String(w * 4) + 'px'} />
                  </Table.Cell>
                ))}
              </Table.Row>
            ))}
          </Table.Body>
        </Table.Root>
      </Frame>
    </Box>
  );
}

/** "Showing 21–40 of 45 orders", and the page buttons. */
export function OrdersPager({ table, total }: { table: OrdersTable; total: number }) {
  const { pageIndex, pageSize } = table.state.pagination;
  const shown = table.getRowModel().rows.length;
  const first = total === 0 ? 0 : pageIndex * pageSize + 1;
  const last = pageIndex * pageSize + shown;
  const pages = table.getPageCount();
  return (
    <Flex
      mt="3"
      direction={{ base: 'column', sm: 'row' }}
      justify="space-between"
      align={{ base: 'start', sm: 'center' }}
      gap="3"
    >
      <Text color="fg.muted" textStyle="sm" aria-live="polite">
        {total === 0
          ? 'No orders match.'
          : `Showing ${first}–${last} of ${total} ${total === 1 ? 'order' : 'orders'}`}
      </Text>
      {pages > 1 && (
        <HStack gap="2">
          <Button
            variant="outline"
            size="sm"
            disabled={!table.getCanPreviousPage()}
            onClick={() => table.previousPage()}
          >
            Previous page
          </Button>
          <Text textStyle="sm" px="1" whiteSpace="nowrap">
            Page {pageIndex + 1} of {pages}
          </Text>
          <Button
            variant="outline"
            size="sm"
            disabled={!table.getCanNextPage()}
            onClick={() => table.nextPage()}
          >
            Next page
          </Button>
        </HStack>
      )}
    </Flex>
  );
}
