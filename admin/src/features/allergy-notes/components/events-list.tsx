import {
  Badge,
  Box,
  Button,
  Flex,
  Heading,
  HStack,
  Link,
  Skeleton,
  Stack,
  Text,
} from '@chakra-ui/react';
import { OrderStatus, plural, type OrderSummary } from '@nappe/shared';
import { Link as RouterLink } from 'react-router';
import { AllergyIcon, ChevronRightIcon, TraceIcon } from '../../../components/ui/icons';
import type { AllergyCounts } from '../api/types';
import { formatEventDate } from '../lib/event-window';
import { ClearIcon, SwapIcon } from './icons';

const STATUS_WORDS: Partial<Record<OrderStatus, string>> = {
  [OrderStatus.Requested]: 'Awaiting the chef',
  [OrderStatus.Confirmed]: 'Confirmed',
  [OrderStatus.Completed]: 'Served',
};

/** The counts of one event, in words with an icon each (never colour alone). */
export function EventCounts({
  counts,
  loading,
}: {
  counts: AllergyCounts | undefined;
  loading: boolean;
}) {
  if (!counts) {
    return loading ? (
      <Skeleton height="6" width="56" aria-hidden />
    ) : (
      <Text textStyle="sm" color="fg.muted">
        Counts unavailable
      </Text>
    );
  }
  if (counts.problem) {
    return (
      <Badge colorPalette="danger" variant="subtle" size="lg" gap="1" whiteSpace="normal">
        <AllergyIcon boxSize="3.5" aria-hidden />
        Plates cannot be checked: {counts.problem}
      </Badge>
    );
  }
  if (counts.guestsWithRequirements === 0) {
    return (
      <Text textStyle="sm" color="fg.muted">
        No guest stated an allergy or a diet.
      </Text>
    );
  }
  return (
    <Flex gap="1.5" wrap="wrap" as="ul" listStyleType="none">
      <li>
        <Badge variant="outline" size="lg">
          {plural(counts.guestsWithRequirements, 'guest')} with requirements
        </Badge>
      </li>
      <li>
        {counts.unresolvedPlates > 0 ? (
          <Badge colorPalette="danger" variant="solid" size="lg" gap="1">
            <AllergyIcon boxSize="3.5" aria-hidden />
            {plural(counts.unresolvedPlates, 'plate')} to resolve
          </Badge>
        ) : (
          <Badge colorPalette="accent" variant="subtle" size="lg" gap="1">
            <ClearIcon boxSize="3.5" aria-hidden />
            No conflict left
          </Badge>
        )}
      </li>
      {counts.substitutions > 0 && (
        <li>
          <Badge variant="subtle" size="lg" gap="1">
            <SwapIcon boxSize="3.5" aria-hidden />
            {plural(counts.substitutions, 'plate')} changed
          </Badge>
        </li>
      )}
      {counts.advisoryCount > 0 && (
        <li>
          <Badge colorPalette="caramel" variant="subtle" size="lg" gap="1">
            <TraceIcon boxSize="3.5" aria-hidden />
            {plural(counts.advisoryCount, 'cross-contact advisory', 'cross-contact advisories')}
          </Badge>
        </li>
      )}
    </Flex>
  );
}

/** Events as a list of cards: one column on a phone, the counts under the event. */
export function EventsList({
  events,
  counts,
  countsLoading,
  hrefOf,
  briefingHrefOf,
}: {
  events: readonly OrderSummary[];
  counts: ReadonlyMap<string, AllergyCounts>;
  countsLoading: boolean;
  hrefOf: (orderId: string) => string;
  briefingHrefOf: (orderId: string) => string;
}) {
  return (
    <Stack as="ul" listStyleType="none" gap="3">
      {events.map((event) => (
        <Box
          as="li"
          key={event.id}
          borderWidth="1px"
          borderColor="border"
          borderRadius="l3"
          bg="bg.panel"
          px={{ base: '4', md: '5' }}
          py="4"
        >
          <Flex
            direction={{ base: 'column', md: 'row' }}
            gap="3"
            justify="space-between"
            align={{ base: 'stretch', md: 'center' }}
          >
            <Stack gap="2" minW="0">
              <Heading as="h3" textStyle="lg" fontFamily="body" fontWeight="semibold">
                <Link asChild color="fg" textDecoration="underline" textUnderlineOffset="3px">
                  <RouterLink to={hrefOf(event.id)}>
                    {formatEventDate(event.eventDate, 'short')}, {event.serviceTime} —{' '}
                    {event.menuName}
                  </RouterLink>
                </Link>
              </Heading>
              <HStack gap="2" wrap="wrap" color="fg.muted" textStyle="sm">
                <Text>{event.reference}</Text>
                <Text aria-hidden>·</Text>
                <Text>{plural(event.guestCount, 'guest')}</Text>
                <Text aria-hidden>·</Text>
                <Text>{event.clientName || 'Client'}</Text>
                <Badge variant="outline" size="sm">
                  {STATUS_WORDS[event.status] ?? event.status}
                </Badge>
              </HStack>
              <EventCounts counts={counts.get(event.id)} loading={countsLoading} />
            </Stack>
            <HStack gap="2" flexShrink="0">
              <Button asChild variant="outline" size="sm">
                <RouterLink
                  to={briefingHrefOf(event.id)}
                  aria-label={`Staff briefing, ${event.reference}`}
                >
                  Staff briefing
                </RouterLink>
              </Button>
              <Button asChild size="sm">
                <RouterLink to={hrefOf(event.id)} aria-label={`Open notes, ${event.reference}`}>
                  Open notes <ChevronRightIcon />
                </RouterLink>
              </Button>
            </HStack>
          </Flex>
        </Box>
      ))}
    </Stack>
  );
}
