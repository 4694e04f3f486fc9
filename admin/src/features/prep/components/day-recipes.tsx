import {
  Alert,
  Badge,
  Box,
  Button,
  HStack,
  List,
  Stack,
  Text,
  VisuallyHidden,
} from '@chakra-ui/react';
import { plural, type PlanRecipeRow, type RunSchedule } from '@nappe/shared';
import { Link as RouterLink } from 'react-router';
import { CautionIcon, ScaleIcon } from '../../../components/ui/icons';
import { paths } from '../../../config/paths';
import { celsius, grams, STORAGE_LABELS, when } from '../lib/format';
import { cautionText } from './task-card';
import { FrozenIcon } from './prep-icons';

/** Each step's caution once, with the step it belongs to. */
function cautionsOf(run: RunSchedule | undefined): Array<{ step: string; text: string }> {
  if (!run) return [];
  const seen = new Set<string>();
  const out: Array<{ step: string; text: string }> = [];
  for (const step of run.steps) {
    if (!step.caution) continue;
    const text = cautionText(step.caution);
    if (seen.has(text)) continue;
    seen.add(text);
    out.push({
      step: `${step.name}${step.temperatureC !== undefined ? ` (${celsius(step.temperatureC)})` : ''}`,
      text,
    });
  }
  return out;
}

/**
 * The recipes made on a day at the quantities of that day's batches, read-only: how much in all,
 * how many batches of how much, the way to the recipe scaled to one batch, and every safety
 * caution of its steps and its storage.
 */
export function DayRecipes({
  rows,
  runs,
  day,
}: {
  rows: readonly PlanRecipeRow[];
  runs: readonly RunSchedule[];
  day: string;
}) {
  const runById = new Map(runs.map((r) => [r.runId, r]));
  return (
    <Stack as="ul" gap="3" ps="0" m="0" aria-label="Recipes and batches">
      {rows.map((row) => {
        const run = runById.get(row.runId);
        const cautions = cautionsOf(run);
        return (
          <Box
            as="li"
            key={row.runId}
            listStyleType="none"
            borderWidth="1px"
            borderColor="border"
            borderRadius="l3"
            bg="bg.panel"
            p={{ base: '3', md: '4' }}
          >
            <Stack gap="2">
              <HStack gap="2" wrap="wrap" justify="space-between">
                <Text fontWeight="semibold" textStyle="lg">
                  {row.recipeName}
                </Text>
                <Badge
                  variant="subtle"
                  colorPalette={row.storage === 'frozen' ? 'brand' : 'caramel'}
                >
                  {row.storage === 'frozen' && <FrozenIcon aria-hidden boxSize="3.5" />}
                  {STORAGE_LABELS[row.storage]}
                </Badge>
              </HStack>
              <Text fontVariantNumeric="tabular-nums">
                <Text as="span" fontWeight="semibold">
                  {grams(row.grams)}
                </Text>{' '}
                in {plural(row.batches, 'batch', 'batches')} of {grams(row.gramsPerBatch)}
                {row.equipment
                  ? ` (${row.equipment.name}, up to ${grams(row.equipment.batchCapacityG)})`
                  : ''}
              </Text>
              <Text textStyle="sm" color="fg.muted">
                Ready {when(row.finishAt, day)} · use by {when(row.expiresAt, day)}
              </Text>
              {cautions.length > 0 && (
                <Alert.Root status="warning" size="sm" borderRadius="l2" alignItems="start">
                  <Alert.Indicator>
                    <CautionIcon />
                  </Alert.Indicator>
                  <Alert.Content>
                    <Alert.Title>Safety</Alert.Title>
                    <Alert.Description>
                      <List.Root ps="4" gap="1">
                        {cautions.map((c) => (
                          <List.Item key={c.step}>
                            <Text as="span" fontWeight="semibold">
                              {c.step}:
                            </Text>{' '}
                            {c.text}
                          </List.Item>
                        ))}
                      </List.Root>
                    </Alert.Description>
                  </Alert.Content>
                </Alert.Root>
              )}
              {run?.storageCaution && (
                <Text textStyle="sm">
                  <Text as="span" fontWeight="semibold">
                    Storage:
                  </Text>{' '}
                  {cautionText(run.storageCaution)}
                </Text>
              )}
              <Button asChild variant="ghost" size="sm" alignSelf="start" px="2">
                <RouterLink
                  to={paths.recipeScale.getHref(row.recipeId, { grams: row.gramsPerBatch })}
                >
                  <ScaleIcon /> Scaled to one batch ({grams(row.gramsPerBatch)})
                  <VisuallyHidden>: {row.recipeName}</VisuallyHidden>
                </RouterLink>
              </Button>
            </Stack>
          </Box>
        );
      })}
    </Stack>
  );
}
