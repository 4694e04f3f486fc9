import { Box, Button, Field, Heading, HStack, Input, Stack, Text } from '@chakra-ui/react';
import type { GuestRequirement } from '@nappe/shared';
import { useEffect, useMemo, useState, type ReactNode } from 'react';
import { Controller, useFieldArray, useForm, useWatch } from 'react-hook-form';
import { PlusIcon } from '../../../components/ui/booking-icons';
import { Checkbox } from '../../../components/ui/checkbox';
import {
  emptyGuestRow,
  guestFormResolver,
  toGuestRequest,
  toGuestRow,
  type GuestFormValues,
  type GuestLimits,
  type GuestRequest,
} from '../form/guest-form';
import { AllergenSummary } from './allergen-summary';
import { CsvColumnsHelp, CsvImport } from './csv-import';
import { GuestRowFields } from './guest-row-fields';

export const CONSENT_LABEL = 'My guests agreed to share their allergies and diets with the studio.';

/**
 * The guests of an event: how many, and the requirements of each guest who has any (typed in
 * or imported from a CSV file), a summary by allergen, and the client's confirmation that the
 * guests agreed to share these health details. Used by the booking wizard and by "Change
 * guests". Checked with the shared `changeGuestCountSchema` and the menu's limits.
 */
export function GuestListForm({
  defaultValues,
  limits,
  onChange,
  onSubmit,
  submitLabel,
  secondary,
  busy = false,
  countHelp,
}: {
  defaultValues: GuestFormValues;
  limits: GuestLimits;
  /** Told of every change (e.g. to keep a draft). */
  onChange?: (request: GuestFormValues) => void;
  onSubmit: (request: GuestRequest, values: GuestFormValues) => void;
  submitLabel: ReactNode;
  /** A Back link or a Cancel button beside the submit button. */
  secondary?: ReactNode;
  busy?: boolean;
  countHelp?: ReactNode;
}) {
  // The limits can change while the form is open (the plates left arrive); useForm reads the
  // resolver it is given on each render, so a new one takes effect at once.
  const resolver = useMemo(() => guestFormResolver(() => limits), [limits]);
  const {
    control,
    register,
    handleSubmit,
    subscribe,
    formState: { errors, isSubmitted },
    trigger,
  } = useForm<GuestFormValues>({ resolver, defaultValues, shouldFocusError: true });
  const { fields, append, remove } = useFieldArray({ control, name: 'guestRequirements' });
  // Rows typed in start open; rows already saved or imported start folded to one line. The row
  // just added has no id until the next render, so "the newest row is open" is its own flag.
  const [openRows, setOpenRows] = useState<ReadonlySet<string>>(() => new Set());
  const [newestOpen, setNewestOpen] = useState(false);
  const isOpen = (id: string, index: number) =>
    openRows.has(id) || (newestOpen && index === fields.length - 1);
  const pinNewest = () => {
    const last = fields[fields.length - 1];
    if (newestOpen && last) setOpenRows((current) => new Set([...current, last.id]));
  };
  const rows = useWatch({ control, name: 'guestRequirements' });
  const guestCount = useWatch({ control, name: 'guestCount' });
  const listed = fields.length > 0;

  useEffect(() => {
    if (!onChange) return;
    return subscribe({
      formState: { values: true },
      callback: ({ values }) => onChange(values),
    });
  }, [subscribe, onChange]);

  const addRows = (requirements: GuestRequirement[]) => {
    pinNewest();
    setNewestOpen(false);
    append(requirements.map(toGuestRow));
    // Re-check at once if the form was already submitted, so messages follow the new list.
    if (isSubmitted) void trigger();
  };

  return (
    <form onSubmit={handleSubmit((values) => onSubmit(toGuestRequest(values), values))} noValidate>
      <Stack gap="8">
        <Field.Root invalid={!!errors.guestCount} required maxW="xs">
          <Field.Label>Number of guests</Field.Label>
          <Input
            type="number"
            inputMode="numeric"
            min={limits.minGuests}
            max={limits.maxGuests}
            step={1}
            {...register('guestCount', { valueAsNumber: true })}
          />
          {errors.guestCount ? (
            <Field.ErrorText>{errors.guestCount.message}</Field.ErrorText>
          ) : (
            <Field.HelperText>
              {countHelp ?? `This menu serves ${limits.minGuests} to ${limits.maxGuests} guests.`}
            </Field.HelperText>
          )}
        </Field.Root>

        <Stack as="section" aria-labelledby="guest-requirements-heading" gap="4">
          <Stack gap="1">
            <Heading as="h3" id="guest-requirements-heading" fontSize="xl" fontWeight="normal">
              Allergies and diets
            </Heading>
            <Text color="fg.muted" textStyle="sm">
              Add a row for each guest with an allergy or a diet: the kitchen checks every component
              of every dessert against it. Guests without any need no row.
            </Text>
          </Stack>

          {fields.map((field, index) => (
            <GuestRowFields
              key={field.id}
              index={index}
              control={control}
              register={register}
              errors={errors}
              open={isOpen(field.id, index)}
              onToggle={() => {
                const open = isOpen(field.id, index);
                if (newestOpen && index === fields.length - 1) setNewestOpen(false);
                setOpenRows((current) => {
                  const next = new Set(current);
                  if (open) next.delete(field.id);
                  else next.add(field.id);
                  return next;
                });
              }}
              onRemove={() => {
                if (index === fields.length - 1) setNewestOpen(false);
                remove(index);
              }}
            />
          ))}
          {errors.guestRequirements?.root?.message && (
            <Text color="fg.error" textStyle="sm" role="alert">
              {errors.guestRequirements.root.message}
            </Text>
          )}

          <CsvImport
            onAccept={addRows}
            before={
              <Button
                variant="outline"
                onClick={() => {
                  pinNewest();
                  append(emptyGuestRow(), { shouldFocus: true });
                  setNewestOpen(true);
                }}
              >
                <PlusIcon /> Add a guest with requirements
              </Button>
            }
          />
          <CsvColumnsHelp />
        </Stack>

        <AllergenSummary
          guests={rows ?? []}
          guestCount={Number.isInteger(guestCount) ? guestCount : null}
        />

        {listed && (
          <Box
            borderWidth="1px"
            borderColor={errors.guestDataConsent ? 'border.error' : 'border'}
            borderRadius="l3"
            p={{ base: '4', md: '5' }}
            bg="bg.panel"
          >
            <Controller
              control={control}
              name="guestDataConsent"
              render={({ field }) => (
                <Field.Root invalid={!!errors.guestDataConsent}>
                  <Checkbox
                    checked={field.value}
                    onCheckedChange={(e) => field.onChange(e.checked === true)}
                    invalid={!!errors.guestDataConsent}
                    inputProps={{ name: field.name, onBlur: field.onBlur, ref: field.ref }}
                  >
                    {CONSENT_LABEL}
                  </Checkbox>
                  <Text textStyle="sm" color="fg.muted" mt="2" ps="7">
                    Allergies and diets are health information: we ask for them only so the kitchen
                    can make every guest a safe plate, show them only to you and the team serving
                    your event, and erase them a few weeks after it.
                  </Text>
                  {errors.guestDataConsent && (
                    <Field.ErrorText ps="7" role="alert">
                      {errors.guestDataConsent.message}
                    </Field.ErrorText>
                  )}
                </Field.Root>
              )}
            />
          </Box>
        )}

        <HStack justify="space-between" gap="3" wrap="wrap-reverse">
          {secondary ?? <span />}
          <Button type="submit" size="lg" colorPalette="accent" loading={busy}>
            {submitLabel}
          </Button>
        </HStack>
      </Stack>
    </form>
  );
}
