import { Box, Grid, List, Stack, Table, Text } from '@chakra-ui/react';
import { safetyNotesForStep, storageCaution } from '@nappe/shared';
import { useMemo, useState } from 'react';
import type { RecipeResponse } from '../api/types';
import { parseNumber } from '../lib/form-resolver';
import {
  formatHours,
  formatNumber,
  STEP_KIND_LABELS,
  STORAGE_LABELS,
  unitLabel,
} from '../lib/labels';
import { attempt, indexWith, recipeInsights, toDomainRecipe } from '../lib/live-kitchen';
import { FormSection } from './editor-layout';
import type { KitchenCatalogueData } from '../api/types';
import { RecipeInsightsPanel } from './recipe-insights-panel';
import { SafetyNotes, StorageCaution } from './safety-notes';

/** A recipe to read and cook from (staff): lines, method with its cautions, storage, figures. */
export function RecipeDetail({
  recipe,
  catalogue,
  seesCosts,
}: {
  recipe: RecipeResponse;
  catalogue: KitchenCatalogueData;
  seesCosts: boolean;
}) {
  const [overrun, setOverrun] = useState('');
  const overrunPercent = parseNumber(overrun);
  const insights = useMemo(() => {
    const index = attempt(() => indexWith(catalogue));
    if (!index.ok) return null;
    return recipeInsights(index.value, toDomainRecipe(recipe), {
      withCost: seesCosts,
      ...(overrunPercent !== undefined && overrunPercent >= 0 ? { overrunPercent } : {}),
    });
  }, [catalogue, recipe, seesCosts, overrunPercent]);

  return (
    <Grid
      templateColumns={{ base: 'minmax(0, 1fr)', lg: 'minmax(0, 1fr) 24rem' }}
      gap={{ base: '5', lg: '6' }}
      alignItems="start"
    >
      <Stack gap="5" minW="0">
        <FormSection title="Recipe" id="recipe-facts">
          <Text>
            Yield {formatNumber(recipe.yieldG, 1)} g · {STORAGE_LABELS[recipe.storage]} · keeps{' '}
            {formatHours(recipe.shelfLifeHours)}
            {recipe.equipment
              ? ` · ${recipe.equipment.name}, up to ${formatNumber(recipe.equipment.batchCapacityG, 0)} g a batch`
              : ''}
          </Text>
          <StorageCaution text={storageCaution(recipe.storage)} />
        </FormSection>
        <FormSection title="Lines" id="recipe-line-facts">
          <Table.Root size="sm">
            <Table.Caption srOnly>Lines of {recipe.name}</Table.Caption>
            <Table.Header>
              <Table.Row bg="transparent">
                <Table.ColumnHeader>Item</Table.ColumnHeader>
                <Table.ColumnHeader textAlign="end">Quantity</Table.ColumnHeader>
              </Table.Row>
            </Table.Header>
            <Table.Body>
              {recipe.lines.map((line, i) => {
                const ref = line.kind === 'ingredient' ? line.ingredientId : line.recipeId;
                return (
                  <Table.Row key={i} bg="transparent">
                    <Table.Cell>
                      {recipe.referenceNames[ref] ?? ref}
                      {line.kind === 'recipe' && (
                        <Text as="span" color="fg.muted">
                          {' '}
                          (sub-recipe)
                        </Text>
                      )}
                      {line.note && (
                        <Text textStyle="xs" color="fg.muted">
                          {line.note}
                        </Text>
                      )}
                    </Table.Cell>
                    <Table.Cell textAlign="end" fontVariantNumeric="tabular-nums">
                      {formatNumber(line.quantity, 3)} {unitLabel(line.unit)}
                    </Table.Cell>
                  </Table.Row>
                );
              })}
            </Table.Body>
          </Table.Root>
        </FormSection>
        <FormSection title="Method" id="recipe-method-facts">
          {recipe.steps.length === 0 ? (
            <Text color="fg.muted">No steps written.</Text>
          ) : (
            <List.Root as="ol" ps="5" gap="4">
              {recipe.steps.map((step, i) => (
                <List.Item key={i}>
                  <Stack gap="2">
                    <Text fontWeight="semibold">{step.name}</Text>
                    <Text textStyle="sm" color="fg.muted">
                      {STEP_KIND_LABELS[step.kind]} · {step.activeMinutes} min hands-on
                      {step.waitMinutes > 0 ? ` · then ${step.waitMinutes} min waiting` : ''}
                      {step.temperatureC !== undefined ? ` · ${step.temperatureC} °C` : ''}
                    </Text>
                    {step.caution && <Text textStyle="sm">{step.caution}</Text>}
                    <SafetyNotes notes={safetyNotesForStep(step)} />
                  </Stack>
                </List.Item>
              ))}
            </List.Root>
          )}
        </FormSection>
        {recipe.notes && (
          <FormSection title="Notes" id="recipe-note-facts">
            <Text whiteSpace="pre-wrap">{recipe.notes}</Text>
          </FormSection>
        )}
      </Stack>
      <Box
        position={{ lg: 'sticky' }}
        top={{ lg: '4' }}
        maxH={{ lg: 'calc(100dvh - 2rem)' }}
        overflowY={{ lg: 'auto' }}
      >
        <RecipeInsightsPanel
          insights={insights}
          waiting="The figures could not be worked out from the catalogue."
          currency={catalogue.currency}
          overrun={overrun}
          onOverrunChange={setOverrun}
          frozen={recipe.storage === 'frozen'}
          live={false}
        />
      </Box>
    </Grid>
  );
}
