import {
  Box,
  Field,
  Grid,
  Heading,
  HStack,
  Input,
  InputGroup,
  SimpleGrid,
  Stack,
  Text,
} from '@chakra-ui/react';
import {
  ALLERGENIC_FOODS,
  createKitchenIndex,
  formatMoney,
  ingredientCostPerGramExact,
  ingredientSchema,
  recipeIngredientLabel,
  rollUpRecipe,
  roundMinorUnits,
  usContainsStatement,
  type AllergenicFood,
  type Ingredient,
} from '@nappe/shared';
import { useMemo, type ReactNode } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { parseMoneyToMinor } from '../../../lib/money-input';
import { useCreateIngredient } from '../api/create-ingredient';
import { useDeleteIngredient } from '../api/delete-ingredient';
import type { IngredientResponse } from '../api/types';
import { useUpdateIngredient } from '../api/update-ingredient';
import { parseNumber } from '../lib/form-resolver';
import {
  allergensFromForm,
  ingredientBody,
  ingredientFieldOf,
  ingredientFromForm,
  ingredientToFormValues,
  type IngredientFormValues,
} from '../lib/ingredient-form-values';
import {
  ANIMAL_ORIGIN_LABELS,
  ANIMAL_ORIGIN_LIST,
  GELATIN_OPTIONS,
  SUGAR_KIND_LIST,
  sugarLabel,
  UNIT_OPTIONS,
} from '../lib/labels';
import { attempt } from '../lib/live-kitchen';
import { AllergenReportView, LabelText } from './allergen-display';
import { FormSection } from './editor-layout';
import {
  decimalInput,
  FormCheckbox,
  NameField,
  SelectField,
  TextAreaField,
  TextField,
  type FormControl,
} from './form-controls';
import { IngredientAllergenPicker } from './ingredient-allergen-picker';
import { ItemEditorForm, useItemEditor } from './item-editor';

/** The chef's ingredient form: create or change one, or delete it. */
export function IngredientEditor({
  ingredient,
  currency,
  onSaved,
  onDeleted,
  actions,
}: {
  ingredient?: IngredientResponse;
  currency: string;
  onSaved: (saved: IngredientResponse, created: boolean) => void;
  onDeleted: () => void;
  actions: ReactNode;
}) {
  const editor = useItemEditor({
    item: ingredient,
    schema: ingredientSchema,
    fromForm: (values: IngredientFormValues) => ingredientFromForm(values, currency),
    fieldOf: ingredientFieldOf,
    toFormValues: (saved: IngredientResponse | undefined) =>
      ingredientToFormValues(saved, currency),
    toBody: ingredientBody,
    create: useCreateIngredient(),
    update: useUpdateIngredient(),
    remove: useDeleteIngredient(),
    onSaved,
    onDeleted,
  });
  const {
    register,
    control,
    formState: { errors },
  } = editor.form;

  const rootErrors = Object.values(errors.root ?? {})
    .map((e) => (typeof e === 'object' && e && 'message' in e ? String(e.message ?? '') : ''))
    .filter(Boolean);
  const foodErrors: Partial<Record<AllergenicFood, { so2?: string; form?: string }>> = {};
  for (const food of ALLERGENIC_FOODS) {
    const e = errors.foods?.[food];
    if (e) foodErrors[food] = { so2: e.so2?.message, form: e.form?.message };
  }

  return (
    <ItemEditorForm editor={editor} what="ingredient" problems={rootErrors} actions={actions}>
      <Stack gap="5">
        <FormSection title="What it is" id="ing-basics">
          <NameField error={errors.name?.message} registration={register('name')} />
          <TextField
            label="Name on labels"
            helper="As an ingredient list writes it, e.g. “emulsifier: soya lecithin”. Leave blank to use the name."
            error={errors.labelName?.message}
            registration={register('labelName')}
            autoComplete="off"
          />
        </FormSection>

        <FormSection
          title="Buying"
          id="ing-buying"
          description="The pack you buy and what it costs. Prices are entered in the currency’s units and kept in whole cents."
        >
          <SimpleGrid columns={{ base: 1, sm: 3 }} gap="4">
            <TextField
              label="Pack size"
              required
              {...decimalInput}
              error={errors.packSize?.message}
              registration={register('packSize')}
            />
            <SelectField
              label="Pack unit"
              error={errors.packUnit?.message}
              registration={register('packUnit')}
              options={UNIT_OPTIONS}
            />
            <PriceField
              currency={currency}
              error={errors.packPrice?.message}
              control={control}
              registration={register('packPrice')}
            />
          </SimpleGrid>
        </FormSection>

        <FormSection
          title="Weighing"
          id="ing-weighing"
          description="Everything turns into grams. A quantity by volume needs the density; by the piece or leaf, the weight of one."
        >
          <SimpleGrid columns={{ base: 1, sm: 3 }} gap="4">
            <TextField
              label="Density (g per ml)"
              {...decimalInput}
              error={errors.density?.message}
              registration={register('density')}
            />
            <TextField
              label="Weight of one piece or leaf (g)"
              {...decimalInput}
              error={errors.unitWeight?.message}
              registration={register('unitWeight')}
            />
            <SelectField
              label="Counted in"
              helper="Eggs, gelatin leaves: scaled amounts round up to whole ones."
              error={errors.countUnit?.message}
              registration={register('countUnit')}
              options={[
                { value: 'piece', label: 'Whole pieces' },
                { value: 'leaf', label: 'Whole leaves' },
              ]}
              placeholder="Weighed, not counted"
            />
          </SimpleGrid>
        </FormSection>

        <FormSection
          title="Allergens"
          id="ing-allergens"
          description="What it is made from, and the traces the supplier declares. The declaration beside updates as you tick."
        >
          <Grid
            templateColumns={{ base: 'minmax(0, 1fr)', xl: 'minmax(0, 1fr) 20rem' }}
            gap="6"
            alignItems="start"
          >
            <IngredientAllergenPicker control={control} register={register} errors={foodErrors} />
            <Box position={{ xl: 'sticky' }} top={{ xl: '4' }}>
              <DerivedDeclaration control={control} />
            </Box>
          </Grid>
        </FormSection>

        <FormSection
          title="Diet"
          id="ing-diet"
          description="Animal origins beyond those its allergens already imply (milk, egg, fish…), gelatin and alcohol."
        >
          <SimpleGrid columns={{ base: 2, md: 5 }} gap="3">
            {ANIMAL_ORIGIN_LIST.map((origin) => (
              <FormCheckbox key={origin} control={control} name={`animalOrigins.${origin}`}>
                {ANIMAL_ORIGIN_LABELS[origin]}
              </FormCheckbox>
            ))}
          </SimpleGrid>
          <SimpleGrid columns={{ base: 1, sm: 2 }} gap="4" alignItems="end">
            <SelectField
              label="Gelatin"
              error={errors.gelatin?.message}
              registration={register('gelatin')}
              options={GELATIN_OPTIONS}
              placeholder="No gelatin"
            />
            <FormCheckbox control={control} name="alcohol">
              Contains alcohol
            </FormCheckbox>
          </SimpleGrid>
        </FormSection>

        <CompositionSection control={control} register={register} errors={errors} />

        <FormSection title="Notes" id="ing-notes">
          <TextAreaField
            label="Notes for the kitchen"
            rows={3}
            error={errors.notes?.message}
            registration={register('notes')}
          />
        </FormSection>
      </Stack>
    </ItemEditorForm>
  );
}

function PriceField({
  currency,
  error,
  control,
  registration,
}: {
  currency: string;
  error?: string;
  control: FormControl<IngredientFormValues>;
  registration: ReturnType<ReturnType<typeof useForm<IngredientFormValues>>['register']>;
}) {
  const [packPrice, packSize, packUnit, density, unitWeight] = useWatch({
    control,
    name: ['packPrice', 'packSize', 'packUnit', 'density', 'unitWeight'],
  });
  const perKg = useMemo(() => {
    const price = parseMoneyToMinor(packPrice, currency);
    const size = parseNumber(packSize);
    if (!price.ok || size === undefined) return null;
    const densityGPerMl = parseNumber(density);
    const unitWeightG = parseNumber(unitWeight);
    const cost = attempt(() =>
      ingredientCostPerGramExact({
        id: 'price-probe',
        name: 'This ingredient',
        purchase: { packSize: size, packUnit, packPriceMinor: price.minor },
        ...(densityGPerMl !== undefined ? { densityGPerMl } : {}),
        ...(unitWeightG !== undefined ? { unitWeightG } : {}),
        allergens: { contains: [], mayContain: [] },
        dietary: { animalOrigins: [], alcohol: false },
      }),
    );
    return cost.ok && Number.isFinite(cost.value)
      ? formatMoney(roundMinorUnits(cost.value * 1000), currency)
      : null;
  }, [packPrice, packSize, packUnit, density, unitWeight, currency]);

  return (
    <Field.Root invalid={!!error} required>
      <Field.Label>
        Pack price ({currency})
        <Field.RequiredIndicator />
      </Field.Label>
      <InputGroup startAddon={currency}>
        <Input {...registration} inputMode="decimal" autoComplete="off" placeholder="0.00" />
      </InputGroup>
      {!error && (
        <Field.HelperText>
          {perKg ? `${perKg} per kg` : 'Per pack, tax as you pay it.'}
        </Field.HelperText>
      )}
      <Field.ErrorText>{error}</Field.ErrorText>
    </Field.Root>
  );
}

/** EU and US declarations of this ingredient, worked out by the shared roll-up as you tick. */
function DerivedDeclaration({ control }: { control: FormControl<IngredientFormValues> }) {
  const [foods, name, labelName] = useWatch({ control, name: ['foods', 'name', 'labelName'] });
  const view = useMemo(
    () =>
      attempt(() => {
        const ingredient: Ingredient = {
          id: 'probe-ingredient',
          name: name.trim() || 'This ingredient',
          ...(labelName.trim() ? { labelName: labelName.trim() } : {}),
          purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 0 },
          allergens: allergensFromForm(foods),
          dietary: { animalOrigins: [], alcohol: false },
        };
        const index = createKitchenIndex({
          ingredients: [ingredient],
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
    [foods, name, labelName],
  );
  return (
    <Box
      borderWidth="1px"
      borderColor="border"
      borderRadius="l2"
      bg="bg.subtle"
      p="4"
      aria-live="polite"
      aria-labelledby="declared-title"
      role="region"
    >
      <Heading as="h3" size="md" id="declared-title" mb="3">
        As declared
      </Heading>
      {view.ok ? (
        <Stack gap="3">
          <AllergenReportView report={view.value.report} usStatement={view.value.usStatement} />
          <Box>
            <Text textStyle="xs" color="fg.muted" mb="1">
              On a label
            </Text>
            <LabelText segments={view.value.label.segments} />
          </Box>
        </Stack>
      ) : (
        <Text textStyle="sm">{view.message}</Text>
      )}
    </Box>
  );
}

function CompositionSection({
  control,
  register,
  errors,
}: {
  control: FormControl<IngredientFormValues>;
  register: ReturnType<typeof useForm<IngredientFormValues>>['register'];
  errors: ReturnType<typeof useForm<IngredientFormValues>>['formState']['errors'];
}) {
  const has = useWatch({ control, name: 'hasComposition' });
  const e = errors.composition;
  return (
    <FormSection
      title="Composition per 100 g"
      id="ing-composition"
      description="For the mix balance of frozen recipes: grams of each part in 100 g, from the supplier’s sheet or a food composition table. Sugars are dry solids; a syrup’s water goes under water."
    >
      <FormCheckbox control={control} name="hasComposition">
        I know its composition
      </FormCheckbox>
      {has && (
        <Stack gap="4">
          <SimpleGrid columns={{ base: 2, md: 3 }} gap="4">
            <TextField
              label="Water"
              required
              {...decimalInput}
              error={e?.water?.message}
              registration={register('composition.water')}
            />
            <TextField
              label="Fat, total"
              required
              {...decimalInput}
              error={e?.fat?.message}
              registration={register('composition.fat')}
            />
            <TextField
              label="of which milkfat"
              {...decimalInput}
              error={e?.milkFat?.message}
              registration={register('composition.milkFat')}
            />
            <TextField
              label="Milk solids non-fat"
              {...decimalInput}
              error={e?.msnf?.message}
              registration={register('composition.msnf')}
            />
            <TextField
              label="Egg-yolk solids"
              {...decimalInput}
              error={e?.eggYolkSolids?.message}
              registration={register('composition.eggYolkSolids')}
            />
            <TextField
              label="Alcohol (ethanol)"
              {...decimalInput}
              error={e?.alcohol?.message}
              registration={register('composition.alcohol')}
            />
          </SimpleGrid>
          <Box>
            <Text fontWeight="medium" mb="2">
              Sugars (dry solids, g per 100 g)
            </Text>
            <SimpleGrid columns={{ base: 2, md: 3 }} gap="4">
              {SUGAR_KIND_LIST.map((kind) => (
                <TextField
                  key={kind}
                  label={sugarLabel(kind)}
                  {...decimalInput}
                  error={e?.sugars?.[kind]?.message}
                  registration={register(`composition.sugars.${kind}`)}
                />
              ))}
            </SimpleGrid>
          </Box>
          <HStack>
            <TextField
              label="Source of the figures"
              helper="E.g. “USDA FDC 171265” or “supplier sheet 2025”."
              error={e?.source?.message}
              registration={register('composition.source')}
            />
          </HStack>
        </Stack>
      )}
    </FormSection>
  );
}
