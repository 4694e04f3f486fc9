import { Badge, Box, Heading, Link, List, Stack, Table, Text } from '@chakra-ui/react';
import { compareIsoDates, plural, type IsoDate, type OrderSummary } from '@nappe/shared';
import { Link as RouterLink } from 'react-router';
import {
  dayLabel,
  monthGrid,
  monthLabel,
  monthOf,
  platesOn,
  WEEKDAYS,
  type Month,
} from '../lib/calendar-month';
import { statusLabel } from '../lib/format';
import { OrderStatusBadge } from './order-status-badge';

export interface CalendarData {
  month: Month;
  today: IsoDate;
  byDay: Map<IsoDate, OrderSummary[]>;
  blackout: ReadonlySet<IsoDate>;
  /** Plates the kitchen can make in a day, or null when the settings could not be read. */
  capacity: number | null;
  hrefOf: (id: string) => string;
  /** The inbox filtered to one day, for a day with more events than its cell shows. */
  dayHref: (date: IsoDate) => string;
}

/** A grid cell lists this many events; the rest are a link away. */
export const EVENTS_PER_CELL = 3;

/**
 * "40 of 240 plates" (", 200 left" where there is room to say it), "40 plates" without the
 * capacity, or nothing when the figures are not known.
 */
function platesText(
  orders: readonly OrderSummary[],
  capacity: number | null,
  withLeft = false,
): string | null {
  const used = platesOn(orders);
  if (used === null) return null;
  if (capacity === null) return plural(used, 'plate');
  const left = withLeft ? `, ${Math.max(0, capacity - used)} left` : '';
  return `${used} of ${capacity} plates${left}`;
}

/** One event as a line: time, reference, guests and status in words. */
function EventLink({
  order,
  href,
  compact,
}: {
  order: OrderSummary;
  href: string;
  compact?: boolean;
}) {
  return (
    <Link
      asChild
      display="block"
      color="fg"
      textDecoration="none"
      borderStartWidth="3px"
      borderColor={order.status === 'requested' ? 'caramel.solid' : 'accent.solid'}
      ps="2"
      py="0.5"
      _hover={{ bg: 'bg.muted' }}
      borderRadius="l1"
    >
      <RouterLink to={href}>
        {compact ? (
          <>
            <Text as="span" display="block" fontWeight="semibold" textStyle="xs">
              {order.reference}
            </Text>
            <Text as="span" display="block" textStyle="xs" color="fg.muted">
              {order.serviceTime} · {plural(order.guestCount, 'guest')}
            </Text>
            <Text as="span" display="block" textStyle="xs" color="fg.muted">
              {statusLabel(order.status)}
            </Text>
          </>
        ) : (
          <>
            <Text as="span" display="block" fontWeight="semibold" textStyle="sm">
              {order.serviceTime} {order.reference}
            </Text>
            <Text
              as="span"
              display="flex"
              gap="2"
              alignItems="center"
              flexWrap="wrap"
              textStyle="sm"
              color="fg.muted"
            >
              {order.clientName} · {plural(order.guestCount, 'guest')} · {order.menuName}
              <OrderStatusBadge status={order.status} size="sm" />
            </Text>
          </>
        )}
      </RouterLink>
    </Link>
  );
}

function ClosedMark() {
  return (
    <Badge variant="outline" colorPalette="gray" size="sm">
      Closed
    </Badge>
  );
}

/** The month as a grid of weeks, Monday first (wide screens). */
export function CalendarMonthGrid({
  month,
  today,
  byDay,
  blackout,
  capacity,
  hrefOf,
  dayHref,
}: CalendarData) {
  const weeks = monthGrid(month);
  return (
    <Table.ScrollArea borderWidth="1px" borderColor="border" borderRadius="l3" bg="bg.panel">
      <Table.Root size="sm" tableLayout="fixed" minW="3xl">
        <Table.Caption srOnly>Events in {monthLabel(month)}</Table.Caption>
        <Table.Header>
          <Table.Row bg="bg.muted">
            {WEEKDAYS.map((d) => (
              <Table.ColumnHeader key={d} color="fg.muted" fontWeight="semibold" textAlign="start">
                <abbr title={d} style={{ textDecoration: 'none' }}>
                  {d.slice(0, 3)}
                </abbr>
              </Table.ColumnHeader>
            ))}
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {weeks.map((week) => (
            <Table.Row key={week[0]}>
              {week.map((date) => {
                const orders = byDay.get(date) ?? [];
                const outside = monthOf(date) !== month;
                const isToday = date === today;
                const closed = blackout.has(date);
                const past = compareIsoDates(date, today) < 0;
                const plates = orders.length > 0 ? platesText(orders, capacity) : null;
                return (
                  <Table.Cell
                    key={date}
                    data-date={date}
                    verticalAlign="top"
                    h="28"
                    p="2"
                    overflow="hidden"
                    overflowWrap="anywhere"
                    borderWidth="1px"
                    borderColor="border.muted"
                    bg={closed ? 'bg.muted' : outside ? 'bg.subtle' : 'bg.panel'}
                    backgroundImage={
                      closed
                        ? 'repeating-linear-gradient(135deg, transparent 0 6px, var(--chakra-colors-border) 6px 7px)'
                        : undefined
                    }
                    boxShadow={
                      isToday ? 'inset 0 0 0 2px var(--chakra-colors-caramel-solid)' : undefined
                    }
                  >
                    <Stack gap="1.5">
                      <Text
                        textStyle="sm"
                        fontWeight={isToday ? 'bold' : 'medium'}
                        color={outside || past ? 'fg.muted' : 'fg'}
                        display="flex"
                        gap="1.5"
                        alignItems="center"
                        flexWrap="wrap"
                      >
                        <span aria-hidden>{Number(date.slice(8))}</span>
                        <Text as="span" srOnly>
                          {dayLabel(date)}
                        </Text>
                        {isToday && (
                          <Badge size="sm" colorPalette="caramel" variant="solid">
                            Today
                          </Badge>
                        )}
                        {closed && <ClosedMark />}
                      </Text>
                      {orders.slice(0, EVENTS_PER_CELL).map((o) => (
                        <EventLink key={o.id} order={o} href={hrefOf(o.id)} compact />
                      ))}
                      {orders.length > EVENTS_PER_CELL && (
                        <Link asChild textStyle="xs" fontWeight="semibold" color="fg">
                          <RouterLink to={dayHref(date)}>
                            +{orders.length - EVENTS_PER_CELL} more
                            <Text as="span" srOnly>
                              {' '}
                              on {dayLabel(date)}
                            </Text>
                          </RouterLink>
                        </Link>
                      )}
                      {plates && (
                        <Text textStyle="xs" color="fg.muted">
                          {plates}
                        </Text>
                      )}
                    </Stack>
                  </Table.Cell>
                );
              })}
            </Table.Row>
          ))}
        </Table.Body>
      </Table.Root>
    </Table.ScrollArea>
  );
}

/** The month as a list of the days that have something on (phones). */
export function CalendarAgenda({ month, today, byDay, blackout, capacity, hrefOf }: CalendarData) {
  const days = monthGrid(month)
    .flat()
    .filter((d) => monthOf(d) === month && (byDay.has(d) || blackout.has(d) || d === today));
  return (
    <Stack gap="4">
      <List.Root as="ul" listStyle="none" gap="3">
        {days.map((date) => {
          const orders = byDay.get(date) ?? [];
          const upcoming = compareIsoDates(date, today) >= 0;
          const plates = orders.length > 0 ? platesText(orders, capacity, upcoming) : null;
          return (
            <List.Item key={date} data-date={date}>
              <Box
                borderWidth="1px"
                borderColor={date === today ? 'caramel.solid' : 'border'}
                borderRadius="l3"
                bg={blackout.has(date) ? 'bg.muted' : 'bg.panel'}
                p="3"
              >
                <Heading
                  as="h3"
                  fontSize="md"
                  fontFamily="body"
                  fontWeight="semibold"
                  display="flex"
                  gap="2"
                  alignItems="center"
                  flexWrap="wrap"
                >
                  {dayLabel(date)}
                  {date === today && (
                    <Badge size="sm" colorPalette="caramel" variant="solid">
                      Today
                    </Badge>
                  )}
                  {blackout.has(date) && <ClosedMark />}
                </Heading>
                {orders.length === 0 ? (
                  <Text textStyle="sm" color="fg.muted" mt="1">
                    {blackout.has(date) ? 'The studio takes no events this day.' : 'No events.'}
                  </Text>
                ) : (
                  <Stack gap="2" mt="2">
                    {orders.map((o) => (
                      <EventLink key={o.id} order={o} href={hrefOf(o.id)} />
                    ))}
                    {plates && (
                      <Text textStyle="xs" color="fg.muted">
                        {plates}
                      </Text>
                    )}
                  </Stack>
                )}
              </Box>
            </List.Item>
          );
        })}
      </List.Root>
    </Stack>
  );
}
