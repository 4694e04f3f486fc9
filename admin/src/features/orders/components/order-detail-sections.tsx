import {
  Alert,
  Badge,
  Box,
  Button,
  Flex,
  Heading,
  HStack,
  Link,
  List,
  Skeleton,
  Stack,
  Table,
  Text,
} from '@chakra-ui/react';
import {
  DIET_LABELS,
  formatIsoDate,
  formatMoney,
  GUEST_ALLERGENS,
  guestAllergenLabel,
  plural,
  type Diet,
  type GuestAllergen,
  type OrderDetail,
  type OrderGuest,
} from '@nappe/shared';
import type { ReactNode } from 'react';
import { Link as RouterLink } from 'react-router';
import { DownloadButton } from '../../../components/ui/download-button';
import { AllergyIcon } from '../../../components/ui/icons';
import { paymentErrorMessage } from '../../../lib/error-message';
import type { AccessLogEntry, AllergySummary, GuestDetailsRemoved } from '../api/types';
import {
  ACCESS_KINDS,
  PAYMENT_KIND_LABELS,
  PAYMENT_STATUS_LABELS,
  ROLE_WORDS,
  shortDate,
  statusLabel,
  studioDateTime,
} from '../lib/format';

/** A titled part of the order's page. */
export function Section({
  id,
  title,
  children,
  aside,
}: {
  id: string;
  title: string;
  children: ReactNode;
  aside?: ReactNode;
}) {
  return (
    <Box
      as="section"
      aria-labelledby={id}
      borderWidth="1px"
      borderColor="border"
      borderRadius="l3"
      bg="bg.panel"
      p={{ base: '4', md: '6' }}
    >
      <HStack justify="space-between" align="baseline" mb="4" gap="3" wrap="wrap">
        <Heading as="h2" id={id} fontSize="xl" fontWeight="normal">
          {title}
        </Heading>
        {aside}
      </HStack>
      {children}
    </Box>
  );
}

/** Term and value pairs, two columns wide on a large screen. */
function Facts({ items }: { items: Array<[string, ReactNode]> }) {
  return (
    <Box
      as="dl"
      display="grid"
      gridTemplateColumns={{ base: '1fr', sm: 'minmax(8rem, max-content) 1fr' }}
      columnGap="6"
      rowGap={{ base: '1', sm: '3' }}
    >
      {items.map(([term, value]) => (
        <Box key={term} display="contents">
          <Text as="dt" color="fg.muted" textStyle="sm" pt={{ base: '2', sm: '0.5' }}>
            {term}
          </Text>
          <Box as="dd">{value}</Box>
        </Box>
      ))}
    </Box>
  );
}

export function EventSection({ order, timeZone }: { order: OrderDetail; timeZone: string }) {
  return (
    <Section id="order-event" title="Event">
      <Facts
        items={[
          ['Date', formatIsoDate(order.eventDate)],
          ['Dessert served at', order.serviceTime],
          [
            'Venue',
            <Stack gap="0" key="venue">
              {order.venueAddressLines.map((line, i) => (
                <Text key={i}>{line}</Text>
              ))}
            </Stack>,
          ],
          ['Occasion', order.occasion],
          ['Menu', order.menuName],
          ['Guests', plural(order.guestCount, 'guest')],
          ['Booked', studioDateTime(order.createdAt, timeZone)],
        ]}
      />
    </Section>
  );
}

export function ClientSection({ order }: { order: OrderDetail }) {
  return (
    <Section id="order-client" title="Client">
      <Stack gap="2">
        <Text fontWeight="semibold">{order.clientName}</Text>
        <Link
          href={`mailto:${order.clientEmail}`}
          color="fg"
          textDecoration="underline"
          wordBreak="break-all"
        >
          {order.clientEmail}
        </Link>
        <Link href={`tel:${order.contactPhone}`} color="fg" textDecoration="underline">
          {order.contactPhone}
        </Link>
        <Text textStyle="sm" color="fg.muted">
          Phone on the day of the event.
        </Text>
      </Stack>
    </Section>
  );
}

const isGuestAllergen = (a: string): a is GuestAllergen =>
  (GUEST_ALLERGENS as readonly string[]).includes(a);

function allergenText(a: string): string {
  return isGuestAllergen(a) ? guestAllergenLabel(a) : a;
}

function dietText(d: string): string {
  return DIET_LABELS[d as Diet] ?? d;
}

function hasRequirement(g: OrderGuest): boolean {
  return g.allergens.length > 0 || g.diets.length > 0 || !!g.notes;
}

/** Guests and what they cannot eat, with the allergy notes' count of plates still in conflict. */
export function GuestsSection({
  order,
  removed,
  allergy,
  allergyNotesHref,
}: {
  order: OrderDetail;
  removed: GuestDetailsRemoved | null;
  allergy: { data?: AllergySummary; isPending: boolean; error: unknown };
  allergyNotesHref: string;
}) {
  const listed = order.guests.filter(hasRequirement);
  const unresolved = allergy.data?.unresolved.length ?? 0;
  return (
    <Section
      id="order-guests"
      title="Guests and their requirements"
      aside={
        <Button asChild size="sm" variant="outline">
          <RouterLink to={allergyNotesHref}>
            <AllergyIcon aria-hidden /> Allergy notes
          </RouterLink>
        </Button>
      }
    >
      <Stack gap="4">
        {removed ? (
          <Text>
            {plural(order.guestCount, 'guest')}. {removed.message}
          </Text>
        ) : (
          <Text>
            {plural(order.guestCount, 'guest')}; {listed.length === 0 ? 'none' : listed.length} with
            allergies, diets or notes.
          </Text>
        )}
        {removed ? null : allergy.isPending ? (
          <Skeleton height="6" maxW="sm" />
        ) : allergy.error ? (
          <Text color="fg.error">
            The allergy check could not be loaded: {paymentErrorMessage(allergy.error)}
          </Text>
        ) : unresolved > 0 ? (
          <Alert.Root status="warning" borderRadius="l2">
            <Alert.Indicator>
              <AllergyIcon />
            </Alert.Indicator>
            <Alert.Content>
              <Alert.Title>
                {plural(unresolved, 'unresolved conflict')}:{' '}
                {unresolved === 1 ? 'a guest plate' : 'guest plates'} still{' '}
                {unresolved === 1 ? 'carries' : 'carry'} what a guest cannot eat
              </Alert.Title>
              <Alert.Description>
                <Link asChild color="fg" textDecoration="underline" fontWeight="semibold">
                  <RouterLink to={allergyNotesHref}>
                    Record substitutions in the allergy notes
                  </RouterLink>
                </Link>
              </Alert.Description>
            </Alert.Content>
          </Alert.Root>
        ) : (
          <Text color="fg.success" fontWeight="medium">
            No unresolved conflicts
            {listed.length > 0 ? ': every guest plate is safe as planned.' : '.'}
          </Text>
        )}
        {listed.length > 0 && (
          <List.Root as="ul" listStyle="none" gap="3">
            {listed.map((g, i) => (
              <List.Item
                key={i}
                borderTopWidth={i === 0 ? '0' : '1px'}
                borderColor="border.muted"
                pt={i === 0 ? '0' : '3'}
              >
                <Text fontWeight="semibold">
                  {g.label}
                  {g.table && (
                    <Text as="span" fontWeight="normal" color="fg.muted">
                      {' '}
                      · table {g.table}
                    </Text>
                  )}
                </Text>
                <Flex gap="1.5" wrap="wrap" mt="1">
                  {g.allergens.map((a) => (
                    <Badge key={a} variant="outline" colorPalette="danger" gap="1">
                      <AllergyIcon aria-hidden boxSize="1em" />
                      {allergenText(a)}
                    </Badge>
                  ))}
                  {g.diets.map((d) => (
                    <Badge key={d} variant="outline" colorPalette="accent">
                      {dietText(d)}
                    </Badge>
                  ))}
                </Flex>
                {g.notes && (
                  <Text textStyle="sm" color="fg.muted" mt="1">
                    “{g.notes}”
                  </Text>
                )}
              </List.Item>
            ))}
          </List.Root>
        )}
      </Stack>
    </Section>
  );
}

export function PaymentsSection({ order, timeZone }: { order: OrderDetail; timeZone: string }) {
  const money = (minor: number) => formatMoney(minor, order.currency);
  return (
    <Section id="order-payments" title="Payments and refunds">
      <Stack gap="4">
        <Facts
          items={[
            [
              'Total',
              <Text key="t" fontVariantNumeric="tabular-nums">
                {money(order.totalMinor)}
              </Text>,
            ],
            [
              'Paid',
              <Text key="p" fontVariantNumeric="tabular-nums">
                {money(order.paidMinor)}
              </Text>,
            ],
            [
              'Still to pay',
              <Text key="b" fontVariantNumeric="tabular-nums">
                {money(order.balanceMinor)}
                {order.balanceMinor > 0 && order.balanceDueDate && (
                  <Text as="span" color="fg.muted">
                    {' '}
                    — due by {shortDate(order.balanceDueDate)}
                  </Text>
                )}
              </Text>,
            ],
          ]}
        />
        {order.payments.length === 0 ? (
          <Text color="fg.muted">No payment yet.</Text>
        ) : (
          <Table.ScrollArea borderWidth="1px" borderColor="border" borderRadius="l2">
            <Table.Root size="sm">
              <Table.Caption srOnly>The order’s payments and refunds, oldest first</Table.Caption>
              <Table.Header>
                <Table.Row bg="bg.muted">
                  <Table.ColumnHeader>What</Table.ColumnHeader>
                  <Table.ColumnHeader>State</Table.ColumnHeader>
                  <Table.ColumnHeader textAlign="end">Amount</Table.ColumnHeader>
                  <Table.ColumnHeader>When</Table.ColumnHeader>
                  <Table.ColumnHeader>Receipt</Table.ColumnHeader>
                </Table.Row>
              </Table.Header>
              <Table.Body>
                {order.payments.map((p) => (
                  <Table.Row key={p.id} bg="bg.panel">
                    <Table.Cell>{PAYMENT_KIND_LABELS[p.kind]}</Table.Cell>
                    <Table.Cell>{PAYMENT_STATUS_LABELS[p.status]}</Table.Cell>
                    <Table.Cell
                      textAlign="end"
                      fontVariantNumeric="tabular-nums"
                      whiteSpace="nowrap"
                    >
                      {p.kind === 'refund' ? `−${money(p.amountMinor)}` : money(p.amountMinor)}
                    </Table.Cell>
                    <Table.Cell whiteSpace="nowrap">
                      {studioDateTime(p.settledAt ?? p.createdAt, timeZone)}
                    </Table.Cell>
                    <Table.Cell>
                      {p.receiptAvailable ? (
                        <DownloadButton
                          path={`/orders/${encodeURIComponent(order.id)}/receipts/${encodeURIComponent(p.id)}.pdf`}
                          fallbackName={`receipt-${order.reference}.pdf`}
                          size="xs"
                          variant="ghost"
                          aria-label={`PDF receipt for the ${PAYMENT_KIND_LABELS[p.kind].toLowerCase()} of ${p.kind === 'refund' ? `−${money(p.amountMinor)}` : money(p.amountMinor)}`}
                        >
                          PDF
                        </DownloadButton>
                      ) : (
                        <Text as="span" color="fg.muted">
                          —
                        </Text>
                      )}
                    </Table.Cell>
                  </Table.Row>
                ))}
              </Table.Body>
            </Table.Root>
          </Table.ScrollArea>
        )}
      </Stack>
    </Section>
  );
}

/** Every recorded change of the order: when, who, what, and why. */
export function TimelineSection({ order, timeZone }: { order: OrderDetail; timeZone: string }) {
  return (
    <Section id="order-history" title="History">
      {order.timeline.length === 0 ? (
        <Text color="fg.muted">Nothing recorded yet.</Text>
      ) : (
        <List.Root as="ol" listStyle="none" gap="0">
          {order.timeline.map((e, i) => (
            <List.Item
              key={e.id}
              position="relative"
              ps="6"
              pb={i === order.timeline.length - 1 ? '0' : '5'}
              _before={{
                content: '""',
                position: 'absolute',
                insetStart: '1.5',
                top: '2',
                boxSize: '2.5',
                borderRadius: 'full',
                bg: e.toStatus ? 'caramel.solid' : 'border.emphasized',
              }}
              _after={
                i === order.timeline.length - 1
                  ? undefined
                  : {
                      content: '""',
                      position: 'absolute',
                      insetStart: '2.5',
                      top: '5',
                      bottom: '0',
                      width: '1px',
                      bg: 'border',
                    }
              }
            >
              <Text textStyle="sm" color="fg.muted">
                <time dateTime={e.at}>{studioDateTime(e.at, timeZone)}</time> ·{' '}
                {e.actor.role === 'system'
                  ? 'Nappe (automatic)'
                  : `${e.actor.name ?? 'Someone'} (${ROLE_WORDS[e.actor.role] ?? e.actor.role})`}
              </Text>
              <Text fontWeight="medium">{e.summary}</Text>
              {e.toStatus && (
                <Text textStyle="sm">
                  Status: {e.fromStatus ? `${statusLabel(e.fromStatus)} → ` : ''}
                  {statusLabel(e.toStatus)}
                </Text>
              )}
              {e.reason && (
                <Text textStyle="sm" color="fg.muted">
                  Reason: “{e.reason}”
                </Text>
              )}
            </List.Item>
          ))}
        </List.Root>
      )}
    </Section>
  );
}

/**
 * Who opened the guests' health details (DESIGN.md "Guest data is health data"): a summary and
 * the latest openings; the whole record folds out.
 */
export function AccessLogSection({
  entries,
  isPending,
  error,
  timeZone,
}: {
  entries: AccessLogEntry[] | undefined;
  isPending: boolean;
  error: unknown;
  timeZone: string;
}) {
  const who = (e: AccessLogEntry) =>
    `${e.name ?? 'A removed account'} (${ROLE_WORDS[e.role] ?? e.role})`;
  const row = (e: AccessLogEntry, i: number) => (
    <List.Item key={`${e.at}-${i}`} textStyle="sm">
      <time dateTime={e.at}>{studioDateTime(e.at, timeZone)}</time> — {who(e)},{' '}
      {ACCESS_KINDS[e.what] ?? e.what}
    </List.Item>
  );
  return (
    <Section id="order-access" title="Who opened the guest details">
      {isPending ? (
        <Stack gap="2" role="status">
          <Text srOnly>Loading the access record…</Text>
          <Skeleton height="4" />
          <Skeleton height="4" width="3/4" />
        </Stack>
      ) : error || !entries ? (
        <Text color="fg.error">
          The access record could not be loaded: {paymentErrorMessage(error)}
        </Text>
      ) : entries.length === 0 ? (
        <Text color="fg.muted">Nobody at the studio has opened them yet.</Text>
      ) : (
        <Stack gap="3">
          <Text>
            Opened {plural(entries.length, 'time')} by{' '}
            {plural(new Set(entries.map((e) => e.userId ?? e.name)).size, 'person', 'people')}; last
            by {who(entries[0]!)}.
          </Text>
          <List.Root as="ul" ps="5" gap="1">
            {entries.slice(0, 5).map(row)}
          </List.Root>
          {entries.length > 5 && (
            <Box as="details">
              <Box as="summary" cursor="pointer" textStyle="sm" fontWeight="medium">
                All {entries.length} openings
              </Box>
              <List.Root as="ul" ps="5" gap="1" mt="2">
                {entries.slice(5).map((e, i) => row(e, i + 5))}
              </List.Root>
            </Box>
          )}
          <Text textStyle="xs" color="fg.muted">
            Guest allergies and diets are health data: every opening by the studio is recorded.
          </Text>
        </Stack>
      )}
    </Section>
  );
}
