import {
  Alert,
  Box,
  Button,
  Card,
  Field,
  Flex,
  Heading,
  Input,
  NativeSelect,
  RadioGroup,
  SimpleGrid,
  Stack,
  Text,
} from '@chakra-ui/react';
import { dateInTimeZone, type StudioSettingsBody, type StudioSettingsView } from '@nappe/shared';
import { useEffect, useMemo, useState, type ReactNode } from 'react';
import { Controller, useForm, useWatch, type FieldPath } from 'react-hook-form';
import { ApiError } from '../../../lib/api-client';
import { errorMessage } from '../../../lib/error-message';
import { useUpdateStudioSettings } from '../api/update-studio-settings';
import {
  formValuesOf,
  placeServerMessages,
  settingsResolver,
  type SettingsFormValues,
} from '../lib/settings-form';
import { currencyOptions, timeZoneGroups } from '../lib/zones-and-currencies';
import { BlackoutDatesField } from './blackout-dates-field';
import { CancellationTiersField } from './cancellation-tiers-field';
import { ErrorLines } from './error-lines';

/** The settings' names in words, for "last changed" and the saved message. */
const FIELD_LABELS: Record<string, string> = {
  name: 'studio name',
  tagline: 'tagline',
  city: 'city',
  currency: 'currency',
  timeZone: 'time zone',
  taxRateBp: 'tax rate',
  pricesIncludeTax: 'tax included or added',
  depositPercent: 'deposit',
  balanceDueDaysBefore: 'balance due days',
  cancellationTiers: 'cancellation policy',
  dailyPlateCapacity: 'daily plate capacity',
  blackoutDates: 'closed days',
  finalGuestCountDaysBefore: 'final guest count deadline',
  sparePercent: 'spare plates',
  guestDataRetentionDays: 'guest data retention',
  workingHours: 'working hours',
  platingBufferMinutes: 'plating time',
};

/** "2 Dec 2026, 10:31" on the studio's clock. */
const stamp = (iso: string, timeZone: string) =>
  new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short', timeZone }).format(
    new Date(iso),
  );

function Section({
  id,
  title,
  description,
  children,
}: {
  id: string;
  title: string;
  description?: ReactNode;
  children: ReactNode;
}) {
  return (
    <Card.Root
      as="section"
      aria-labelledby={`${id}-title`}
      variant="outline"
      bg="bg.panel"
      borderColor="border"
    >
      <Card.Body gap="5" p={{ base: '4', md: '6' }}>
        <Stack gap="1">
          <Heading as="h2" id={`${id}-title`} fontSize="xl" fontWeight="normal">
            {title}
          </Heading>
          {description && (
            <Text color="fg.muted" textStyle="sm" maxW="2xl">
              {description}
            </Text>
          )}
        </Stack>
        {children}
      </Card.Body>
    </Card.Root>
  );
}

function TextInputField({
  label,
  helper,
  error,
  unit,
  children,
}: {
  label: string;
  helper?: ReactNode;
  error?: string;
  unit?: string;
  children: ReactNode;
}) {
  return (
    <Field.Root invalid={!!error}>
      <Field.Label>{label}</Field.Label>
      {unit ? (
        <Flex align="center" gap="2" w="full">
          {children}
          <Text as="span" color="fg.muted" flexShrink="0" aria-hidden>
            {unit}
          </Text>
        </Flex>
      ) : (
        children
      )}
      {helper && !error && <Field.HelperText>{helper}</Field.HelperText>}
      <ErrorLines message={error} />
    </Field.Root>
  );
}

const numeric = { inputMode: 'numeric', autoComplete: 'off', w: '28', flexShrink: 0 } as const;

/**
 * Every studio setting on one form, validated with the shared body schema before it is sent (the
 * API validates with the same one), saved in one PUT. A 400 from the server puts each message
 * beside its field.
 */
export function SettingsForm({
  settings,
  onDirtyChange,
}: {
  settings: StudioSettingsView;
  onDirtyChange: (dirty: boolean) => void;
}) {
  const update = useUpdateStudioSettings();
  const {
    register,
    control,
    handleSubmit,
    reset,
    setError,
    setFocus,
    formState: { errors, isDirty, isSubmitting, submitCount },
  } = useForm<SettingsFormValues, unknown, StudioSettingsBody>({
    resolver: settingsResolver,
    defaultValues: formValuesOf(settings),
  });
  const [saved, setSaved] = useState<string | null>(null);
  const [failure, setFailure] = useState<{ title: string; messages: string[] } | null>(null);
  const [currency, timeZone] = useWatch({ control, name: ['currency', 'timeZone'] });
  const zones = useMemo(() => timeZoneGroups(settings.timeZone), [settings.timeZone]);
  const currencies = useMemo(() => currencyOptions(settings.currency), [settings.currency]);
  const today = dateInTimeZone(new Date(), settings.timeZone);

  useEffect(() => onDirtyChange(isDirty), [isDirty, onDirtyChange]);

  const onSubmit = handleSubmit(
    async (body) => {
      setSaved(null);
      setFailure(null);
      try {
        const view = await update.mutateAsync(body);
        reset(formValuesOf(view));
        const changed = view.lastChange?.fields.map((f) => FIELD_LABELS[f] ?? f) ?? [];
        setSaved(
          changed.length > 0 && view.lastChange?.changedAt === view.updatedAt
            ? `Settings saved: ${changed.join(', ')}.`
            : 'Settings saved.',
        );
      } catch (error) {
        if (error instanceof ApiError && error.status === 400) {
          const byField = new Map<string, string[]>();
          const general: string[] = [];
          for (const placed of placeServerMessages(error.messages)) {
            if (placed.field)
              byField.set(placed.field, [...(byField.get(placed.field) ?? []), placed.message]);
            else general.push(placed.message);
          }
          for (const [field, messages] of byField) {
            setError(field as FieldPath<SettingsFormValues>, {
              type: 'server',
              message: messages.join('\n'),
            });
          }
          const first = byField.keys().next();
          if (!first.done) setFocus(first.value as FieldPath<SettingsFormValues>);
          setFailure({
            title: 'The server did not accept these settings',
            messages:
              general.length > 0
                ? general
                : ['Change what the messages beside the fields say, then save again.'],
          });
        } else {
          setFailure({
            title: 'The settings were not saved',
            messages: [
              error instanceof ApiError && error.status < 500
                ? errorMessage(error)
                : 'Something went wrong on our side. Your changes are still here: please try again in a moment.',
            ],
          });
        }
      }
    },
    () => {
      setSaved(null);
      setFailure(null);
    },
  );

  const invalidOnClient = submitCount > 0 && Object.keys(errors).length > 0 && !failure;

  return (
    <form onSubmit={(e) => void onSubmit(e)} noValidate aria-label="Studio settings">
      <Stack gap={{ base: '5', md: '6' }}>
        {settings.lastChange && (
          <Text color="fg.muted" textStyle="sm">
            Last changed {stamp(settings.lastChange.changedAt, settings.timeZone)}
            {settings.lastChange.changedBy ? ` by ${settings.lastChange.changedBy}` : ''}.
          </Text>
        )}

        <Section
          id="studio"
          title="The studio"
          description="Shown to clients on the storefront, receipts and e-mails."
        >
          <SimpleGrid columns={{ base: 1, md: 2 }} gap="5">
            <TextInputField label="Studio name" error={errors.name?.message}>
              <Input autoComplete="organization" {...register('name')} />
            </TextInputField>
            <TextInputField label="City" error={errors.city?.message}>
              <Input autoComplete="address-level2" {...register('city')} />
            </TextInputField>
            <Box gridColumn={{ md: 'span 2' }}>
              <TextInputField
                label="Tagline"
                helper="One line under the name. Optional."
                error={errors.tagline?.message}
              >
                <Input {...register('tagline')} />
              </TextInputField>
            </Box>
            <Box gridColumn={{ md: 'span 2' }}>
              <Field.Root invalid={!!errors.timeZone}>
                <Field.Label>Time zone</Field.Label>
                <NativeSelect.Root maxW="md">
                  <NativeSelect.Field {...register('timeZone')} bg="bg.subtle">
                    {zones.map((group) => (
                      <optgroup key={group.region} label={group.region}>
                        {group.zones.map((zone) => (
                          <option key={zone.value} value={zone.value}>
                            {zone.label}
                          </option>
                        ))}
                      </optgroup>
                    ))}
                  </NativeSelect.Field>
                  <NativeSelect.Indicator />
                </NativeSelect.Root>
                {!errors.timeZone && (
                  <Field.HelperText>
                    Decides what “today” is: bookable dates, the prep schedule and balance due
                    dates.
                    {timeZone !== settings.timeZone &&
                      ' Changing it moves “today” for every screen once you save.'}
                  </Field.HelperText>
                )}
                <ErrorLines message={errors.timeZone?.message} />
              </Field.Root>
            </Box>
          </SimpleGrid>
        </Section>

        <Section
          id="money"
          title="Money"
          description="For new bookings. Orders already booked keep the terms they were booked on."
        >
          <SimpleGrid columns={{ base: 1, md: 2 }} gap="5">
            <Field.Root invalid={!!errors.currency}>
              <Field.Label>Currency</Field.Label>
              <NativeSelect.Root maxW="sm">
                <NativeSelect.Field {...register('currency')} bg="bg.subtle">
                  {currencies.map((c) => (
                    <option key={c.value} value={c.value}>
                      {c.label}
                    </option>
                  ))}
                </NativeSelect.Field>
                <NativeSelect.Indicator />
              </NativeSelect.Root>
              <ErrorLines message={errors.currency?.message} />
            </Field.Root>
            <TextInputField
              label="Tax rate"
              unit="%"
              helper="21 for 21 %; up to two decimals, such as 5.5."
              error={errors.taxRatePercent?.message}
            >
              <Input
                inputMode="decimal"
                autoComplete="off"
                w="28"
                flexShrink={0}
                {...register('taxRatePercent')}
              />
            </TextInputField>
            {currency !== settings.currency && (
              <Alert.Root status="warning" borderRadius="l2" gridColumn={{ md: 'span 2' }}>
                <Alert.Indicator />
                <Alert.Content>
                  <Alert.Title>Prices are not converted</Alert.Title>
                  <Alert.Description>
                    Menu prices and ingredient costs keep their amounts and will be read in{' '}
                    {currency}. Check every menu’s price after saving. Orders already booked stay in{' '}
                    {settings.currency}.
                  </Alert.Description>
                </Alert.Content>
              </Alert.Root>
            )}
            <Box gridColumn={{ md: 'span 2' }}>
              <Controller
                control={control}
                name="pricesIncludeTax"
                render={({ field }) => (
                  <RadioGroup.Root
                    value={field.value}
                    onValueChange={(e) => field.onChange(e.value)}
                    name={field.name}
                  >
                    <Stack gap="2">
                      <RadioGroup.Label fontWeight="medium">Menu prices</RadioGroup.Label>
                      <RadioGroup.Item value="included">
                        <RadioGroup.ItemHiddenInput ref={field.ref} onBlur={field.onBlur} />
                        <RadioGroup.ItemIndicator />
                        <RadioGroup.ItemText>
                          Include tax (the price a client sees is what they pay)
                        </RadioGroup.ItemText>
                      </RadioGroup.Item>
                      <RadioGroup.Item value="added">
                        <RadioGroup.ItemHiddenInput onBlur={field.onBlur} />
                        <RadioGroup.ItemIndicator />
                        <RadioGroup.ItemText>Have tax added on top at checkout</RadioGroup.ItemText>
                      </RadioGroup.Item>
                    </Stack>
                  </RadioGroup.Root>
                )}
              />
            </Box>
            <TextInputField
              label="Deposit"
              unit="% of the total"
              helper="Paid when booking. 100 means paid in full."
              error={errors.depositPercent?.message}
            >
              <Input {...numeric} {...register('depositPercent')} />
            </TextInputField>
            <TextInputField
              label="Balance due"
              unit="days before the event"
              error={errors.balanceDueDaysBefore?.message}
            >
              <Input {...numeric} {...register('balanceDueDaysBefore')} />
            </TextInputField>
          </SimpleGrid>
        </Section>

        <Section
          id="cancellation"
          title="Cancellation policy"
          description="How much of what was paid is refunded, by how many days before the event a booking is cancelled. Cancelling earlier never refunds less."
        >
          <CancellationTiersField control={control} register={register} errors={errors} />
        </Section>

        <Section
          id="kitchen"
          title="Kitchen and calendar"
          description="What the kitchen can make, when it works, and the days it is closed."
        >
          <SimpleGrid columns={{ base: 1, md: 2 }} gap="5">
            <TextInputField
              label="Daily plate capacity"
              unit="plates a day"
              helper="Across all events on one day; bookings beyond it are refused."
              error={errors.dailyPlateCapacity?.message}
            >
              <Input {...numeric} {...register('dailyPlateCapacity')} />
            </TextInputField>
            <TextInputField
              label="Spare plates"
              unit="% over the guest count"
              helper="Made in the prep plan for breakage and tasting."
              error={errors.sparePercent?.message}
            >
              <Input {...numeric} {...register('sparePercent')} />
            </TextInputField>
            <TextInputField label="Opening time" error={errors.workingHours?.start?.message}>
              <Input type="time" w="36" {...register('workingHours.start')} />
            </TextInputField>
            <TextInputField
              label="Closing time"
              helper="Hands-on prep is scheduled between these times."
              error={errors.workingHours?.end?.message}
            >
              <Input type="time" w="36" {...register('workingHours.end')} />
            </TextInputField>
            <TextInputField
              label="Plating time"
              unit="minutes before service"
              helper="Every component is ready this long before the service time."
              error={errors.platingBufferMinutes?.message}
            >
              <Input {...numeric} {...register('platingBufferMinutes')} />
            </TextInputField>
          </SimpleGrid>
          <Stack gap="2">
            <Heading as="h3" fontSize="md" fontFamily="body" fontWeight="semibold">
              Closed days
            </Heading>
            <Controller
              control={control}
              name="blackoutDates"
              render={({ field }) => (
                <BlackoutDatesField
                  value={field.value}
                  onChange={field.onChange}
                  error={errors.blackoutDates?.message}
                  today={today}
                />
              )}
            />
          </Stack>
        </Section>

        <Section
          id="guests"
          title="Guests and their data"
          description="Guest allergies and diets are health data: they are kept only as long as the kitchen needs them."
        >
          <SimpleGrid columns={{ base: 1, md: 2 }} gap="5">
            <TextInputField
              label="Final guest count"
              unit="days before the event"
              helper="Clients can change the number of guests until then."
              error={errors.finalGuestCountDaysBefore?.message}
            >
              <Input {...numeric} {...register('finalGuestCountDaysBefore')} />
            </TextInputField>
            <TextInputField
              label="Keep guest details"
              unit="days after the event"
              helper="Then names, allergies and notes are removed; anonymous counts stay for your figures."
              error={errors.guestDataRetentionDays?.message}
            >
              <Input {...numeric} {...register('guestDataRetentionDays')} />
            </TextInputField>
          </SimpleGrid>
        </Section>

        {errors.root?.message && (
          <Alert.Root status="error" borderRadius="l2">
            <Alert.Indicator />
            <Alert.Content>
              <Alert.Title>These settings cannot be saved</Alert.Title>
              <Alert.Description whiteSpace="pre-line">{errors.root.message}</Alert.Description>
            </Alert.Content>
          </Alert.Root>
        )}

        <Box
          position="sticky"
          bottom="0"
          zIndex="docked"
          bg="bg"
          borderTopWidth="1px"
          borderColor="border"
          mx={{ base: '-4', md: '0' }}
          px={{ base: '4', md: '0' }}
          py="3"
        >
          <Stack gap="3">
            <Box aria-live="polite" aria-atomic="true">
              {/* Editing again hides the last "saved" message. */}
              {saved && !isDirty && (
                <Alert.Root status="success" borderRadius="l2">
                  <Alert.Indicator />
                  <Alert.Content>
                    <Alert.Title>{saved}</Alert.Title>
                  </Alert.Content>
                </Alert.Root>
              )}
            </Box>
            {failure && (
              <Alert.Root status="error" role="alert" borderRadius="l2">
                <Alert.Indicator />
                <Alert.Content>
                  <Alert.Title>{failure.title}</Alert.Title>
                  {failure.messages.map((m) => (
                    <Alert.Description key={m}>{m}</Alert.Description>
                  ))}
                </Alert.Content>
              </Alert.Root>
            )}
            {invalidOnClient && (
              <Text color="fg.error" role="alert" fontWeight="medium">
                Some settings need a change: see the messages beside the fields.
              </Text>
            )}
            <Flex gap="3" justify="end" align="center" wrap="wrap">
              {isDirty && (
                <Text color="fg.muted" textStyle="sm" me="auto">
                  Unsaved changes
                </Text>
              )}
              <Button
                variant="outline"
                disabled={!isDirty || isSubmitting}
                onClick={() => {
                  reset(formValuesOf(settings));
                  setFailure(null);
                }}
              >
                Discard changes
              </Button>
              <Button type="submit" loading={isSubmitting} loadingText="Saving…">
                Save settings
              </Button>
            </Flex>
          </Stack>
        </Box>
      </Stack>
    </form>
  );
}
