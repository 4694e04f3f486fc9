import {
  Box,
  Button,
  Field,
  Flex,
  Input,
  InputGroup,
  NativeSelect,
  SimpleGrid,
  Text,
} from '@chakra-ui/react';
import { ORDER_STATUSES, ORDER_STATUS_LABELS_FOR_CHEF, isOrderStatus } from '@nappe/shared';
import { useCallback, useEffect, useRef, useState } from 'react';
import { useLocation, useNavigationType } from 'react-router';
import { SearchIcon } from '../../../components/ui/icons';
import {
  dateRangeProblem,
  hasFilters,
  ORDER_SEARCH_MAX,
  type OrderFilters,
} from '../lib/order-filters';
import { setColumnFilter, type OrdersTable } from './orders-table';

type Range = [from: string | null, to: string | null];

/** Waits this long after the last keystroke before searching. */
export const SEARCH_DELAY_MS = 350;

/**
 * Status, event dates and search. Each control sets the table's filter state, which the screen
 * keeps in the address bar; the search waits for a pause in typing.
 */
export function OrdersFilters({
  table,
  filters,
  onClear,
}: {
  table: OrdersTable;
  filters: OrderFilters;
  onClear: () => void;
}) {
  const [text, setText] = useState(filters.q);
  const problem = dateRangeProblem(filters);

  // The table object is new on every render: the pause is timed from the last keystroke only.
  const tableRef = useRef(table);
  useEffect(() => {
    tableRef.current = table;
  });
  /** The last search this box sent (the pause is timed against it). */
  const sent = useRef(filters.q);
  /** Searches sent and not yet seen in the address: their echo is not typed back. */
  const pending = useRef<string[]>([]);
  /** The search the address held when last looked at. */
  const seen = useRef(filters.q);
  const search = useCallback((value: string) => {
    sent.current = value;
    pending.current.push(value);
    tableRef.current.setGlobalFilter(value);
  }, []);

  // The box follows the address when something else changed its search: Back and Forward, a
  // link, "Clear filters" — but not the echo of its own searches, which may arrive while the
  // chef is still typing.
  const location = useLocation();
  const navigationType = useNavigationType();
  useEffect(() => {
    const q = filters.q;
    const own = pending.current.indexOf(q);
    if (navigationType !== 'POP' && own >= 0) {
      pending.current = pending.current.slice(own + 1);
      seen.current = q;
      return;
    }
    if (navigationType === 'POP' || q !== seen.current) {
      pending.current = [];
      seen.current = q;
      sent.current = q;
      setText(q);
    }
    // Only a new address is looked at; `filters.q` is read from the render that shows it.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [location.key]);

  useEffect(() => {
    if (text.trim() === sent.current) return;
    const timer = setTimeout(() => search(text.trim()), SEARCH_DELAY_MS);
    return () => clearTimeout(timer);
  }, [text, search]);

  return (
    <Box
      as="form"
      role="search"
      aria-label="Filter orders"
      mb="4"
      onSubmit={(e) => {
        e.preventDefault();
        if (text.trim() !== sent.current) search(text.trim());
      }}
    >
      <SimpleGrid columns={{ base: 2, lg: 4 }} gap="3" alignItems="start">
        <Field.Root gridColumn={{ base: 'span 2', lg: 'auto' }}>
          <Field.Label>Search</Field.Label>
          <InputGroup startElement={<SearchIcon boxSize="4" color="fg.muted" aria-hidden />}>
            <Input
              type="search"
              placeholder="Reference or client name"
              maxLength={ORDER_SEARCH_MAX}
              value={text}
              onChange={(e) => setText(e.target.value)}
              bg="bg.subtle"
            />
          </InputGroup>
        </Field.Root>
        <Field.Root gridColumn={{ base: 'span 2', lg: 'auto' }}>
          <Field.Label>Status</Field.Label>
          <NativeSelect.Root>
            <NativeSelect.Field
              bg="bg.subtle"
              value={filters.status ?? ''}
              onChange={(e) =>
                setColumnFilter(table, 'status', () =>
                  isOrderStatus(e.target.value) ? e.target.value : null,
                )
              }
            >
              <option value="">All statuses</option>
              {ORDER_STATUSES.map((s) => (
                <option key={s} value={s}>
                  {ORDER_STATUS_LABELS_FOR_CHEF[s].label}
                </option>
              ))}
            </NativeSelect.Field>
            <NativeSelect.Indicator />
          </NativeSelect.Root>
        </Field.Root>
        <Field.Root invalid={!!problem}>
          <Field.Label>Event from</Field.Label>
          <Input
            type="date"
            bg="bg.subtle"
            value={filters.from ?? ''}
            onChange={(e) => {
              const from = e.target.value || null;
              setColumnFilter<Range>(table, 'eventDate', (range) => [from, range?.[1] ?? null]);
            }}
          />
        </Field.Root>
        <Field.Root invalid={!!problem}>
          <Field.Label>Event to</Field.Label>
          <Input
            type="date"
            bg="bg.subtle"
            value={filters.to ?? ''}
            onChange={(e) => {
              const to = e.target.value || null;
              setColumnFilter<Range>(table, 'eventDate', (range) => [range?.[0] ?? null, to]);
            }}
          />
        </Field.Root>
      </SimpleGrid>
      <Flex mt="2" gap="3" align="center" wrap="wrap" minH="8">
        {problem && (
          <Text color="fg.error" textStyle="sm" role="alert">
            {problem}
          </Text>
        )}
        {hasFilters(filters) && (
          <Button size="sm" variant="ghost" onClick={onClear} ms={{ base: '-3', sm: '0' }}>
            Clear filters
          </Button>
        )}
      </Flex>
    </Box>
  );
}
