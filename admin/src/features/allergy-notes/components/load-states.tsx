import type { ComponentProps } from 'react';
import { BlockSkeleton as SharedBlockSkeleton } from '../../../components/ui/block-skeleton';
import { LoadError as SharedLoadError } from '../../../components/ui/load-error';
import { describeError } from '../lib/describe-error';

/** Something that could not be loaded, in the allergy notes' words, with a retry that works. */
export function LoadError(
  props: Omit<ComponentProps<typeof SharedLoadError>, 'error' | 'describe'> & { error: unknown },
) {
  return <SharedLoadError {...props} describe={describeError} />;
}

/** Grey bars in the shape of the cards that are coming, announced once to screen readers. */
export function BlockSkeleton({ label, rows = 5 }: { label: string; rows?: number }) {
  return <SharedBlockSkeleton label={label} rows={rows} rowHeight="16" />;
}
