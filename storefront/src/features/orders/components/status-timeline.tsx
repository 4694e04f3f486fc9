import { Text, Timeline } from '@chakra-ui/react';
import type { OrderEvent } from '@nappe/shared';
import { dateTime } from '../../../lib/dates';

function byWhom(actor: OrderEvent['actor']): string {
  switch (actor.role) {
    case 'client':
      return 'by you';
    case 'chef':
      return actor.name ? `by ${actor.name}, the chef` : 'by the chef';
    case 'staff':
      return actor.name ? `by ${actor.name}` : 'by the studio';
    case 'system':
      return 'automatically';
  }
}

/** What happened to the booking and when, oldest first, as the server recorded it. */
export function StatusTimeline({ events }: { events: readonly OrderEvent[] }) {
  const sorted = [...events].sort((a, b) => Date.parse(a.at) - Date.parse(b.at));
  return (
    <Timeline.Root size="md" variant="subtle" as="ol">
      {sorted.map((event, i) => (
        <Timeline.Item key={event.id} as="li">
          <Timeline.Connector>
            <Timeline.Separator />
            <Timeline.Indicator
              bg={i === sorted.length - 1 ? 'accent.solid' : 'bg.emphasized'}
              color={i === sorted.length - 1 ? 'accent.contrast' : 'fg'}
              boxSize="3"
            />
          </Timeline.Connector>
          <Timeline.Content pb="5">
            <Timeline.Title fontWeight="medium">{event.summary}</Timeline.Title>
            <Timeline.Description color="fg.muted">
              <time dateTime={event.at}>{dateTime(event.at)}</time>, {byWhom(event.actor)}
            </Timeline.Description>
            {event.reason && (
              <Text textStyle="sm" color="fg.muted">
                Reason: {event.reason}
              </Text>
            )}
          </Timeline.Content>
        </Timeline.Item>
      ))}
    </Timeline.Root>
  );
}
