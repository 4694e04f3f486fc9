import { Box, Stack, Text } from '@chakra-ui/react';
import type { AvailabilityDay, IsoDate } from '@nappe/shared';
import { useQueryClient } from '@tanstack/react-query';
import { memo, useEffect, useId, useMemo } from 'react';
import { LoadError } from '../../../components/ui/query-state';
import { longDate } from '../../../lib/dates';
import { availabilityQueryOptions, useAvailability } from '../api/get-availability';
import { CalendarLegend, MonthCalendar } from './month-calendar';
import { addMonths, firstDayOf, lastDayOf, localToday, monthOf, type IsoMonth } from './month';

/** How far ahead the calendar lets a client look. */
export const MONTHS_AHEAD = 18;

/**
 * The month calendar filled with the server's availability for one menu: each day open, full,
 * closed, too soon or past, with the plates left. Fetches a month at a time and the next one
 * in the background.
 */
export const AvailabilityCalendar = memo(function AvailabilityCalendar({
  menuId,
  month,
  onMonthChange,
  selected,
  onSelect,
  openHint,
  showLegend = true,
}: {
  menuId: string;
  month: IsoMonth;
  onMonthChange: (month: IsoMonth) => void;
  selected: IsoDate | null;
  onSelect: (date: IsoDate, day: AvailabilityDay) => void;
  openHint?: string;
  showLegend?: boolean;
}) {
  const captionId = useId();
  const from = firstDayOf(month);
  const to = lastDayOf(month);
  const availability = useAvailability(menuId, from, to);
  const queryClient = useQueryClient();

  // Look one month ahead in the background, so paging forward is instant.
  useEffect(() => {
    const next = addMonths(month, 1);
    void queryClient.prefetchQuery(
      availabilityQueryOptions(menuId, firstDayOf(next), lastDayOf(next)),
    );
  }, [queryClient, menuId, month]);

  const days = useMemo(
    () =>
      availability.data ? new Map(availability.data.days.map((d) => [d.date, d] as const)) : null,
    [availability.data],
  );
  const today = availability.data?.today ?? localToday();
  const minMonth = monthOf(today);

  return (
    <Stack gap="4">
      {availability.isError && (
        <LoadError
          title="The calendar could not be loaded"
          error={availability.error}
          onRetry={() => void availability.refetch()}
          retrying={availability.isFetching}
        />
      )}
      {availability.data && availability.data.earliestDate > today && (
        <Text textStyle="sm" color="fg.muted">
          This menu needs notice: the earliest date you can book is{' '}
          <Text as="span" color="fg" fontWeight="medium">
            {longDate(availability.data.earliestDate)}
          </Text>
          .
        </Text>
      )}
      <Box>
        <MonthCalendar
          month={month}
          onMonthChange={onMonthChange}
          days={availability.isError ? new Map() : days}
          selected={selected}
          onSelect={(date) => {
            const day = days?.get(date);
            if (day) onSelect(date, day);
          }}
          minMonth={minMonth < month ? minMonth : month}
          maxMonth={addMonths(minMonth, MONTHS_AHEAD)}
          today={availability.data?.today ?? null}
          captionId={captionId}
          openHint={openHint}
        />
      </Box>
      {showLegend && <CalendarLegend />}
    </Stack>
  );
});
