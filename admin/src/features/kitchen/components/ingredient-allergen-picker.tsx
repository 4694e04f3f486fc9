import {
  Box,
  Button,
  Checkbox,
  Fieldset,
  Grid,
  HStack,
  Input,
  NativeSelect,
  Stack,
  Text,
  VisuallyHidden,
} from '@chakra-ui/react';
import {
  ALLERGENIC_FOODS,
  EU_ALLERGEN_GROUPS,
  EU_GROUP_LABELS,
  US_ALLERGEN_LABELS,
  euGroupOf,
  usAllergenOf,
  type AllergenicFood,
} from '@nappe/shared';
import { useState, type ReactNode } from 'react';
import { useController, useWatch, type UseFormRegister } from 'react-hook-form';
import { ChevronDownIcon, ChevronRightIcon } from '../../../components/ui/icons';
import { foodLabel } from '../lib/allergen-text';
import type { IngredientFormValues } from '../lib/ingredient-form-values';
import { DERIVED_FORM_OPTIONS } from '../lib/labels';
import type { FormControl } from './form-controls';

const capitalise = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/** Foods by EU group, in Annex II order; the foods outside the 14 groups come last. */
const GROUPS: Array<{ key: string; title: string; foods: AllergenicFood[] }> = [
  ...EU_ALLERGEN_GROUPS.map((group) => ({
    key: group,
    title: EU_GROUP_LABELS[group],
    foods: ALLERGENIC_FOODS.filter((f) => euGroupOf(f) === group),
  })),
  {
    key: 'other',
    title: 'Not among the EU 14',
    foods: ALLERGENIC_FOODS.filter((f) => euGroupOf(f) === undefined),
  },
];

const OTHER_FOODS = ALLERGENIC_FOODS.filter((f) => euGroupOf(f) === undefined);

function usView(food: AllergenicFood): string {
  const us = usAllergenOf(food);
  return us ? `US: ${US_ALLERGEN_LABELS[us]}` : 'US: not a major allergen';
}

function FoodCheckbox({
  area,
  control,
  name,
  label,
  food,
  disabled,
}: {
  area: string;
  control: FormControl<IngredientFormValues>;
  name: `foods.${AllergenicFood}.contains` | `foods.${AllergenicFood}.mayContain`;
  label: string;
  food: string;
  disabled?: boolean;
}) {
  const {
    field: { ref, name: fieldName, value, onChange, onBlur },
  } = useController({ control, name });
  return (
    <Checkbox.Root
      gridArea={area}
      size="sm"
      checked={Boolean(value)}
      disabled={disabled}
      onCheckedChange={(e) => onChange(e.checked === true)}
    >
      <Checkbox.HiddenInput ref={ref} name={fieldName} onBlur={onBlur} />
      <Checkbox.Control />
      <Checkbox.Label fontWeight="normal">
        <span aria-hidden>{label}</span>
        <VisuallyHidden>{`${label} ${food}`}</VisuallyHidden>
      </Checkbox.Label>
    </Checkbox.Root>
  );
}

function FoodRow({
  food,
  title,
  control,
  register,
  so2Error,
  formError,
}: {
  food: AllergenicFood;
  /** The EU group's name when the group is this one food ("Eggs", "Sulphur dioxide…"). */
  title?: string;
  control: FormControl<IngredientFormValues>;
  register: UseFormRegister<IngredientFormValues>;
  so2Error?: string;
  formError?: string;
}) {
  const contains = useWatch({ control, name: `foods.${food}.contains` });
  const name = title ?? capitalise(foodLabel(food));
  return (
    <Grid
      templateColumns={{
        base: 'auto minmax(0, 1fr)',
        md: 'minmax(8rem, 1.2fr) auto auto minmax(10rem, 1fr)',
      }}
      templateAreas={{
        base: '"name name" "contains trace" "form form"',
        md: '"name contains trace form"',
      }}
      columnGap={{ base: '5', md: '4' }}
      rowGap="2"
      alignItems="center"
      py="2"
      borderTopWidth="1px"
      borderColor="border.muted"
    >
      <Box gridArea="name">
        <Text fontWeight="medium">{name}</Text>
        <Text textStyle="xs" color="fg.muted">
          {usView(food)}
        </Text>
      </Box>
      <FoodCheckbox
        area="contains"
        control={control}
        name={`foods.${food}.contains`}
        label="Contains"
        food={name}
      />
      <FoodCheckbox
        area="trace"
        control={control}
        name={`foods.${food}.mayContain`}
        label="May contain"
        food={name}
        disabled={contains}
      />
      {contains ? (
        <HStack gap="2" align="start" gridArea="form" minW="0">
          <Box flex="1" minW="0">
            <NativeSelect.Root size="sm">
              <NativeSelect.Field
                aria-label={`Form of ${name} in this ingredient`}
                bg="bg.subtle"
                {...register(`foods.${food}.form`)}
              >
                <option value="">As the food itself</option>
                {DERIVED_FORM_OPTIONS.map((o) => (
                  <option key={o.value} value={o.value}>
                    {o.label}
                  </option>
                ))}
              </NativeSelect.Field>
              <NativeSelect.Indicator />
            </NativeSelect.Root>
            {formError && (
              <Text textStyle="xs" color="fg.error" mt="1">
                {formError}
              </Text>
            )}
          </Box>
          {food === 'sulphites' && (
            <Box w="7rem">
              <Input
                size="sm"
                inputMode="decimal"
                aria-label="Total SO₂, mg per kg as sold"
                placeholder="SO₂ mg/kg"
                aria-invalid={so2Error ? true : undefined}
                {...register(`foods.${food}.so2`)}
              />
              {so2Error && (
                <Text textStyle="xs" color="fg.error" mt="1">
                  {so2Error}
                </Text>
              )}
            </Box>
          )}
        </HStack>
      ) : null}
    </Grid>
  );
}

/** The foods outside the EU 14, folded away until asked for (open when any is ticked). */
function OtherFoods({
  control,
  children,
}: {
  control: FormControl<IngredientFormValues>;
  children: ReactNode;
}) {
  const foods = useWatch({ control, name: 'foods' });
  const used = OTHER_FOODS.some((f) => foods[f]?.contains || foods[f]?.mayContain);
  const [open, setOpen] = useState(used);
  return (
    <Box>
      <Button
        variant="ghost"
        size="sm"
        px="2"
        aria-expanded={open}
        onClick={() => setOpen((o) => !o)}
      >
        {open ? <ChevronDownIcon /> : <ChevronRightIcon />}
        Other foods: US tree nuts, coconut, celery-family spices…
      </Button>
      {open && <Box mt="2">{children}</Box>}
    </Box>
  );
}

/**
 * The foods an ingredient is made from or may carry as traces, grouped as Annex II groups them,
 * each with its US status beside it. "Form" records what the supplier's specification says
 * (a glucose syrup, a fully refined oil, a fining agent…): the shared rules decide what each
 * jurisdiction then declares.
 */
export function IngredientAllergenPicker({
  control,
  register,
  errors,
}: {
  control: FormControl<IngredientFormValues>;
  register: UseFormRegister<IngredientFormValues>;
  errors: Partial<Record<AllergenicFood, { so2?: string; form?: string }>>;
}) {
  return (
    <Stack gap="3">
      {GROUPS.map((group) => {
        if (group.foods.length === 1) {
          const food = group.foods[0]!;
          return (
            <FoodRow
              key={group.key}
              food={food}
              title={group.title}
              control={control}
              register={register}
              so2Error={errors[food]?.so2}
              formError={errors[food]?.form}
            />
          );
        }
        const body = (
          <Fieldset.Root key={group.key} minW="0">
            <Fieldset.Legend fontWeight="semibold" color="fg">
              {group.title}
            </Fieldset.Legend>
            <Fieldset.Content mt="1" gap="0">
              {group.foods.map((food) => (
                <FoodRow
                  key={food}
                  food={food}
                  control={control}
                  register={register}
                  so2Error={errors[food]?.so2}
                  formError={errors[food]?.form}
                />
              ))}
            </Fieldset.Content>
          </Fieldset.Root>
        );
        return group.key === 'other' ? (
          <OtherFoods key={group.key} control={control}>
            {body}
          </OtherFoods>
        ) : (
          body
        );
      })}
    </Stack>
  );
}
