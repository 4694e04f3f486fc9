import { Badge, Image, List, SimpleGrid, Stack, Text } from '@chakra-ui/react';
import { formatMoney } from '@nappe/shared';
import type { MenuResponse } from '../api/types';
import { FormSection } from './editor-layout';

/** A menu as staff see it: what is served, to how many, with how much notice. */
export function MenuDetail({ menu, currency }: { menu: MenuResponse; currency: string }) {
  return (
    <Stack gap="5">
      <FormSection title="Menu" id="menu-facts">
        <Badge
          alignSelf="start"
          variant="subtle"
          colorPalette={menu.active ? 'accent' : 'gray'}
          size="md"
        >
          {menu.active ? 'On sale' : 'Not on sale'}
        </Badge>
        {menu.description && <Text>{menu.description}</Text>}
        <Text>
          {formatMoney(menu.pricePerGuestMinor, currency)} per guest · {menu.minGuests}–
          {menu.maxGuests} guests · booked at least {menu.leadDays}{' '}
          {menu.leadDays === 1 ? 'day' : 'days'} ahead
        </Text>
      </FormSection>
      <FormSection title="Desserts" id="menu-dessert-facts">
        <List.Root as="ol" ps="5" gap="1">
          {menu.dessertIds.map((id) => (
            <List.Item key={id}>{menu.referenceNames[id] ?? id}</List.Item>
          ))}
        </List.Root>
      </FormSection>
      {menu.photos.length > 0 && (
        <FormSection title="Photo" id="menu-photo-facts">
          <SimpleGrid columns={{ base: 2, md: 3 }} gap="3">
            {menu.photos.map((p, i) => (
              <Image
                key={p.id}
                src={p.thumbnailUrl}
                alt={`${menu.name}, photo ${i + 1}`}
                width={p.width}
                height={p.height}
                w="full"
                h="auto"
                borderRadius="l2"
              />
            ))}
          </SimpleGrid>
        </FormSection>
      )}
    </Stack>
  );
}
