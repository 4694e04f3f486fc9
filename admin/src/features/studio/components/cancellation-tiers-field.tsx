import { Box, Button, Field, Flex, IconButton, Input, List, Stack, Text } from '@chakra-ui/react';
import {
  useFieldArray,
  useWatch,
  type Control,
  type FieldErrors,
  type UseFormRegister,
} from 'react-hook-form';
import { PlusIcon, TrashIcon } from '../../../components/ui/icons';
import { describePolicy, textToNumber, type SettingsFormValues } from '../lib/settings-form';
import { ErrorLines } from './error-lines';

export const MAX_TIERS = 10;

/**
 * The cancellation policy as an editable list: from N days before the event, refund P %. The
 * shared schema checks the whole list (one tier per day, a tier from 0 days, never less refund
 * for cancelling earlier); the policy is repeated in words underneath, earliest first.
 */
export function CancellationTiersField({
  control,
  register,
  errors,
}: {
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- the resolver's output type is irrelevant here
  control: Control<SettingsFormValues, unknown, any>;
  register: UseFormRegister<SettingsFormValues>;
  errors: FieldErrors<SettingsFormValues>;
}) {
  const { fields, append, remove } = useFieldArray({ control, name: 'cancellationTiers' });
  const tiers = useWatch({ control, name: 'cancellationTiers' });
  const listError =
    errors.cancellationTiers?.root?.message ?? errors.cancellationTiers?.message ?? undefined;
  const policy = describePolicy(
    (tiers ?? []).map((t) => ({
      daysBefore: textToNumber(t.daysBefore),
      refundPercent: textToNumber(t.refundPercent),
    })),
  );

  return (
    <Stack gap="4">
      <Stack as="ol" gap="3" listStyleType="none" aria-label="Cancellation tiers">
        {fields.map((field, i) => {
          const rowErrors = errors.cancellationTiers?.[i];
          const n = i + 1;
          return (
            <Box
              as="li"
              key={field.id}
              borderWidth="1px"
              borderColor="border"
              borderRadius="l2"
              bg="bg.subtle"
              p="3"
            >
              <Flex gap="3" align="end">
                <Field.Root invalid={!!rowErrors?.daysBefore} w="auto">
                  <Field.Label>
                    From, days before{' '}
                    <Box as="span" srOnly>
                      (tier {n})
                    </Box>
                  </Field.Label>
                  <Input
                    inputMode="numeric"
                    autoComplete="off"
                    w="28"
                    {...register(`cancellationTiers.${i}.daysBefore`)}
                  />
                </Field.Root>
                <Field.Root invalid={!!rowErrors?.refundPercent} w="auto">
                  <Field.Label>
                    Refund, %{' '}
                    <Box as="span" srOnly>
                      (tier {n})
                    </Box>
                  </Field.Label>
                  <Input
                    inputMode="numeric"
                    autoComplete="off"
                    w="28"
                    {...register(`cancellationTiers.${i}.refundPercent`)}
                  />
                </Field.Root>
                <IconButton
                  variant="ghost"
                  colorPalette="danger"
                  aria-label={`Remove tier ${n}`}
                  disabled={fields.length === 1}
                  onClick={() => remove(i)}
                  ms="auto"
                >
                  <TrashIcon />
                </IconButton>
              </Flex>
              {(rowErrors?.daysBefore || rowErrors?.refundPercent) && (
                <Field.Root invalid mt="2">
                  <ErrorLines
                    message={[rowErrors.daysBefore?.message, rowErrors.refundPercent?.message]
                      .filter(Boolean)
                      .join('\n')}
                  />
                </Field.Root>
              )}
            </Box>
          );
        })}
      </Stack>
      {listError && (
        <Field.Root invalid>
          <ErrorLines message={listError} />
        </Field.Root>
      )}
      <Box>
        <Button
          variant="outline"
          size="sm"
          disabled={fields.length >= MAX_TIERS}
          onClick={() => append({ daysBefore: '', refundPercent: '' })}
        >
          <PlusIcon /> Add a tier
        </Button>
        {fields.length >= MAX_TIERS && (
          <Text textStyle="sm" color="fg.muted" mt="1">
            A policy has at most {MAX_TIERS} tiers.
          </Text>
        )}
      </Box>
      {policy.length > 0 && !listError && (
        <Box borderStartWidth="3px" borderColor="caramel.solid" ps="3">
          <Text fontWeight="semibold" textStyle="sm" mb="1">
            What clients read
          </Text>
          <List.Root textStyle="sm" color="fg.muted" ps="4">
            {policy.map((line) => (
              <List.Item key={line}>{line}</List.Item>
            ))}
          </List.Root>
        </Box>
      )}
    </Stack>
  );
}
