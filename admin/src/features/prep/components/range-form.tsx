import { Button, chakra, Field, Flex, HStack, Input, Text } from '@chakra-ui/react';
import { useState, type FormEvent } from 'react';
import type { DateRange } from '../api/types';
import { defaultPlanRange, rangeProblem } from '../lib/dates';

/**
 * The plan's dates: first and last event day (both included), with the usual spans one tap
 * away. Submitting a valid range hands it on; a bad one says why and keeps what was typed.
 */
export function RangeForm({
  initial,
  today,
  onSubmit,
  busy,
}: {
  initial: { from: string; to: string };
  today: string;
  onSubmit: (range: DateRange) => void;
  busy?: boolean;
}) {
  const [from, setFrom] = useState(initial.from);
  const [to, setTo] = useState(initial.to);
  const [problem, setProblem] = useState<string | null>(null);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const why = rangeProblem(from, to);
    setProblem(why);
    if (!why) onSubmit({ from, to });
  };
  const preset = (days: number) => {
    const range = defaultPlanRange(today, days);
    setFrom(range.from);
    setTo(range.to);
    setProblem(null);
    onSubmit(range);
  };

  return (
    <chakra.form
      onSubmit={submit}
      aria-label="Plan dates"
      noValidate
      borderWidth="1px"
      borderColor="border"
      borderRadius="l3"
      bg="bg.panel"
      p={{ base: '4', md: '5' }}
      mb={{ base: '6', md: '8' }}
    >
      <Flex gap="4" wrap="wrap" align="end">
        <Field.Root invalid={!!problem} w={{ base: 'full', sm: '11rem' }}>
          <Field.Label>First event day</Field.Label>
          <Input type="date" value={from} onChange={(e) => setFrom(e.target.value)} />
        </Field.Root>
        <Field.Root invalid={!!problem} w={{ base: 'full', sm: '11rem' }}>
          <Field.Label>Last event day</Field.Label>
          <Input
            type="date"
            value={to}
            min={from || undefined}
            onChange={(e) => setTo(e.target.value)}
          />
        </Field.Root>
        <Button type="submit" loading={busy} w={{ base: 'full', sm: 'auto' }}>
          Show plan
        </Button>
        <HStack gap="2" wrap="wrap">
          <Button type="button" variant="ghost" size="sm" onClick={() => preset(7)}>
            Next 7 days
          </Button>
          <Button type="button" variant="ghost" size="sm" onClick={() => preset(14)}>
            Next 14 days
          </Button>
        </HStack>
      </Flex>
      {problem && (
        <Text role="alert" color="fg.error" mt="3" fontWeight="medium">
          {problem}
        </Text>
      )}
    </chakra.form>
  );
}
