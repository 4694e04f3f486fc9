import { Box, Flex, Heading, HStack, List, Stack, Text } from '@chakra-ui/react';
import { AllergenIcon } from '../../../components/ui/allergen-icons';
import { InfoIcon } from '../../../components/ui/booking-icons';
import type { PublicAllergen, PublicAllergens } from '../api/types';

function AllergenItem({ allergen, trace }: { allergen: PublicAllergen; trace: boolean }) {
  // "Nuts (almonds, hazelnuts)": the group as the law names it, the foods as the label does —
  // unless the foods only repeat the group's name ("Eggs", not "Eggs (egg)").
  const stem = (w: string) => w.toLowerCase().replace(/s$/, '');
  const repeats = allergen.foods.every((f) => stem(f) === stem(allergen.label));
  const foods = allergen.foods.length > 0 && !repeats ? ` (${allergen.foods.join(', ')})` : '';
  return (
    <List.Item
      display="inline-flex"
      alignItems="center"
      gap="1.5"
      px="2.5"
      py="1"
      borderRadius="full"
      borderWidth="1px"
      borderStyle={trace ? 'dashed' : 'solid'}
      borderColor={trace ? 'border.emphasized' : 'caramel.border'}
      bg={trace ? 'transparent' : 'caramel.subtle'}
      color="fg"
      textStyle="sm"
    >
      <AllergenIcon allergen={allergen.group} color={trace ? 'fg.muted' : 'caramel.fg'} />
      <span>
        {allergen.label}
        {foods}
      </span>
    </List.Item>
  );
}

function AllergenList({
  id,
  title,
  hint,
  items,
  trace,
  none,
}: {
  id: string;
  title: string;
  hint: string;
  items: PublicAllergen[];
  trace: boolean;
  none: string;
}) {
  return (
    <Stack gap="2" as="section" aria-labelledby={id}>
      <Stack gap="0">
        <Heading as="h4" id={id} fontFamily="body" fontSize="sm" fontWeight="semibold">
          {title}
        </Heading>
        <Text textStyle="xs" color="fg.muted">
          {hint}
        </Text>
      </Stack>
      {items.length > 0 ? (
        <List.Root
          as="ul"
          listStyleType="none"
          display="flex"
          flexDirection="row"
          flexWrap="wrap"
          gap="2"
        >
          {items.map((a) => (
            <AllergenItem key={a.group} allergen={a} trace={trace} />
          ))}
        </List.Root>
      ) : (
        <Text textStyle="sm" color="fg.muted">
          {none}
        </Text>
      )}
    </Stack>
  );
}

/**
 * A dish's allergens under the EU's 14 groups, "contains" and "may contain" in two labelled
 * lists (a solid outline and a dashed one, but the headings say it first), advisories apart,
 * and the US major allergens in one line for visitors used to that list.
 */
export function AllergenDeclaration({
  allergens,
  idPrefix,
}: {
  allergens: PublicAllergens;
  idPrefix: string;
}) {
  const us = allergens.us.contains.map((a) => a.label.toLowerCase());
  return (
    <Stack gap="4">
      <AllergenList
        id={`${idPrefix}-contains`}
        title="Contains"
        hint="Made with these allergens."
        items={allergens.eu.contains}
        trace={false}
        none="None of the 14 major allergens."
      />
      <AllergenList
        id={`${idPrefix}-may-contain`}
        title="May contain"
        hint="Not an ingredient, but traces cannot be ruled out."
        items={allergens.eu.mayContain}
        trace
        none="No traces declared."
      />
      {allergens.advisories.length > 0 && (
        <Stack gap="1.5">
          {allergens.advisories.map((advice) => (
            <HStack key={advice} gap="2" align="start" textStyle="sm" color="fg.muted">
              <InfoIcon boxSize="4" mt="0.5" flexShrink="0" />
              <Text>{advice}</Text>
            </HStack>
          ))}
        </Stack>
      )}
      {us.length > 0 && (
        <Text textStyle="xs" color="fg.muted">
          Under US labelling (the 9 major food allergens): contains {us.join(', ')}.
        </Text>
      )}
    </Stack>
  );
}

/** One line for a card: the groups a menu contains, and those it may contain, as words. */
export function AllergenSummaryLine({ allergens }: { allergens: PublicAllergens }) {
  const { contains, mayContain } = allergens.eu;
  return (
    <Stack gap="1.5" textStyle="sm">
      <Flex gap="1.5" wrap="wrap" align="center">
        <Text as="span" fontWeight="semibold">
          Contains:
        </Text>
        {contains.length === 0 ? (
          <Text as="span" color="fg.muted">
            none of the 14 major allergens
          </Text>
        ) : (
          contains.map((a, i) => (
            <HStack as="span" key={a.group} gap="1">
              <AllergenIcon allergen={a.group} color="caramel.fg" />
              <span>
                {a.label}
                {i < contains.length - 1 ? ',' : ''}
              </span>
            </HStack>
          ))
        )}
      </Flex>
      {mayContain.length > 0 && (
        <Box color="fg.muted">
          <Text as="span" fontWeight="semibold">
            May contain:
          </Text>{' '}
          {mayContain.map((a) => a.label).join(', ')}
        </Box>
      )}
    </Stack>
  );
}
