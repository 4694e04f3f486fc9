import { Alert, Button, Flex, Heading, HStack, Stack, Text } from '@chakra-ui/react';
import type { OrderSummary } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';
import { useSearchParams } from 'react-router';
import { EmptyState } from '../../../components/ui/empty-state';
import { AllergyIcon, CalendarIcon } from '../../../components/ui/icons';
import { paths } from '../../../config/paths';
import { useAllergyCounts } from '../../../features/allergy-notes/api/get-allergy-counts';
import { eventsQueryOptions, useEvents } from '../../../features/allergy-notes/api/get-events';
import { CautionLine } from '../../../features/allergy-notes/components/caution-line';
import { EventsList } from '../../../features/allergy-notes/components/events-list';
import { BlockSkeleton, LoadError } from '../../../features/allergy-notes/components/load-states';
import { describeError } from '../../../features/allergy-notes/lib/describe-error';
import { eventWindow, RECENT_DAYS } from '../../../features/allergy-notes/lib/event-window';
import { studioQueryOptions } from '../../../features/studio/api/get-studio';
import { ApiError } from '../../../lib/api-client';
import { deviceTimeZone } from '../../../lib/studio-time';
import { warmAfterSignIn, WithNotesViewer } from './viewer-shell';

/** Upcoming events per page; the counts are asked for the events on screen only. */
export const EVENTS_PAGE_SIZE = 20;

export const allergyNotesLoader = (queryClient: QueryClient) => () => {
  warmAfterSignIn(queryClient, async () => {
    const studio = await queryClient.ensureQueryData(studioQueryOptions());
    return queryClient.ensureQueryData(
      eventsQueryOptions(eventWindow(studio.timeZone || deviceTimeZone()).from),
    );
  });
  return null;
};

/** `/allergy-notes` (chef and staff): upcoming and recent events with their allergy counts. */
export function AllergyNotesRoute() {
  return (
    <WithNotesViewer title="Allergy notes">
      {(viewer) => <AllergyNotes timeZone={viewer.timeZone} isChef={viewer.isChef} />}
    </WithNotesViewer>
  );
}

function AllergyNotes({ timeZone, isChef }: { timeZone: string; isChef: boolean }) {
  const { today, from } = eventWindow(timeZone);
  const events = useEvents(from);
  const [search, setSearch] = useSearchParams();

  const { upcoming, recent } = useMemo(() => {
    const all = events.data ?? [];
    return {
      upcoming: all.filter((e) => e.eventDate >= today),
      recent: all.filter((e) => e.eventDate < today).reverse(),
    };
  }, [events.data, today]);

  const pages = Math.max(1, Math.ceil(upcoming.length / EVENTS_PAGE_SIZE));
  const page = Math.min(pages, Math.max(1, Number(search.get('page')) || 1));
  const shown = upcoming.slice((page - 1) * EVENTS_PAGE_SIZE, page * EVENTS_PAGE_SIZE);
  const ids = useMemo(() => [...shown, ...recent].map((e) => e.id).slice(0, 100), [shown, recent]);
  const counts = useAllergyCounts(ids);
  const countsById = useMemo(
    () => new Map((counts.data ?? []).map((c) => [c.orderId, c])),
    [counts.data],
  );

  const goTo = (next: number) =>
    setSearch((s) => {
      const params = new URLSearchParams(s);
      if (next <= 1) params.delete('page');
      else params.set('page', String(next));
      return params;
    });

  const list = (items: readonly OrderSummary[]) => (
    <EventsList
      events={items}
      counts={countsById}
      countsLoading={counts.isPending && counts.fetchStatus !== 'idle'}
      hrefOf={paths.orderAllergyNotes.getHref}
      briefingHrefOf={paths.briefing.getHref}
    />
  );

  return (
    <Stack gap={{ base: '5', md: '7' }}>
      <Stack gap="2">
        <Heading as="h1" fontSize={{ base: '3xl', md: '4xl' }} fontWeight="normal">
          Allergy notes
        </Heading>
        <Text color="fg.muted" maxW="2xl">
          {isChef
            ? 'Every guest’s allergies and diets against every dessert of the menu. Open an event to see which component conflicts and to change a guest’s plate.'
            : 'Every guest’s allergies and diets against every dessert of the menu. Open an event for the details, or its staff briefing for service.'}
        </Text>
        <CautionLine />
      </Stack>

      {events.isPending ? (
        <BlockSkeleton label="Loading the events…" />
      ) : events.isError ? (
        <LoadError
          title="The events could not be loaded"
          error={events.error}
          onRetry={() => void events.refetch()}
          retrying={events.isFetching}
        />
      ) : (
        <>
          {counts.isError && (
            <Alert.Root status="warning" role="alert" borderRadius="l2">
              <Alert.Indicator />
              <Alert.Content gap="2">
                <Alert.Title>The allergy counts could not be loaded</Alert.Title>
                <Alert.Description>
                  {counts.error instanceof ApiError && counts.error.status === 404
                    ? 'This server does not offer the counts yet.'
                    : describeError(counts.error)}{' '}
                  Each event’s notes still open.
                </Alert.Description>
                <Button
                  size="sm"
                  variant="outline"
                  alignSelf="start"
                  loading={counts.isFetching}
                  onClick={() => void counts.refetch()}
                >
                  Try again
                </Button>
              </Alert.Content>
            </Alert.Root>
          )}

          <Stack as="section" aria-labelledby="upcoming-heading" gap="3">
            <Heading as="h2" id="upcoming-heading" textStyle="2xl">
              Upcoming
            </Heading>
            {upcoming.length === 0 ? (
              <EmptyState icon={<CalendarIcon />} title="No upcoming events">
                Confirmed bookings and requests waiting for the chef appear here with their guests’
                allergies and diets.
              </EmptyState>
            ) : (
              <>
                {list(shown)}
                {pages > 1 && (
                  <Flex
                    as="nav"
                    aria-label="Pages of upcoming events"
                    justify="space-between"
                    align="center"
                    gap="3"
                    wrap="wrap"
                  >
                    <Text color="fg.muted" textStyle="sm" aria-live="polite">
                      Page {page} of {pages} · {upcoming.length} upcoming events
                    </Text>
                    <HStack gap="2">
                      <Button
                        variant="outline"
                        size="sm"
                        disabled={page <= 1}
                        onClick={() => goTo(page - 1)}
                      >
                        Previous
                      </Button>
                      <Button
                        variant="outline"
                        size="sm"
                        disabled={page >= pages}
                        onClick={() => goTo(page + 1)}
                      >
                        Next
                      </Button>
                    </HStack>
                  </Flex>
                )}
              </>
            )}
          </Stack>

          <Stack as="section" aria-labelledby="recent-heading" gap="3">
            <Heading as="h2" id="recent-heading" textStyle="2xl">
              Recent
            </Heading>
            {recent.length === 0 ? (
              <HStack gap="2" color="fg.muted">
                <AllergyIcon boxSize="4" aria-hidden />
                <Text>No events in the last {RECENT_DAYS} days.</Text>
              </HStack>
            ) : (
              <>
                <Text color="fg.muted" textStyle="sm">
                  Events of the last {RECENT_DAYS} days, most recent first.
                </Text>
                {list(recent)}
              </>
            )}
          </Stack>
        </>
      )}
    </Stack>
  );
}
