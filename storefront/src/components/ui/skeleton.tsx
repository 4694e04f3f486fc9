import { Skeleton as ChakraSkeleton, Stack, type SkeletonProps } from '@chakra-ui/react';

/** A placeholder block while content loads; hidden from screen readers (the page says "Loading"). */
export function Skeleton(props: SkeletonProps) {
  return <ChakraSkeleton aria-hidden="true" {...props} />;
}

/** A few lines of placeholder text, the last one shorter. */
export function SkeletonLines({ lines = 3, gap = '2' }: { lines?: number; gap?: string }) {
  return (
    <Stack gap={gap} aria-hidden="true">
      {Array.from({ length: lines }, (_, i) => (
        <Skeleton key={i} h="3.5" w={i === lines - 1 ? '60%' : 'full'} />
      ))}
    </Stack>
  );
}
