import { Container, Heading, Stack, Text } from '@chakra-ui/react';
import { Role } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { BlockSkeleton } from '../../../components/ui/block-skeleton';
import { LoadError } from '../../../components/ui/load-error';
import { PageTitle } from '../../../components/ui/page-title';
import { meQueryOptions, useMe } from '../../../features/auth/api/get-me';
import { RequireRole } from '../../../features/auth/components/require-role';
import { useUnsavedChangesGuard } from '../../../features/kitchen/components/unsaved-changes-guard';
import {
  studioSettingsQueryOptions,
  useStudioSettings,
} from '../../../features/studio/api/get-studio-settings';
import { SettingsForm } from '../../../features/studio/components/settings-form';

/** Starts loading the settings while the screen's code arrives — for the chef only. */
export const settingsLoader = (queryClient: QueryClient) => async () => {
  const user = await queryClient.ensureQueryData(meQueryOptions()).catch(() => null);
  if (user?.role === Role.Chef) void queryClient.prefetchQuery(studioSettingsQueryOptions());
  return null;
};

export function SettingsRoute() {
  const me = useMe();
  if (!me.data) return null; // The layout renders only for a signed-in team member.
  return (
    <RequireRole user={me.data} roles={[Role.Chef]}>
      <Settings />
    </RequireRole>
  );
}

function Settings() {
  const settings = useStudioSettings();
  const [dirty, setDirty] = useState(false);
  const guard = useUnsavedChangesGuard(dirty);

  return (
    <>
      <PageTitle>Studio settings</PageTitle>
      <Container maxW="4xl" py={{ base: '6', md: '10' }} px={{ base: '4', md: '8' }}>
        <Stack gap="2" mb={{ base: '6', md: '8' }}>
          <Text color="caramel.fg" fontWeight="semibold" textStyle="sm">
            Studio
          </Text>
          <Heading as="h1" fontSize={{ base: '3xl', md: '4xl' }} fontWeight="normal">
            Settings
          </Heading>
          <Text color="fg.muted" maxW="2xl">
            The studio’s card, money and booking terms, the kitchen’s capacity and calendar, and how
            long guest details are kept.
          </Text>
        </Stack>
        {settings.isPending ? (
          <BlockSkeleton label="Loading the settings…" rows={10} />
        ) : settings.isError ? (
          <LoadError
            title="The settings could not be loaded"
            error={settings.error}
            onRetry={() => void settings.refetch()}
            retrying={settings.isFetching}
          />
        ) : (
          <SettingsForm settings={settings.data} onDirtyChange={setDirty} />
        )}
      </Container>
      {guard.dialog}
    </>
  );
}
