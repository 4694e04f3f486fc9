import { Button, Field, HStack, IconButton, Input } from '@chakra-ui/react';
import { addIsoDays, isIsoDate } from '@nappe/shared';
import { useState } from 'react';
import { ChevronLeftIcon, ChevronRightIcon } from '../../../components/ui/icons';

/**
 * One day, kept in the URL by the screen: a date field, the day before and after, and back to
 * today. Typing a partial date waits until it is a real one.
 */
export function DayPicker({
  label,
  date,
  today,
  onChange,
}: {
  label: string;
  date: string;
  today: string;
  onChange: (date: string) => void;
}) {
  const [typed, setTyped] = useState(date);
  // A new day from outside (the arrows, Today, the URL) replaces what was typed.
  const [shown, setShown] = useState(date);
  if (shown !== date) {
    setShown(date);
    setTyped(date);
  }
  return (
    <HStack gap="2" align="end" wrap="wrap">
      <Field.Root w="11rem">
        <Field.Label>{label}</Field.Label>
        <Input
          type="date"
          value={typed}
          onChange={(e) => {
            setTyped(e.target.value);
            if (isIsoDate(e.target.value)) onChange(e.target.value);
          }}
        />
      </Field.Root>
      <HStack gap="1">
        <IconButton
          variant="outline"
          aria-label="Previous day"
          onClick={() => onChange(addIsoDays(date, -1))}
        >
          <ChevronLeftIcon />
        </IconButton>
        <IconButton
          variant="outline"
          aria-label="Next day"
          onClick={() => onChange(addIsoDays(date, 1))}
        >
          <ChevronRightIcon />
        </IconButton>
        <Button variant="ghost" disabled={date === today} onClick={() => onChange(today)}>
          Today
        </Button>
      </HStack>
    </HStack>
  );
}
