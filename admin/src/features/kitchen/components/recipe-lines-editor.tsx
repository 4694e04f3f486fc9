import {
  Box,
  Button,
  Field,
  Grid,
  IconButton,
  Input,
  NativeSelect,
  Stack,
  Text,
} from '@chakra-ui/react';
import type { KitchenIndex } from '@nappe/shared';
import {
  Controller,
  useFieldArray,
  useWatch,
  type FieldErrors,
  type UseFormRegister,
} from 'react-hook-form';
import { PlusIcon, TrashIcon } from '../../../components/ui/icons';
import { formatGrams, UNIT_OPTIONS } from '../lib/labels';
import { lineGrams } from '../lib/live-kitchen';
import { emptyLine, parseRef, type RecipeFormValues } from '../lib/recipe-form-values';
import { parseNumber } from '../lib/form-resolver';
import type { FormControl } from './form-controls';
import { ItemPicker, type PickerOption } from './item-picker';

/** What one line weighs, worked out as you type, or why it cannot be weighed. */
function LineHint({
  control,
  index,
  kitchen,
  holder,
  loopEnters,
}: {
  control: FormControl<RecipeFormValues>;
  index: number;
  kitchen: KitchenIndex | null;
  holder: string;
  loopEnters: string | null;
}) {
  const line = useWatch({ control, name: `lines.${index}` });
  const ref = parseRef(line.ref);
  const quantity = parseNumber(line.quantity);
  if (!kitchen || !ref || quantity === undefined || !(quantity > 0)) return null;
  if (ref.kind === 'recipe' && ref.id === loopEnters) {
    return (
      <Text textStyle="sm" color="fg.error">
        This sub-recipe uses the recipe you are editing: a loop.
      </Text>
    );
  }
  const grams = lineGrams(
    kitchen,
    ref.kind === 'ingredient'
      ? { kind: 'ingredient', ingredientId: ref.id, quantity, unit: line.unit }
      : { kind: 'recipe', recipeId: ref.id, quantity, unit: line.unit },
    holder,
  );
  return grams.ok ? (
    line.unit === 'g' ? null : (
      <Text textStyle="sm" color="fg.muted">
        = {formatGrams(grams.value)}
      </Text>
    )
  ) : (
    <Text textStyle="sm" color="fg.error">
      {grams.message}
    </Text>
  );
}

/** The recipe's lines: what goes in, how much, in which unit. */
export function RecipeLinesEditor({
  control,
  register,
  errors,
  options,
  kitchen,
  holder,
  loopEnters,
}: {
  control: FormControl<RecipeFormValues>;
  register: UseFormRegister<RecipeFormValues>;
  errors: FieldErrors<RecipeFormValues>['lines'];
  options: readonly PickerOption[];
  kitchen: KitchenIndex | null;
  holder: string;
  loopEnters: string | null;
}) {
  const { fields, append, remove } = useFieldArray({ control, name: 'lines' });
  return (
    <Stack gap="3">
      {fields.map((field, index) => {
        const e = errors?.[index];
        const label = `Line ${index + 1}`;
        return (
          <Box
            key={field.id}
            role="group"
            aria-label={label}
            borderWidth="1px"
            borderColor={e ? 'border.error' : 'border.muted'}
            borderRadius="l2"
            p="3"
            bg="bg.subtle"
          >
            <Grid
              templateColumns={{
                base: 'minmax(0, 1fr) minmax(0, 1fr) auto',
                sm: '8rem 12rem minmax(0, 1fr) auto',
              }}
              templateAreas={{
                base: '"item item item" "qty unit remove"',
                sm: '"item item item item" "qty unit . remove"',
              }}
              gap="2"
              alignItems="start"
            >
              <Field.Root gridArea="item" invalid={!!e?.ref}>
                <Controller
                  control={control}
                  name={`lines.${index}.ref`}
                  render={({ field: f }) => (
                    <ItemPicker
                      label={`${label}: ingredient or recipe`}
                      value={f.value}
                      onChange={f.onChange}
                      onBlur={f.onBlur}
                      options={options}
                      invalid={!!e?.ref}
                    />
                  )}
                />
                <Field.ErrorText role="alert">{e?.ref?.message}</Field.ErrorText>
              </Field.Root>
              <Field.Root gridArea="qty" invalid={!!e?.quantity}>
                <Field.Label srOnly>{label}: quantity</Field.Label>
                <Input
                  inputMode="decimal"
                  autoComplete="off"
                  placeholder="Quantity"
                  {...register(`lines.${index}.quantity`)}
                />
                <Field.ErrorText>{e?.quantity?.message}</Field.ErrorText>
              </Field.Root>
              <Field.Root gridArea="unit" invalid={!!e?.unit}>
                <Field.Label srOnly>{label}: unit</Field.Label>
                <NativeSelect.Root>
                  <NativeSelect.Field bg="bg.panel" {...register(`lines.${index}.unit`)}>
                    {UNIT_OPTIONS.map((o) => (
                      <option key={o.value} value={o.value}>
                        {o.label}
                      </option>
                    ))}
                  </NativeSelect.Field>
                  <NativeSelect.Indicator />
                </NativeSelect.Root>
                <Field.ErrorText>{e?.unit?.message}</Field.ErrorText>
              </Field.Root>
              <IconButton
                gridArea="remove"
                justifySelf="end"
                aria-label={`Remove line ${index + 1}`}
                variant="ghost"
                disabled={fields.length === 1}
                onClick={() => remove(index)}
              >
                <TrashIcon />
              </IconButton>
            </Grid>
            <Box mt="1">
              <LineHint
                control={control}
                index={index}
                kitchen={kitchen}
                holder={holder}
                loopEnters={loopEnters}
              />
            </Box>
          </Box>
        );
      })}
      {errors?.root?.message && (
        <Text color="fg.error" role="alert">
          {errors.root.message}
        </Text>
      )}
      <Button variant="outline" alignSelf="start" onClick={() => append(emptyLine())}>
        <PlusIcon /> Add a line
      </Button>
    </Stack>
  );
}
