import { Alert, Badge, Box, Button, Heading, HStack, List, Stack, Text } from '@chakra-ui/react';
import { plural } from '@nappe/shared';
import { AllergyIcon, TraceIcon } from '../../../components/ui/icons';
import { useDownloadBriefingPdf } from '../api/download-briefing-pdf';
import type { Briefing, BriefingGuest } from '../api/types';
import { describeError } from '../lib/describe-error';
import { formatEventDate } from '../lib/event-window';
import { CautionLine } from './caution-line';
import { ClearIcon, DocumentIcon, PrintIcon, SwapIcon } from './icons';

/** The lines of one table, grouped by guest (the API gives one line per guest and dessert). */
function byGuest(
  lines: readonly BriefingGuest[],
): Array<{ guest: string; lines: BriefingGuest[] }> {
  const groups: Array<{ guest: string; lines: BriefingGuest[] }> = [];
  for (const line of lines) {
    const last = groups.at(-1);
    if (last && last.guest === line.guest) last.lines.push(line);
    else groups.push({ guest: line.guest, lines: [line] });
  }
  return groups;
}

function PlateLine({ line }: { line: BriefingGuest }) {
  return (
    <Stack gap="2" borderTopWidth="1px" borderColor="border" pt="3">
      <HStack justify="space-between" align="start" gap="2" wrap="wrap">
        <Text textStyle="lg" fontWeight="semibold">
          {line.dessert}
        </Text>
        {/* A changed plate that still conflicts; an untouched one already says so in words. */}
        {line.unresolved && !line.change.startsWith('NOT RESOLVED') && (
          <Badge colorPalette="danger" variant="solid" size="lg" gap="1">
            <AllergyIcon boxSize="4" aria-hidden />
            Not resolved
          </Badge>
        )}
      </HStack>
      <HStack gap="2" align="start">
        {line.unresolved ? (
          <AllergyIcon boxSize="5" mt="1" color="danger.fg" flexShrink="0" aria-hidden />
        ) : (
          <SwapIcon boxSize="5" mt="1" flexShrink="0" aria-hidden />
        )}
        <Text textStyle="xl" fontWeight="medium" color={line.unresolved ? 'danger.fg' : 'fg'}>
          {line.change}
        </Text>
      </HStack>
      {line.why.length > 0 && (
        <Box>
          <Text textStyle="sm" color="fg.muted" fontWeight="semibold">
            Why
          </Text>
          <List.Root ps="5" gap="1" textStyle="md">
            {line.why.map((why) => (
              <List.Item key={why}>{why}</List.Item>
            ))}
          </List.Root>
        </Box>
      )}
      {line.advisories.length > 0 && (
        <Box>
          <HStack gap="1.5" color="caramel.fg">
            <TraceIcon boxSize="4" aria-hidden />
            <Text textStyle="sm" fontWeight="semibold">
              Tell or ask the guest
            </Text>
          </HStack>
          <List.Root ps="5" gap="1" textStyle="md">
            {line.advisories.map((a) => (
              <List.Item key={a}>{a}</List.Item>
            ))}
          </List.Root>
        </Box>
      )}
    </Stack>
  );
}

/**
 * The staff briefing, phone first: by table, each guest whose plate changes or needs a word,
 * what changes and why, in large type; one column; printable as it is, or as the PDF.
 */
export function BriefingView({ briefing }: { briefing: Briefing }) {
  const download = useDownloadBriefingPdf();
  const changed = briefing.guestCount - briefing.standardPlates;
  const unresolved = briefing.tables.reduce(
    (n, t) => n + t.guests.filter((g) => g.unresolved).length,
    0,
  );
  return (
    <Stack gap={{ base: '5', md: '6' }} maxW="3xl" textStyle="lg">
      <Stack gap="2">
        <Text color="caramel.fg" fontWeight="semibold" textStyle="sm">
          Staff briefing · {briefing.reference}
        </Text>
        <Heading as="h1" fontSize={{ base: '3xl', md: '4xl' }} fontWeight="normal">
          {briefing.occasion}
        </Heading>
        <Text textStyle="xl">
          {formatEventDate(briefing.eventDate)}, service {briefing.serviceTime}
        </Text>
        {briefing.venue.length > 0 && <Text color="fg.muted">{briefing.venue.join(', ')}</Text>}
        <Text>
          {plural(briefing.guestCount, 'guest')}:{' '}
          {plural(briefing.standardPlates, 'standard plate')}
          {changed > 0 ? `, ${plural(changed, 'guest')} below` : ''}.
        </Text>
      </Stack>

      <HStack gap="2" wrap="wrap" data-print-hide>
        <Button
          size="lg"
          loading={download.isPending}
          loadingText="Preparing the PDF…"
          onClick={() => download.mutate(briefing.orderId)}
        >
          <DocumentIcon /> Download PDF
        </Button>
        <Button size="lg" variant="outline" onClick={() => window.print()}>
          <PrintIcon /> Print
        </Button>
      </HStack>
      {download.isError && (
        <Alert.Root status="error" role="alert" borderRadius="l2" data-print-hide>
          <Alert.Indicator />
          <Alert.Content>
            <Alert.Title>The PDF could not be downloaded</Alert.Title>
            <Alert.Description>{describeError(download.error)}</Alert.Description>
          </Alert.Content>
        </Alert.Root>
      )}

      {unresolved > 0 && (
        <Alert.Root status="error" borderRadius="l2">
          <Alert.Indicator>
            <AllergyIcon />
          </Alert.Indicator>
          <Alert.Content>
            <Alert.Title>{plural(unresolved, 'plate')} not resolved yet</Alert.Title>
            <Alert.Description>
              Do not serve those guests the standard plate. Ask the chef before service.
            </Alert.Description>
          </Alert.Content>
        </Alert.Root>
      )}

      <CautionLine />

      {briefing.tables.length === 0 ? (
        <HStack
          gap="3"
          align="start"
          borderWidth="1px"
          borderColor="border"
          borderRadius="l3"
          p="4"
          bg="bg.panel"
        >
          <ClearIcon boxSize="6" color="fg.success" aria-hidden />
          <Text>
            Every guest gets the standard plate: nobody at this event stated an allergy or a diet
            that changes a plate.
          </Text>
        </HStack>
      ) : (
        briefing.tables.map((table) => (
          <Box
            as="section"
            key={table.table}
            aria-labelledby={`table-${table.table}`}
            css={{ breakInside: 'avoid-page' }}
          >
            <Heading
              as="h2"
              id={`table-${table.table}`}
              fontSize={{ base: '2xl', md: '3xl' }}
              mb="3"
            >
              {/^\d+$/.test(table.table) ? `Table ${table.table}` : table.table}
            </Heading>
            <Stack gap="3">
              {byGuest(table.guests).map((group, i) => (
                <Box
                  as="article"
                  key={`${group.guest}-${i}`}
                  aria-label={group.guest}
                  borderWidth="1px"
                  borderColor={group.lines.some((l) => l.unresolved) ? 'danger.border' : 'border'}
                  borderRadius="l3"
                  bg="bg.panel"
                  p="4"
                  css={{ breakInside: 'avoid' }}
                >
                  <Heading as="h3" textStyle="xl" fontFamily="body" fontWeight="semibold" mb="1">
                    {group.guest}
                  </Heading>
                  <Stack gap="3">
                    {group.lines.map((line) => (
                      <PlateLine key={line.dessert} line={line} />
                    ))}
                  </Stack>
                </Box>
              ))}
            </Stack>
          </Box>
        ))
      )}
    </Stack>
  );
}
