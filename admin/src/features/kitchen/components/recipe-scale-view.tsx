import {
  Alert,
  Box,
  Button,
  Field,
  Flex,
  Heading,
  HStack,
  Input,
  InputGroup,
  NativeSelect,
  RadioGroup,
  Stack,
  Table,
  Text,
} from '@chakra-ui/react';
import {
  expandDessertComponents,
  type IngredientTotal,
  type ScaledLine,
  type ScaledRecipe,
} from '@nappe/shared';
import { useMemo, useState, type FormEvent } from 'react';
import { BlockSkeleton } from '../../../components/ui/block-skeleton';
import { errorMessage } from '../../../lib/error-message';
import type { ScaleQuery } from '../api/kitchen-keys';
import { useRecipeScaled } from '../api/get-recipe-scaled';
import type { RecipeResponse } from '../api/types';
import { parseNumber } from '../lib/form-resolver';
import { formatGrams, formatNumber, unitLabel } from '../lib/labels';
import { attempt, indexWith, toDomainDessert } from '../lib/live-kitchen';
import type { KitchenCatalogueData } from '../api/types';

function pieces(count: number, unit: 'piece' | 'leaf') {
  return `${count} ${unit === 'leaf' ? (count === 1 ? 'leaf' : 'leaves') : count === 1 ? 'piece' : 'pieces'}`;
}

/** What to weigh: grams, or whole pieces and what they weigh. */
function weighText(grams: number, counted?: { countUnit: 'piece' | 'leaf'; pieces: number }) {
  return counted
    ? `${pieces(counted.pieces, counted.countUnit)} (${formatGrams(grams)})`
    : formatGrams(grams);
}

function purchaseText(total: IngredientTotal) {
  if (!total.inPurchaseUnit) return '—';
  const { quantity, unit } = total.inPurchaseUnit;
  if (unit === 'piece' || unit === 'leaf') return pieces(quantity, unit);
  return `${formatNumber(quantity, 3)} ${unitLabel(unit)}`;
}

function TreeRows({ recipe, depth }: { recipe: ScaledRecipe; depth: number }) {
  return (
    <>
      <Table.Row bg={depth === 0 ? 'bg.muted' : 'bg.subtle'}>
        <Table.Cell ps={`${depth * 1.25 + 0.75}rem`} fontWeight="semibold" colSpan={2}>
          {depth > 0 ? 'Sub-recipe: ' : ''}
          {recipe.name}
        </Table.Cell>
        <Table.Cell textAlign="end" fontWeight="semibold" fontVariantNumeric="tabular-nums">
          {formatGrams(recipe.grams)}
        </Table.Cell>
      </Table.Row>
      {recipe.lines.map((line: ScaledLine, i) =>
        line.kind === 'recipe' ? (
          <TreeRows key={`${line.recipe.recipeId}-${i}`} recipe={line.recipe} depth={depth + 1} />
        ) : (
          <Table.Row key={`${line.ingredientId}-${i}`} bg="bg.panel">
            <Table.Cell ps={`${(depth + 1) * 1.25 + 0.75}rem`}>{line.name}</Table.Cell>
            <Table.Cell color="fg.muted" fontVariantNumeric="tabular-nums">
              {line.unit === 'g' ? '' : `${formatNumber(line.quantity, 2)} ${unitLabel(line.unit)}`}
            </Table.Cell>
            <Table.Cell textAlign="end" fontVariantNumeric="tabular-nums">
              {weighText(line.grams, line.counted)}
            </Table.Cell>
          </Table.Row>
        ),
      )}
    </>
  );
}

/**
 * The Scale view: a recipe for N grams, or for N plates of a dessert that uses it. Every quantity
 * in grams and in the unit it is bought in, sub-recipes expanded, counted items rounded up to
 * whole pieces — computed by the API with the shared scaling.
 */
export function RecipeScaleView({
  recipe,
  catalogue,
  query,
  onQueryChange,
}: {
  recipe: RecipeResponse;
  catalogue: KitchenCatalogueData;
  query: ScaleQuery | null;
  onQueryChange: (query: ScaleQuery) => void;
}) {
  // Desserts that use this recipe, as a component or inside one.
  const users = useMemo(() => {
    const index = attempt(() => indexWith(catalogue));
    if (!index.ok) return [];
    return catalogue.desserts.filter((d) => {
      const trees = attempt(() => expandDessertComponents(index.value, toDomainDessert(d)));
      if (!trees.ok) return false;
      const visit = (node: (typeof trees.value)[number]): boolean =>
        node.recipe.id === recipe.id ||
        node.lines.some((l) => l.kind === 'recipe' && visit(l.node));
      return trees.value.some(visit);
    });
  }, [catalogue, recipe.id]);

  const [mode, setMode] = useState<'grams' | 'plates'>(
    query && 'plates' in query ? 'plates' : 'grams',
  );
  const [grams, setGrams] = useState(
    query && 'grams' in query ? String(query.grams) : String(recipe.yieldG),
  );
  const [plates, setPlates] = useState(query && 'plates' in query ? String(query.plates) : '10');
  const [dessertId, setDessertId] = useState(
    query && 'dessertId' in query ? query.dessertId : (users[0]?.id ?? ''),
  );
  const [problem, setProblem] = useState<string | null>(null);
  const scaled = useRecipeScaled(recipe.id, query);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setProblem(null);
    if (mode === 'grams') {
      const g = parseNumber(grams);
      if (g === undefined || !Number.isFinite(g) || g < 0.1 || g > 1_000_000) {
        setProblem('Enter the grams to make: from 0.1 g to 1,000,000 g.');
        return;
      }
      onQueryChange({ grams: g });
    } else {
      const n = parseNumber(plates);
      if (n === undefined || !Number.isInteger(n) || n < 1 || n > 10_000) {
        setProblem('Enter a whole number of plates, from 1 to 10,000.');
        return;
      }
      if (!dessertId) {
        setProblem('Pick the dessert the plates are of.');
        return;
      }
      onQueryChange({ plates: n, dessertId });
    }
  };

  const view = scaled.data;
  return (
    <Stack gap="6">
      <Box
        as="form"
        onSubmit={submit}
        borderWidth="1px"
        borderColor="border"
        borderRadius="l3"
        bg="bg.panel"
        p={{ base: '4', md: '6' }}
      >
        <Stack gap="4">
          <RadioGroup.Root
            value={mode}
            onValueChange={(e) => setMode(e.value === 'plates' ? 'plates' : 'grams')}
          >
            <RadioGroup.Label fontWeight="semibold">Scale by</RadioGroup.Label>
            <HStack gap="6" mt="2" wrap="wrap">
              <RadioGroup.Item value="grams">
                <RadioGroup.ItemHiddenInput />
                <RadioGroup.ItemIndicator />
                <RadioGroup.ItemText>Weight</RadioGroup.ItemText>
              </RadioGroup.Item>
              <RadioGroup.Item value="plates" disabled={users.length === 0}>
                <RadioGroup.ItemHiddenInput />
                <RadioGroup.ItemIndicator />
                <RadioGroup.ItemText>Plates of a dessert</RadioGroup.ItemText>
              </RadioGroup.Item>
            </HStack>
          </RadioGroup.Root>
          {users.length === 0 && (
            <Text textStyle="sm" color="fg.muted">
              No dessert uses this recipe yet, so it scales by weight only.
            </Text>
          )}
          <Flex gap="4" wrap="wrap" align="end">
            {mode === 'grams' ? (
              <Field.Root maxW="14rem">
                <Field.Label>Grams to make</Field.Label>
                <InputGroup endAddon="g">
                  <Input
                    inputMode="decimal"
                    value={grams}
                    onChange={(e) => setGrams(e.target.value)}
                  />
                </InputGroup>
              </Field.Root>
            ) : (
              <>
                <Field.Root maxW="10rem">
                  <Field.Label>Plates</Field.Label>
                  <Input
                    inputMode="numeric"
                    value={plates}
                    onChange={(e) => setPlates(e.target.value)}
                  />
                </Field.Root>
                <Field.Root maxW="20rem">
                  <Field.Label>Of the dessert</Field.Label>
                  <NativeSelect.Root>
                    <NativeSelect.Field
                      bg="bg.subtle"
                      value={dessertId}
                      onChange={(e) => setDessertId(e.target.value)}
                    >
                      {users.map((d) => (
                        <option key={d.id} value={d.id}>
                          {d.name}
                        </option>
                      ))}
                    </NativeSelect.Field>
                    <NativeSelect.Indicator />
                  </NativeSelect.Root>
                </Field.Root>
              </>
            )}
            <Button type="submit" loading={scaled.isFetching}>
              Scale
            </Button>
          </Flex>
          {problem && (
            <Text color="fg.error" role="alert">
              {problem}
            </Text>
          )}
        </Stack>
      </Box>

      {!query ? (
        <Text color="fg.muted">Choose a weight or a number of plates, then Scale.</Text>
      ) : scaled.isPending ? (
        <BlockSkeleton label="Scaling…" />
      ) : scaled.isError ? (
        <Alert.Root status="error" role="alert" borderRadius="l2">
          <Alert.Indicator />
          <Alert.Content gap="2">
            <Alert.Title>This could not be scaled</Alert.Title>
            <Alert.Description>{errorMessage(scaled.error)}</Alert.Description>
            <Button
              size="sm"
              variant="outline"
              alignSelf="start"
              onClick={() => void scaled.refetch()}
            >
              Try again
            </Button>
          </Alert.Content>
        </Alert.Root>
      ) : view ? (
        <Stack
          gap="6"
          opacity={scaled.isPlaceholderData ? 0.6 : 1}
          aria-busy={scaled.isPlaceholderData || undefined}
        >
          <Text aria-live="polite" fontWeight="medium">
            {view.basis.mode === 'grams'
              ? `${formatGrams(view.grams)} of ${view.name}`
              : `${view.basis.plates} plates of ${view.basis.dessertName} × ${formatGrams(view.basis.gramsPerPlate)} = ${formatGrams(view.grams)} of ${view.name}`}
            <Text as="span" color="fg.muted" fontWeight="normal">
              {' '}
              — {formatNumber(view.tree.factor, 3)} × the recipe as written (
              {formatGrams(view.tree.yieldG)})
            </Text>
          </Text>

          <Box as="section" aria-labelledby="scale-totals">
            <Heading as="h2" size="lg" id="scale-totals" mb="3">
              To weigh out
            </Heading>
            <Table.ScrollArea borderWidth="1px" borderColor="border" borderRadius="l3">
              <Table.Root size="sm">
                <Table.Caption srOnly>Ingredients in all, sub-recipes included</Table.Caption>
                <Table.Header>
                  <Table.Row bg="bg.muted">
                    <Table.ColumnHeader>Ingredient</Table.ColumnHeader>
                    <Table.ColumnHeader textAlign="end">Weigh</Table.ColumnHeader>
                    <Table.ColumnHeader textAlign="end">As bought</Table.ColumnHeader>
                  </Table.Row>
                </Table.Header>
                <Table.Body>
                  {view.totals.map((t) => (
                    <Table.Row key={t.ingredientId} bg="bg.panel">
                      <Table.Cell>{t.name}</Table.Cell>
                      <Table.Cell textAlign="end" fontVariantNumeric="tabular-nums">
                        {weighText(t.grams, t.counted)}
                      </Table.Cell>
                      <Table.Cell textAlign="end" fontVariantNumeric="tabular-nums">
                        {purchaseText(t)}
                      </Table.Cell>
                    </Table.Row>
                  ))}
                </Table.Body>
              </Table.Root>
            </Table.ScrollArea>
            <Text textStyle="xs" color="fg.muted" mt="2">
              Rounded as the kitchen weighs: 100 g and over to the gram, under 100 g to 0.1 g; eggs
              and leaves up to whole ones.
            </Text>
          </Box>

          <Box as="section" aria-labelledby="scale-tree">
            <Heading as="h2" size="lg" id="scale-tree" mb="3">
              Recipe by recipe
            </Heading>
            <Table.ScrollArea borderWidth="1px" borderColor="border" borderRadius="l3">
              <Table.Root size="sm">
                <Table.Caption srOnly>Each recipe and sub-recipe with its lines</Table.Caption>
                <Table.Header>
                  <Table.Row bg="bg.muted">
                    <Table.ColumnHeader>Line</Table.ColumnHeader>
                    <Table.ColumnHeader>As written</Table.ColumnHeader>
                    <Table.ColumnHeader textAlign="end">Weigh</Table.ColumnHeader>
                  </Table.Row>
                </Table.Header>
                <Table.Body>
                  <TreeRows recipe={view.tree} depth={0} />
                </Table.Body>
              </Table.Root>
            </Table.ScrollArea>
          </Box>
        </Stack>
      ) : null}
    </Stack>
  );
}
