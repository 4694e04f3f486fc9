import {
  Alert,
  Box,
  Button,
  Container,
  Flex,
  Heading,
  HStack,
  Spinner,
  Stack,
  Text,
} from '@chakra-ui/react';
import {
  ORDER_STATUS_LABELS_FOR_CLIENT,
  OrderStatus,
  plural,
  type OrderDetail,
} from '@nappe/shared';
import { useQuery, type QueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import {
  Link as RouterLink,
  useParams,
  useSearchParams,
  type LoaderFunctionArgs,
} from 'react-router';
import { Facts } from '../../components/ui/facts';
import { CheckIcon } from '../../components/ui/icons';
import { PageTitle } from '../../components/ui/page-title';
import { LoadError } from '../../components/ui/query-state';
import { paths } from '../../config/paths';
import { RequireUser } from '../../features/auth/components/require-user';
import { clearBookingDraft } from '../../features/booking/draft/booking-draft';
import { orderQueryOptions } from '../../features/orders/api/get-order';
import { useCheckoutReturn } from '../../features/orders/api/return-from-checkout';
import { OrderStatusBadge } from '../../features/orders/components/order-status-badge';
import { balanceWords } from '../../features/orders/components/order-card';
import { longDate } from '../../lib/dates';
import { money } from '../../lib/format';
import { requireUserLoader } from '../guards';

export const bookedLoader = (queryClient: QueryClient) => async (args: LoaderFunctionArgs) => {
  await requireUserLoader(queryClient)(args);
  return null;
};

/** How often the page asks whether the payment is recorded, and for how long. */
export const BOOKED_POLL_MS = 1_000;
export const BOOKED_TIMEOUT_MS = 45_000;

const waiting = (order: OrderDetail | undefined) =>
  order === undefined || order.status === OrderStatus.PendingPayment;

const NOT_PAID: readonly OrderStatus[] = [OrderStatus.Expired, OrderStatus.Cancelled];

function Waiting({
  timedOut,
  onCheckAgain,
  orderId,
}: {
  timedOut: boolean;
  onCheckAgain: () => void;
  orderId: string;
}) {
  if (timedOut) {
    return (
      <Alert.Root status="warning" role="alert" borderRadius="l3">
        <Alert.Indicator />
        <Alert.Content>
          <Alert.Title>Your payment is taking longer than usual to confirm</Alert.Title>
          <Alert.Description>
            <Stack gap="3" mt="1">
              <Text>
                There is no need to pay again. As soon as the payment service confirms it, your
                booking is recorded and we e-mail you a receipt. You can follow it in My events.
              </Text>
              <HStack gap="3" wrap="wrap">
                <Button size="sm" onClick={onCheckAgain}>
                  Check again
                </Button>
                <Button asChild size="sm" variant="outline">
                  <RouterLink to={paths.event.getHref(orderId)}>Go to the event</RouterLink>
                </Button>
              </HStack>
            </Stack>
          </Alert.Description>
        </Alert.Content>
      </Alert.Root>
    );
  }
  return (
    <Flex
      role="status"
      aria-live="polite"
      direction="column"
      align="center"
      textAlign="center"
      gap="4"
      py={{ base: '12', md: '16' }}
      px="6"
      bg="bg.panel"
      borderWidth="1px"
      borderColor="border"
      borderRadius="l3"
    >
      <Spinner size="lg" color="accent.fg" borderWidth="3px" animationDuration="1.2s" />
      <Heading as="h2" fontSize="2xl" fontWeight="normal">
        Recording your payment…
      </Heading>
      <Text color="fg.muted" maxW="md">
        This usually takes a few seconds. You can stay on this page; there is nothing more to do.
      </Text>
    </Flex>
  );
}

function Recorded({ order }: { order: OrderDetail }) {
  const m = (minor: number) => money(minor, order.currency);
  const status = ORDER_STATUS_LABELS_FOR_CLIENT[order.status];
  return (
    <Stack gap="6">
      <Flex
        direction="column"
        align="start"
        gap="3"
        p={{ base: '5', md: '8' }}
        bg="accent.subtle"
        borderRadius="l3"
        role="status"
      >
        <Flex
          boxSize="10"
          borderRadius="full"
          bg="accent.solid"
          color="accent.contrast"
          align="center"
          justify="center"
        >
          <CheckIcon boxSize="6" />
        </Flex>
        <Heading as="h2" fontSize="2xl" fontWeight="normal">
          Thank you: your payment of {m(order.paidMinor)} is recorded
        </Heading>
        <Text>
          {status.description} We have sent a receipt to {order.clientEmail}.
        </Text>
      </Flex>
      <Facts
        labelWidth="9rem"
        items={[
          ['Status', <OrderStatusBadge status={order.status} />],
          ['Reference', order.reference],
          ['Menu', order.menuName],
          ['When', `${longDate(order.eventDate)}, dessert at ${order.serviceTime}`],
          ['Guests', plural(order.guestCount, 'guest')],
          ['Still to pay', balanceWords(order)],
        ]}
      />
      <HStack gap="3" wrap="wrap">
        <Button asChild colorPalette="accent">
          <RouterLink to={paths.event.getHref(order.id)}>See your event</RouterLink>
        </Button>
        <Button asChild variant="outline">
          <RouterLink to={paths.myEvents.getHref()}>My events</RouterLink>
        </Button>
      </HStack>
    </Stack>
  );
}

function BookedStatus({ orderId, sessionId }: { orderId: string; sessionId: string | null }) {
  const returned = useCheckoutReturn(orderId, sessionId);
  const [deadline, setDeadline] = useState(() => Date.now() + BOOKED_TIMEOUT_MS);
  const [timedOut, setTimedOut] = useState(false);
  const order = useQuery({
    ...orderQueryOptions(orderId),
    // After the return call (which records the payment if the service already has it), ask
    // until the payment is recorded, or until the time runs out.
    enabled: sessionId === null || !returned.isPending,
    staleTime: 0,
    refetchInterval: (query) => (waiting(query.state.data) && !timedOut ? BOOKED_POLL_MS : false),
  });

  useEffect(() => {
    const id = window.setTimeout(() => setTimedOut(true), Math.max(0, deadline - Date.now()));
    return () => window.clearTimeout(id);
  }, [deadline]);

  // The booking is made: the draft (with its guests' health details) has no further use.
  useEffect(() => {
    clearBookingDraft();
  }, []);

  if (order.isError && !order.data) {
    return (
      <LoadError
        title="We could not check your booking"
        error={order.error}
        onRetry={() => void order.refetch()}
        retrying={order.isFetching}
      />
    );
  }
  const data = order.data;
  if (data && NOT_PAID.includes(data.status)) {
    return (
      <Alert.Root status="warning" role="alert" borderRadius="l3">
        <Alert.Indicator />
        <Alert.Content>
          <Alert.Title>{ORDER_STATUS_LABELS_FOR_CLIENT[data.status].label}</Alert.Title>
          <Alert.Description>
            <Stack gap="3" mt="1">
              <Text>{ORDER_STATUS_LABELS_FOR_CLIENT[data.status].description}</Text>
              <Button asChild size="sm" alignSelf="start">
                <RouterLink to={paths.menus.getHref()}>Book again</RouterLink>
              </Button>
            </Stack>
          </Alert.Description>
        </Alert.Content>
      </Alert.Root>
    );
  }
  if (waiting(data)) {
    return (
      <Waiting
        orderId={orderId}
        timedOut={timedOut}
        onCheckAgain={() => {
          setTimedOut(false);
          setDeadline(Date.now() + BOOKED_TIMEOUT_MS);
          void order.refetch();
        }}
      />
    );
  }
  return <Recorded order={data!} />;
}

/** *Booked*: back from the payment page, follows the order until the payment is recorded. */
export function BookedRoute() {
  const { orderId = '' } = useParams();
  const [searchParams] = useSearchParams();
  const sessionId = searchParams.get('session_id');
  return (
    <RequireUser>
      {() => (
        <Container maxW="3xl" py={{ base: '8', md: '12' }}>
          <PageTitle>Booked</PageTitle>
          <Stack gap="6">
            <Box>
              <Text
                textStyle="sm"
                fontWeight="semibold"
                letterSpacing="0.12em"
                textTransform="uppercase"
                color="caramel.fg"
              >
                Step 5 of 5
              </Text>
              <Heading as="h1" fontSize={{ base: '4xl', md: '5xl' }} fontWeight="normal">
                Booked
              </Heading>
            </Box>
            <BookedStatus orderId={orderId} sessionId={sessionId} />
          </Stack>
        </Container>
      )}
    </RequireUser>
  );
}
