import {
  Alert,
  Box,
  Field,
  Grid,
  Input,
  InputGroup,
  SimpleGrid,
  Text,
  Textarea,
} from '@chakra-ui/react';
import { recipeSchema, storageCaution, type Recipe } from '@nappe/shared';
import { useMemo, useState, type ReactNode } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { ApiError } from '../../../lib/api-client';
import { useCreateRecipe } from '../api/create-recipe';
import { useDeleteRecipe } from '../api/delete-recipe';
import type { KitchenCatalogueData, RecipeResponse } from '../api/types';
import { useUpdateRecipe } from '../api/update-recipe';
import { parseNumber, schemaResolver } from '../lib/form-resolver';
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
import { placeServerMessages, saveFailureMessage } from '../lib/server-errors';
import { DeleteButton } from './delete-dialog';
import { EditorActions, FormSection } from './editor-layout';
import { decimalInput, SelectField, TextField } from './form-controls';
import type { PickerOption } from './item-picker';
import { RecipeInsightsPanel } from './recipe-insights-panel';
import { RecipeLinesEditor } from './recipe-lines-editor';
import { RecipeStepsEditor } from './recipe-steps-editor';
import { StorageCaution } from './safety-notes';
import { useUnsavedChangesGuard } from './unsaved-changes-guard';

type FieldName = Parameters<ReturnType<typeof useForm<RecipeFormValues>>['setError']>[0];

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
  const create = useCreateRecipe();
  const update = useUpdateRecipe();
  const remove = useDeleteRecipe();
  const [formError, setFormError] = useState<string | null>(null);
  const [savedNote, setSavedNote] = useState<string | null>(null);
  const [overrun, setOverrun] = useState('');

  const resolver = useMemo(
    () =>
      schemaResolver<RecipeFormValues, typeof recipeSchema>(
        (values) => recipeFromForm(values, id),
        recipeSchema,
        recipeFieldOf,
        rephraseRecipeMessage,
      ),
    [id],
  );
  const form = useForm<RecipeFormValues, unknown, Recipe>({
    resolver,
    defaultValues: recipeToFormValues(recipe),
  });
  const {
    register,
    control,
    handleSubmit,
    formState: { errors, isDirty },
  } = form;
  const guard = useUnsavedChangesGuard(isDirty);

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

  // ---------------------------------------------------------------- saving
  const placeAtLine = (message: string): number | null => {
    const values = form.getValues();
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
  };

  const onSubmit = handleSubmit(async (parsed) => {
    setFormError(null);
    setSavedNote(null);
    const body = recipeBody(parsed);
    try {
      const saved = recipe
        ? await update.mutateAsync({ id: recipe.id, body })
        : await create.mutateAsync(body);
      form.reset(recipeToFormValues(saved));
      setSavedNote(`Saved “${saved.name}”.`);
      guard.allowNextNavigation();
      onSaved(saved, !recipe);
    } catch (error) {
      if (error instanceof ApiError && error.status === 400) {
        const general: string[] = [];
        for (const placed of placeServerMessages(error, (path) => {
          const field = recipeFieldOf(path);
          return field.startsWith('root.') ? null : field;
        })) {
          const line = placed.field ? null : placeAtLine(placed.message);
          if (placed.field) {
            form.setError(placed.field as FieldName, { type: 'server', message: placed.message });
          } else if (line !== null) {
            form.setError(`lines.${line}.ref`, { type: 'server', message: placed.message });
          } else {
            general.push(placed.message);
          }
        }
        setFormError(
          general.length > 0 ? general.join(' ') : 'Please check the fields marked below.',
        );
      } else {
        setFormError(saveFailureMessage(error));
      }
    }
  });

  const shelfHours = parseNumber(shelfLife);
  const saving = create.isPending || update.isPending;

  return (
    <form onSubmit={(e) => void onSubmit(e)} noValidate>
      {guard.dialog}
      {formError && (
        <Alert.Root status="error" role="alert" borderRadius="l2" mb="5">
          <Alert.Indicator />
          <Alert.Content>
            <Alert.Title>Not saved</Alert.Title>
            <Alert.Description>{formError}</Alert.Description>
          </Alert.Content>
        </Alert.Root>
      )}
      <Grid
        templateColumns={{ base: 'minmax(0, 1fr)', lg: 'minmax(0, 1fr) 24rem' }}
        templateAreas={{
          base: '"basics" "lines" "panel" "method" "equipment" "notes"',
          lg: '"basics panel" "lines panel" "method panel" "equipment panel" "notes panel"',
        }}
        gap={{ base: '5', lg: '6' }}
        alignItems="start"
      >
        <Box gridArea="basics" minW="0">
          <FormSection title="Recipe" id="recipe-basics">
            <TextField
              label="Name"
              required
              error={errors.name?.message}
              registration={register('name')}
              autoComplete="off"
            />
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
        </Box>
        <Box gridArea="lines" minW="0">
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
        </Box>
        <Box
          gridArea="panel"
          position={{ lg: 'sticky' }}
          top={{ lg: '4' }}
          maxH={{ lg: 'calc(100dvh - 2rem)' }}
          overflowY={{ lg: 'auto' }}
        >
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
        </Box>
        <Box gridArea="method" minW="0">
          <FormSection
            title="Method"
            id="recipe-method"
            description="Steps in order. Move them with the arrows."
          >
            <RecipeStepsEditor control={control} register={register} errors={errors.steps} />
          </FormSection>
        </Box>
        <Box gridArea="equipment" minW="0">
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
        </Box>
        <Box gridArea="notes" minW="0">
          <FormSection title="Notes" id="recipe-notes">
            <Field.Root invalid={!!errors.notes}>
              <Field.Label>Notes for the kitchen</Field.Label>
              <Textarea rows={3} {...register('notes')} />
              <Field.ErrorText>{errors.notes?.message}</Field.ErrorText>
            </Field.Root>
          </FormSection>
        </Box>
      </Grid>

      <EditorActions
        saving={saving}
        saveLabel={recipe ? 'Save changes' : 'Create recipe'}
        dirty={isDirty}
        status={savedNote && !isDirty ? savedNote : undefined}
        extra={
          <>
            {actions}
            {recipe && (
              <DeleteButton
                what="recipe"
                name={recipe.name}
                onDelete={() => remove.mutateAsync(recipe.id)}
                onDeleted={() => {
                  guard.allowNextNavigation();
                  onDeleted();
                }}
              />
            )}
          </>
        }
      />
    </form>
  );
}
