import {
  Alert,
  Box,
  Button,
  chakra,
  Code,
  Heading,
  HStack,
  List,
  Stack,
  Table,
  Text,
} from '@chakra-ui/react';
import {
  DIET_LABELS,
  DIETS,
  EU_ALLERGEN_GROUPS,
  guestAllergenLabel,
  plural,
  type GuestRequirement,
} from '@nappe/shared';
import { useId, useRef, useState, type ReactNode } from 'react';
import { DownloadIcon, UploadIcon } from '../../../components/ui/booking-icons';
import { CheckIcon } from '../../../components/ui/icons';
import {
  GUEST_CSV_COLUMNS,
  GUEST_CSV_MAX_BYTES,
  GUEST_CSV_PARSE_OPTIONS,
  GUEST_CSV_TEMPLATE,
  readGuestCsv,
  type GuestCsvPreview,
} from '../csv/guest-csv';
import { allergenLabel, dietLabel, sortAllergens } from '../form/guest-form';

const Details = chakra('details');
const Summary = chakra('summary');

const TEMPLATE_HREF = `data:text/csv;charset=utf-8,${encodeURIComponent(GUEST_CSV_TEMPLATE)}`;

/** Where the columns of a guest list are explained, with a template to download. */
export function CsvColumnsHelp() {
  return (
    <Details borderWidth="1px" borderColor="border" borderRadius="l2" bg="bg.panel" px="4" py="3">
      <Summary cursor="pointer" fontWeight="medium" textStyle="sm">
        How to lay out the file
      </Summary>
      <Stack gap="3" mt="3" textStyle="sm">
        <Text>
          A CSV file (save as “CSV UTF-8” from a spreadsheet), with these column names in the first
          row, one guest per row below. Only guests with an allergy or a diet need a row. Put a cell
          that contains a comma in double quotes.
        </Text>
        <List.Root as="ul" gap="1.5" ps="4">
          {GUEST_CSV_COLUMNS.map((c) => (
            <List.Item key={c.column}>
              <Code>{c.column}</Code> ({c.required ? 'required' : 'optional'}): {c.description}{' '}
              <Text as="span" color="fg.muted">
                For example: {c.example}
              </Text>
            </List.Item>
          ))}
        </List.Root>
        <Text>
          <Text as="span" fontWeight="medium">
            Allergen groups:
          </Text>{' '}
          {EU_ALLERGEN_GROUPS.map((g) => `${guestAllergenLabel(g)} (${g})`).join(', ')}.
        </Text>
        <Text>
          <Text as="span" fontWeight="medium">
            Diets:
          </Text>{' '}
          {DIETS.map((d) => DIET_LABELS[d].toLowerCase()).join(', ')}.
        </Text>
        <Button asChild size="sm" variant="outline" alignSelf="start">
          <a href={TEMPLATE_HREF} download="guest-list-template.csv">
            <DownloadIcon /> Download the template (CSV)
          </a>
        </Button>
      </Stack>
    </Details>
  );
}

/**
 * Import a guest list from a CSV file: the file is read in the browser (it is never uploaded
 * as a file), shown as a preview with a problem for each row that cannot be taken, and only
 * added once every row is right.
 */
export function CsvImport({
  onAccept,
  before,
}: {
  onAccept: (guests: GuestRequirement[]) => void;
  /** Buttons to show in the same row, before "Import a guest list". */
  before?: ReactNode;
}) {
  const inputId = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const [fileName, setFileName] = useState<string | null>(null);
  const [preview, setPreview] = useState<GuestCsvPreview | null>(null);
  const [readError, setReadError] = useState<string | null>(null);
  const [reading, setReading] = useState(false);

  async function read(file: File) {
    setFileName(file.name);
    setPreview(null);
    setReadError(null);
    if (file.size > GUEST_CSV_MAX_BYTES) {
      setReadError(
        'This file is larger than 1 MB. A guest list is usually a few kilobytes: is it the right file?',
      );
      return;
    }
    setReading(true);
    try {
      const [text, { default: Papa }] = await Promise.all([file.text(), import('papaparse')]);
      const result = Papa.parse<Record<string, string | undefined>>(text, {
        ...GUEST_CSV_PARSE_OPTIONS,
      });
      setPreview(readGuestCsv(result));
    } catch {
      setReadError('This file could not be read. Save it as CSV (UTF-8) and choose it again.');
    } finally {
      setReading(false);
    }
  }

  function reset() {
    setFileName(null);
    setPreview(null);
    setReadError(null);
    if (inputRef.current) inputRef.current.value = '';
  }

  const bad = preview ? preview.rows.filter((r) => r.errors.length > 0).length : 0;
  const acceptable =
    preview !== null && preview.fileErrors.length === 0 && bad === 0 && preview.rows.length > 0;

  return (
    <Stack gap="3" minW="0">
      <HStack gap="3" wrap="wrap">
        {before}
        <chakra.input
          ref={inputRef}
          id={inputId}
          type="file"
          accept=".csv,text/csv"
          aria-label="Choose a CSV file"
          srOnly
          onChange={(e) => {
            const file = e.currentTarget.files?.[0];
            if (file) void read(file);
          }}
        />
        <Button
          variant="outline"
          onClick={() => inputRef.current?.click()}
          loading={reading}
          loadingText="Reading the file…"
        >
          <UploadIcon />{' '}
          {preview || readError ? 'Choose another file' : 'Import a guest list (CSV)'}
        </Button>
      </HStack>

      {readError && (
        <Alert.Root status="error" role="alert" borderRadius="l2">
          <Alert.Indicator />
          <Alert.Content>
            <Alert.Title>{fileName}</Alert.Title>
            <Alert.Description>{readError}</Alert.Description>
          </Alert.Content>
        </Alert.Root>
      )}

      {preview && (
        <Box
          as="section"
          aria-labelledby={`${inputId}-preview`}
          borderWidth="1px"
          borderColor={acceptable ? 'accent.border' : 'border.error'}
          borderRadius="l3"
          p={{ base: '3', md: '4' }}
          bg="bg.panel"
        >
          <Stack gap="3">
            <Stack gap="1">
              <Heading
                as="h4"
                id={`${inputId}-preview`}
                fontSize="md"
                fontFamily="body"
                fontWeight="semibold"
              >
                Preview of {fileName}
              </Heading>
              <Text textStyle="sm" color={acceptable ? 'fg.muted' : 'fg.error'} role="status">
                {preview.fileErrors.length > 0
                  ? 'This file cannot be imported as it is.'
                  : bad > 0
                    ? `${plural(preview.rows.length, 'guest')} read; ${plural(bad, 'row')} ${bad === 1 ? 'has a problem' : 'have problems'}. Correct ${bad === 1 ? 'it' : 'them'} in your file, save it and choose it again: nothing is added until every row is right.`
                    : `${plural(preview.rows.length, 'guest')} ready to add. Check them, then add them to your list.`}
              </Text>
            </Stack>
            {bad > 0 && (
              <List.Root as="ul" ps="5" gap="1" textStyle="sm" color="fg.error">
                {preview.rows
                  .filter((r) => r.errors.length > 0)
                  .flatMap((r) =>
                    r.errors.map((e) => (
                      <List.Item key={`${r.rowNumber}-${e}`}>
                        Row {r.rowNumber}
                        {r.cells.name ? ` (${r.cells.name})` : ''}: {e}
                      </List.Item>
                    )),
                  )}
              </List.Root>
            )}
            {preview.fileErrors.length > 0 && (
              <Alert.Root status="error" borderRadius="l2">
                <Alert.Indicator />
                <Alert.Content>
                  <List.Root as="ul" ps="4">
                    {preview.fileErrors.map((e) => (
                      <List.Item key={e}>{e}</List.Item>
                    ))}
                  </List.Root>
                </Alert.Content>
              </Alert.Root>
            )}
            {preview.ignoredColumns.length > 0 && (
              <Text textStyle="sm" color="fg.muted">
                Not imported (unknown column{preview.ignoredColumns.length > 1 ? 's' : ''}):{' '}
                {preview.ignoredColumns.map((c) => `“${c}”`).join(', ')}.
              </Text>
            )}
            {preview.rows.length > 0 && (
              <Table.ScrollArea borderWidth="1px" borderColor="border" borderRadius="l2" maxH="96">
                <Table.Root size="sm" stickyHeader>
                  <Table.Caption srOnly>Guests read from {fileName}</Table.Caption>
                  <Table.Header>
                    <Table.Row bg="bg.muted">
                      <Table.ColumnHeader>Row</Table.ColumnHeader>
                      <Table.ColumnHeader>Name</Table.ColumnHeader>
                      <Table.ColumnHeader>Table</Table.ColumnHeader>
                      <Table.ColumnHeader>Allergens</Table.ColumnHeader>
                      <Table.ColumnHeader>Diets</Table.ColumnHeader>
                      <Table.ColumnHeader>Notes</Table.ColumnHeader>
                      <Table.ColumnHeader>Check</Table.ColumnHeader>
                    </Table.Row>
                  </Table.Header>
                  <Table.Body>
                    {preview.rows.map((row) => (
                      <Table.Row
                        key={row.rowNumber}
                        bg={row.errors.length > 0 ? 'bg.error' : 'bg.panel'}
                        verticalAlign="top"
                      >
                        <Table.Cell>{row.rowNumber}</Table.Cell>
                        <Table.Cell>{row.cells.name || '—'}</Table.Cell>
                        <Table.Cell>{row.cells.table}</Table.Cell>
                        <Table.Cell>
                          {row.requirement
                            ? sortAllergens(row.requirement.allergens).map(allergenLabel).join(', ')
                            : row.cells.allergens}
                        </Table.Cell>
                        <Table.Cell>
                          {row.requirement
                            ? row.requirement.diets.map(dietLabel).join(', ')
                            : row.cells.diets}
                        </Table.Cell>
                        <Table.Cell maxW="48" whiteSpace="normal">
                          {row.cells.notes}
                        </Table.Cell>
                        <Table.Cell minW="56" whiteSpace="normal">
                          {row.errors.length > 0 ? (
                            <Stack gap="1" color="fg.error">
                              {row.errors.map((e) => (
                                <Text key={e}>
                                  <Text as="span" fontWeight="semibold">
                                    Row {row.rowNumber}:
                                  </Text>{' '}
                                  {e}
                                </Text>
                              ))}
                            </Stack>
                          ) : (
                            <HStack gap="1" color="fg.success">
                              <CheckIcon boxSize="4" />
                              <span>Ready</span>
                            </HStack>
                          )}
                        </Table.Cell>
                      </Table.Row>
                    ))}
                  </Table.Body>
                </Table.Root>
              </Table.ScrollArea>
            )}
            <HStack gap="3" wrap="wrap">
              <Button
                colorPalette="accent"
                disabled={!acceptable}
                onClick={() => {
                  if (!acceptable) return;
                  onAccept(preview.rows.map((r) => r.requirement!));
                  reset();
                }}
              >
                {acceptable
                  ? `Add ${plural(preview.rows.length, 'guest')} to the list`
                  : 'Add these guests'}
              </Button>
              <Button variant="ghost" onClick={reset}>
                Cancel the import
              </Button>
            </HStack>
          </Stack>
        </Box>
      )}
    </Stack>
  );
}
