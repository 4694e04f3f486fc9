import { Box, SimpleGrid, Stack, Text } from '@chakra-ui/react';
import {
  createKitchenIndex,
  recipeIngredientLabel,
  rollUpRecipe,
  SUGAR_KINDS,
  usContainsStatement,
} from '@nappe/shared';
import { useMemo } from 'react';
import type { IngredientResponse } from '../api/types';
import {
  ANIMAL_ORIGIN_LABELS,
  formatNumber,
  GELATIN_LABELS,
  sugarLabel,
  unitLabel,
} from '../lib/labels';
import { attempt, toDomainIngredient } from '../lib/live-kitchen';
import { AllergenReportView, LabelText } from './allergen-display';
import { FormSection } from './editor-layout';

function Facts({ items }: { items: Array<[string, string]> }) {
  return (
    <Box as="dl" display="grid" gridTemplateColumns={{ base: '1fr', sm: '12rem 1fr' }} gap="2">
      {items.map(([term, value]) => (
        <Box key={term} display="contents">
          <Text as="dt" color="fg.muted" textStyle="sm">
            {term}
          </Text>
          <Text as="dd" mb={{ base: '2', sm: '0' }}>
            {value}
          </Text>
        </Box>
      ))}
    </Box>
  );
}

/** What staff see of an ingredient: everything but its price, with nothing to edit. */
export function IngredientDetail({ ingredient }: { ingredient: IngredientResponse }) {
  const view = useMemo(
    () =>
      attempt(() => {
        const index = createKitchenIndex({
          ingredients: [toDomainIngredient(ingredient)],
          recipes: [
            {
              id: 'probe',
              name: ingredient.name,
              lines: [
                { kind: 'ingredient', ingredientId: ingredient.id, quantity: 100, unit: 'g' },
              ],
              yieldG: 100,
              steps: [],
              storage: 'dry',
              shelfLifeHours: 1,
            },
          ],
        });
        const report = rollUpRecipe(index, 'probe');
        return {
          report,
          label: recipeIngredientLabel(index, 'probe'),
          usStatement: usContainsStatement(report),
        };
      }),
    [ingredient],
  );
  const d = ingredient.dietary;
  const c = ingredient.composition;
  return (
    <Stack gap="5">
      <FormSection title="Buying and weighing" id="ing-facts">
        <Facts
          items={[
            ['Name on labels', ingredient.labelName ?? ingredient.name],
            [
              'Pack',
              `${formatNumber(ingredient.purchase.packSize, 3)} ${unitLabel(ingredient.purchase.packUnit)}`,
            ],
            [
              'Density',
              ingredient.densityGPerMl !== undefined
                ? `${formatNumber(ingredient.densityGPerMl, 3)} g per ml`
                : 'Not given',
            ],
            [
              'Weight of one',
              ingredient.unitWeightG !== undefined
                ? `${formatNumber(ingredient.unitWeightG, 2)} g${ingredient.countUnit ? `, counted in whole ${ingredient.countUnit === 'leaf' ? 'leaves' : 'pieces'}` : ''}`
                : 'Not given',
            ],
          ]}
        />
      </FormSection>
      <FormSection title="Allergens" id="ing-allergen-facts">
        {view.ok ? (
          <Stack gap="4">
            <AllergenReportView report={view.value.report} usStatement={view.value.usStatement} />
            <Box>
              <Text textStyle="xs" color="fg.muted" mb="1">
                On a label
              </Text>
              <LabelText segments={view.value.label.segments} />
            </Box>
          </Stack>
        ) : (
          <Text>{view.message}</Text>
        )}
      </FormSection>
      <FormSection title="Diet" id="ing-diet-facts">
        <Facts
          items={[
            [
              'Animal origins stated',
              d.animalOrigins.length > 0
                ? d.animalOrigins.map((o) => ANIMAL_ORIGIN_LABELS[o]).join(', ')
                : 'None beyond its allergens',
            ],
            ['Gelatin', d.gelatin ? GELATIN_LABELS[d.gelatin] : 'None'],
            ['Alcohol', d.alcohol || (c?.alcohol ?? 0) > 0 ? 'Contains alcohol' : 'None'],
          ]}
        />
      </FormSection>
      {c && (
        <FormSection title="Composition per 100 g" id="ing-composition-facts">
          <SimpleGrid columns={{ base: 2, md: 4 }} gap="3">
            {(
              [
                ['Water', c.water],
                ['Fat', c.fat],
                ['Milkfat', c.milkFat],
                ['Milk solids non-fat', c.msnf],
                ['Egg-yolk solids', c.eggYolkSolids],
                ['Alcohol', c.alcohol],
                ...SUGAR_KINDS.map((k) => [sugarLabel(k), c.sugars?.[k]] as const),
              ] as ReadonlyArray<readonly [string, number | undefined]>
            )
              .filter(([, v]) => v !== undefined)
              .map(([label, v]) => (
                <Stack key={label} gap="0">
                  <Text textStyle="xs" color="fg.muted">
                    {label}
                  </Text>
                  <Text fontVariantNumeric="tabular-nums">{formatNumber(v!, 2)} g</Text>
                </Stack>
              ))}
          </SimpleGrid>
          {c.source && (
            <Text textStyle="xs" color="fg.muted">
              Source: {c.source}
            </Text>
          )}
        </FormSection>
      )}
      {ingredient.notes && (
        <FormSection title="Notes" id="ing-notes-facts">
          <Text whiteSpace="pre-wrap">{ingredient.notes}</Text>
        </FormSection>
      )}
    </Stack>
  );
}
