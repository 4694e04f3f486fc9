import { Field, Input, InputGroup, SimpleGrid, Text } from '@chakra-ui/react';
import { recipeSchema, storageCaution } from '@nappe/shared';
import { useMemo, useState, type ReactNode } from 'react';
import { useWatch } from 'react-hook-form';
import { useCreateRecipe } from '../api/create-recipe';
import { useDeleteRecipe } from '../api/delete-recipe';
import type { KitchenCatalogueData, RecipeResponse } from '../api/types';
import { useUpdateRecipe } from '../api/update-recipe';
import { parseNumber } from '../lib/form-resolver';
import { formatHours, STORAGE_OPTIONS, unitLabel } from '../lib/labels';
import {
  attempt,
  cycleThrough,
  DRAFT_ID,
  indexWith,
  recipeInsights,
  type RecipeInsights,
} from '../lib/live-kitchen';
import {
  liveRecipe,
  recipeBody,
  recipeFieldOf,
  recipeFromForm,
  recipeToFormValues,
  rephraseRecipeMessage,
  type RecipeFormValues,
} from '../lib/recipe-form-values';
import { EditorArea, EditorColumns, EditorPanel, FormSection } from './editor-layout';
import { decimalInput, NameField, SelectField, TextAreaField, TextField } from './form-controls';
import { ItemEditorForm, useItemEditor } from './item-editor';
import type { PickerOption } from './item-picker';
import { RecipeInsightsPanel } from './recipe-insights-panel';
import { RecipeLinesEditor } from './recipe-lines-editor';
import { RecipeStepsEditor } from './recipe-steps-editor';
import { StorageCaution } from './safety-notes';

/** Ingredients and the other recipes, for the line picker. */
export function pickerOptions(catalogue: KitchenCatalogueData, selfId: string): PickerOption[] {
  return [
    ...catalogue.ingredients.map((i) => ({
      value: `ingredient:${i.id}`,
      label: i.name,
      group: 'Ingredients',
      hint: `Bought in ${unitLabel(i.purchase.packUnit)}`,
    })),
    ...catalogue.recipes
      .filter((r) => r.id !== selfId)
      .map((r) => ({
        value: `recipe:${r.id}`,
        label: r.name,
        group: 'Recipes',
        hint: `Yield ${r.yieldG} g`,
      })),
  ];
}

/**
 * The line a server message without a field path is about: the sub-recipe line that enters a
 * loop, or the line whose ingredient or recipe the message names by id.
 */
function lineOfMessage(
  message: string,
  values: RecipeFormValues,
  catalogue: KitchenCatalogueData,
  id: string,
): number | null {
  if (message.startsWith('These recipes use each other in a loop')) {
    const candidate = recipeFromForm(values, id).candidate;
    const index = attempt(() => indexWith(catalogue, { recipe: candidate }));
    const through = index.ok ? cycleThrough(index.value, id) : null;
    const at = through ? values.lines.findIndex((l) => l.ref === `recipe:${through.enters}`) : -1;
    return at >= 0 ? at : null;
  }
  const at = values.lines.findIndex((l) => {
    const refId = l.ref.slice(l.ref.indexOf(':') + 1);
    return refId !== '' && message.includes(`(id ${refId})`);
  });
  return at >= 0 ? at : null;
}

/** The chef's recipe editor, with cost, allergens and mix balance worked out as the lines change. */
export function RecipeEditor({
  recipe,
  catalogue,
  seesCosts,
  onSaved,
  onDeleted,
  actions,
}: {
  recipe?: RecipeResponse;
  catalogue: KitchenCatalogueData;
  seesCosts: boolean;
  onSaved: (saved: RecipeResponse, created: boolean) => void;
  onDeleted: () => void;
  actions: ReactNode;
}) {
  const id = recipe?.id ?? DRAFT_ID;
  const [overrun, setOverrun] = useState('');

  const editor = useItemEditor({
    item: recipe,
    schema: recipeSchema,
    fromForm: (values: RecipeFormValues) => recipeFromForm(values, id),
    fieldOf: recipeFieldOf,
    rephrase: rephraseRecipeMessage,
    toFormValues: recipeToFormValues,
    toBody: recipeBody,
    placeElsewhere: (message, values) => {
      const line = lineOfMessage(message, values, catalogue, id);
      return line === null ? null : `lines.${line}.ref`;
    },
    create: useCreateRecipe(),
    update: useUpdateRecipe(),
    remove: useDeleteRecipe(),
    onSaved,
    onDeleted,
  });
  const {
    register,
    control,
    formState: { errors },
  } = editor.form;

  // ---------------------------------------------------------------- live figures
  const [name, yieldG, storage, lines, density, unitWeight, shelfLife] = useWatch({
    control,
    name: ['name', 'yieldG', 'storage', 'lines', 'density', 'unitWeight', 'shelfLifeHours'],
  });
  const live = useMemo(
    () =>
      liveRecipe(
        {
          ...recipeToFormValues(undefined),
          name,
          yieldG,
          storage,
          lines,
          density,
          unitWeight,
        },
        id,
      ),
    [name, yieldG, storage, lines, density, unitWeight, id],
  );
  // An index with the draft in place of the saved recipe; the other recipes as the API sent them.
  const kitchen = useMemo(() => {
    const draft = live.recipe ?? {
      id,
      name: name.trim() || 'This recipe',
      lines: [],
      yieldG: 1,
      steps: [],
      storage,
      shelfLifeHours: 1,
    };
    const built = attempt(() => indexWith(catalogue, { recipe: draft }));
    return built.ok ? built.value : null;
  }, [catalogue, live, id, name, storage]);
  const loop = useMemo(
    () => (kitchen && live.recipe ? cycleThrough(kitchen, id) : null),
    [kitchen, live, id],
  );
  const overrunPercent = parseNumber(overrun);
  const insights: RecipeInsights | null = useMemo(
    () =>
      kitchen && live.recipe
        ? recipeInsights(kitchen, live.recipe, {
            withCost: seesCosts,
            ...(overrunPercent !== undefined && overrunPercent >= 0 ? { overrunPercent } : {}),
          })
        : null,
    [kitchen, live, seesCosts, overrunPercent],
  );
  const options = useMemo(() => pickerOptions(catalogue, id), [catalogue, id]);

  const shelfHours = parseNumber(shelfLife);

  return (
    <ItemEditorForm editor={editor} what="recipe" actions={actions}>
      <EditorColumns areas={['basics', 'lines', 'method', 'equipment', 'notes']} panelWidth="24rem">
        <EditorArea area="basics">
          <FormSection title="Recipe" id="recipe-basics">
            <NameField error={errors.name?.message} registration={register('name')} />
            <SimpleGrid columns={{ base: 1, sm: 3 }} gap="4">
              <Field.Root invalid={!!errors.yieldG} required>
                <Field.Label>
                  Measured yield
                  <Field.RequiredIndicator />
                </Field.Label>
                <InputGroup endAddon="g">
                  <Input {...decimalInput} {...register('yieldG')} />
                </InputGroup>
                {!errors.yieldG && (
                  <Field.HelperText>What one batch weighs when done.</Field.HelperText>
                )}
                <Field.ErrorText>{errors.yieldG?.message}</Field.ErrorText>
              </Field.Root>
              <SelectField
                label="Storage"
                error={errors.storage?.message}
                registration={register('storage')}
                options={STORAGE_OPTIONS}
              />
              <Field.Root invalid={!!errors.shelfLifeHours} required>
                <Field.Label>
                  Shelf life
                  <Field.RequiredIndicator />
                </Field.Label>
                <InputGroup endAddon="hours">
                  <Input inputMode="decimal" {...register('shelfLifeHours')} />
                </InputGroup>
                {!errors.shelfLifeHours && shelfHours !== undefined && shelfHours > 0 && (
                  <Field.HelperText>{formatHours(shelfHours)}</Field.HelperText>
                )}
                <Field.ErrorText>{errors.shelfLifeHours?.message}</Field.ErrorText>
              </Field.Root>
            </SimpleGrid>
            <StorageCaution text={storageCaution(storage)} />
          </FormSection>
        </EditorArea>
        <EditorArea area="lines">
          <FormSection
            title="Lines"
            id="recipe-lines"
            description="Ingredients, or other recipes used as sub-recipes. Any unit works if the item has a density (volumes) or a weight per piece."
          >
            <RecipeLinesEditor
              control={control}
              register={register}
              errors={errors.lines}
              options={options}
              kitchen={kitchen}
              holder={name.trim() || 'This recipe'}
              loopEnters={loop?.enters ?? null}
            />
          </FormSection>
        </EditorArea>
        <EditorPanel>
          <RecipeInsightsPanel
            insights={insights}
            waiting={live.recipe ? undefined : live.reason}
            currency={catalogue.currency}
            overrun={overrun}
            onOverrunChange={setOverrun}
            frozen={storage === 'frozen'}
            live
          />
          {loop && (
            <Text mt="3" textStyle="sm" color="fg.error" role="status">
              These recipes would use each other in a loop: {loop.names.join(' → ')}.
            </Text>
          )}
        </EditorPanel>
        <EditorArea area="method">
          <FormSection
            title="Method"
            id="recipe-method"
            description="Steps in order. Move them with the arrows."
          >
            <RecipeStepsEditor control={control} register={register} errors={errors.steps} />
          </FormSection>
        </EditorArea>
        <EditorArea area="equipment">
          <FormSection
            title="Equipment and use elsewhere"
            id="recipe-equipment"
            description="The batch limit splits large prep into batches. Density and piece weight let other recipes and desserts use this one by volume or by the piece."
          >
            <SimpleGrid columns={{ base: 1, sm: 2 }} gap="4">
              <TextField
                label="Equipment"
                placeholder="e.g. Batch freezer"
                error={errors.equipmentName?.message}
                registration={register('equipmentName')}
                autoComplete="off"
              />
              <TextField
                label="Batch capacity (g)"
                {...decimalInput}
                error={errors.equipmentCapacity?.message}
                registration={register('equipmentCapacity')}
              />
              <TextField
                label="Density (g per ml)"
                {...decimalInput}
                error={errors.density?.message}
                registration={register('density')}
              />
              <TextField
                label="Weight of one piece (g)"
                {...decimalInput}
                error={errors.unitWeight?.message}
                registration={register('unitWeight')}
              />
            </SimpleGrid>
          </FormSection>
        </EditorArea>
        <EditorArea area="notes">
          <FormSection title="Notes" id="recipe-notes">
            <TextAreaField
              label="Notes for the kitchen"
              rows={3}
              error={errors.notes?.message}
              registration={register('notes')}
            />
          </FormSection>
        </EditorArea>
      </EditorColumns>
    </ItemEditorForm>
  );
}
