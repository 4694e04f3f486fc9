import {
  Alert,
  Box,
  Button,
  Card,
  Field,
  Flex,
  Heading,
  HStack,
  Link,
  Stack,
  Text,
} from '@chakra-ui/react';
import { createOrderSchema, plural } from '@nappe/shared';
import { useState } from 'react';
import { Link as RouterLink, Navigate, useNavigate } from 'react-router';
import { Checkbox } from '../../../components/ui/checkbox';
import { ArrowRightIcon } from '../../../components/ui/icons';
import { LoadError } from '../../../components/ui/query-state';
import { SkeletonLines } from '../../../components/ui/skeleton';
import { paths, type BookingStep } from '../../../config/paths';
import { useBookingTerms } from '../../../features/booking/api/get-booking-terms';
import { useQuote } from '../../../features/booking/api/get-quote';
import {
  CancellationPolicy,
  QuoteNotes,
  QuoteSummary,
} from '../../../features/booking/components/quote-summary';
import { addressLines } from '../../../features/booking/draft/event-schema';
import { AllergenSummary } from '../../../features/guests/components/allergen-summary';
import { ApiError } from '../../../lib/api-client';
import { longDate } from '../../../lib/dates';
import { firstOpenStep, reachableSteps, useBooking } from './book-layout';

const ACCEPT_MESSAGE =
  createOrderSchema.shape.acceptTerms.safeParse(false).error?.issues[0]?.message ??
  'Please accept the booking terms and the cancellation policy to continue.';

function ChangeLink({ menuId, step, what }: { menuId: string; step: BookingStep; what: string }) {
  return (
    <Link asChild textStyle="sm" color="brand.fg" textDecoration="underline">
      <RouterLink to={paths.book.getHref(menuId, step)}>
        Change{' '}
        <Box as="span" srOnly>
          {what}
        </Box>
      </RouterLink>
    </Link>
  );
}

/** *Review*: the event, the guests, the server's quote, the cancellation tiers and the terms. */
export function ReviewStepRoute() {
  const { menu, draft, update } = useBooking();
  const navigate = useNavigate();
  const [accepted, setAccepted] = useState(draft.acceptTerms);
  const [showError, setShowError] = useState(false);
  const ready = reachableSteps(draft, menu).has('review');
  const quote = useQuote(
    ready && draft.guests?.guestCount
      ? { menuId: menu.id, eventDate: draft.event.eventDate, guestCount: draft.guests.guestCount }
      : null,
  );
  const terms = useBookingTerms();

  if (!ready)
    return <Navigate to={paths.book.getHref(menu.id, firstOpenStep(draft, menu))} replace />;
  const guests = draft.guests!;
  const quoteRefused =
    quote.error instanceof ApiError && quote.error.status >= 400 && quote.error.status < 500;

  return (
    <Stack gap="8">
      <Card.Root variant="outline" bg="bg.panel" borderColor="border">
        <Card.Body gap="4">
          <Flex justify="space-between" align="baseline" gap="3">
            <Heading as="h3" fontSize="xl" fontWeight="normal">
              Your event
            </Heading>
            <ChangeLink menuId={menu.id} step="event" what="your event" />
          </Flex>
          <Stack gap="1">
            <Text fontWeight="medium">
              {longDate(draft.event.eventDate)}, dessert served at {draft.event.serviceTime}
            </Text>
            <Text color="fg.muted">{draft.event.occasion}</Text>
            <Text color="fg.muted">{addressLines(draft.event.venueAddress).join(', ')}</Text>
            <Text color="fg.muted">Phone on the day: {draft.event.contactPhone}</Text>
          </Stack>
        </Card.Body>
      </Card.Root>

      <Card.Root variant="outline" bg="bg.panel" borderColor="border">
        <Card.Body gap="4">
          <Flex justify="space-between" align="baseline" gap="3">
            <Heading as="h3" fontSize="xl" fontWeight="normal">
              Your guests
            </Heading>
            <ChangeLink menuId={menu.id} step="guests" what="your guests" />
          </Flex>
          <Text fontWeight="medium">{plural(guests.guestCount ?? 0, 'guest')}</Text>
          <AllergenSummary
            guests={guests.guestRequirements}
            guestCount={guests.guestCount}
            headingLevel="h4"
          />
        </Card.Body>
      </Card.Root>

      <Box
        as="section"
        aria-labelledby="review-price"
        aria-busy={quote.isPending && quote.fetchStatus !== 'idle'}
      >
        <Heading as="h3" id="review-price" fontSize="xl" fontWeight="normal" mb="3">
          Price
        </Heading>
        {quote.isPending ? (
          <Box role="status" aria-label="Working out the price">
            <SkeletonLines lines={5} gap="3" />
          </Box>
        ) : quote.isError ? (
          quoteRefused ? (
            <Alert.Root status="error" role="alert" borderRadius="l2">
              <Alert.Indicator />
              <Alert.Content>
                <Alert.Title>We cannot quote this booking</Alert.Title>
                <Alert.Description>
                  {(quote.error as ApiError).messages.join(' ')}{' '}
                  <Link asChild textDecoration="underline">
                    <RouterLink to={paths.book.getHref(menu.id, 'event')}>
                      Change your event
                    </RouterLink>
                  </Link>
                </Alert.Description>
              </Alert.Content>
            </Alert.Root>
          ) : (
            <LoadError
              title="The price could not be worked out"
              error={quote.error}
              onRetry={() => void quote.refetch()}
              retrying={quote.isFetching}
            />
          )
        ) : (
          <Stack gap="4">
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
            <QuoteNotes quote={quote.data} />
          </Stack>
        )}
      </Box>

      {quote.data && (
        <CancellationPolicy lines={quote.data.cancellationPolicy} headingId="review-cancel" />
      )}

      <Stack as="section" aria-labelledby="review-terms" gap="3">
        <Heading as="h3" id="review-terms" fontSize="lg" fontWeight="normal">
          Booking terms
        </Heading>
        {terms.isPending ? (
          <SkeletonLines lines={4} />
        ) : terms.isError ? (
          <LoadError
            title="The booking terms could not be loaded"
            error={terms.error}
            onRetry={() => void terms.refetch()}
            retrying={terms.isFetching}
          />
        ) : (
          <Box
            tabIndex={0}
            role="region"
            aria-label="The full booking terms"
            maxH="64"
            overflowY="auto"
            borderWidth="1px"
            borderColor="border"
            borderRadius="l2"
            bg="bg.panel"
            px="4"
            py="3"
            textStyle="sm"
          >
            <Stack gap="2">
              {terms.data.terms.map((paragraph) => (
                <Text key={paragraph}>{paragraph}</Text>
              ))}
            </Stack>
          </Box>
        )}
        <Field.Root invalid={showError && !accepted}>
          <Checkbox
            checked={accepted}
            onCheckedChange={(e) => {
              setAccepted(e.checked === true);
              update((d) => ({ ...d, acceptTerms: e.checked === true }));
            }}
            invalid={showError && !accepted}
          >
            I accept the booking terms and the cancellation policy.
          </Checkbox>
          {showError && !accepted && (
            <Field.ErrorText role="alert">{ACCEPT_MESSAGE}</Field.ErrorText>
          )}
        </Field.Root>
      </Stack>

      <HStack justify="space-between" gap="3" wrap="wrap-reverse">
        <Button asChild variant="ghost">
          <RouterLink to={paths.book.getHref(menu.id, 'guests')}>Back to your guests</RouterLink>
        </Button>
        <Button
          size="lg"
          colorPalette="accent"
          disabled={!quote.data}
          onClick={() => {
            if (!accepted) {
              setShowError(true);
              return;
            }
            update((d) => ({ ...d, acceptTerms: true }));
            void navigate(paths.book.getHref(menu.id, 'payment'));
          }}
        >
          Continue to payment <ArrowRightIcon />
        </Button>
      </HStack>
    </Stack>
  );
}
