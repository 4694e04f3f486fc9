import { HStack, Text } from '@chakra-ui/react';
import { ORDER_STATUS_LABELS_FOR_CLIENT, OrderStatus } from '@nappe/shared';
import type { ComponentType } from 'react';
import {
  CardIcon,
  ClosedIcon,
  CrossIcon,
  HourglassIcon,
} from '../../../components/ui/booking-icons';
import { CheckIcon, PlateIcon } from '../../../components/ui/icons';

const LOOK: Record<OrderStatus, { icon: ComponentType<{ boxSize?: string }>; palette: string }> = {
  [OrderStatus.PendingPayment]: { icon: CardIcon, palette: 'caramel' },
  [OrderStatus.Requested]: { icon: HourglassIcon, palette: 'brand' },
  [OrderStatus.Confirmed]: { icon: CheckIcon, palette: 'accent' },
  [OrderStatus.Completed]: { icon: PlateIcon, palette: 'accent' },
  [OrderStatus.Expired]: { icon: ClosedIcon, palette: 'gray' },
  [OrderStatus.Declined]: { icon: CrossIcon, palette: 'danger' },
  [OrderStatus.Cancelled]: { icon: CrossIcon, palette: 'gray' },
};

/** The order's status for the client, as words with a mark (never a colour alone). */
export function OrderStatusBadge({ status }: { status: OrderStatus }) {
  const look = LOOK[status];
  return (
    <HStack
      as="span"
      display="inline-flex"
      gap="1.5"
      px="2.5"
      py="0.5"
      borderRadius="full"
      colorPalette={look.palette}
      bg="colorPalette.subtle"
      color="colorPalette.fg"
      borderWidth="1px"
      borderColor="colorPalette.muted"
      textStyle="sm"
      fontWeight="medium"
      whiteSpace="nowrap"
    >
      <look.icon boxSize="3.5" />
      <Text as="span">{ORDER_STATUS_LABELS_FOR_CLIENT[status].label}</Text>
    </HStack>
  );
}
