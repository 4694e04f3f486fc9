import { Button, Container } from '@chakra-ui/react';
import { Role, type AuthUser } from '@nappe/shared';
import type { EnsureQueryDataOptions, QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Link as RouterLink } from 'react-router';
import { BlockSkeleton } from '../../../components/ui/block-skeleton';
import { ChevronLeftIcon } from '../../../components/ui/icons';
import { LoadError } from '../../../components/ui/load-error';
import { PageTitle } from '../../../components/ui/page-title';
import { meQueryOptions, useMe } from '../../../features/auth/api/get-me';
import { studioQueryOptions, useStudio } from '../../../features/studio/api/get-studio';

/** Who is looking at a Kitchen screen, and the studio's currency for its money. */
export interface KitchenViewer {
  user: AuthUser;
  /** The chef edits; staff read. */
  canEdit: boolean;
  /** Costs and prices are the chef's. */
  seesCosts: boolean;
  currency: string;
}

/**
 * Renders `children` with the viewer once the signed-in person and the studio's currency are
 * known; a skeleton until then, an error with a retry if the studio cannot be reached.
 */
export function WithKitchenViewer({
  title,
  children,
}: {
  title: string;
  children: (viewer: KitchenViewer) => ReactNode;
}) {
  const me = useMe();
  const studio = useStudio();
  if (!me.data) return null; // The layout renders only for a signed-in team member.
  const chef = me.data.role === Role.Chef;
  return (
    <>
      <PageTitle>{title}</PageTitle>
      <Container maxW="7xl" py={{ base: '6', md: '10' }} px={{ base: '4', md: '8' }}>
        {studio.isPending ? (
          <BlockSkeleton label="Loading…" />
        ) : studio.isError ? (
          <LoadError
            title="The studio’s settings could not be loaded"
            error={studio.error}
            onRetry={() => void studio.refetch()}
            retrying={studio.isFetching}
          />
        ) : (
          children({
            user: me.data,
            canEdit: chef,
            seesCosts: chef,
            currency: studio.data.currency,
          })
        )}
      </Container>
    </>
  );
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- any query's options
export type AnyQueryOptions = EnsureQueryDataOptions<any, any, any, any>;

/** Starts loading what a Kitchen screen needs while its code arrives; the screen shows its own errors. */
export function warm(queryClient: QueryClient, ...options: AnyQueryOptions[]) {
  void queryClient.ensureQueryData(studioQueryOptions()).catch(() => undefined);
  // After a reload the session is restored first (the layout's loader asks the same query), so
  // these requests carry the token rather than bouncing off a 401 and retrying.
  const signedIn = queryClient.ensureQueryData(meQueryOptions()).catch(() => null);
  for (const o of options) {
    void signedIn.then((user) =>
      user ? queryClient.ensureQueryData(o).catch(() => undefined) : undefined,
    );
  }
}

export function BackLink({ to, children }: { to: string; children: ReactNode }) {
  return (
    <Button asChild variant="ghost" size="sm">
      <RouterLink to={to}>
        <ChevronLeftIcon /> {children}
      </RouterLink>
    </Button>
  );
}
