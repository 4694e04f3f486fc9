import { Box, Skeleton, Stack, VisuallyHidden, type BoxProps } from '@chakra-ui/react';

/** Grey bars in the shape of what is coming, announced once to screen readers. */
export function BlockSkeleton({
  label,
  rows = 6,
  headHeight = '10',
  rowHeight = '8',
}: {
  /** "Loading desserts…", for screen readers. */
  label: string;
  rows?: number;
  /** The first, shorter bar: where the heading or filter will be. */
  headHeight?: BoxProps['height'];
  /** Each row: a table line, or a taller card. */
  rowHeight?: BoxProps['height'];
}) {
  return (
    <Box role="status">
      <VisuallyHidden>{label}</VisuallyHidden>
      <Stack gap="3" aria-hidden>
        <Skeleton height={headHeight} width="full" maxW="sm" />
        {Array.from({ length: rows }, (_, i) => (
          <Skeleton key={i} height={rowHeight} width={i % 3 === 2 ? '3/4' : 'full'} />
        ))}
      </Stack>
    </Box>
  );
}
