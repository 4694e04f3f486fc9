import {
  Button,
  Container,
  Flex,
  Heading,
  HStack,
  IconButton,
  Stack,
  Text,
  useBreakpointValue,
} from '@chakra-ui/react';
import { dateInTimeZone, Role } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';
import { Link as RouterLink, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { BlockSkeleton } from '../../components/ui/block-skeleton';
import { ChevronLeftIcon, ChevronRightIcon } from '../../components/ui/icons';
import { LoadError } from '../../components/ui/load-error';
import { PageTitle } from '../../components/ui/page-title';
import { paths } from '../../config/paths';
import { meQueryOptions, useMe } from '../../features/auth/api/get-me';
import { RequireRole } from '../../features/auth/components/require-role';
import {
  calendarSettingsQueryOptions,
  useCalendarSettings,
} from '../../features/orders/api/get-calendar-settings';
import {
  ordersInRangeQueryOptions,
  useOrdersInRange,
} from '../../features/orders/api/get-orders-in-range';
import { CalendarAgenda, CalendarMonthGrid } from '../../features/orders/components/calendar-views';
import {
  addMonths,
  gridRange,
  isMonth,
  monthLabel,
  monthOf,
  ordersByDay,
} from '../../features/orders/lib/calendar-month';
import { studioQueryOptions, useStudio } from '../../features/studio/api/get-studio';
import { deviceTimeZone } from '../../lib/studio-time';

/** Starts loading the month while the screen's code arrives — for the chef only. */
export const calendarLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const user = await queryClient.ensureQueryData(meQueryOptions());
    if (user?.role !== Role.Chef) return null;
    void queryClient.ensureQueryData(calendarSettingsQueryOptions()).catch(() => undefined);
    const asked = new URL(request.url).searchParams.get('month');
    if (isMonth(asked)) {
      const { from, to } = gridRange(asked);
      void queryClient.ensureQueryData(ordersInRangeQueryOptions(from, to)).catch(() => undefined);
    } else {
      // "This month" depends on the studio's time zone.
      void queryClient
        .ensureQueryData(studioQueryOptions())
        .then((studio) => {
          const { from, to } = gridRange(monthOf(dateInTimeZone(new Date(), studio.timeZone)));
          return queryClient.ensureQueryData(ordersInRangeQueryOptions(from, to));
        })
        .catch(() => undefined);
    }
    return null;
  };

export function CalendarRoute() {
  const me = useMe();
  if (!me.data) return null; // The layout renders only for a signed-in team member.
  return (
    <RequireRole user={me.data} roles={[Role.Chef]}>
      <Calendar />
    </RequireRole>
  );
}

function Calendar() {
  const studio = useStudio();
  return (
    <>
      <PageTitle>Calendar</PageTitle>
      <Container maxW="7xl" py={{ base: '6', md: '10' }} px={{ base: '4', md: '8' }}>
        {studio.isPending ? (
          <BlockSkeleton label="Loading the calendar…" />
        ) : (
          <Month timeZone={studio.data?.timeZone ?? deviceTimeZone()} />
        )}
      </Container>
    </>
  );
}

function Month({ timeZone }: { timeZone: string }) {
  const [searchParams] = useSearchParams();
  const today = dateInTimeZone(new Date(), timeZone);
  const thisMonth = monthOf(today);
  const asked = searchParams.get('month');
  const month = isMonth(asked) ? asked : thisMonth;
  const { from, to } = gridRange(month);
  const orders = useOrdersInRange(from, to);
  const settings = useCalendarSettings();
  const wide = useBreakpointValue({ base: false, md: true }, { ssr: false });

  const byDay = useMemo(() => ordersByDay(orders.data ?? []), [orders.data]);
  const blackout = useMemo(() => new Set(settings.data?.blackoutDates ?? []), [settings.data]);
  const data = {
    month,
    today,
    byDay,
    blackout,
    capacity: settings.data?.dailyPlateCapacity ?? null,
    hrefOf: (id: string) => paths.order.getHref(id),
    dayHref: (date: string) => paths.orders.getHref(`from=${date}&to=${date}`),
  };
  const events = [...byDay.entries()].filter(([date]) => date.startsWith(month));
  const eventCount = events.reduce((n, [, list]) => n + list.length, 0);

  return (
    <>
      <Stack gap="2" mb="6">
        <Heading as="h1" fontSize={{ base: '3xl', md: '4xl' }} fontWeight="normal">
          Calendar
        </Heading>
        <Text color="fg.muted" maxW="2xl">
          Booked events by day, with the plates each day takes from the kitchen
          {settings.data ? ` (${settings.data.dailyPlateCapacity} a day)` : ''} and the days the
          studio is closed. Times are the studio’s ({timeZone}).
        </Text>
      </Stack>

      <Flex
        as="nav"
        aria-label="Months"
        justify="space-between"
        align="center"
        gap="3"
        mb="4"
        wrap="wrap"
      >
        <Heading as="h2" fontSize="2xl" fontWeight="normal" aria-live="polite">
          {monthLabel(month)}
        </Heading>
        <HStack gap="1">
          <IconButton asChild variant="outline" size="sm" aria-label="Previous month">
            <RouterLink to={paths.calendar.getHref(addMonths(month, -1))}>
              <ChevronLeftIcon />
            </RouterLink>
          </IconButton>
          <Button
            asChild
            variant="outline"
            size="sm"
            aria-disabled={month === thisMonth || undefined}
          >
            <RouterLink to={paths.calendar.getHref(thisMonth)}>Today</RouterLink>
          </Button>
          <IconButton asChild variant="outline" size="sm" aria-label="Next month">
            <RouterLink to={paths.calendar.getHref(addMonths(month, 1))}>
              <ChevronRightIcon />
            </RouterLink>
          </IconButton>
        </HStack>
      </Flex>

      {settings.isError && (
        <Text color="fg.warning" textStyle="sm" mb="3">
          The studio’s capacity and closed days could not be loaded; the events are shown without
          them.
        </Text>
      )}

      {orders.isPending ? (
        <BlockSkeleton label={`Loading ${monthLabel(month)}…`} />
      ) : orders.isError ? (
        <LoadError
          title="The events could not be loaded"
          error={orders.error}
          onRetry={() => void orders.refetch()}
          retrying={orders.isFetching}
        />
      ) : (
        <Stack gap="3" aria-busy={orders.isPlaceholderData || undefined}>
          <Text textStyle="sm" color="fg.muted" role="status">
            {eventCount === 0
              ? `No events in ${monthLabel(month)}.`
              : `${eventCount} ${eventCount === 1 ? 'event' : 'events'} in ${monthLabel(month)}.`}{' '}
            Checkouts not paid in time, declined and cancelled bookings are left out.
          </Text>
          {wide ? <CalendarMonthGrid {...data} /> : <CalendarAgenda {...data} />}
        </Stack>
      )}
    </>
  );
}
