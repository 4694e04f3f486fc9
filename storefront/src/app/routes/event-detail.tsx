import {
  Alert,
  Box,
  Button,
  Container,
  Flex,
  Heading,
  HStack,
  Stack,
  Tabs,
  Text,
} from '@chakra-ui/react';
import { ORDER_STATUS_LABELS_FOR_CLIENT, plural, type OrderDetail } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import {
  Link as RouterLink,
  useLocation,
  useParams,
  useSearchParams,
  type LoaderFunctionArgs,
} from 'react-router';
import { ArrowLeftIcon, DownloadIcon, ReceiptIcon } from '../../components/ui/booking-icons';
import { Facts } from '../../components/ui/facts';
import { CalendarIcon } from '../../components/ui/icons';
import { PageTitle } from '../../components/ui/page-title';
import { LoadError } from '../../components/ui/query-state';
import { Skeleton, SkeletonLines } from '../../components/ui/skeleton';
import { TextLink } from '../../components/ui/text-link';
import { EVENT_TABS, paths, type EventTab } from '../../config/paths';
import { RequireUser } from '../../features/auth/components/require-user';
import { AllergenSummary } from '../../features/guests/components/allergen-summary';
import { GuestCards } from '../../features/guests/components/guest-table';
import {
  eventFileDocument,
  receiptDocument,
  useDownloadDocument,
  type OrderDocument,
} from '../../features/orders/api/download-document';
import { orderQueryOptions, useOrder } from '../../features/orders/api/get-order';
import { useStartCheckout, type CheckoutPlan } from '../../features/orders/api/start-checkout';
import { CancelDialog } from '../../features/orders/components/cancel-dialog';
import { OrderMoney } from '../../features/orders/components/order-money';
import { OrderStatusBadge } from '../../features/orders/components/order-status-badge';
import {
  PAYMENT_KIND_LABELS,
  PaymentsLedger,
} from '../../features/orders/components/payments-ledger';
import { StatusTimeline } from '../../features/orders/components/status-timeline';
import { ApiError } from '../../lib/api-client';
import { browser } from '../../lib/browser';
import { dateTime, longDate } from '../../lib/dates';
import { money } from '../../lib/format';
import { requireUserLoader } from '../guards';
import { warm } from '../loaders';
import { EVENT_NOT_FOUND, keepOnSearchChange } from '../screen-loader-parts';
import type { GuestsChangedState } from './change-guests';

export const shouldRevalidate = keepOnSearchChange;

export const eventDetailLoader = (queryClient: QueryClient) => async (args: LoaderFunctionArgs) => {
  await requireUserLoader(queryClient)(args);
  await warm(queryClient, orderQueryOptions(args.params.orderId ?? ''), EVENT_NOT_FOUND);
  return null;
};

const TAB_TITLES: Record<EventTab, string> = {
  overview: 'Overview',
  guests: 'Guests and diets',
  payments: 'Payments',
  documents: 'Documents',
};

function isTab(value: string | null): value is EventTab {
  return (EVENT_TABS as readonly string[]).includes(value ?? '');
}

/** The buttons to pay what the server says is payable now, with the amounts it quoted. */
function PayActions({
  order,
  onPay,
  paying,
}: {
  order: OrderDetail;
  onPay: (plan: CheckoutPlan) => void;
  paying: CheckoutPlan | null;
}) {
  const m = (minor: number) => money(minor, order.currency);
  switch (order.actions.pay) {
    case null:
      return null;
    case 'balance':
      return (
        <Button
          colorPalette="accent"
          onClick={() => onPay('balance')}
          loading={paying === 'balance'}
        >
          Pay the balance: {m(order.balanceMinor)}
        </Button>
      );
    case 'top_up':
      return (
        <Button colorPalette="accent" onClick={() => onPay('top_up')} loading={paying === 'top_up'}>
          Pay for the added guests
        </Button>
      );
    case 'deposit_or_full':
      return (
        <>
          {order.quote.paymentPlan === 'deposit_and_balance' && (
            <Button
              colorPalette="accent"
              onClick={() => onPay('deposit')}
              loading={paying === 'deposit'}
            >
              Pay the deposit: {m(order.quote.depositMinor)}
            </Button>
          )}
          <Button
            colorPalette="accent"
            variant={order.quote.paymentPlan === 'deposit_and_balance' ? 'outline' : 'solid'}
            onClick={() => onPay('full')}
            loading={paying === 'full'}
          >
            Pay in full: {m(order.quote.totalMinor)}
          </Button>
        </>
      );
  }
}

function Overview({ order }: { order: OrderDetail }) {
  return (
    <Stack gap="8">
      <Facts
        items={[
          ['Date', longDate(order.eventDate)],
          ['Dessert served at', order.serviceTime],
          ['Occasion', order.occasion],
          [
            'Venue',
            <Stack gap="0">
              {order.venueAddressLines.map((line) => (
                <span key={line}>{line}</span>
              ))}
            </Stack>,
          ],
          ['Phone on the day', order.contactPhone],
          ['Guests', plural(order.guestCount, 'guest')],
        ]}
      />
      <Box>
        <Heading as="h3" fontSize="xl" fontWeight="normal" mb="3">
          Money
        </Heading>
        <OrderMoney order={order} />
      </Box>
      <Box>
        <Heading as="h3" fontSize="xl" fontWeight="normal" mb="4">
          What has happened
        </Heading>
        {order.timeline.length > 0 ? (
          <StatusTimeline events={order.timeline} />
        ) : (
          <Text color="fg.muted">Nothing recorded yet.</Text>
        )}
      </Box>
    </Stack>
  );
}

function EventDetail({ order }: { order: OrderDetail }) {
  const [searchParams, setSearchParams] = useSearchParams();
  const tabParam = searchParams.get('tab');
  const tab: EventTab = isTab(tabParam) ? tabParam : 'overview';
  const [cancelOpen, setCancelOpen] = useState(false);
  const [cancelledRefund, setCancelledRefund] = useState<number | null>(null);
  const checkout = useStartCheckout();
  const download = useDownloadDocument();
  const status = ORDER_STATUS_LABELS_FOR_CLIENT[order.status];
  const guestsChanged = (useLocation().state as Partial<GuestsChangedState> | null)?.guestsChanged;

  const pay = (plan: CheckoutPlan) =>
    checkout.mutate(
      { orderId: order.id, plan },
      { onSuccess: (session) => browser.assign(session.checkoutUrl) },
    );
  const save = (document: OrderDocument) => download.mutate(document);
  const downloading = download.isPending ? (download.variables?.path ?? null) : null;
  const receipts = order.payments.filter((p) => p.receiptAvailable);

  return (
    <>
      <PageTitle>{`${order.menuName}, ${longDate(order.eventDate)}`}</PageTitle>
      <Stack gap="6">
        <Stack gap="3">
          <Flex justify="space-between" gap="3" wrap="wrap" align="start">
            <Stack gap="1">
              <Text textStyle="sm" color="fg.muted">
                Reference {order.reference}
              </Text>
              <Heading as="h1" fontSize={{ base: '3xl', md: '4xl' }} fontWeight="normal">
                {order.menuName}
              </Heading>
              <Text textStyle="lg">
                {longDate(order.eventDate)} · {plural(order.guestCount, 'guest')}
              </Text>
            </Stack>
            <OrderStatusBadge status={order.status} />
          </Flex>
          <Text color="fg.muted">{status.description}</Text>
        </Stack>

        {guestsChanged && (
          <Alert.Root status="success" role="status" borderRadius="l2">
            <Alert.Indicator />
            <Alert.Content>
              <Alert.Title>Your guests are updated</Alert.Title>
              <Alert.Description>
                {guestsChanged.refundedMinor > 0
                  ? `${money(guestsChanged.refundedMinor, order.currency)} will be refunded to the card you paid with.`
                  : 'The kitchen sees the new list.'}
              </Alert.Description>
            </Alert.Content>
          </Alert.Root>
        )}
        {cancelledRefund !== null && (
          <Alert.Root status="success" role="status" borderRadius="l2">
            <Alert.Indicator />
            <Alert.Content>
              <Alert.Title>Your booking is cancelled</Alert.Title>
              <Alert.Description>
                {cancelledRefund > 0
                  ? `${money(cancelledRefund, order.currency)} will be refunded to the card you paid with.`
                  : 'Nothing is refunded under the cancellation policy.'}{' '}
                We have sent you an e-mail.
              </Alert.Description>
            </Alert.Content>
          </Alert.Root>
        )}
        {(checkout.error || download.error) && (
          <Alert.Root status="error" role="alert" borderRadius="l2">
            <Alert.Indicator />
            <Alert.Content>
              <Alert.Title>
                {checkout.error
                  ? 'The payment page could not be opened'
                  : 'The file could not be downloaded'}
              </Alert.Title>
              <Alert.Description>
                {(() => {
                  const error = checkout.error ?? download.error;
                  return error instanceof ApiError ? error.messages.join(' ') : 'Please try again.';
                })()}
              </Alert.Description>
            </Alert.Content>
          </Alert.Root>
        )}

        {(order.actions.pay || order.actions.changeGuests || order.actions.cancel) && (
          <Stack gap="2">
            <HStack gap="3" wrap="wrap">
              <PayActions
                order={order}
                onPay={pay}
                paying={checkout.isPending ? (checkout.variables?.plan ?? null) : null}
              />
              {order.actions.changeGuests && (
                <Button asChild variant="outline">
                  <RouterLink to={paths.changeGuests.getHref(order.id)}>Change guests</RouterLink>
                </Button>
              )}
              {order.actions.cancel && (
                <Button variant="ghost" colorPalette="danger" onClick={() => setCancelOpen(true)}>
                  Cancel booking
                </Button>
              )}
            </HStack>
            {order.changeGuestsUntil && order.actions.changeGuests && (
              <Text textStyle="sm" color="fg.muted">
                You can change the number of guests and their requirements until{' '}
                {longDate(order.changeGuestsUntil)}.
              </Text>
            )}
          </Stack>
        )}

        <Tabs.Root
          value={tab}
          onValueChange={(e) =>
            setSearchParams(
              (current) => {
                const next = new URLSearchParams(current);
                if (e.value === 'overview') next.delete('tab');
                else next.set('tab', e.value);
                return next;
              },
              { replace: true, preventScrollReset: true },
            )
          }
          variant="line"
          colorPalette="brand"
          lazyMount
        >
          <Box overflowX="auto" mx={{ base: '-4', md: '0' }} px={{ base: '4', md: '0' }}>
            <Tabs.List minW="max-content">
              {EVENT_TABS.map((t) => (
                // Narrower on a phone, so that all four show at 390 px (they scroll below that).
                <Tabs.Trigger key={t} value={t} whiteSpace="nowrap" px={{ base: '2', sm: '4' }}>
                  {TAB_TITLES[t]}
                </Tabs.Trigger>
              ))}
            </Tabs.List>
          </Box>
          <Tabs.Content value="overview" pt="6">
            <Overview order={order} />
          </Tabs.Content>
          <Tabs.Content value="guests" pt="6">
            <Stack gap="6">
              {guestDetailsRemoved(order) ? (
                <Text>
                  {plural(order.guestCount, 'guest')} in all. {guestDetailsRemoved(order)}
                </Text>
              ) : (
                <Text>
                  {plural(order.guestCount, 'guest')} in all;{' '}
                  {order.guests.length === 0
                    ? 'no allergies or diets listed.'
                    : `${plural(order.guests.length, 'guest')} with an allergy or a diet.`}
                </Text>
              )}
              {order.guests.length > 0 && (
                <>
                  <AllergenSummary guests={order.guests} guestCount={order.guestCount} />
                  <GuestCards guests={order.guests} />
                </>
              )}
              <Text textStyle="sm" color="fg.muted">
                Only you, the chef and the team serving your event can see these details. They are
                erased a few weeks after the event.
              </Text>
              {order.actions.changeGuests && (
                <Button asChild variant="outline" alignSelf="start">
                  <RouterLink to={paths.changeGuests.getHref(order.id)}>Change guests</RouterLink>
                </Button>
              )}
            </Stack>
          </Tabs.Content>
          <Tabs.Content value="payments" pt="6">
            <Stack gap="6">
              <OrderMoney order={order} />
              <PaymentsLedger
                payments={order.payments}
                receipt={(p) => receiptDocument(order.id, p.id, order.reference)}
                onDownload={save}
                downloading={downloading}
              />
            </Stack>
          </Tabs.Content>
          <Tabs.Content value="documents" pt="6">
            <Stack as="ul" listStyleType="none" gap="3">
              <Box as="li">
                <DocumentRow
                  icon={<CalendarIcon boxSize="5" />}
                  title="Event file (.ics)"
                  text="Adds the event to your calendar, with the service time and the venue."
                  document={eventFileDocument(order.id, order.reference)}
                  onDownload={save}
                  downloading={downloading}
                />
              </Box>
              {receipts.map((p) => (
                <Box as="li" key={p.id}>
                  <DocumentRow
                    icon={<ReceiptIcon boxSize="5" />}
                    title={`Receipt: ${PAYMENT_KIND_LABELS[p.kind].toLowerCase()} of ${money(p.amountMinor, p.currency)}`}
                    text={p.settledAt ? `PDF, ${dateTime(p.settledAt)}` : 'PDF'}
                    document={receiptDocument(order.id, p.id, order.reference)}
                    onDownload={save}
                    downloading={downloading}
                  />
                </Box>
              ))}
              {receipts.length === 0 && (
                <Text as="li" color="fg.muted" textStyle="sm">
                  Receipts appear here once a payment is recorded.
                </Text>
              )}
            </Stack>
          </Tabs.Content>
        </Tabs.Root>
      </Stack>
      <CancelDialog
        order={order}
        open={cancelOpen}
        onOpenChange={setCancelOpen}
        onCancelled={(refund) => setCancelledRefund(refund)}
      />
    </>
  );
}

function DocumentRow({
  icon,
  title,
  text,
  document,
  onDownload,
  downloading,
}: {
  icon: ReactNode;
  title: string;
  text: string;
  document: OrderDocument;
  onDownload: (document: OrderDocument) => void;
  downloading: string | null;
}) {
  return (
    <Flex
      gap="4"
      align={{ base: 'start', sm: 'center' }}
      direction={{ base: 'column', sm: 'row' }}
      justify="space-between"
      borderWidth="1px"
      borderColor="border"
      borderRadius="l3"
      bg="bg.panel"
      p="4"
    >
      <HStack gap="3" align="start">
        <Box color="caramel.fg" mt="0.5">
          {icon}
        </Box>
        <Stack gap="0.5">
          <Text fontWeight="medium">{title}</Text>
          <Text textStyle="sm" color="fg.muted">
            {text}
          </Text>
        </Stack>
      </HStack>
      <Button
        size="sm"
        variant="outline"
        onClick={() => onDownload(document)}
        loading={downloading === document.path}
        loadingText="Downloading…"
      >
        <DownloadIcon /> Download{' '}
        <Text as="span" srOnly>
          {title}
        </Text>
      </Button>
    </Flex>
  );
}

/**
 * Why the guests' allergies and diets are no longer shown, when they have been erased (a set
 * number of days after the event, or with the account); the API adds it to the order.
 */
function guestDetailsRemoved(order: OrderDetail): string | null {
  const removed = (order as OrderDetail & { guestDetailsRemoved?: { message?: unknown } })
    .guestDetailsRemoved;
  return typeof removed?.message === 'string' ? removed.message : null;
}

export function EventDetailRoute() {
  const { orderId = '' } = useParams();
  const order = useOrder(orderId);
  return (
    <RequireUser>
      {() => (
        <Container maxW="4xl" py={{ base: '6', md: '10' }}>
          <TextLink
            to={paths.myEvents.getHref()}
            textStyle="sm"
            display="inline-flex"
            alignItems="center"
            gap="1.5"
            mb="6"
          >
            <ArrowLeftIcon boxSize="4" /> My events
          </TextLink>
          {order.isPending ? (
            <Stack gap="4" role="status" aria-label="Loading the event">
              <PageTitle>My events</PageTitle>
              <Skeleton h="10" w="60%" />
              <SkeletonLines lines={3} />
              <Skeleton h="48" />
            </Stack>
          ) : order.isError ? (
            <>
              <PageTitle>My events</PageTitle>
              <LoadError
                title="This event could not be loaded"
                error={order.error}
                onRetry={() => void order.refetch()}
                retrying={order.isFetching}
              />
            </>
          ) : (
            <EventDetail order={order.data} />
          )}
        </Container>
      )}
    </RequireUser>
  );
}
