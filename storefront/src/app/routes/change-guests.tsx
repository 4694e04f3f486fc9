import { Alert, Box, Button, Container, Heading, HStack, Stack, Text } from '@chakra-ui/react';
import type { ChangeGuestCountRequest, OrderDetail } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { Link as RouterLink, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { ArrowLeftIcon } from '../../components/ui/booking-icons';
import { PageTitle } from '../../components/ui/page-title';
import { LoadError } from '../../components/ui/query-state';
import { Skeleton } from '../../components/ui/skeleton';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { RequireUser } from '../../features/auth/components/require-user';
import { GuestListForm } from '../../features/guests/components/guest-list-form';
import { toGuestFormValues, type GuestLimits } from '../../features/guests/form/guest-form';
import { useChangeGuests } from '../../features/orders/api/change-guests';
import { orderQueryOptions, useOrder } from '../../features/orders/api/get-order';
import { usePreviewGuestChange } from '../../features/orders/api/preview-guest-change';
import { RequoteSummary } from '../../features/orders/components/requote-summary';
import { ApiError } from '../../lib/api-client';
import { browser } from '../../lib/browser';
import { longDate } from '../../lib/dates';
import { money } from '../../lib/format';
import { requireUserLoader } from '../guards';
import { warm } from '../loaders';
import { EVENT_NOT_FOUND } from '../screen-loader-parts';

export const changeGuestsLoader =
  (queryClient: QueryClient) => async (args: LoaderFunctionArgs) => {
    await requireUserLoader(queryClient)(args);
    await warm(queryClient, orderQueryOptions(args.params.orderId ?? ''), EVENT_NOT_FOUND);
    return null;
  };

/** What the event page says after a change of guests. */
export interface GuestsChangedState {
  guestsChanged: { refundedMinor: number };
}

function messages(error: unknown): string {
  return error instanceof ApiError ? error.messages.join(' ') : 'Please try again.';
}

function ChangeGuests({ order }: { order: OrderDetail }) {
  const navigate = useNavigate();
  const preview = usePreviewGuestChange(order.id);
  const change = useChangeGuests(order.id);
  const [request, setRequest] = useState<ChangeGuestCountRequest | null>(null);
  const [defaults] = useState(() =>
    toGuestFormValues({
      guestCount: order.guestCount,
      guestRequirements: order.guests.map((g) => ({
        label: g.label,
        ...(g.table ? { table: g.table } : {}),
        allergens: g.allergens as never[],
        diets: g.diets as never[],
        ...(g.notes ? { notes: g.notes } : {}),
      })),
    }),
  );
  const limits = useMemo<GuestLimits>(
    () => ({ minGuests: order.quote.pricing.minGuests, maxGuests: order.quote.pricing.maxGuests }),
    [order.quote.pricing.minGuests, order.quote.pricing.maxGuests],
  );

  if (!order.actions.changeGuests) {
    return (
      <Stack gap="4" align="start">
        <Text>
          The guests of this event can no longer be changed online
          {order.changeGuestsUntil
            ? ` (the final count was due on ${longDate(order.changeGuestsUntil)})`
            : ''}
          . Please contact the studio if something has changed.
        </Text>
        <Button asChild variant="outline">
          <RouterLink to={paths.event.getHref(order.id)}>Back to the event</RouterLink>
        </Button>
      </Stack>
    );
  }

  const requote = preview.data?.requote;

  return (
    <Stack gap="8">
      {order.changeGuestsUntil && (
        <Text color="fg.muted">
          You can change the guests until {longDate(order.changeGuestsUntil)}. More guests are paid
          for now; for fewer guests, the cancellation policy decides what is refunded. You see the
          amounts before anything changes.
        </Text>
      )}
      <GuestListForm
        defaultValues={defaults}
        limits={limits}
        onChange={() => {
          // The preview was for the answers as they were: any edit asks for a new one.
          if (preview.data || preview.error) preview.reset();
          if (change.error) change.reset();
        }}
        onSubmit={(next) => {
          const body: ChangeGuestCountRequest = next;
          setRequest(body);
          preview.mutate(body);
        }}
        busy={preview.isPending}
        submitLabel="Preview the change"
        countHelp={`This menu serves ${limits.minGuests} to ${limits.maxGuests} guests.`}
        secondary={
          <Button asChild variant="ghost">
            <RouterLink to={paths.event.getHref(order.id)}>Back to the event</RouterLink>
          </Button>
        }
      />

      {preview.error && (
        <Alert.Root status="error" role="alert" borderRadius="l2">
          <Alert.Indicator />
          <Alert.Content>
            <Alert.Title>This change cannot be made</Alert.Title>
            <Alert.Description>{messages(preview.error)}</Alert.Description>
          </Alert.Content>
        </Alert.Root>
      )}

      {requote && request && (
        <Box
          as="section"
          aria-labelledby="guest-change-preview"
          borderWidth="2px"
          borderColor="fg"
          borderRadius="l3"
          bg="bg.panel"
          p={{ base: '4', md: '6' }}
        >
          <Stack gap="4">
            <Heading as="h2" id="guest-change-preview" fontSize="2xl" fontWeight="normal">
              What this change means
            </Heading>
            <RequoteSummary requote={requote} />
            {change.error && (
              <Alert.Root status="error" role="alert" borderRadius="l2">
                <Alert.Indicator />
                <Alert.Content>
                  <Alert.Title>The change was not made</Alert.Title>
                  <Alert.Description>{messages(change.error)}</Alert.Description>
                </Alert.Content>
              </Alert.Root>
            )}
            <HStack gap="3" wrap="wrap">
              <Button
                colorPalette="accent"
                loading={change.isPending || change.isSuccess}
                loadingText={requote.collectNowMinor > 0 ? 'Opening the payment page…' : 'Saving…'}
                onClick={() =>
                  change.mutate(request, {
                    onSuccess: (result) => {
                      if (result.checkout) {
                        browser.assign(result.checkout.checkoutUrl);
                        return;
                      }
                      const state: GuestsChangedState = {
                        guestsChanged: { refundedMinor: result.refundedMinor },
                      };
                      void navigate(paths.event.getHref(order.id, 'guests'), { state });
                    },
                  })
                }
              >
                {requote.collectNowMinor > 0
                  ? `Confirm and pay ${money(requote.collectNowMinor, requote.quote.currency)}`
                  : requote.refundNowMinor > 0
                    ? `Confirm and refund ${money(requote.refundNowMinor, requote.quote.currency)}`
                    : 'Confirm the change'}
              </Button>
            </HStack>
          </Stack>
        </Box>
      )}
    </Stack>
  );
}

export function ChangeGuestsRoute() {
  const { orderId = '' } = useParams();
  const order = useOrder(orderId);
  return (
    <RequireUser>
      {() => (
        <Container maxW="4xl" py={{ base: '6', md: '10' }}>
          <PageTitle>Change guests</PageTitle>
          <TextLink
            to={paths.event.getHref(orderId)}
            textStyle="sm"
            display="inline-flex"
            alignItems="center"
            gap="1.5"
            mb="6"
          >
            <ArrowLeftIcon boxSize="4" /> Back to the event
          </TextLink>
          <Heading as="h1" fontSize={{ base: '3xl', md: '4xl' }} fontWeight="normal" mb="2">
            Change guests
          </Heading>
          {order.isPending ? (
            <Stack gap="4" role="status" aria-label="Loading the event">
              <Skeleton h="10" maxW="xs" />
              <Skeleton h="64" />
            </Stack>
          ) : order.isError ? (
            <LoadError
              title="This event could not be loaded"
              error={order.error}
              onRetry={() => void order.refetch()}
              retrying={order.isFetching}
            />
          ) : (
            <>
              <Text textStyle="lg" mb="6">
                {order.data.menuName}, {longDate(order.data.eventDate)}
              </Text>
              <ChangeGuests order={order.data} />
            </>
          )}
        </Container>
      )}
    </RequireUser>
  );
}
