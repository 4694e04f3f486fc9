import { Stack, Text } from '@chakra-ui/react';
import type { Requote } from '@nappe/shared';
import { Facts, type Fact } from '../../../components/ui/facts';
import { longDate } from '../../../lib/dates';
import { money } from '../../../lib/format';

/** The server's re-quote for a change of guests: what is collected or refunded now, and after. */
export function RequoteSummary({ requote }: { requote: Requote }) {
  const m = (minor: number) => money(minor, requote.quote.currency);
  const strong = (text: string) => (
    <Text as="span" fontWeight="semibold">
      {text}
    </Text>
  );
  const items: Fact[] = [
    ['Guests', `${requote.previousGuestCount} → ${requote.guestCount}`],
    ['Total', `${m(requote.previousTotalMinor)} → ${m(requote.quote.totalMinor)}`],
  ];
  if (requote.collectNowMinor > 0) items.push(['To pay now', strong(m(requote.collectNowMinor))]);
  if (requote.refundNowMinor > 0) items.push(['Refunded now', strong(m(requote.refundNowMinor))]);
  if (requote.retainedNowMinor > 0)
    items.push(['Kept under the policy', m(requote.retainedNowMinor)]);
  items.push([
    'Still to pay after',
    `${m(requote.balanceAfterMinor)}${requote.balanceAfterMinor > 0 ? ` by ${longDate(requote.balanceDueDate)}` : ''}`,
  ]);
  return (
    <Stack gap="3">
      <Text fontWeight="medium">{requote.message}</Text>
      <Facts items={items} />
    </Stack>
  );
}
