import { Box, Heading, HStack, List, Stack, Text } from '@chakra-ui/react';
import { plural, type Diet, type GuestAllergen } from '@nappe/shared';
import { FoodAllergenIcon } from '../../../components/ui/allergen-food-icon';
import { allergenLabel, dietLabel, sortAllergens, FORM_DIETS } from '../form/guest-form';

/** A guest as a form holds it or as an order returns it (allergen and diet ids as strings). */
interface GuestLike {
  label: string;
  allergens: readonly string[];
  diets: readonly string[];
}

/** Who is affected by each allergen and diet: what the kitchen plans around. */
export function summariseByAllergen(guests: readonly GuestLike[]) {
  const byAllergen = new Map<GuestAllergen, string[]>();
  const byDiet = new Map<Diet, string[]>();
  guests.forEach((g, i) => {
    const name = g.label.trim() || `Guest ${i + 1}`;
    for (const a of new Set(g.allergens as readonly GuestAllergen[])) {
      byAllergen.set(a, [...(byAllergen.get(a) ?? []), name]);
    }
    for (const d of new Set(g.diets as readonly Diet[]))
      byDiet.set(d, [...(byDiet.get(d) ?? []), name]);
  });
  const allergens = sortAllergens([...byAllergen.keys()]).map((a) => ({
    allergen: a,
    guests: byAllergen.get(a)!,
  }));
  const diets = FORM_DIETS.filter((d) => byDiet.has(d)).map((d) => ({
    diet: d,
    guests: byDiet.get(d)!,
  }));
  return { allergens, diets };
}

/** The summary by allergen and by diet, as lists of words (with our icons beside them). */
export function AllergenSummary({
  guests,
  guestCount,
  headingLevel = 'h3',
}: {
  guests: readonly GuestLike[];
  guestCount: number | null;
  headingLevel?: 'h2' | 'h3' | 'h4';
}) {
  const { allergens, diets } = summariseByAllergen(guests);
  const withNeeds = guests.filter((g) => g.allergens.length > 0 || g.diets.length > 0).length;
  return (
    <Box
      as="section"
      aria-label="Summary by allergen"
      bg="bg.muted"
      borderRadius="l3"
      p={{ base: '4', md: '5' }}
    >
      <Stack gap="3">
        <Heading as={headingLevel} fontSize="lg" fontWeight="normal">
          Summary by allergen
        </Heading>
        <Text textStyle="sm" color="fg.muted">
          {withNeeds === 0
            ? 'No allergies or diets listed yet.'
            : `${plural(withNeeds, 'guest')}${guestCount && Number.isInteger(guestCount) ? ` of ${guestCount}` : ''} with an allergy or a diet.`}
        </Text>
        {allergens.length > 0 && (
          <List.Root as="ul" listStyleType="none" gap="1.5">
            {allergens.map(({ allergen, guests: names }) => (
              <List.Item key={allergen} textStyle="sm">
                <HStack gap="2" align="start">
                  <FoodAllergenIcon allergen={allergen} mt="0.5" color="caramel.fg" />
                  <Text>
                    <Text as="span" fontWeight="semibold">
                      {allergenLabel(allergen)}
                    </Text>
                    : {plural(names.length, 'guest')} ({names.join(', ')})
                  </Text>
                </HStack>
              </List.Item>
            ))}
          </List.Root>
        )}
        {diets.length > 0 && (
          <List.Root as="ul" listStyleType="none" gap="1.5">
            {diets.map(({ diet, guests: names }) => (
              <List.Item key={diet} textStyle="sm">
                <Text>
                  <Text as="span" fontWeight="semibold">
                    {dietLabel(diet)}
                  </Text>
                  : {plural(names.length, 'guest')} ({names.join(', ')})
                </Text>
              </List.Item>
            ))}
          </List.Root>
        )}
      </Stack>
    </Box>
  );
}
