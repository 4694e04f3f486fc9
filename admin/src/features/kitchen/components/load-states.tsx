import { Box, EmptyState, Skeleton, Stack, VisuallyHidden } from '@chakra-ui/react';
import type { ReactNode } from 'react';
import { LoadError } from '../../../components/ui/load-error';

/** Grey bars in the shape of what is coming, announced once to screen readers. */
export function BlockSkeleton({ label, rows = 6 }: { label: string; rows?: number }) {
  return (
    <Box role="status">
      <VisuallyHidden>{label}</VisuallyHidden>
      <Stack gap="3" aria-hidden>
        <Skeleton height="10" width="full" maxW="sm" />
        {Array.from({ length: rows }, (_, i) => (
          <Skeleton key={i} height="8" width={i % 3 === 2 ? '3/4' : 'full'} />
        ))}
      </Stack>
    </Box>
  );
}

/** What `QueryGate` reads of a query (or of several read together). */
interface GateQuery<T> {
  data: T | undefined;
  error: unknown;
  isFetching: boolean;
  refetch: () => unknown;
}

/** Renders `children` with the query's data once loaded; a skeleton until then, or the error. */
export function QueryGate<T>({
  query,
  loading,
  failed,
  children,
}: {
  query: GateQuery<T>;
  /** "Loading desserts…", for screen readers. */
  loading: string;
  /** "The desserts could not be loaded". */
  failed: string;
  children: (data: T) => ReactNode;
}) {
  if (query.error) {
    return (
      <LoadError
        title={failed}
        error={query.error}
        onRetry={() => void query.refetch()}
        retrying={query.isFetching}
      />
    );
  }
  if (query.data === undefined) return <BlockSkeleton label={loading} />;
  return children(query.data);
}

/** Nothing here yet, and what to do about it. */
export function KitchenEmpty({
  icon,
  title,
  children,
  action,
}: {
  icon: ReactNode;
  title: string;
  children: ReactNode;
  action?: ReactNode;
}) {
  return (
    <EmptyState.Root
      borderWidth="1px"
      borderStyle="dashed"
      borderColor="border.emphasized"
      borderRadius="l3"
      bg="bg.panel"
    >
      <EmptyState.Content>
        <EmptyState.Indicator color="caramel.fg">{icon}</EmptyState.Indicator>
        <EmptyState.Title fontFamily="heading" textStyle="xl">
          {title}
        </EmptyState.Title>
        <EmptyState.Description color="fg.muted" textAlign="center" maxW="md">
          {children}
        </EmptyState.Description>
        {action}
      </EmptyState.Content>
    </EmptyState.Root>
  );
}
