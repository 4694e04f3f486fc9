import {
  Button,
  Container,
  EmptyState,
  Heading,
  HStack,
  Stack,
  Text,
  VStack,
} from '@chakra-ui/react';
import { PageLoader } from '@nappe/web-kit/react';
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { flushSync } from 'react-dom';
import {
  Link as RouterLink,
  useNavigate,
  useSearchParams,
  type LoaderFunctionArgs,
} from 'react-router';
import { CalendarIcon } from '../../components/ui/icons';
import { PageTitle } from '../../components/ui/page-title';
import { LoadError } from '../../components/ui/query-state';
import { Skeleton } from '../../components/ui/skeleton';
import { paths } from '../../config/paths';
import { YourDataSection } from '../../features/account/components/your-data-section';
import { authKeys } from '@nappe/web-kit/auth';
import { RequireUser } from '../../features/auth/components/require-user';
import { ordersQueryOptions, useOrders } from '../../features/orders/api/get-orders';
import { OrderCard } from '../../features/orders/components/order-card';
import { api } from '../../lib/api-client';
import { pageCount, pageFromSearch } from '../../lib/page';
import { requireUserLoader } from '../guards';
import { warm } from '../loaders';

export const myEventsLoader = (queryClient: QueryClient) => async (args: LoaderFunctionArgs) => {
  await requireUserLoader(queryClient)(args);
  const page = pageFromSearch(new URL(args.request.url).searchParams.get('page'));
  await warm(queryClient, ordersQueryOptions(page));
  return null;
};

function EventList() {
  const [searchParams] = useSearchParams();
  const page = pageFromSearch(searchParams.get('page'));
  const orders = useOrders(page);

  if (orders.isPending) {
    return (
      <Stack gap="3" mt="10" role="status" aria-label="Loading your events">
        {[0, 1, 2].map((i) => (
          <Skeleton key={i} h="32" borderRadius="l3" />
        ))}
      </Stack>
    );
  }
  if (orders.isError) {
    return (
      <Stack mt="10">
        <LoadError
          title="Your events could not be loaded"
          error={orders.error}
          onRetry={() => void orders.refetch()}
          retrying={orders.isFetching}
        />
      </Stack>
    );
  }
  if (orders.data.items.length === 0) {
    return (
      <EmptyState.Root
        mt="10"
        borderWidth="1px"
        borderStyle="dashed"
        borderColor="border.emphasized"
        borderRadius="l3"
        bg="bg.panel"
      >
        <EmptyState.Content>
          <EmptyState.Indicator color="caramel.fg">
            <CalendarIcon />
          </EmptyState.Indicator>
          <VStack textAlign="center" gap="2">
            <EmptyState.Title fontFamily="heading" textStyle="2xl">
              No events yet
            </EmptyState.Title>
            <EmptyState.Description color="fg.muted" maxW="md">
              When you book a dessert for an event, it will appear here with its date, guests and
              diets, payments and documents.
            </EmptyState.Description>
          </VStack>
          <HStack gap="3" wrap="wrap" justify="center">
            <Button asChild colorPalette="accent">
              <RouterLink to={paths.menus.getHref()}>See the menus</RouterLink>
            </Button>
            <Button asChild variant="outline">
              <RouterLink to={paths.howBookingWorks.getHref()}>See how booking works</RouterLink>
            </Button>
          </HStack>
        </EmptyState.Content>
      </EmptyState.Root>
    );
  }
  const pages = pageCount(orders.data);
  return (
    <Stack gap="4" mt="10">
      <Stack as="ul" listStyleType="none" gap="4" aria-label="Your events">
        {orders.data.items.map((order) => (
          <li key={order.id}>
            <OrderCard order={order} />
          </li>
        ))}
      </Stack>
      {pages > 1 && (
        <HStack as="nav" aria-label="Pages of events" justify="space-between">
          {page > 1 ? (
            <Button asChild variant="outline">
              <RouterLink to={paths.myEvents.getHref(page - 1)}>Previous page</RouterLink>
            </Button>
          ) : (
            <span />
          )}
          <Text color="fg.muted" textStyle="sm">
            Page {page} of {pages}
          </Text>
          {page < pages ? (
            <Button asChild variant="outline">
              <RouterLink to={paths.myEvents.getHref(page + 1)}>Next page</RouterLink>
            </Button>
          ) : (
            <span />
          )}
        </HStack>
      )}
    </Stack>
  );
}

/** Where a deleted account lands: the home page, told to say so. */
export interface AccountDeletedState {
  accountDeleted: true;
}

export function MyEventsRoute() {
  const navigate = useNavigate();
  const queryClient = useQueryClient();

  const [deleted, setDeleted] = useState(false);

  // The server has ended every session: forget the person here — the token, everything cached
  // for them, a booking in progress in this tab — and leave for the home page. This page stops
  // asking for a signed-in person first, so it cannot send them to Sign in meanwhile.
  const signOutDeleted = async () => {
    flushSync(() => setDeleted(true));
    try {
      window.sessionStorage.clear();
    } catch {
      // Storage switched off: there is nothing kept to forget.
    }
    api.clearSession();
    queryClient.setQueryData(authKeys.me(), null);
    queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
    await navigate(paths.home.getHref(), {
      replace: true,
      state: { accountDeleted: true } satisfies AccountDeletedState,
    });
  };

  if (deleted) return <PageLoader />;

  return (
    <RequireUser>
      {(user) => (
        <>
          <PageTitle>My events</PageTitle>
          <Container maxW="4xl" py={{ base: '10', md: '16' }}>
            <HStack justify="space-between" align="end" gap="4" wrap="wrap">
              <Stack gap="2">
                <Heading as="h1" fontSize={{ base: '4xl', md: '5xl' }} fontWeight="normal">
                  My events
                </Heading>
                <Text color="fg.muted">
                  Signed in as {user.name} ({user.email})
                </Text>
              </Stack>
              <Button asChild variant="outline">
                <RouterLink to={paths.menus.getHref()}>Book another event</RouterLink>
              </Button>
            </HStack>
            <EventList />
            <YourDataSection onDeleted={() => void signOutDeleted()} />
          </Container>
        </>
      )}
    </RequireUser>
  );
}
