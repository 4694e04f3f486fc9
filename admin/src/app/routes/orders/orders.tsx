import { Button, Container, Heading, Stack, Text } from '@chakra-ui/react';
import { OrderStatus, Role } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useMemo, useRef } from 'react';
import { useLocation, useNavigate, useNavigation, type LoaderFunctionArgs } from 'react-router';
import { EmptyState } from '../../../components/ui/empty-state';
import { InboxIcon } from '../../../components/ui/icons';
import { LoadError } from '../../../components/ui/load-error';
import { PageTitle } from '../../../components/ui/page-title';
import { paths } from '../../../config/paths';
import { meQueryOptions, useMe } from '../../../features/auth/api/get-me';
import { RequireRole } from '../../../features/auth/components/require-role';
import { ordersQueryOptions, useOrders } from '../../../features/orders/api/get-orders';
import { AwaitingDecision } from '../../../features/orders/components/awaiting-decision';
import { OrdersFilters } from '../../../features/orders/components/orders-filters';
import {
  OrdersPager,
  OrdersTableSkeleton,
  OrdersTableView,
  useOrdersTable,
  type FiltersUpdate,
} from '../../../features/orders/components/orders-table';
import {
  dateRangeProblem,
  filtersFromSearch,
  hasFilters,
  NO_FILTERS,
  searchFromFilters,
  type OrderFilters,
} from '../../../features/orders/lib/order-filters';

/** The requests waiting for a decision: the same request as the "To confirm" filter. */
const AWAITING: OrderFilters = { ...NO_FILTERS, status: OrderStatus.Requested };
/** How many of them the panel above the inbox lists. */
const AWAITING_SHOWN = 5;

/** Starts loading the list while the screen's code arrives — for the chef only. */
export const ordersLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const user = await queryClient.ensureQueryData(meQueryOptions());
    if (user?.role === Role.Chef) {
      const filters = filtersFromSearch(new URL(request.url).searchParams);
      // The screen shows its own loading and error states: nothing here waits or throws.
      if (!dateRangeProblem(filters)) {
        void queryClient.ensureQueryData(ordersQueryOptions(filters)).catch(() => undefined);
      }
      if (!hasFilters(filters)) {
        void queryClient.ensureQueryData(ordersQueryOptions(AWAITING)).catch(() => undefined);
      }
    }
    return null;
  };

export function OrdersRoute() {
  const me = useMe();
  if (!me.data) return null; // The layout renders only for a signed-in team member.
  return (
    <RequireRole user={me.data} roles={[Role.Chef]}>
      <Orders />
    </RequireRole>
  );
}

/**
 * The filters in the address bar, and a way to change them. While a change is on its way (the
 * router runs the loaders first) the screen already follows the new address, and a second
 * change made meanwhile builds on the first rather than on what is still displayed.
 */
function useFiltersInAddress(): [OrderFilters, FiltersUpdate] {
  const location = useLocation();
  const navigation = useNavigation();
  const navigate = useNavigate();
  const pending =
    navigation.location?.pathname === location.pathname ? navigation.location : undefined;
  const search = (pending ?? location).search;
  const filters = useMemo(() => filtersFromSearch(new URLSearchParams(search)), [search]);
  const latest = useRef(filters);
  /** Whether the last change was the search box's: refining a search is one step of history. */
  const searching = useRef(false);
  useEffect(() => {
    if (searchFromFilters(filters).toString() !== searchFromFilters(latest.current).toString()) {
      searching.current = false; // Back, Forward or a link: a new search is a new step again
    }
    latest.current = filters;
  }, [filters]);
  const update = useCallback<FiltersUpdate>(
    (change) => {
      const previous = latest.current;
      const next = change(previous);
      const isSearch =
        next.q !== previous.q &&
        next.status === previous.status &&
        next.from === previous.from &&
        next.to === previous.to;
      const replace = isSearch && searching.current;
      searching.current = isSearch;
      latest.current = next;
      const query = searchFromFilters(next).toString();
      void navigate({ search: query ? `?${query}` : '' }, { preventScrollReset: true, replace });
    },
    [navigate],
  );
  return [filters, update];
}

function Orders() {
  const [filters, updateFilters] = useFiltersInAddress();
  const problem = dateRangeProblem(filters);
  const orders = useOrders(filters, !problem);
  const awaiting = useOrders(AWAITING, !hasFilters(filters));
  const hrefOf = useCallback((id: string) => paths.order.getHref(id), []);

  const setFilters = (next: OrderFilters) => updateFilters(() => next);
  const clear = () => setFilters(NO_FILTERS);
  const table = useOrdersTable({
    page: orders.data,
    filters,
    onFiltersChange: updateFilters,
    hrefOf,
  });

  return (
    <>
      <PageTitle>Orders</PageTitle>
      <Container maxW="7xl" py={{ base: '6', md: '10' }} px={{ base: '4', md: '8' }}>
        <Stack gap="2" mb="6">
          <Heading as="h1" fontSize={{ base: '3xl', md: '4xl' }} fontWeight="normal">
            Orders
          </Heading>
          <Text color="fg.muted" maxW="2xl">
            Every booking, newest first: confirm or decline paid requests, follow payments, and open
            an order for its guests, allergy notes and history.
          </Text>
        </Stack>

        {!hasFilters(filters) && awaiting.data && (
          <AwaitingDecision
            orders={awaiting.data.items.slice(0, AWAITING_SHOWN)}
            total={awaiting.data.total}
            hrefOf={hrefOf}
            onShowAll={() => setFilters(AWAITING)}
          />
        )}

        <OrdersFilters table={table} filters={filters} onClear={clear} />

        {problem ? null : orders.isPending ? (
          <OrdersTableSkeleton />
        ) : orders.isError ? (
          <LoadError
            title="The orders could not be loaded"
            error={orders.error}
            onRetry={() => void orders.refetch()}
            retrying={orders.isFetching}
          />
        ) : orders.data.total === 0 ? (
          hasFilters(filters) ? (
            <EmptyState
              icon={<InboxIcon />}
              title="No orders match these filters"
              action={
                <Button variant="outline" onClick={clear}>
                  Clear filters
                </Button>
              }
            >
              Try another status or date range, or search for part of a reference or a client’s
              name.
            </EmptyState>
          ) : (
            <EmptyState icon={<InboxIcon />} title="No bookings yet">
              When a client books on the storefront and pays, the request appears here for you to
              confirm or decline.
            </EmptyState>
          )
        ) : orders.data.items.length === 0 ? (
          <EmptyState
            icon={<InboxIcon />}
            title="This page is past the end of the list"
            action={
              <Button variant="outline" onClick={() => setFilters({ ...filters, page: 1 })}>
                Back to the first page
              </Button>
            }
          >
            There are {orders.data.total} orders with these filters.
          </EmptyState>
        ) : (
          <>
            <OrdersTableView table={table} busy={orders.isPlaceholderData} hrefOf={hrefOf} />
            <OrdersPager table={table} total={orders.data.total} />
          </>
        )}
      </Container>
    </>
  );
}
