import { Box, chakra, Flex, Heading, HStack, IconButton, List, Text } from '@chakra-ui/react';
import { plural, type AvailabilityDay, type DayStatus, type IsoDate } from '@nappe/shared';
import { useEffect, useRef, useState, type KeyboardEvent, type ReactNode } from 'react';
import {
  ChevronLeftIcon,
  ChevronRightIcon,
  ClosedIcon,
  FullPlateIcon,
  HourglassIcon,
} from '../../../components/ui/booking-icons';
import { CheckIcon, PlateIcon } from '../../../components/ui/icons';
import { longDate } from '../../../lib/dates';
import {
  addMonths,
  compareMonths,
  firstDayOf,
  lastDayOf,
  monthGrid,
  monthLabel,
  monthOf,
  moveDate,
  type IsoMonth,
} from './month';

const WEEKDAYS = [
  ['Mon', 'Monday'],
  ['Tue', 'Tuesday'],
  ['Wed', 'Wednesday'],
  ['Thu', 'Thursday'],
  ['Fri', 'Friday'],
  ['Sat', 'Saturday'],
  ['Sun', 'Sunday'],
] as const;

/** Each status in words (for the day's label and the legend) and its mark of our own. */
export const STATUS_WORDS: Record<DayStatus, { short: string; label: string; legend: string }> = {
  open: {
    short: 'left',
    label: 'open',
    legend: 'Open: the figure is how many plates the kitchen can still make that day.',
  },
  full: { short: 'Full', label: 'full', legend: 'Full: no plates left for this menu.' },
  blackout: {
    short: 'Closed',
    label: 'closed, the studio takes no events that day',
    legend: 'Closed: the studio takes no events that day.',
  },
  too_soon: {
    short: 'Too soon',
    label: 'too soon, this menu needs more notice',
    legend: 'Too soon: less notice than this menu needs.',
  },
  past: { short: '', label: 'past', legend: 'Past: the day has gone.' },
};

export function StatusMark({ status }: { status: DayStatus }): ReactNode {
  switch (status) {
    case 'open':
      return <PlateIcon boxSize="3" />;
    case 'full':
      return <FullPlateIcon boxSize="3" />;
    case 'blackout':
      return <ClosedIcon boxSize="3" />;
    case 'too_soon':
      return <HourglassIcon boxSize="3" />;
    case 'past':
      return null;
  }
}

/** A day's status in words, as a screen reader hears it. */
export function dayLabel(
  date: IsoDate,
  day: AvailabilityDay | undefined,
  loading: boolean,
  today: IsoDate | null,
): string {
  const status = day
    ? day.status === 'open'
      ? `open, ${plural(day.remainingPlates, 'plate')} left`
      : STATUS_WORDS[day.status].label
    : loading
      ? 'checking availability'
      : 'availability unknown';
  return `${longDate(date)}${date === today ? ' (today)' : ''}: ${status}`;
}

const DayButton = chakra('button');

export interface MonthCalendarProps {
  month: IsoMonth;
  onMonthChange: (month: IsoMonth) => void;
  /** The server's days, by date; null while they load. */
  days: ReadonlyMap<IsoDate, AvailabilityDay> | null;
  selected: IsoDate | null;
  onSelect: (date: IsoDate) => void;
  minMonth: IsoMonth;
  maxMonth: IsoMonth;
  today: IsoDate | null;
  /** Id for the month heading, which names the grid. */
  captionId: string;
  /** Said after an open day's status, e.g. "choose to start booking". */
  openHint?: string;
}

/**
 * A month of days as an accessible grid (WAI-ARIA Authoring Practices, date picker grid): one
 * day is in the tab order; arrows move by a day or a week, Home/End to the ends of the week, Page
 * Up/Down by a month; Enter or Space chooses an open day. Every day's label says its status in
 * words; on screen a status is a word and a mark, never a colour alone.
 */
export function MonthCalendar({
  month,
  onMonthChange,
  days,
  selected,
  onSelect,
  minMonth,
  maxMonth,
  today,
  captionId,
  openHint,
}: MonthCalendarProps) {
  const gridRef = useRef<HTMLTableElement>(null);
  const focusPending = useRef(false);
  const [focusDate, setFocusDate] = useState<IsoDate | null>(null);
  const weeks = monthGrid(month);
  const loading = days === null;

  const defaultFocus = (): IsoDate => {
    if (selected && monthOf(selected) === month) return selected;
    const firstOpen = weeks.flat().find((d) => d !== null && days?.get(d)?.status === 'open');
    if (firstOpen) return firstOpen;
    if (today && monthOf(today) === month) return today;
    return firstDayOf(month);
  };
  const active = focusDate && monthOf(focusDate) === month ? focusDate : defaultFocus();

  // After a key press, focus follows the day — once its month is the one on screen.
  useEffect(() => {
    if (!focusPending.current || focusDate === null || monthOf(focusDate) !== month) return;
    focusPending.current = false;
    gridRef.current?.querySelector<HTMLButtonElement>(`button[data-date="${focusDate}"]`)?.focus();
  });

  const first = firstDayOf(minMonth);
  const last = lastDayOf(maxMonth);

  function onKeyDown(event: KeyboardEvent<HTMLTableElement>) {
    // While a new month is on its way, keep moving from the day already chosen by the keys.
    const from = focusPending.current && focusDate ? focusDate : active;
    const next = moveDate(from, event.key, event.shiftKey);
    if (next === null) return;
    event.preventDefault();
    const clamped = next < first ? first : next > last ? last : next;
    focusPending.current = true;
    setFocusDate(clamped);
    if (monthOf(clamped) !== month) onMonthChange(monthOf(clamped));
  }

  return (
    <Box>
      <Flex align="center" justify="space-between" gap="2" mb="3">
        <IconButton
          variant="ghost"
          size="sm"
          aria-label="Previous month"
          disabled={compareMonths(month, minMonth) <= 0}
          onClick={() => onMonthChange(addMonths(month, -1))}
        >
          <ChevronLeftIcon />
        </IconButton>
        <Heading as="h3" id={captionId} fontSize="xl" fontWeight="normal" aria-live="polite">
          {monthLabel(month)}
        </Heading>
        <IconButton
          variant="ghost"
          size="sm"
          aria-label="Next month"
          disabled={compareMonths(month, maxMonth) >= 0}
          onClick={() => onMonthChange(addMonths(month, 1))}
        >
          <ChevronRightIcon />
        </IconButton>
      </Flex>
      <chakra.table
        ref={gridRef}
        role="grid"
        aria-labelledby={captionId}
        aria-busy={loading}
        onKeyDown={onKeyDown}
        w="full"
        tableLayout="fixed"
        borderCollapse="separate"
        borderSpacing={{ base: '2px', md: '4px' }}
      >
        <thead>
          <tr>
            {WEEKDAYS.map(([short, long]) => (
              <chakra.th
                key={long}
                scope="col"
                abbr={long}
                pb="1"
                textStyle="xs"
                fontWeight="semibold"
                color="fg.muted"
              >
                <span aria-hidden="true">{short}</span>
                <chakra.span srOnly>{long}</chakra.span>
              </chakra.th>
            ))}
          </tr>
        </thead>
        <tbody>
          {weeks.map((week) => (
            <tr key={week.find((d) => d !== null)}>
              {week.map((date, i) =>
                date === null ? (
                  <td key={`blank-${i}`} role="gridcell" />
                ) : (
                  <DayCell
                    key={date}
                    date={date}
                    day={days?.get(date)}
                    loading={loading}
                    today={today}
                    selected={date === selected}
                    focusable={date === active}
                    onSelect={onSelect}
                    onFocus={() => setFocusDate(date)}
                    openHint={openHint}
                  />
                ),
              )}
            </tr>
          ))}
        </tbody>
      </chakra.table>
    </Box>
  );
}

function DayCell({
  date,
  day,
  loading,
  today,
  selected,
  focusable,
  onSelect,
  onFocus,
  openHint,
}: {
  date: IsoDate;
  day: AvailabilityDay | undefined;
  loading: boolean;
  today: IsoDate | null;
  selected: boolean;
  focusable: boolean;
  onSelect: (date: IsoDate) => void;
  onFocus: () => void;
  openHint?: string;
}) {
  const status = day?.status;
  const open = status === 'open';
  const label =
    dayLabel(date, day, loading, today) + (open && openHint && !selected ? `. ${openHint}` : '');
  return (
    <td role="gridcell" aria-selected={selected}>
      <DayButton
        type="button"
        data-date={date}
        tabIndex={focusable ? 0 : -1}
        aria-label={label}
        aria-disabled={!open}
        onClick={() => {
          if (open) onSelect(date);
        }}
        onFocus={onFocus}
        display="flex"
        flexDirection="column"
        alignItems="center"
        justifyContent="flex-start"
        gap="0.5"
        w="full"
        minH={{ base: '14', md: '16' }}
        px="0.5"
        py="1.5"
        borderRadius="l2"
        borderWidth={selected ? '2px' : '1px'}
        borderStyle={status === 'full' || status === 'blackout' ? 'dashed' : 'solid'}
        borderColor={
          selected ? 'fg' : open ? 'accent.border' : status === 'past' ? 'transparent' : 'border'
        }
        bg={selected ? 'bg.inverted' : open ? 'bg.panel' : 'transparent'}
        color={selected ? 'fg.inverted' : open ? 'fg' : 'fg.muted'}
        cursor={open ? 'pointer' : 'default'}
        _hover={open && !selected ? { bg: 'accent.subtle' } : undefined}
        focusVisibleRing="outside"
        focusRingColor="brand.focusRing"
        outline="none"
      >
        <Text
          as="span"
          textStyle={{ base: 'sm', md: 'md' }}
          fontWeight={open || selected ? 'semibold' : 'normal'}
          textDecoration={status === 'past' ? 'line-through' : undefined}
          aria-hidden="true"
        >
          {Number(date.slice(8))}
        </Text>
        <HStack
          as="span"
          gap="0.5"
          textStyle="2xs"
          lineHeight="1.1"
          textAlign="center"
          justify="center"
          flexWrap="wrap"
          aria-hidden="true"
          color={selected ? 'fg.inverted' : open ? 'accent.fg' : 'fg.muted'}
        >
          {selected ? (
            <CheckIcon boxSize="3" />
          ) : status ? (
            <>
              <StatusMark status={status} />
              {status === 'open' ? (
                <span>
                  {day?.remainingPlates}
                  <chakra.span display={{ base: 'none', md: 'inline' }}> left</chakra.span>
                </span>
              ) : (
                <chakra.span
                  display={{ base: status === 'too_soon' ? 'none' : 'inline', md: 'inline' }}
                >
                  {STATUS_WORDS[status].short}
                </chakra.span>
              )}
            </>
          ) : null}
        </HStack>
      </DayButton>
    </td>
  );
}

/** What each mark and word of the calendar means. */
export function CalendarLegend() {
  const statuses: DayStatus[] = ['open', 'full', 'blackout', 'too_soon', 'past'];
  return (
    <Box as="section" aria-label="What the calendar shows">
      <List.Root
        as="ul"
        listStyleType="none"
        display="grid"
        gap="1.5"
        textStyle="sm"
        color="fg.muted"
      >
        {statuses.map((status) => (
          <List.Item key={status} display="flex" alignItems="center" gap="2">
            <Flex
              boxSize="6"
              flexShrink="0"
              align="center"
              justify="center"
              borderRadius="l1"
              borderWidth="1px"
              borderStyle={status === 'full' || status === 'blackout' ? 'dashed' : 'solid'}
              borderColor={
                status === 'open' ? 'accent.border' : status === 'past' ? 'transparent' : 'border'
              }
              color={status === 'open' ? 'accent.fg' : 'fg.muted'}
              textDecoration={status === 'past' ? 'line-through' : undefined}
              aria-hidden="true"
            >
              {status === 'past' ? <Text textStyle="xs">1</Text> : <StatusMark status={status} />}
            </Flex>
            <Text>{STATUS_WORDS[status].legend}</Text>
          </List.Item>
        ))}
        <List.Item display="flex" alignItems="center" gap="2">
          <Flex
            boxSize="6"
            flexShrink="0"
            align="center"
            justify="center"
            borderRadius="l1"
            bg="bg.inverted"
            color="fg.inverted"
            aria-hidden="true"
          >
            <CheckIcon boxSize="3" />
          </Flex>
          <Text>Your chosen date.</Text>
        </List.Item>
      </List.Root>
    </Box>
  );
}
