import { Box, Skeleton, Stack, Text } from '@chakra-ui/react';
import { storageCaution, type LabelSegment, type PlanRecipeRow } from '@nappe/shared';

/** "2026-12-05 18:30": the planner's zoned time as the labels PDF prints it. */
export const labelTime = (zonedIso: string): string => zonedIso.slice(0, 16).replace('T', ' ');

/**
 * One component label as the PDF prints it: recipe name, made on, use by, storage with its
 * caution, then the ingredient list with allergens in bold (the same segments the PDF gets).
 */
export function LabelPreview({
  row,
  segments,
  state,
}: {
  row: PlanRecipeRow;
  segments: readonly LabelSegment[] | undefined;
  state: 'pending' | 'error' | 'success';
}) {
  const caution = storageCaution(row.storage);
  return (
    <Box
      as="article"
      aria-label={`Label: ${row.recipeName}`}
      borderWidth="1px"
      borderStyle="dashed"
      borderColor="border.emphasized"
      borderRadius="l2"
      bg="white"
      color="fg"
      p="4"
      fontFamily="body"
    >
      <Text fontWeight="bold" textStyle="lg">
        {row.recipeName}
      </Text>
      <Stack gap="0" textStyle="sm" mt="1">
        <Text>Made on {labelTime(row.finishAt)}</Text>
        <Text fontWeight="semibold">Use by {labelTime(row.expiresAt)}</Text>
        <Text>
          Storage: {row.storage}
          {caution ? ` — ${caution}` : ''}
        </Text>
      </Stack>
      <Box textStyle="sm" mt="2">
        {state === 'pending' ? (
          <Stack gap="1" aria-label="Loading the ingredient list">
            <Skeleton height="3" />
            <Skeleton height="3" width="2/3" />
          </Stack>
        ) : state === 'error' || !segments ? (
          <Text color="fg.error">
            The ingredient list could not be loaded here; the PDF still prints it.
          </Text>
        ) : (
          <Text>
            {segments.map((s, i) =>
              s.emphasis ? (
                <Text as="strong" key={i} fontWeight="bold">
                  {s.text}
                </Text>
              ) : (
                <span key={i}>{s.text}</span>
              ),
            )}
          </Text>
        )}
      </Box>
    </Box>
  );
}
