import type { ReactNode } from 'react';
import { BlockSkeleton } from '../../../components/ui/block-skeleton';
import { LoadError } from '../../../components/ui/load-error';

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
