import { Box, HStack, List, Stack, Text } from '@chakra-ui/react';
import type { Diet, GuestAllergen } from '@nappe/shared';
import { FoodAllergenIcon } from '../../../components/ui/allergen-food-icon';
import { allergenLabel, dietLabel, sortAllergens } from '../form/guest-form';

export interface GuestView {
  label: string;
  table?: string;
  allergens: readonly string[];
  diets: readonly string[];
  notes?: string;
}

/** The guests with requirements, read-only: one card each, allergens as words with our icons. */
export function GuestCards({ guests }: { guests: readonly GuestView[] }) {
  return (
    <List.Root
      as="ul"
      listStyleType="none"
      display="grid"
      gap="3"
      gridTemplateColumns={{ base: '1fr', md: '1fr 1fr' }}
    >
      {guests.map((g, i) => (
        <List.Item key={`${g.label}-${i}`}>
          <Box
            borderWidth="1px"
            borderColor="border"
            borderRadius="l3"
            bg="bg.panel"
            p="4"
            h="full"
          >
            <Stack gap="2">
              <HStack justify="space-between" align="baseline" gap="3">
                <Text fontWeight="semibold">{g.label}</Text>
                {g.table && (
                  <Text textStyle="sm" color="fg.muted" whiteSpace="nowrap">
                    Table {g.table}
                  </Text>
                )}
              </HStack>
              {g.allergens.length > 0 ? (
                <Stack gap="1" as="ul" listStyleType="none" aria-label={`Allergies of ${g.label}`}>
                  {sortAllergens(g.allergens as GuestAllergen[]).map((a) => (
                    <HStack as="li" key={a} gap="1.5" textStyle="sm">
                      <FoodAllergenIcon allergen={a} color="caramel.fg" />
                      <span>{allergenLabel(a)}</span>
                    </HStack>
                  ))}
                </Stack>
              ) : (
                <Text textStyle="sm" color="fg.muted">
                  No allergies
                </Text>
              )}
              {g.diets.length > 0 && (
                <Text textStyle="sm">
                  <Text as="span" fontWeight="medium">
                    Diet:
                  </Text>{' '}
                  {(g.diets as Diet[]).map(dietLabel).join(', ')}
                </Text>
              )}
              {g.notes && (
                <Text textStyle="sm" color="fg.muted">
                  “{g.notes}”
                </Text>
              )}
            </Stack>
          </Box>
        </List.Item>
      ))}
    </List.Root>
  );
}
