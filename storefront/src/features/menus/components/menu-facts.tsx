import { HStack, Stack, Text } from '@chakra-ui/react';
import { plural } from '@nappe/shared';
import { GuestsIcon, CalendarIcon, PlateIcon } from '../../../components/ui/icons';
import { guestRange, leadTimeInWords, money } from '../../../lib/format';
import type { PublicMenu } from '../api/types';

/** Price per guest, party size, notice and desserts per guest, in words. */
export function MenuFacts({ menu, size = 'md' }: { menu: PublicMenu; size?: 'sm' | 'md' }) {
  const text = size === 'sm' ? 'sm' : 'md';
  return (
    <Stack gap={size === 'sm' ? '1.5' : '2.5'}>
      <Text textStyle={size === 'sm' ? 'lg' : '2xl'} fontFamily="heading" fontWeight="bold">
        {money(menu.pricePerGuestMinor, menu.currency)}{' '}
        <Text as="span" textStyle={text} fontFamily="body" fontWeight="normal" color="fg.muted">
          per guest
        </Text>
      </Text>
      <HStack gap="2" textStyle={text} color="fg.muted">
        <GuestsIcon boxSize="4" flexShrink="0" />
        <Text>{guestRange(menu.minGuests, menu.maxGuests)}</Text>
      </HStack>
      <HStack gap="2" textStyle={text} color="fg.muted">
        <CalendarIcon boxSize="4" flexShrink="0" />
        <Text>{leadTimeInWords(menu.leadDays)}</Text>
      </HStack>
      <HStack gap="2" textStyle={text} color="fg.muted">
        <PlateIcon boxSize="4" flexShrink="0" />
        <Text>
          {menu.desserts.length === 1
            ? 'One plated dessert for each guest'
            : `${plural(menu.desserts.length, 'plated dessert')} for each guest`}
        </Text>
      </HStack>
    </Stack>
  );
}
