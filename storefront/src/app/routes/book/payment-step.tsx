import { Alert, Box, Button, HStack, Link, List, RadioCard, Stack, Text } from '@chakra-ui/react';
import { createOrderSchema, type Quote } from '@nappe/shared';
import { useMutation } from '@tanstack/react-query';
import { Link as RouterLink, Navigate } from 'react-router';
import { LockIcon } from '../../../components/ui/booking-icons';
import { LoadError } from '../../../components/ui/query-state';
import { SkeletonLines } from '../../../components/ui/skeleton';
import { paths } from '../../../config/paths';
import { useCreateOrder } from '../../../features/booking/api/create-order';
import { useQuote } from '../../../features/booking/api/get-quote';
import { QuoteSummary } from '../../../features/booking/components/quote-summary';
import type { PaymentChoice } from '../../../features/booking/draft/booking-draft';
import { orderInputFrom } from '../../../features/booking/draft/event-schema';
import { startCheckout } from '../../../features/orders/api/start-checkout';
import { ApiError } from '../../../lib/api-client';
import { browser, newIdempotencyKey } from '../../../lib/browser';
import { longDate } from '../../../lib/dates';
import { money } from '../../../lib/format';
import { firstOpenStep, reachableSteps, useBooking } from './book-layout';

function choices(quote: Quote): { value: PaymentChoice; title: string; text: string }[] {
  const m = (minor: number) => money(minor, quote.currency);
  const full = {
    value: 'full' as const,
    title: `Pay in full: ${m(quote.totalMinor)}`,
    text: 'Nothing more to pay before the event.',
  };
  if (quote.paymentPlan === 'full') return [full];
  return [
    {
      value: 'deposit',
      title: `Pay the deposit: ${m(quote.depositMinor)}`,
      text: `Then ${m(quote.balanceMinor)}${quote.balanceDueDate ? ` by ${longDate(quote.balanceDueDate)}` : ''}. We remind you by e-mail.`,
    },
    full,
  ];
}

/** Words for a booking or a payment the server refused. */
function describeFailure(error: unknown): {
  title: string;
  messages: string[];
  changeDate: boolean;
} {
  if (error instanceof ApiError) {
    if (error.status === 409) {
      return {
        title: 'This date can no longer be booked',
        messages: error.messages,
        changeDate: true,
      };
    }
    if (error.status === 0) {
      return {
        title: 'No connection',
        messages: [
          'We could not reach Nappe. Check your connection and try again: you will not be charged twice.',
        ],
        changeDate: false,
      };
    }
    if (error.status >= 500) {
      return {
        title: 'Something went wrong on our side',
        messages: ['Please try again in a moment: you will not be charged twice.'],
        changeDate: false,
      };
    }
    return { title: 'The booking was not accepted', messages: error.messages, changeDate: false };
  }
  return {
    title: 'The booking was not accepted',
    messages: [String((error as Error)?.message ?? error)],
    changeDate: false,
  };
}

/**
 * *Payment*: deposit or full, then the booking is made (`POST /api/orders` with the attempt's
 * idempotency key) and the browser goes to the payment page. A retry reuses the key — and the
 * order, once it exists — so a double click or a lost answer cannot book twice.
 */
export function PaymentStepRoute() {
  const { menu, draft, update } = useBooking();
  const ready = reachableSteps(draft, menu).has('payment');
  const guestCount = draft.guests?.guestCount ?? 0;
  const quote = useQuote(
    ready ? { menuId: menu.id, eventDate: draft.event.eventDate, guestCount } : null,
  );
  const createOrder = useCreateOrder();

  const pay = useMutation({
    mutationFn: async (plan: PaymentChoice) => {
      const body = createOrderSchema.parse(orderInputFrom(draft));
      const fingerprint = JSON.stringify(body);
      const attempt =
        draft.attempt && draft.attempt.fingerprint === fingerprint
          ? draft.attempt
          : { key: newIdempotencyKey(), fingerprint, orderId: null };
      update((d) => ({ ...d, plan, attempt }));
      let orderId = attempt.orderId;
      if (orderId === null) {
        const order = await createOrder.mutateAsync({ input: body, idempotencyKey: attempt.key });
        orderId = order.id;
        update((d) => ({ ...d, attempt: { ...attempt, orderId: order.id } }));
      }
      const checkout = await startCheckout(orderId, plan);
      browser.assign(checkout.checkoutUrl);
      return checkout;
    },
  });

  if (!ready)
    return <Navigate to={paths.book.getHref(menu.id, firstOpenStep(draft, menu))} replace />;

  const options = quote.data ? choices(quote.data) : [];
  const plan: PaymentChoice = options.some((o) => o.value === draft.plan)
    ? draft.plan
    : (options[0]?.value ?? 'full');
  const amount = quote.data
    ? plan === 'full'
      ? quote.data.totalMinor
      : quote.data.depositMinor
    : 0;
  const failure = pay.error ? describeFailure(pay.error) : null;
  const leaving = pay.isSuccess;

  return (
    <Stack gap="8">
      {quote.isPending ? (
        <Box role="status" aria-label="Working out the price">
          <SkeletonLines lines={5} gap="3" />
        </Box>
      ) : quote.isError ? (
        <LoadError
          title="The price could not be worked out"
          error={quote.error}
          onRetry={() => void quote.refetch()}
          retrying={quote.isFetching}
        />
      ) : (
        <>
          <Box
            bg="bg.panel"
            borderWidth="1px"
            borderColor="border"
            borderRadius="l3"
            px={{ base: '4', md: '6' }}
            py="3"
          >
            <QuoteSummary quote={quote.data} />
          </Box>

          <RadioCard.Root
            value={plan}
            onValueChange={(e) => {
              if (e.value === 'deposit' || e.value === 'full')
                update((d) => ({ ...d, plan: e.value as PaymentChoice }));
            }}
            orientation="horizontal"
            align="start"
            colorPalette="accent"
            disabled={pay.isPending || leaving}
          >
            <RadioCard.Label fontWeight="medium" mb="2">
              How would you like to pay?
            </RadioCard.Label>
            <Stack direction={{ base: 'column', md: 'row' }} gap="3" align="stretch">
              {options.map((o) => (
                <RadioCard.Item key={o.value} value={o.value} flex="1" bg="bg.panel">
                  <RadioCard.ItemHiddenInput />
                  <RadioCard.ItemControl>
                    <RadioCard.ItemContent>
                      <RadioCard.ItemText fontWeight="semibold">{o.title}</RadioCard.ItemText>
                      <RadioCard.ItemDescription>{o.text}</RadioCard.ItemDescription>
                    </RadioCard.ItemContent>
                    <RadioCard.ItemIndicator />
                  </RadioCard.ItemControl>
                </RadioCard.Item>
              ))}
            </Stack>
          </RadioCard.Root>
          {quote.data.paymentPlan === 'full' && (
            <Text textStyle="sm" color="fg.muted">
              {quote.data.notes[quote.data.notes.length - 1]}
            </Text>
          )}
        </>
      )}

      {failure && (
        <Alert.Root status="error" role="alert" borderRadius="l2">
          <Alert.Indicator />
          <Alert.Content>
            <Alert.Title>{failure.title}</Alert.Title>
            <Alert.Description>
              <List.Root
                as="ul"
                ps={failure.messages.length > 1 ? '4' : '0'}
                listStyleType={failure.messages.length > 1 ? 'disc' : 'none'}
              >
                {failure.messages.map((m) => (
                  <List.Item key={m}>{m}</List.Item>
                ))}
              </List.Root>
              {failure.changeDate && (
                <Link asChild textDecoration="underline" mt="1">
                  <RouterLink to={paths.book.getHref(menu.id, 'event')}>
                    Choose another date
                  </RouterLink>
                </Link>
              )}
            </Alert.Description>
          </Alert.Content>
        </Alert.Root>
      )}

      <Stack gap="3">
        <HStack gap="2" color="fg.muted" textStyle="sm">
          <LockIcon boxSize="4" flexShrink="0" />
          <Text>
            You will pay on the secure payment page, then come straight back here. Your date is held
            while you pay.
          </Text>
        </HStack>
        <HStack justify="space-between" gap="3" wrap="wrap-reverse">
          <Button asChild variant="ghost">
            <RouterLink to={paths.book.getHref(menu.id, 'review')}>Back to review</RouterLink>
          </Button>
          <Button
            size="lg"
            colorPalette="accent"
            disabled={!quote.data || leaving}
            loading={pay.isPending || leaving}
            loadingText={leaving ? 'Opening the payment page…' : 'Booking…'}
            onClick={() => pay.mutate(plan)}
          >
            {failure
              ? 'Try again'
              : quote.data
                ? `Pay ${money(amount, quote.data.currency)}`
                : 'Pay'}
          </Button>
        </HStack>
      </Stack>
    </Stack>
  );
}
