import { Badge, createIcon, type IconProps } from '@chakra-ui/react';
import { OrderStatus } from '@nappe/shared';
import type { ComponentType } from 'react';
import { statusLabel } from '../lib/format';

// Line icons of our own on the app's 24-unit grid, one per status, beside the words.
const stroke = {
  fill: 'none',
  stroke: 'currentColor',
  strokeWidth: 2,
  strokeLinecap: 'round',
  strokeLinejoin: 'round',
} as const;

/** A card with a clock hand: a checkout still open. */
const CheckoutIcon = createIcon({
  displayName: 'CheckoutIcon',
  path: [
    <circle key="a" {...stroke} cx="12" cy="12" r="8" />,
    <path key="b" {...stroke} d="M12 7.5V12l3 2" />,
  ],
});

/** A bell: a request waiting for the chef. */
const WaitingIcon = createIcon({
  displayName: 'WaitingIcon',
  path: [
    <path key="a" {...stroke} d="M6 16.5V11a6 6 0 0 1 12 0v5.5l1.5 1.5h-15z" />,
    <path key="b" {...stroke} d="M10 20.5h4" />,
  ],
});

const TickIcon = createIcon({
  displayName: 'TickIcon',
  path: <path {...stroke} d="M5 12.5l4.5 4.5L19 7.5" />,
});

/** A plate seen from above: served. */
const ServedIcon = createIcon({
  displayName: 'ServedIcon',
  path: [
    <circle key="a" {...stroke} cx="12" cy="12" r="8.5" />,
    <circle key="b" {...stroke} cx="12" cy="12" r="4.5" />,
  ],
});

const CrossIcon = createIcon({
  displayName: 'CrossIcon',
  path: <path {...stroke} d="M7 7l10 10M17 7 7 17" />,
});

/** A ring struck through: called off. */
const StruckIcon = createIcon({
  displayName: 'StruckIcon',
  path: [
    <circle key="a" {...stroke} cx="12" cy="12" r="8" />,
    <path key="b" {...stroke} d="M6.5 17.5l11-11" />,
  ],
});

/** An hourglass: the checkout ran out of time. */
const LapsedIcon = createIcon({
  displayName: 'LapsedIcon',
  path: (
    <path {...stroke} d="M7 3.5h10M7 20.5h10M8 3.5c0 5 8 5 8 8.5s-8 3.5-8 8.5M16 3.5c0 2-1 3-2 4" />
  ),
});

const LOOK: Record<OrderStatus, { icon: ComponentType<IconProps>; palette: string }> = {
  [OrderStatus.PendingPayment]: { icon: CheckoutIcon, palette: 'gray' },
  [OrderStatus.Requested]: { icon: WaitingIcon, palette: 'caramel' },
  [OrderStatus.Confirmed]: { icon: TickIcon, palette: 'accent' },
  [OrderStatus.Completed]: { icon: ServedIcon, palette: 'brand' },
  [OrderStatus.Expired]: { icon: LapsedIcon, palette: 'gray' },
  [OrderStatus.Declined]: { icon: CrossIcon, palette: 'gray' },
  [OrderStatus.Cancelled]: { icon: StruckIcon, palette: 'gray' },
};

/** The order's status in the chef's words, with an icon: never a colour alone. */
export function OrderStatusBadge({
  status,
  size = 'md',
}: {
  status: OrderStatus;
  size?: 'sm' | 'md' | 'lg';
}) {
  const { icon: Icon, palette } = LOOK[status];
  return (
    <Badge colorPalette={palette} variant="subtle" size={size} gap="1" whiteSpace="nowrap">
      <Icon aria-hidden boxSize="1em" flexShrink={0} />
      {statusLabel(status)}
    </Badge>
  );
}
