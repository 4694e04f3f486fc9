import type { OrderDetail } from '@nappe/shared';
import { Text } from '@chakra-ui/react';
import { Facts } from '../../../components/ui/facts';
import { longDate } from '../../../lib/dates';
import { money } from '../../../lib/format';

/** The order's money as the server keeps it: total, paid (net of refunds), still to pay. */
export function OrderMoney({ order }: { order: OrderDetail }) {
  const m = (minor: number) => money(minor, order.currency);
  return (
    <Facts
      items={[
        [
          'Total',
          <Text as="span" fontWeight="semibold">
            {m(order.totalMinor)}
          </Text>,
        ],
        ['Paid', m(order.paidMinor)],
        [
          'Still to pay',
          `${m(order.balanceMinor)}${order.balanceMinor > 0 && order.balanceDueDate ? ` by ${longDate(order.balanceDueDate)}` : ''}`,
        ],
      ]}
    />
  );
}
