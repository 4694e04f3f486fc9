import { Container } from '@chakra-ui/react';
import { Role, type AuthUser } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { LoadError } from '../../../components/ui/load-error';
import { PageTitle } from '../../../components/ui/page-title';
import { useMe } from '../../../features/auth/api/get-me';
import { PrepSkeleton } from '../../../features/prep/components/prep-states';
import { studioToday } from '../../../features/prep/lib/dates';
import { studioQueryOptions, useStudio } from '../../../features/studio/api/get-studio';
import { deviceTimeZone } from '../../../lib/studio-time';

/** Who is looking at a Prep screen, and the studio's calendar. */
export interface PrepViewer {
  user: AuthUser;
  /** Costs are the chef's; the API leaves them out for staff. */
  chef: boolean;
  timeZone: string;
  currency: string;
  /** The studio's date now. */
  today: string;
}

/** The studio's date now, for a loader's default (the device's zone if the studio is unreachable). */
export async function loaderToday(queryClient: QueryClient): Promise<string> {
  const studio = await queryClient.ensureQueryData(studioQueryOptions()).catch(() => null);
  return studioToday(studio?.timeZone ?? deviceTimeZone());
}

/** Renders `children` once the signed-in person and the studio's zone are known. */
export function WithPrepViewer({
  title,
  children,
}: {
  title: string;
  children: (viewer: PrepViewer) => ReactNode;
}) {
  const me = useMe();
  const studio = useStudio();
  const [now] = useState(() => new Date());
  if (!me.data) return null; // The layout renders only for a signed-in team member.
  return (
    <>
      <PageTitle>{title}</PageTitle>
      <Container maxW="6xl" py={{ base: '5', md: '10' }} px={{ base: '4', md: '8' }}>
        {studio.isPending ? (
          <PrepSkeleton label="Loading…" />
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
            chef: me.data.role === Role.Chef,
            timeZone: studio.data.timeZone,
            currency: studio.data.currency,
            today: studioToday(studio.data.timeZone, now),
          })
        )}
      </Container>
    </>
  );
}
