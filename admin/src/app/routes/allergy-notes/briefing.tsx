import { Heading, Stack } from '@chakra-ui/react';
import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import {
  briefingQueryOptions,
  useBriefing,
} from '../../../features/allergy-notes/api/get-briefing';
import { BriefingView } from '../../../features/allergy-notes/components/briefing-view';
import { BlockSkeleton, LoadError } from '../../../features/allergy-notes/components/load-states';
import { paths } from '../../../config/paths';
import { BackLink, warmAfterSignIn, WithNotesViewer } from './viewer-shell';

export const briefingLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    const id = params.orderId;
    if (id)
      warmAfterSignIn(queryClient, () => queryClient.ensureQueryData(briefingQueryOptions(id)));
    return null;
  };

/**
 * On paper only the briefing: the app's sidebar, top bar and buttons stay on screen. (The API
 * logs the opening; nothing to do here.)
 */
const PRINT_CSS = `@media print {
  aside, header, [data-print-hide] { display: none !important; }
  html, body { background: #fff !important; }
}`;

/** `/allergy-notes/:orderId/briefing` (chef and staff): phone first, by table, printable. */
export function BriefingRoute() {
  const { orderId = '' } = useParams();
  return (
    <WithNotesViewer title="Staff briefing" maxW="3xl">
      {() => <BriefingScreen orderId={orderId} />}
    </WithNotesViewer>
  );
}

function BriefingScreen({ orderId }: { orderId: string }) {
  const briefing = useBriefing(orderId);
  return (
    <Stack gap="4">
      <style>{PRINT_CSS}</style>
      <div data-print-hide>
        <BackLink to={paths.orderAllergyNotes.getHref(orderId)}>The event’s allergy notes</BackLink>
      </div>
      {briefing.isPending ? (
        <BlockSkeleton label="Loading the briefing…" />
      ) : briefing.isError ? (
        <>
          <Heading as="h1" fontSize={{ base: '3xl', md: '4xl' }} fontWeight="normal">
            Staff briefing
          </Heading>
          <LoadError
            title="The briefing could not be loaded"
            error={briefing.error}
            onRetry={() => void briefing.refetch()}
            retrying={briefing.isFetching}
          />
        </>
      ) : (
        <BriefingView briefing={briefing.data} />
      )}
    </Stack>
  );
}
