import { Button, Heading, Stack, Table, Text } from '@chakra-ui/react';
import { useState } from 'react';
import { useAccessLog } from '../api/get-access-log';
import { formatInstant } from '../lib/event-window';
import { BlockSkeleton, LoadError } from './load-states';

const WHAT: Record<string, string> = {
  allergy_notes: 'Opened the allergy notes',
  briefing: 'Opened the staff briefing',
  briefing_pdf: 'Downloaded the briefing PDF',
  guest_list: 'Opened the guest list',
};

const ROLE: Record<string, string> = { chef: 'Chef', staff: 'Staff' };

const FIRST = 15;

/**
 * Who in the studio opened this event's guest data, and when (the chef's view of the API's
 * log). Newest first; the latest few, then all on request.
 */
export function AccessLog({ orderId, timeZone }: { orderId: string; timeZone: string }) {
  const log = useAccessLog(orderId, true);
  const [all, setAll] = useState(false);
  return (
    <Stack as="section" aria-labelledby="access-log-heading" gap="3">
      <Heading as="h2" id="access-log-heading" textStyle="xl">
        Who opened the guests’ data
      </Heading>
      <Text color="fg.muted" textStyle="sm">
        Every opening of this event’s allergy notes, staff briefing or guest list by the studio is
        recorded. The client reading their own guests is not.
      </Text>
      {log.isPending ? (
        <BlockSkeleton label="Loading the access record…" rows={2} />
      ) : log.isError ? (
        <LoadError
          title="The access record could not be loaded"
          error={log.error}
          onRetry={() => void log.refetch()}
          retrying={log.isFetching}
        />
      ) : log.data.length === 0 ? (
        <Text>Nobody has opened it yet.</Text>
      ) : (
        <>
          <Table.ScrollArea borderWidth="1px" borderColor="border" borderRadius="l2">
            <Table.Root size="sm" bg="bg.panel">
              <Table.Caption srOnly>
                Openings of this event’s guest data, newest first
              </Table.Caption>
              <Table.Header>
                <Table.Row>
                  <Table.ColumnHeader>When</Table.ColumnHeader>
                  <Table.ColumnHeader>Who</Table.ColumnHeader>
                  <Table.ColumnHeader>What</Table.ColumnHeader>
                </Table.Row>
              </Table.Header>
              <Table.Body>
                {(all ? log.data : log.data.slice(0, FIRST)).map((entry, i) => (
                  <Table.Row key={`${entry.at}-${i}`}>
                    <Table.Cell whiteSpace="nowrap">{formatInstant(entry.at, timeZone)}</Table.Cell>
                    <Table.Cell>
                      {entry.name ?? 'A removed account'}{' '}
                      <Text as="span" color="fg.muted">
                        ({ROLE[entry.role] ?? entry.role})
                      </Text>
                    </Table.Cell>
                    <Table.Cell>{WHAT[entry.what] ?? entry.what}</Table.Cell>
                  </Table.Row>
                ))}
              </Table.Body>
            </Table.Root>
          </Table.ScrollArea>
          {log.data.length > FIRST && (
            <Button variant="ghost" size="sm" alignSelf="start" onClick={() => setAll((a) => !a)}>
              {all ? `Show the latest ${FIRST}` : `Show all ${log.data.length} openings`}
            </Button>
          )}
        </>
      )}
    </Stack>
  );
}
