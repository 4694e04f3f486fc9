import { Badge, Button, Flex, Heading, Stack, Text } from '@chakra-ui/react';
import { plural } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import { Link as RouterLink, useParams, type LoaderFunctionArgs } from 'react-router';
import { EmptyState } from '../../../components/ui/empty-state';
import { AllergyIcon, GuestsIcon, TraceIcon } from '../../../components/ui/icons';
import { paths } from '../../../config/paths';
import {
  allergyNotesQueryOptions,
  useAllergyNotes,
} from '../../../features/allergy-notes/api/get-allergy-notes';
import { AccessLog } from '../../../features/allergy-notes/components/access-log';
import { CautionLine } from '../../../features/allergy-notes/components/caution-line';
import { GuestCard } from '../../../features/allergy-notes/components/guest-card';
import { ClearIcon, SwapIcon } from '../../../features/allergy-notes/components/icons';
import { BlockSkeleton, LoadError } from '../../../features/allergy-notes/components/load-states';
import {
  hasRequirement,
  unresolvedPlates,
} from '../../../features/allergy-notes/lib/allergen-words';
import { formatEventDate } from '../../../features/allergy-notes/lib/event-window';
import { BackLink, warmAfterSignIn, WithNotesViewer, type NotesViewer } from './viewer-shell';

export const orderAllergyNotesLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    const id = params.orderId;
    if (id)
      warmAfterSignIn(queryClient, () => queryClient.ensureQueryData(allergyNotesQueryOptions(id)));
    return null;
  };

const STATUS_WORDS: Record<string, string> = {
  pending_payment: 'Awaiting payment',
  requested: 'Awaiting the chef',
  confirmed: 'Confirmed',
  completed: 'Served',
  expired: 'Expired',
  declined: 'Declined',
  cancelled: 'Cancelled',
};

/** `/allergy-notes/:orderId`: every guest against every dessert; the chef changes plates. */
export function OrderAllergyNotesRoute() {
  const { orderId = '' } = useParams();
  return (
    <WithNotesViewer title="Allergy notes">
      {(viewer) => <OrderAllergyNotes orderId={orderId} viewer={viewer} />}
    </WithNotesViewer>
  );
}

function OrderAllergyNotes({ orderId, viewer }: { orderId: string; viewer: NotesViewer }) {
  const notes = useAllergyNotes(orderId);
  if (notes.isPending) return <BlockSkeleton label="Loading the allergy notes…" />;
  if (notes.isError) {
    return (
      <Stack gap="4">
        <BackLink to={paths.allergyNotes.getHref()}>All events</BackLink>
        <Heading as="h1" fontSize={{ base: '3xl', md: '4xl' }} fontWeight="normal">
          Allergy notes
        </Heading>
        <LoadError
          title="These allergy notes could not be loaded"
          error={notes.error}
          onRetry={() => void notes.refetch()}
          retrying={notes.isFetching}
        />
      </Stack>
    );
  }
  const data = notes.data;
  // In the order the client gave (by seat): a card does not move when its plate is resolved.
  const guests = data.guests.filter(hasRequirement);
  const open = unresolvedPlates(data.guests);
  const changed = data.guests.reduce(
    (n, g) => n + g.plates.filter((p) => p.substitution !== null).length,
    0,
  );
  const advisories = data.guests.reduce(
    (n, g) => n + g.plates.reduce((m, p) => m + (p.afterSubstitution ?? p).advisories.length, 0),
    0,
  );
  const canEdit =
    viewer.isChef && ['pending_payment', 'requested', 'confirmed'].includes(data.status);

  return (
    <Stack gap={{ base: '5', md: '7' }}>
      <Stack gap="2">
        <BackLink to={paths.allergyNotes.getHref()}>All events</BackLink>
        <Text color="caramel.fg" fontWeight="semibold" textStyle="sm">
          Allergy notes · {data.reference}
        </Text>
        <Heading as="h1" fontSize={{ base: '3xl', md: '4xl' }} fontWeight="normal">
          {formatEventDate(data.eventDate)}, {data.serviceTime}
        </Heading>
        <Text color="fg.muted">
          {plural(data.guestCount, 'guest')} ·{' '}
          {data.desserts.map((d) => d.name).join(', ') || 'No desserts'}{' '}
          <Badge variant="outline" verticalAlign="text-bottom">
            {STATUS_WORDS[data.status] ?? data.status}
          </Badge>
        </Text>
      </Stack>

      <Flex
        direction={{ base: 'column', md: 'row' }}
        justify="space-between"
        align={{ base: 'stretch', md: 'center' }}
        gap="3"
        borderWidth="1px"
        borderColor="border"
        borderRadius="l3"
        bg="bg.panel"
        p="4"
      >
        <Flex
          as="ul"
          listStyleType="none"
          gap="2"
          wrap="wrap"
          aria-live="polite"
          aria-label="This event at a glance"
        >
          <li>
            <Badge variant="outline" size="lg" gap="1">
              <GuestsIcon boxSize="3.5" aria-hidden />
              {plural(guests.length, 'guest')} with requirements
            </Badge>
          </li>
          <li>
            {open > 0 ? (
              <Badge colorPalette="danger" variant="solid" size="lg" gap="1">
                <AllergyIcon boxSize="3.5" aria-hidden />
                {plural(open, 'plate')} to resolve
              </Badge>
            ) : (
              <Badge colorPalette="accent" variant="subtle" size="lg" gap="1">
                <ClearIcon boxSize="3.5" aria-hidden />
                No conflict left
              </Badge>
            )}
          </li>
          {changed > 0 && (
            <li>
              <Badge variant="subtle" size="lg" gap="1">
                <SwapIcon boxSize="3.5" aria-hidden />
                {plural(changed, 'plate')} changed
              </Badge>
            </li>
          )}
          {advisories > 0 && (
            <li>
              <Badge colorPalette="caramel" variant="subtle" size="lg" gap="1">
                <TraceIcon boxSize="3.5" aria-hidden />
                {plural(advisories, 'advisory', 'advisories')}
              </Badge>
            </li>
          )}
        </Flex>
        <Button asChild variant="outline">
          <RouterLink to={paths.briefing.getHref(data.orderId)}>Staff briefing</RouterLink>
        </Button>
      </Flex>

      <CautionLine />
      {!viewer.isChef && (
        <Text color="fg.muted" textStyle="sm">
          Read-only: the chef records the changes to a guest’s plate.
        </Text>
      )}
      {viewer.isChef && !canEdit && (
        <Text color="fg.muted" textStyle="sm">
          This booking is closed: its plates can no longer change.
        </Text>
      )}

      {guests.length === 0 ? (
        <EmptyState icon={<ClearIcon />} title="No allergies or diets">
          No guest of this event stated an allergy, a diet or a note: every guest gets the standard
          plate.
        </EmptyState>
      ) : (
        <Stack gap="4">
          {guests.map((guest) => (
            <GuestCard
              key={`${guest.guestId}-${guest.label}`}
              orderId={data.orderId}
              guest={guest}
              canEdit={canEdit}
              timeZone={viewer.timeZone}
            />
          ))}
        </Stack>
      )}

      {viewer.isChef && <AccessLog orderId={data.orderId} timeZone={viewer.timeZone} />}
    </Stack>
  );
}
