import { zodResolver } from '@hookform/resolvers/zod';
import { Box, Button, Field, Heading, HStack, Input, Stack, Text } from '@chakra-ui/react';
import { ADDRESS_LINES_MAX } from '@nappe/shared';
import { useCallback, useEffect, useState, type ReactNode } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { ArrowRightIcon, CheckIcon } from '../../../components/ui/icons';
import { Textarea } from '../../../components/ui/textarea';
import { longDate } from '../../../lib/dates';
import type { EventDraft } from '../draft/booking-draft';
import { eventStepSchema } from '../draft/event-schema';
import { AvailabilityCalendar } from './availability-calendar';
import { localToday, monthOf } from './month';

const OCCASIONS = [
  'Dinner party',
  'Wedding',
  'Company dinner',
  'Private tasting',
  'Birthday',
  'Anniversary',
];

/**
 * *Your event*: the date (from the calendar of open days), the service time, the venue, the
 * occasion and a phone number for the day. Every change is kept in the draft as it is typed.
 */
export function EventStepForm({
  menuId,
  defaultValues,
  onChange,
  onSubmit,
  back,
}: {
  menuId: string;
  defaultValues: EventDraft;
  onChange: (values: EventDraft) => void;
  onSubmit: (values: EventDraft) => void;
  back: ReactNode;
}) {
  const {
    register,
    handleSubmit,
    setValue,
    subscribe,
    control,
    formState: { errors },
  } = useForm<EventDraft>({
    resolver: zodResolver(eventStepSchema),
    defaultValues,
    shouldFocusError: true,
  });
  const [month, setMonth] = useState(() => monthOf(defaultValues.eventDate || localToday()));
  const eventDate = useWatch({ control, name: 'eventDate' });
  const selectDate = useCallback(
    (date: string) => setValue('eventDate', date, { shouldValidate: true, shouldDirty: true }),
    [setValue],
  );

  useEffect(
    () =>
      subscribe({
        formState: { values: true },
        callback: ({ values }) => onChange({ ...defaultValues, ...values }),
      }),
    [subscribe, onChange, defaultValues],
  );

  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate>
      <Stack gap="8">
        <Stack as="fieldset" gap="3">
          <Heading as="legend" fontSize="xl" fontWeight="normal" mb="1">
            Date
          </Heading>
          <Text color="fg.muted" textStyle="sm">
            Choose an open day. The figure under each day is the plates the kitchen can still make.
          </Text>
          <Box
            p={{ base: '3', md: '5' }}
            mx={{ base: '-3', md: '0' }}
            bg="bg.panel"
            borderWidth="1px"
            borderColor={errors.eventDate ? 'border.error' : 'border'}
            borderRadius="l3"
          >
            <AvailabilityCalendar
              menuId={menuId}
              month={month}
              onMonthChange={setMonth}
              selected={eventDate || null}
              onSelect={selectDate}
              openHint="Choose it for your event"
            />
          </Box>
          <input type="hidden" {...register('eventDate')} />
          <Box aria-live="polite">
            {eventDate ? (
              <HStack gap="2" color="accent.fg" fontWeight="medium">
                <CheckIcon boxSize="4" />
                <Text>Your date: {longDate(eventDate)}</Text>
              </HStack>
            ) : errors.eventDate ? (
              <Text color="fg.error" textStyle="sm" role="alert">
                {errors.eventDate.message}
              </Text>
            ) : null}
          </Box>
        </Stack>

        <Stack as="fieldset" gap="5">
          <Heading as="legend" fontSize="xl" fontWeight="normal" mb="1">
            Service and venue
          </Heading>
          <Field.Root invalid={!!errors.serviceTime} required maxW="xs">
            <Field.Label>Service time</Field.Label>
            <Input type="time" step={900} {...register('serviceTime')} />
            {errors.serviceTime ? (
              <Field.ErrorText>{errors.serviceTime.message}</Field.ErrorText>
            ) : (
              <Field.HelperText>When dessert is served, on the 24-hour clock.</Field.HelperText>
            )}
          </Field.Root>
          <Field.Root invalid={!!errors.venueAddress} required>
            <Field.Label>Venue address</Field.Label>
            <Textarea rows={4} autoComplete="street-address" {...register('venueAddress')} />
            {errors.venueAddress ? (
              <Field.ErrorText>{errors.venueAddress.message}</Field.ErrorText>
            ) : (
              <Field.HelperText>
                As on an envelope, one line per line (at most {ADDRESS_LINES_MAX}).
              </Field.HelperText>
            )}
          </Field.Root>
          <Field.Root invalid={!!errors.occasion} required>
            <Field.Label>Occasion</Field.Label>
            <Input list="booking-occasions" {...register('occasion')} />
            <datalist id="booking-occasions">
              {OCCASIONS.map((o) => (
                <option key={o} value={o} />
              ))}
            </datalist>
            {errors.occasion ? (
              <Field.ErrorText>{errors.occasion.message}</Field.ErrorText>
            ) : (
              <Field.HelperText>A wedding, a company dinner, a birthday…</Field.HelperText>
            )}
          </Field.Root>
          <Field.Root invalid={!!errors.contactPhone} required maxW="sm">
            <Field.Label>Phone on the day</Field.Label>
            <Input type="tel" autoComplete="tel" inputMode="tel" {...register('contactPhone')} />
            {errors.contactPhone ? (
              <Field.ErrorText>{errors.contactPhone.message}</Field.ErrorText>
            ) : (
              <Field.HelperText>
                With the country code. We call it only if we need you on the day.
              </Field.HelperText>
            )}
          </Field.Root>
        </Stack>

        <HStack justify="space-between" gap="3" wrap="wrap-reverse">
          {back}
          <Button type="submit" size="lg" colorPalette="accent">
            Continue to your guests <ArrowRightIcon />
          </Button>
        </HStack>
      </Stack>
    </form>
  );
}
