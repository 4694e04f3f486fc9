import {
  Badge,
  Box,
  Button,
  Card,
  Flex,
  Heading,
  HStack,
  Link,
  SimpleGrid,
  Stack,
  Text,
} from '@chakra-ui/react';
import { dateInTimeZone, OrderStatus, plural } from '@nappe/shared';
import { useState, type ComponentType, type ReactNode } from 'react';
import { Link as RouterLink } from 'react-router';
import { AllergyIcon, CalendarIcon, CautionIcon, InboxIcon } from '../../../components/ui/icons';
import { paths } from '../../../config/paths';
import type { DashboardAlert, DashboardEvent, DashboardRequest } from '../api/get-dashboard';
import {
  formatDate,
  formatDayLong,
  formatDayShort,
  formatMinor,
  relativeDay,
  statusLabel,
} from '../lib/format';

function Panel({
  id,
  title,
  count,
  icon: Icon,
  children,
}: {
  id: string;
  title: string;
  count?: number;
  icon: ComponentType<{ boxSize?: string }>;
  children: ReactNode;
}) {
  return (
    <Card.Root
      as="section"
      aria-labelledby={`${id}-title`}
      variant="outline"
      bg="bg.panel"
      borderColor="border"
      minW="0"
    >
      <Card.Body gap="4" p={{ base: '4', md: '6' }}>
        <HStack gap="3">
          <Flex
            boxSize="9"
            borderRadius="full"
            bg="accent.subtle"
            color="accent.fg"
            align="center"
            justify="center"
            flexShrink="0"
            aria-hidden
          >
            <Icon boxSize="5" />
          </Flex>
          <Heading as="h2" id={`${id}-title`} fontSize="xl" fontWeight="normal">
            {title}
            {count !== undefined && (
              <>
                {' '}
                <Text as="span" color="fg.muted" fontFamily="body" textStyle="md" ms="1">
                  ({count})
                </Text>
              </>
            )}
          </Heading>
        </HStack>
        {children}
      </Card.Body>
    </Card.Root>
  );
}

function OrderLink({ id, label, children }: { id: string; label?: string; children: ReactNode }) {
  return (
    <Link asChild color="brand.fg" fontWeight="semibold" textDecoration="underline">
      <RouterLink to={paths.order.getHref(id)} aria-label={label}>
        {children}
      </RouterLink>
    </Link>
  );
}

const STATUS_PALETTE: Partial<Record<OrderStatus, string>> = {
  [OrderStatus.Requested]: 'caramel',
  [OrderStatus.Confirmed]: 'accent',
  [OrderStatus.Completed]: 'gray',
};

/** Events from today to 13 days ahead, by date and service time. */
export function UpcomingEvents({ events, today }: { events: DashboardEvent[]; today: string }) {
  return (
    <Panel id="upcoming" title="Next 14 days" count={events.length} icon={CalendarIcon}>
      {events.length === 0 ? (
        <Text color="fg.muted">No events in the next 14 days.</Text>
      ) : (
        <Stack as="ul" gap="0" listStyleType="none">
          {events.map((e) => (
            <Box
              as="li"
              key={e.id}
              py="3"
              borderColor="border"
              _notFirst={{ borderTopWidth: '1px' }}
            >
              <Flex justify="space-between" gap="3" align="start" wrap="wrap">
                <Stack gap="0.5" minW="0">
                  <Text fontWeight="semibold">
                    <time dateTime={`${e.eventDate}T${e.serviceTime}`}>
                      <Box as="span" title={formatDayLong(e.eventDate)}>
                        {formatDayShort(e.eventDate)}
                      </Box>{' '}
                      · {e.serviceTime}
                    </time>{' '}
                    <Text as="span" color="fg.muted" fontWeight="normal">
                      ({relativeDay(e.eventDate, today)})
                    </Text>
                  </Text>
                  <Text>
                    <OrderLink id={e.id}>{e.reference}</OrderLink> · {e.clientName || 'Client'}
                  </Text>
                  <Text color="fg.muted" textStyle="sm">
                    {e.menuName} · {plural(e.guests, 'guest')}
                  </Text>
                </Stack>
                <Badge colorPalette={STATUS_PALETTE[e.status] ?? 'gray'} variant="subtle" size="md">
                  {statusLabel(e.status)}
                </Badge>
              </Flex>
            </Box>
          ))}
        </Stack>
      )}
    </Panel>
  );
}

/** Paid bookings waiting for the chef to confirm or decline, oldest first. */
export function WaitingRequests({
  requests,
  today,
  timeZone,
}: {
  requests: DashboardRequest[];
  today: string;
  timeZone: string;
}) {
  return (
    <Panel id="requests" title="Waiting for your decision" count={requests.length} icon={InboxIcon}>
      {requests.length === 0 ? (
        <Text color="fg.muted">No booking requests are waiting.</Text>
      ) : (
        <Stack as="ul" gap="0" listStyleType="none">
          {requests.map((r) => {
            const requestedOn = dateInTimeZone(new Date(r.requestedAt), timeZone);
            return (
              <Box
                as="li"
                key={r.id}
                py="3"
                borderColor="border"
                _notFirst={{ borderTopWidth: '1px' }}
              >
                <Flex justify="space-between" gap="3" align="start" wrap="wrap">
                  <Stack gap="0.5" minW="0">
                    <Text>
                      <OrderLink id={r.id}>{r.reference}</OrderLink> · {r.clientName || 'Client'}
                    </Text>
                    <Text color="fg.muted" textStyle="sm">
                      {r.menuName} · {plural(r.guests, 'guest')} · event on{' '}
                      {formatDate(r.eventDate)} ({relativeDay(r.eventDate, today)})
                    </Text>
                    <Text color="fg.muted" textStyle="sm">
                      Requested {relativeDay(requestedOn, today)}
                    </Text>
                  </Stack>
                  <Text fontWeight="semibold" whiteSpace="nowrap">
                    {formatMinor(r.totalMinor, r.currency)}
                  </Text>
                </Flex>
              </Box>
            );
          })}
        </Stack>
      )}
    </Panel>
  );
}

const ALERT_KIND: Record<
  DashboardAlert['kind'],
  { label: string; icon: ComponentType<{ boxSize?: string }> }
> = {
  lead_time: { label: 'Lead time too short', icon: CautionIcon },
  balance_overdue: { label: 'Balance overdue', icon: InboxIcon },
  allergy_conflict: { label: 'Allergy conflict', icon: AllergyIcon },
};

/** The API's message starts with the order's reference, which the row already shows as a link. */
function withoutReference(message: string, reference: string): string {
  return message.startsWith(`${reference}: `) ? message.slice(reference.length + 2) : message;
}

function alertDetail(alert: DashboardAlert, today: string): string {
  const event = `Event ${formatDayShort(alert.eventDate)} (${relativeDay(alert.eventDate, today)})`;
  if (alert.kind === 'balance_overdue') {
    return `${event} · ${formatMinor(alert.balanceMinor, alert.currency)} due since ${formatDate(alert.balanceDueDate)}`;
  }
  return event;
}

/** How many alerts show before "Show all": the rest are one click away, not a long scroll. */
export const ALERTS_SHOWN = 4;

/** What needs the chef now: each alert names its kind in words and links to its order. */
export function AlertsPanel({ alerts, today }: { alerts: DashboardAlert[]; today: string }) {
  const [showAll, setShowAll] = useState(false);
  const shown = showAll ? alerts : alerts.slice(0, ALERTS_SHOWN);
  return (
    <Card.Root
      as="section"
      aria-labelledby="alerts-title"
      variant="outline"
      bg={alerts.length > 0 ? 'bg.error' : 'bg.panel'}
      borderColor={alerts.length > 0 ? 'border.error' : 'border'}
    >
      <Card.Body gap="3" p={{ base: '4', md: '6' }}>
        <Heading as="h2" id="alerts-title" fontSize="xl" fontWeight="normal">
          {alerts.length > 0 ? `Needs your attention (${alerts.length})` : 'Needs your attention'}
        </Heading>
        {alerts.length === 0 ? (
          <Text color="fg.muted">
            Nothing right now: no lead time too short, no overdue balance, no unresolved allergy
            conflict.
          </Text>
        ) : (
          <>
            <SimpleGrid
              as="ul"
              columns={{ base: 1, lg: 2 }}
              gap="2"
              listStyleType="none"
              id="alerts-list"
            >
              {shown.map((alert) => {
                const kind = ALERT_KIND[alert.kind];
                const Icon = kind.icon;
                return (
                  <Flex
                    as="li"
                    key={`${alert.kind}-${alert.orderId}-${alert.message}`}
                    gap="3"
                    align="start"
                    bg="bg.panel"
                    borderWidth="1px"
                    borderColor="border"
                    borderStartWidth="4px"
                    borderStartColor="danger"
                    borderRadius="l2"
                    px="3"
                    py="2.5"
                  >
                    <Box color="fg.error" pt="0.5" flexShrink="0" aria-hidden>
                      <Icon boxSize="5" />
                    </Box>
                    <Stack gap="0.5" minW="0">
                      <Flex gap="2" wrap="wrap" align="baseline">
                        <Text fontWeight="semibold" color="fg.error">
                          {kind.label}
                        </Text>
                        <OrderLink id={alert.orderId} label={`Open order ${alert.reference}`}>
                          {alert.reference}
                        </OrderLink>
                      </Flex>
                      <Text textStyle="sm" overflowWrap="anywhere">
                        {withoutReference(alert.message, alert.reference)}
                      </Text>
                      <Text color="fg.muted" textStyle="xs">
                        {alertDetail(alert, today)}
                      </Text>
                    </Stack>
                  </Flex>
                );
              })}
            </SimpleGrid>
            {alerts.length > ALERTS_SHOWN && (
              <Box>
                <Button
                  variant="outline"
                  size="sm"
                  bg="bg.panel"
                  aria-expanded={showAll}
                  aria-controls="alerts-list"
                  onClick={() => setShowAll((v) => !v)}
                >
                  {showAll ? 'Show fewer' : `Show all ${alerts.length} alerts`}
                </Button>
              </Box>
            )}
          </>
        )}
      </Card.Body>
    </Card.Root>
  );
}
