import { Box, Flex, Heading, HStack, Link, Stack, Text } from '@chakra-ui/react';
import { plural, type OrderSummary } from '@nappe/shared';
import { Link as RouterLink } from 'react-router';
import { ClockIcon } from '../../../components/ui/booking-icons';
import { CalendarIcon, GuestsIcon } from '../../../components/ui/icons';
import { paths } from '../../../config/paths';
import { longDate } from '../../../lib/dates';
import { money } from '../../../lib/format';
import { OrderStatusBadge } from './order-status-badge';

/** What is still owed on an order, in words. */
export function balanceWords(
  order: Pick<OrderSummary, 'balanceMinor' | 'balanceDueDate' | 'currency' | 'status'>,
): string {
  if (order.status === 'cancelled' || order.status === 'declined' || order.status === 'expired') {
    return 'Nothing to pay';
  }
  if (order.balanceMinor <= 0) return 'Paid in full';
  const due = order.balanceDueDate ? `, due by ${longDate(order.balanceDueDate)}` : '';
  return `Balance ${money(order.balanceMinor, order.currency)}${due}`;
}

/** One event in My events: date, menu, guests, status and what is left to pay. */
export function OrderCard({ order }: { order: OrderSummary }) {
  const headingId = `order-${order.id}`;
  return (
    <Box
      as="article"
      aria-labelledby={headingId}
      borderWidth="1px"
      borderColor="border"
      borderRadius="l3"
      bg="bg.panel"
      p={{ base: '4', md: '5' }}
      _hover={{ borderColor: 'border.emphasized' }}
    >
      <Flex justify="space-between" gap="3" wrap="wrap" align="start">
        <Stack gap="1">
          <Heading as="h2" id={headingId} fontSize="xl" fontWeight="normal">
            <Link asChild color="fg">
              <RouterLink to={paths.event.getHref(order.id)}>{order.menuName}</RouterLink>
            </Link>
          </Heading>
          <Text textStyle="sm" color="fg.muted">
            Reference {order.reference}
          </Text>
        </Stack>
        <OrderStatusBadge status={order.status} />
      </Flex>
      <Flex
        mt="3"
        gap={{ base: '2', md: '6' }}
        direction={{ base: 'column', md: 'row' }}
        textStyle="sm"
      >
        <HStack gap="2">
          <CalendarIcon boxSize="4" color="fg.muted" />
          <Text>{longDate(order.eventDate)}</Text>
        </HStack>
        <HStack gap="2">
          <ClockIcon boxSize="4" color="fg.muted" />
          <Text>Served at {order.serviceTime}</Text>
        </HStack>
        <HStack gap="2">
          <GuestsIcon boxSize="4" color="fg.muted" />
          <Text>{plural(order.guestCount, 'guest')}</Text>
        </HStack>
      </Flex>
      <Text mt="3" textStyle="sm" fontWeight="medium">
        {balanceWords(order)}
      </Text>
    </Box>
  );
}
