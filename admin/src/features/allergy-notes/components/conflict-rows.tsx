import { Box, HStack, List, Stack, Text } from '@chakra-ui/react';
import type { GuestAdvisory, GuestConflict } from '@nappe/shared';
import { AllergyIcon, TraceIcon } from '../../../components/ui/icons';
import { advisoryRows, conflictRows } from '../lib/allergen-words';

/**
 * "Brown-butter almond crumble — Tree nuts (almonds)", then the ingredient that brings it: one
 * row per component that carries a conflict, with our "contains" triangle and the words.
 */
export function ConflictRows({
  conflicts,
  label,
}: {
  conflicts: readonly GuestConflict[];
  /** Names the list for screen readers ("Conflicts on the standard plate"). */
  label: string;
}) {
  const rows = conflictRows(conflicts);
  if (rows.length === 0) return null;
  return (
    <List.Root as="ul" listStyleType="none" gap="2" aria-label={label}>
      {rows.map((row) => (
        <List.Item key={row.key} display="block">
          <HStack gap="2" align="start">
            <Box color="danger.fg" mt="0.5" flexShrink="0">
              <AllergyIcon boxSize="4.5" aria-hidden />
            </Box>
            <Stack gap="0.5" minW="0">
              <Text fontWeight="semibold" overflowWrap="anywhere">
                {row.component}{' '}
                <Text as="span" fontWeight="normal">
                  — {row.what}
                </Text>
              </Text>
              <Text textStyle="sm" color="fg.muted" overflowWrap="anywhere">
                From {row.carriers.join(', ')}
              </Text>
            </Stack>
          </HStack>
        </List.Item>
      ))}
    </List.Root>
  );
}

/** "May contain" and other advisories, kept apart from conflicts, with our dotted ring. */
export function AdvisoryRows({ advisories }: { advisories: readonly GuestAdvisory[] }) {
  const rows = advisoryRows(advisories);
  if (rows.length === 0) return null;
  return (
    <Stack gap="2">
      <Text textStyle="sm" fontWeight="semibold" color="caramel.fg">
        Advisories — a word with the guest, not a conflict
      </Text>
      <List.Root as="ul" listStyleType="none" gap="2" aria-label="Advisories">
        {rows.map((row) => (
          <List.Item key={row.key} display="block">
            <HStack gap="2" align="start">
              <Box color="caramel.fg" mt="0.5" flexShrink="0">
                <TraceIcon boxSize="4.5" aria-hidden />
              </Box>
              <Stack gap="0.5" minW="0">
                <Text>{row.title}</Text>
                <Text textStyle="sm" color="fg.muted" overflowWrap="anywhere">
                  {row.kind === 'may_contain'
                    ? `In ${row.components
                        .map((c) => `${c.name} (${c.carriers.join(', ')})`)
                        .join('; ')}.`
                    : row.detail}
                </Text>
              </Stack>
            </HStack>
          </List.Item>
        ))}
      </List.Root>
    </Stack>
  );
}
