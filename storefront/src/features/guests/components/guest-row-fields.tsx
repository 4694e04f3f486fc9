import {
  Box,
  Button,
  chakra,
  Field,
  Grid,
  HStack,
  IconButton,
  Input,
  SimpleGrid,
  Stack,
  Text,
} from '@chakra-ui/react';
import type { Diet, GuestAllergen } from '@nappe/shared';
import {
  Controller,
  useWatch,
  type Control,
  type FieldErrors,
  type UseFormRegister,
} from 'react-hook-form';
import { FoodAllergenIcon } from '../../../components/ui/allergen-food-icon';
import { TrashIcon } from '../../../components/ui/booking-icons';
import { Checkbox } from '../../../components/ui/checkbox';
import { Textarea } from '../../../components/ui/textarea';
import {
  allergenLabel,
  dietLabel,
  FORM_ALLERGENS,
  FORM_DIETS,
  LABEL_MAX,
  NOTES_MAX,
  requirementSummary,
  TABLE_MAX,
  type GuestFormValues,
} from '../form/guest-form';

function toggle<T>(list: readonly T[], item: T, on: boolean): T[] {
  return on ? (list.includes(item) ? [...list] : [...list, item]) : list.filter((x) => x !== item);
}

const Legend = chakra('legend');

/**
 * One guest's requirements: a name or label, the table, allergens and diets as labelled
 * checkboxes, and short notes with a character count. Folds to a one-line summary.
 */
export function GuestRowFields({
  index,
  control,
  register,
  errors,
  open,
  onToggle,
  onRemove,
}: {
  index: number;
  control: Control<GuestFormValues>;
  register: UseFormRegister<GuestFormValues>;
  errors: FieldErrors<GuestFormValues>;
  open: boolean;
  onToggle: () => void;
  onRemove: () => void;
}) {
  const row = useWatch({ control, name: `guestRequirements.${index}` });
  const rowErrors = errors.guestRequirements?.[index];
  const name = row?.label?.trim() || `Guest ${index + 1}`;
  const hasErrors = !!rowErrors;
  // Allergens a file named that are not one of the 14 groups (a specific food) get a box too.
  const allergenOptions: GuestAllergen[] = [
    ...FORM_ALLERGENS,
    ...(row?.allergens ?? []).filter((a) => !FORM_ALLERGENS.includes(a)),
  ];
  const notesLength = row?.notes?.length ?? 0;

  return (
    <Box
      as="fieldset"
      position="relative"
      borderWidth="1px"
      borderColor={hasErrors ? 'border.error' : 'border'}
      borderRadius="l3"
      bg="bg.panel"
      p={{ base: '4', md: '5' }}
    >
      {/* The legend names the group for screen readers; it must be the fieldset's own child. */}
      <Legend float="left" w="full" pe="28" fontWeight="semibold" lineHeight="2rem">
        Guest {index + 1}
        {row?.label?.trim() ? `: ${row.label.trim()}` : ''}
      </Legend>
      <HStack
        gap="1"
        position="absolute"
        top={{ base: '3', md: '4' }}
        insetEnd={{ base: '3', md: '4' }}
      >
        <Button size="sm" variant="ghost" onClick={onToggle} aria-expanded={open || hasErrors}>
          {open || hasErrors ? 'Fold' : 'Edit'} <chakra.span srOnly>{name}</chakra.span>
        </Button>
        <IconButton size="sm" variant="ghost" aria-label={`Remove ${name}`} onClick={onRemove}>
          <TrashIcon />
        </IconButton>
      </HStack>
      {!open && !hasErrors && (
        <Text textStyle="sm" color="fg.muted" clear="both">
          {row?.table?.trim() ? `Table ${row.table.trim()} · ` : ''}
          {requirementSummary({ allergens: row?.allergens ?? [], diets: row?.diets ?? [] })}
          {row?.notes?.trim() ? ' · with notes' : ''}
        </Text>
      )}

      <Stack gap="5" mt="4" display={open || hasErrors ? 'flex' : 'none'} clear="both">
        <Grid templateColumns={{ base: '1fr', sm: '3fr 1fr' }} gap="4">
          <Field.Root invalid={!!rowErrors?.label} required>
            <Field.Label>Name or label</Field.Label>
            <Input maxLength={LABEL_MAX} {...register(`guestRequirements.${index}.label`)} />
            {rowErrors?.label ? (
              <Field.ErrorText>{rowErrors.label.message}</Field.ErrorText>
            ) : (
              <Field.HelperText>A first name, or “Table 3, seat 2”.</Field.HelperText>
            )}
          </Field.Root>
          <Field.Root invalid={!!rowErrors?.table}>
            <Field.Label>Table</Field.Label>
            <Input maxLength={TABLE_MAX} {...register(`guestRequirements.${index}.table`)} />
            <Field.ErrorText>{rowErrors?.table?.message}</Field.ErrorText>
          </Field.Root>
        </Grid>

        <Controller
          control={control}
          name={`guestRequirements.${index}.allergens`}
          render={({ field }) => (
            <Box as="fieldset">
              <Legend fontWeight="medium" textStyle="sm" mb="2">
                Allergies
              </Legend>
              <SimpleGrid columns={{ base: 2, lg: 3 }} gapX="4" gapY="2">
                {allergenOptions.map((a) => (
                  <Checkbox
                    key={a}
                    size="sm"
                    checked={field.value.includes(a)}
                    onCheckedChange={(e) =>
                      field.onChange(toggle(field.value, a, e.checked === true))
                    }
                    inputProps={{ onBlur: field.onBlur }}
                  >
                    <HStack as="span" gap="1.5">
                      <FoodAllergenIcon allergen={a} color="fg.muted" />
                      <span>{allergenLabel(a)}</span>
                    </HStack>
                  </Checkbox>
                ))}
              </SimpleGrid>
            </Box>
          )}
        />

        <Controller
          control={control}
          name={`guestRequirements.${index}.diets`}
          render={({ field }) => (
            <Box as="fieldset">
              <Legend fontWeight="medium" textStyle="sm" mb="2">
                Diet
              </Legend>
              <SimpleGrid columns={{ base: 2, lg: 3 }} gapX="4" gapY="2">
                {FORM_DIETS.map((d: Diet) => (
                  <Checkbox
                    key={d}
                    size="sm"
                    checked={field.value.includes(d)}
                    onCheckedChange={(e) =>
                      field.onChange(toggle(field.value, d, e.checked === true))
                    }
                    inputProps={{ onBlur: field.onBlur }}
                  >
                    {dietLabel(d)}
                  </Checkbox>
                ))}
              </SimpleGrid>
            </Box>
          )}
        />

        <Field.Root invalid={!!rowErrors?.notes}>
          <Field.Label>Notes for the kitchen</Field.Label>
          <Textarea
            rows={2}
            maxLength={NOTES_MAX}
            {...register(`guestRequirements.${index}.notes`)}
          />
          {rowErrors?.notes ? (
            <Field.ErrorText>{rowErrors.notes.message}</Field.ErrorText>
          ) : (
            <Field.HelperText
              color={notesLength >= NOTES_MAX - 50 ? 'fg.warning' : undefined}
              aria-live={notesLength >= NOTES_MAX - 50 ? 'polite' : 'off'}
            >
              {notesLength} of {NOTES_MAX} characters. Severity, a food not listed above, anything
              that helps.
            </Field.HelperText>
          )}
        </Field.Root>
      </Stack>
    </Box>
  );
}
