import {
  Box,
  Button,
  Field,
  Flex,
  HStack,
  IconButton,
  Input,
  NativeSelect,
  SimpleGrid,
  Stack,
  Text,
  Textarea,
} from '@chakra-ui/react';
import { safetyNotesForStep } from '@nappe/shared';
import { useMemo } from 'react';
import { useFieldArray, useWatch, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import { ArrowDownIcon, ArrowUpIcon, PlusIcon, TrashIcon } from '../../../components/ui/icons';
import { parseNumber } from '../lib/form-resolver';
import { STEP_KIND_OPTIONS } from '../lib/labels';
import { emptyStep, type RecipeFormValues } from '../lib/recipe-form-values';
import type { FormControl } from './form-controls';
import { SafetyNotes } from './safety-notes';

function StepSafety({ control, index }: { control: FormControl<RecipeFormValues>; index: number }) {
  const [kind, temperature] = useWatch({
    control,
    name: [`steps.${index}.kind`, `steps.${index}.temperature`],
  });
  const notes = useMemo(() => {
    const t = parseNumber(temperature);
    return safetyNotesForStep({
      kind,
      ...(t !== undefined && Number.isFinite(t) ? { temperatureC: t } : {}),
    });
  }, [kind, temperature]);
  return <SafetyNotes notes={notes} />;
}

/** The method: steps in order, each with its hands-on time, its wait and its temperature. */
export function RecipeStepsEditor({
  control,
  register,
  errors,
}: {
  control: FormControl<RecipeFormValues>;
  register: UseFormRegister<RecipeFormValues>;
  errors: FieldErrors<RecipeFormValues>['steps'];
}) {
  const { fields, append, remove, move } = useFieldArray({ control, name: 'steps' });
  return (
    <Stack gap="4">
      {fields.length === 0 && (
        <Text color="fg.muted">
          No steps yet. The prep schedule works back from service time through them.
        </Text>
      )}
      {fields.map((field, index) => {
        const e = errors?.[index];
        const n = index + 1;
        return (
          <Box
            key={field.id}
            role="group"
            aria-label={`Step ${n}`}
            borderWidth="1px"
            borderColor="border.muted"
            borderRadius="l2"
            p="3"
            bg="bg.subtle"
          >
            <Flex justify="space-between" align="center" mb="2" gap="2">
              <Text fontWeight="semibold">Step {n}</Text>
              <HStack gap="1">
                <IconButton
                  aria-label={`Move step ${n} up`}
                  variant="ghost"
                  size="sm"
                  disabled={index === 0}
                  onClick={() => move(index, index - 1)}
                >
                  <ArrowUpIcon />
                </IconButton>
                <IconButton
                  aria-label={`Move step ${n} down`}
                  variant="ghost"
                  size="sm"
                  disabled={index === fields.length - 1}
                  onClick={() => move(index, index + 1)}
                >
                  <ArrowDownIcon />
                </IconButton>
                <IconButton
                  aria-label={`Remove step ${n}`}
                  variant="ghost"
                  size="sm"
                  onClick={() => remove(index)}
                >
                  <TrashIcon />
                </IconButton>
              </HStack>
            </Flex>
            <Stack gap="3">
              <SimpleGrid columns={{ base: 1, md: 2 }} gap="3">
                <Field.Root invalid={!!e?.name}>
                  <Field.Label>What to do</Field.Label>
                  <Input autoComplete="off" {...register(`steps.${index}.name`)} />
                  <Field.ErrorText>{e?.name?.message}</Field.ErrorText>
                </Field.Root>
                <Field.Root invalid={!!e?.kind}>
                  <Field.Label>Kind of step</Field.Label>
                  <NativeSelect.Root>
                    <NativeSelect.Field bg="bg.panel" {...register(`steps.${index}.kind`)}>
                      {STEP_KIND_OPTIONS.map((o) => (
                        <option key={o.value} value={o.value}>
                          {o.label}
                        </option>
                      ))}
                    </NativeSelect.Field>
                    <NativeSelect.Indicator />
                  </NativeSelect.Root>
                </Field.Root>
              </SimpleGrid>
              <SimpleGrid columns={{ base: 1, sm: 3 }} gap="3">
                <Field.Root invalid={!!e?.activeMinutes}>
                  <Field.Label>Hands-on (min)</Field.Label>
                  <Input inputMode="numeric" {...register(`steps.${index}.activeMinutes`)} />
                  <Field.ErrorText>{e?.activeMinutes?.message}</Field.ErrorText>
                </Field.Root>
                <Field.Root invalid={!!e?.waitMinutes}>
                  <Field.Label>Wait after (min)</Field.Label>
                  <Input inputMode="numeric" {...register(`steps.${index}.waitMinutes`)} />
                  <Field.HelperText>Rest, chill, freeze…</Field.HelperText>
                  <Field.ErrorText>{e?.waitMinutes?.message}</Field.ErrorText>
                </Field.Root>
                <Field.Root invalid={!!e?.temperature}>
                  <Field.Label>Temperature (°C)</Field.Label>
                  <Input inputMode="decimal" {...register(`steps.${index}.temperature`)} />
                  <Field.ErrorText>{e?.temperature?.message}</Field.ErrorText>
                </Field.Root>
              </SimpleGrid>
              <StepSafety control={control} index={index} />
              <Field.Root invalid={!!e?.caution}>
                <Field.Label>Your own caution for this step</Field.Label>
                <Textarea rows={2} {...register(`steps.${index}.caution`)} />
                <Field.HelperText>
                  Printed with the step; the safety notes above are added where they apply.
                </Field.HelperText>
                <Field.ErrorText>{e?.caution?.message}</Field.ErrorText>
              </Field.Root>
            </Stack>
          </Box>
        );
      })}
      <Button variant="outline" alignSelf="start" onClick={() => append(emptyStep())}>
        <PlusIcon /> Add a step
      </Button>
    </Stack>
  );
}
