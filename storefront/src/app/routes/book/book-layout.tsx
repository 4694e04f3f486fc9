import { Box, Container, Heading, HStack, Stack, Text } from '@chakra-ui/react';
import { changeGuestCountSchema, plural } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import { useEffect, useRef } from 'react';
import {
  Outlet,
  useLocation,
  useOutletContext,
  useParams,
  type LoaderFunctionArgs,
} from 'react-router';
import { PageTitle } from '../../../components/ui/page-title';
import { LoadError } from '../../../components/ui/query-state';
import { Skeleton } from '../../../components/ui/skeleton';
import { BOOKING_STEPS, type BookingStep } from '../../../config/paths';
import { StepIndicator, STEP_TITLES } from '../../../features/booking/components/step-indicator';
import { useBookingDraft, type BookingDraft } from '../../../features/booking/draft/booking-draft';
import { eventComplete } from '../../../features/booking/draft/event-schema';
import { menuQueryOptions, useMenu } from '../../../features/menus/api/get-menu';
import type { PublicMenu } from '../../../features/menus/api/types';
import { longDate } from '../../../lib/dates';
import { money } from '../../../lib/format';
import { MENU_NOT_FOUND, warm } from '../../loaders';

export interface BookingOutlet {
  menu: PublicMenu;
  draft: BookingDraft;
  /** Change the draft; `quiet` for keystrokes (stored at once, shown at the next step). */
  update: (change: (draft: BookingDraft) => BookingDraft, options?: { quiet?: boolean }) => void;
}

export const useBooking = () => useOutletContext<BookingOutlet>();

export const bookLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    await warm(queryClient, menuQueryOptions(params.menuId ?? ''), MENU_NOT_FOUND);
    return null;
  };

/** Whether the guest step's answers stand (the shared rules and the menu's limits). */
export function guestsComplete(draft: BookingDraft, menu: PublicMenu): boolean {
  const g = draft.guests;
  if (!g || g.guestCount === null) return false;
  if (g.guestCount < menu.minGuests || g.guestCount > menu.maxGuests) return false;
  return changeGuestCountSchema.safeParse({
    guestCount: g.guestCount,
    guestRequirements: g.guestRequirements,
    ...(g.guestRequirements.length > 0 ? { guestDataConsent: g.guestDataConsent } : {}),
  }).success;
}

/** The steps a client may open now: each one needs the ones before it done. */
export function reachableSteps(draft: BookingDraft, menu: PublicMenu): Set<BookingStep> {
  const steps = new Set<BookingStep>(['event']);
  if (!eventComplete(draft.event)) return steps;
  steps.add('guests');
  if (!guestsComplete(draft, menu)) return steps;
  steps.add('review');
  if (draft.acceptTerms) steps.add('payment');
  return steps;
}

/** The first step that still needs answers, to send a client to when a later one is opened. */
export function firstOpenStep(draft: BookingDraft, menu: PublicMenu): BookingStep {
  const reachable = reachableSteps(draft, menu);
  return [...BOOKING_STEPS].reverse().find((s) => reachable.has(s)) ?? 'event';
}

function currentStep(pathname: string): BookingStep {
  const last = pathname.split('/').filter(Boolean).pop();
  return (BOOKING_STEPS as readonly string[]).includes(last ?? '')
    ? (last as BookingStep)
    : 'event';
}

/** The booking wizard's frame: the menu, the steps, and the step at this address. */
export function BookLayoutRoute() {
  const { menuId = '' } = useParams();
  const menu = useMenu(menuId);
  const [draft, update] = useBookingDraft(menuId);
  const { pathname } = useLocation();
  const step = currentStep(pathname);
  const headingRef = useRef<HTMLHeadingElement>(null);
  const previousStep = useRef(step);

  // Moving between steps puts focus on the new step's title, as a new page would.
  useEffect(() => {
    if (previousStep.current === step) return;
    previousStep.current = step;
    headingRef.current?.focus();
  }, [step]);

  if (menu.isPending) {
    return (
      <Container maxW="4xl" py={{ base: '8', md: '12' }}>
        <PageTitle>Book</PageTitle>
        <Stack gap="4" role="status" aria-label="Loading the menu">
          <Skeleton h="10" w="60%" />
          <Skeleton h="8" />
          <Skeleton h="64" />
        </Stack>
      </Container>
    );
  }
  if (menu.isError) {
    return (
      <Container maxW="4xl" py={{ base: '8', md: '12' }}>
        <PageTitle>Book</PageTitle>
        <LoadError
          title="This menu could not be loaded"
          error={menu.error}
          onRetry={() => void menu.refetch()}
          retrying={menu.isFetching}
        />
      </Container>
    );
  }

  const reachable = reachableSteps(draft, menu.data);
  const facts = [
    draft.event.eventDate && reachable.has('guests') ? longDate(draft.event.eventDate) : null,
    draft.guests?.guestCount && reachable.has('review')
      ? plural(draft.guests.guestCount, 'guest')
      : null,
  ].filter(Boolean);

  return (
    <Container maxW="4xl" py={{ base: '8', md: '12' }}>
      <PageTitle>{`${STEP_TITLES[step]} · Book ${menu.data.name}`}</PageTitle>
      <Stack gap="6">
        <Stack gap="1">
          <Text
            textStyle="sm"
            fontWeight="semibold"
            letterSpacing="0.12em"
            textTransform="uppercase"
            color="caramel.fg"
          >
            Booking
          </Text>
          <Heading as="h1" fontSize={{ base: '3xl', md: '4xl' }} fontWeight="normal">
            {menu.data.name}
          </Heading>
          <HStack gap="2" wrap="wrap" color="fg.muted" textStyle="sm">
            <Text>{money(menu.data.pricePerGuestMinor, menu.data.currency)} per guest</Text>
            {facts.map((f) => (
              <Text key={f}>· {f}</Text>
            ))}
          </HStack>
        </Stack>
        <StepIndicator menuId={menuId} current={step} reachable={reachable} />
        <Box borderTopWidth="1px" borderColor="border" pt="6">
          <Heading
            as="h2"
            ref={headingRef}
            tabIndex={-1}
            fontSize={{ base: '2xl', md: '3xl' }}
            fontWeight="normal"
            mb="6"
            outline="none"
          >
            {STEP_TITLES[step]}
          </Heading>
          <Outlet context={{ menu: menu.data, draft, update } satisfies BookingOutlet} />
        </Box>
      </Stack>
    </Container>
  );
}
