import { Box, Button, Heading, HStack, Link, List, Stack, Text } from '@chakra-ui/react';
import { formatMoney, type OrderSummary } from '@nappe/shared';
import { Link as RouterLink } from 'react-router';
import { shortDate } from '../lib/format';

/**
 * Requests waiting for the chef's decision, above the inbox: paid bookings that are not in the
 * prep plan until confirmed. Soonest event first, so the most urgent is read first.
 */
export function AwaitingDecision({
  orders,
  total,
  hrefOf,
  onShowAll,
}: {
  orders: OrderSummary[];
  total: number;
  hrefOf: (id: string) => string;
  onShowAll: () => void;
}) {
  if (total === 0) return null;
  const soonestFirst = [...orders].sort(
    (a, b) => a.eventDate.localeCompare(b.eventDate) || a.serviceTime.localeCompare(b.serviceTime),
  );
  return (
    <Box
      as="section"
      aria-labelledby="awaiting-decision"
      mb="6"
      p={{ base: '4', md: '5' }}
      borderWidth="1px"
      borderColor="caramel.border"
      borderRadius="l3"
      bg="caramel.subtle"
    >
      <Stack gap="3">
        <HStack justify="space-between" align="baseline" wrap="wrap" gap="2">
          <Heading
            as="h2"
            id="awaiting-decision"
            textStyle="lg"
            fontFamily="body"
            fontWeight="semibold"
          >
            {total === 1
              ? '1 request waits for your decision'
              : `${total} requests wait for your decision`}
          </Heading>
          {total > orders.length && (
            <Button size="sm" variant="outline" bg="bg.panel" onClick={onShowAll}>
              Show all {total}
            </Button>
          )}
        </HStack>
        <Text textStyle="sm" color="fg.muted">
          Paid and waiting: confirm to add them to the prep plan, or decline to refund them in full.
        </Text>
        <List.Root as="ul" listStyle="none" gap="2">
          {soonestFirst.map((o) => (
            <List.Item key={o.id}>
              <Link
                asChild
                fontWeight="semibold"
                color="fg"
                textDecoration="underline"
                textUnderlineOffset="3px"
              >
                <RouterLink to={hrefOf(o.id)}>{o.reference}</RouterLink>
              </Link>{' '}
              <Text as="span" color="fg.muted">
                — {shortDate(o.eventDate)} at {o.serviceTime}, {o.clientName}, {o.guestCount}{' '}
                guests, {formatMoney(o.paidMinor, o.currency)} paid
              </Text>
            </List.Item>
          ))}
        </List.Root>
      </Stack>
    </Box>
  );
}
