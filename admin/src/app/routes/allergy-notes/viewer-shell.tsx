import { Button, Container } from '@chakra-ui/react';
import { Role, type AuthUser } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Link as RouterLink } from 'react-router';
import { ChevronLeftIcon } from '../../../components/ui/icons';
import { PageTitle } from '../../../components/ui/page-title';
import { meQueryOptions, useMe } from '../../../features/auth/api/get-me';
import { studioQueryOptions, useStudio } from '../../../features/studio/api/get-studio';
import { BlockSkeleton, LoadError } from '../../../features/allergy-notes/components/load-states';
import { deviceTimeZone } from '../../../lib/studio-time';

/** Who is reading the allergy notes, and the studio's clock. */
export interface NotesViewer {
  user: AuthUser;
  /** The chef records substitutions and sees the access log; staff read. */
  isChef: boolean;
  timeZone: string;
}

/**
 * Renders `children` once the signed-in person and the studio's time zone are known: a skeleton
 * until then, an error with a retry if the studio cannot be reached.
 */
export function WithNotesViewer({
  title,
  maxW = '6xl',
  children,
}: {
  title: string;
  maxW?: string;
  children: (viewer: NotesViewer) => ReactNode;
}) {
  const me = useMe();
  const studio = useStudio();
  if (!me.data) return null; // The layout renders only for a signed-in team member.
  return (
    <>
      <PageTitle>{title}</PageTitle>
      <Container maxW={maxW} py={{ base: '5', md: '10' }} px={{ base: '4', md: '8' }}>
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
            isChef: me.data.role === Role.Chef,
            timeZone: studio.data.timeZone || deviceTimeZone(),
          })
        )}
      </Container>
    </>
  );
}

/**
 * Starts a screen's reads while its code arrives, once the session is known (after a reload the
 * session is restored first, so the requests carry the token). The screen shows its own errors.
 */
export function warmAfterSignIn(
  queryClient: QueryClient,
  load: (user: AuthUser) => Promise<unknown>,
): void {
  void queryClient.ensureQueryData(studioQueryOptions()).catch(() => undefined);
  void queryClient
    .ensureQueryData(meQueryOptions())
    .then((user) => (user ? load(user) : undefined))
    .catch(() => undefined);
}

export function BackLink({ to, children }: { to: string; children: ReactNode }) {
  return (
    <Button asChild variant="ghost" size="sm" alignSelf="start" ms="-2">
      <RouterLink to={to}>
        <ChevronLeftIcon /> {children}
      </RouterLink>
    </Button>
  );
}
