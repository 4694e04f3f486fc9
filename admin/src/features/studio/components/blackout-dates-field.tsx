import { Badge, Box, Button, Field, Flex, IconButton, Input, Stack, Text } from '@chakra-ui/react';
import { BLACKOUT_DATES_MAX, isIsoDate } from '@nappe/shared';
import { useId, useState } from 'react';
import { PlusIcon, TrashIcon } from '../../../components/ui/icons';
import { ErrorLines } from './error-lines';

const longDate = new Intl.DateTimeFormat('en-GB', {
  timeZone: 'UTC',
  weekday: 'short',
  day: 'numeric',
  month: 'long',
  year: 'numeric',
});
/**
 * "Wed 25 December 2030": a calendar day, already the studio's, not shifted by the device's zone.
 * Built from Intl's parts so the punctuation does not change with the runtime's CLDR version.
 */
export function formatClosedDay(iso: string): string {
  const parts: Record<string, string> = {};
  for (const p of longDate.formatToParts(new Date(`${iso}T00:00:00Z`))) parts[p.type] = p.value;
  return `${parts.weekday} ${parts.day} ${parts.month} ${parts.year}`;
}

/** Days the studio takes no events: pick a date, add it; each listed day can be removed. */
export function BlackoutDatesField({
  value,
  onChange,
  error,
  today,
}: {
  value: string[];
  onChange: (next: string[]) => void;
  error?: string;
  /** `YYYY-MM-DD` in the studio's zone: earlier days are marked as past. */
  today: string;
}) {
  const [draft, setDraft] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const inputId = useId();

  const add = () => {
    const date = draft.trim();
    if (date === '') return setProblem('Choose a date first.');
    if (!isIsoDate(date))
      return setProblem('Write each closed day as a real date like 2026-12-25.');
    if (value.includes(date)) return setProblem(`${formatClosedDay(date)} is already closed.`);
    if (value.length >= BLACKOUT_DATES_MAX) {
      return setProblem(`List at most ${BLACKOUT_DATES_MAX} closed days.`);
    }
    setProblem(null);
    setDraft('');
    onChange([...value, date].sort());
  };

  return (
    <Stack gap="3">
      <Field.Root invalid={!!problem}>
        <Field.Label htmlFor={inputId}>Add a closed day</Field.Label>
        <Flex gap="2">
          <Input
            id={inputId}
            type="date"
            value={draft}
            w="48"
            flexShrink={0}
            onChange={(e) => {
              setDraft(e.target.value);
              setProblem(null);
            }}
            onKeyDown={(e) => {
              if (e.key === 'Enter') {
                e.preventDefault();
                add();
              }
            }}
          />
          <Button variant="outline" onClick={add}>
            <PlusIcon /> Add
          </Button>
        </Flex>
        <Field.ErrorText>{problem}</Field.ErrorText>
      </Field.Root>

      {value.length === 0 ? (
        <Text color="fg.muted" textStyle="sm">
          No closed days: every day can be booked, up to the daily capacity.
        </Text>
      ) : (
        <Stack as="ul" gap="2" listStyleType="none" aria-label="Closed days">
          {value.map((date) => (
            <Flex
              as="li"
              key={date}
              align="center"
              justify="space-between"
              gap="3"
              borderWidth="1px"
              borderColor="border"
              borderRadius="l2"
              bg="bg.subtle"
              ps="3"
              pe="1"
              py="1"
            >
              <Box>
                <time dateTime={date}>{formatClosedDay(date)}</time>
                {date < today && (
                  <Badge ms="2" variant="outline" size="sm">
                    Past
                  </Badge>
                )}
              </Box>
              <IconButton
                variant="ghost"
                size="sm"
                colorPalette="danger"
                aria-label={`Remove ${formatClosedDay(date)}`}
                onClick={() => onChange(value.filter((d) => d !== date))}
              >
                <TrashIcon />
              </IconButton>
            </Flex>
          ))}
        </Stack>
      )}
      {error && (
        <Field.Root invalid>
          <ErrorLines message={error} />
        </Field.Root>
      )}
    </Stack>
  );
}
