import {
  ALLERGENIC_FOODS,
  DIET_LABELS,
  DIETS,
  EU_ALLERGEN_GROUPS,
  euGroupOf,
  GUEST_ALLERGENS,
  GUEST_COUNT_MAX,
  guestAllergenLabel,
  guestRequirementSchema,
  type Diet,
  type GuestAllergen,
  type GuestRequirement,
} from '@nappe/shared';
import type { ParseError, ParseResult } from 'papaparse';
import { LABEL_MAX, NOTES_MAX, TABLE_MAX } from '../form/guest-form';

/**
 * A guest list as a CSV file (RFC 4180: comma-separated, a header row, fields with commas,
 * quotes or line breaks in double quotes). Parsed by papaparse; this module turns its rows into
 * guest requirements with a readable problem for every row that cannot be taken as it is.
 */

export type GuestCsvColumn = 'name' | 'table' | 'allergens' | 'diets' | 'notes';

export const GUEST_CSV_COLUMNS: readonly {
  column: GuestCsvColumn;
  required: boolean;
  description: string;
  example: string;
  aliases: readonly string[];
}[] = [
  {
    column: 'name',
    required: true,
    description: 'The guest’s name, or a label such as “Table 3, seat 2”.',
    example: 'Aunt Mireille',
    aliases: ['name', 'guest', 'guest name', 'label', 'name or label'],
  },
  {
    column: 'table',
    required: false,
    description: 'The table, if you have a seating plan.',
    example: '3',
    aliases: ['table', 'table number', 'table no'],
  },
  {
    column: 'allergens',
    required: false,
    description: 'Allergens, separated by semicolons: the 14 groups below or a specific food.',
    example: 'milk; nuts',
    aliases: ['allergens', 'allergen', 'allergies', 'allergy'],
  },
  {
    column: 'diets',
    required: false,
    description: 'Diets, separated by semicolons.',
    example: 'vegetarian; no alcohol',
    aliases: ['diets', 'diet', 'dietary requirements'],
  },
  {
    column: 'notes',
    required: false,
    description: `Anything else the kitchen should know, up to ${NOTES_MAX} characters.`,
    example: 'Carries an adrenaline pen',
    aliases: ['notes', 'note', 'comments', 'comment'],
  },
];

export const GUEST_CSV_MAX_BYTES = 1_000_000;

/** A template to fill in, with invented example guests. Starts with a UTF-8 byte order mark
 * so that spreadsheet programs read accented names correctly (common practice, no source). */
export const GUEST_CSV_TEMPLATE =
  '\uFEFF' +
  [
    'name,table,allergens,diets,notes',
    'Aunt Mireille,1,milk; eggs,vegetarian,Carries an adrenaline pen',
    '"Table 3, seat 2",3,nuts,,',
    'Léon Brasseur,5,,vegan; no alcohol,"Prefers no fruit, if possible"',
  ].join('\r\n') +
  '\r\n';

/** Lower case, accents and punctuation removed, single spaces: "Tree-nuts " → "tree nuts". */
export function normaliseWord(value: string): string {
  return value
    .normalize('NFD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, ' ')
    .trim();
}

function withPlurals(word: string): string[] {
  const forms = [word];
  if (word.endsWith('es')) forms.push(word.slice(0, -2));
  if (word.endsWith('s')) forms.push(word.slice(0, -1));
  else forms.push(`${word}s`, `${word}es`);
  return forms;
}

/**
 * Every way a file may name an allergen → what the form stores. A food that is the only food of
 * its EU group ("egg", "soya", "celery") is stored as the group, so its box is ticked; foods of
 * the broad groups (wheat, almonds, pine nuts…) and foods of no group (coconut) are kept as they
 * are, the more precise statement.
 */
const ALLERGEN_WORDS: ReadonlyMap<string, GuestAllergen> = (() => {
  const words = new Map<string, GuestAllergen>();
  const add = (word: string, allergen: GuestAllergen) => {
    for (const form of withPlurals(normaliseWord(word)))
      if (!words.has(form)) words.set(form, allergen);
  };
  const foodsPerGroup = new Map<string, number>();
  for (const food of ALLERGENIC_FOODS) {
    const group = euGroupOf(food);
    if (group) foodsPerGroup.set(group, (foodsPerGroup.get(group) ?? 0) + 1);
  }
  for (const group of EU_ALLERGEN_GROUPS) {
    add(group, group);
    add(guestAllergenLabel(group), group);
  }
  add('gluten', 'gluten');
  add('sulfites', 'sulphites');
  add('soy', 'soybeans');
  add('shellfish', 'crustaceans');
  for (const allergen of GUEST_ALLERGENS) {
    if ((EU_ALLERGEN_GROUPS as readonly string[]).includes(allergen)) continue;
    const group = (ALLERGENIC_FOODS as readonly string[]).includes(allergen)
      ? euGroupOf(allergen as (typeof ALLERGENIC_FOODS)[number])
      : undefined;
    const target = group && foodsPerGroup.get(group) === 1 ? group : allergen;
    add(allergen.replace(/_/g, ' '), target);
    add(guestAllergenLabel(allergen), target);
  }
  return words;
})();

const DIET_WORDS: ReadonlyMap<string, Diet> = (() => {
  const words = new Map<string, Diet>();
  for (const diet of DIETS) {
    words.set(normaliseWord(diet), diet);
    words.set(normaliseWord(DIET_LABELS[diet]), diet);
  }
  words.set('gelatin free', 'no_gelatin');
  words.set('gelatine free', 'no_gelatin');
  words.set('no gelatine', 'no_gelatin');
  words.set('alcohol free', 'no_alcohol');
  return words;
})();

export function allergenFromWord(word: string): GuestAllergen | undefined {
  return ALLERGEN_WORDS.get(normaliseWord(word));
}

export function dietFromWord(word: string): Diet | undefined {
  return DIET_WORDS.get(normaliseWord(word));
}

function splitList(cell: string): string[] {
  return cell
    .split(/[;|,/]+/)
    .map((w) => w.trim())
    .filter((w) => w !== '');
}

/** Header cells → our column names (papaparse's `transformHeader`); others keep their name. */
export function columnFor(header: string): string {
  const word = normaliseWord(header.replace(/^\uFEFF/, ''));
  const match = GUEST_CSV_COLUMNS.find((c) => c.aliases.includes(word));
  return match ? match.column : `ignored:${header.trim()}`;
}

export interface GuestCsvRow {
  /** 1 for the first guest, under the header. */
  rowNumber: number;
  cells: Record<GuestCsvColumn, string>;
  requirement: GuestRequirement | null;
  errors: string[];
}

export interface GuestCsvPreview {
  rows: GuestCsvRow[];
  /** Problems with the whole file: no name column, no rows, too many rows. */
  fileErrors: string[];
  ignoredColumns: string[];
}

function parseErrorMessage(error: ParseError): string {
  switch (error.code) {
    case 'TooManyFields':
      return 'This row has more cells than the header has columns. A comma inside a name or a note needs that whole cell in double quotes.';
    case 'MissingQuotes':
    case 'InvalidQuotes':
      return 'A double quote in this row is not closed. Put the whole cell in double quotes and double any quote inside it ("").';
    default:
      return error.message;
  }
}

/**
 * The preview of a parsed file: each row with what it becomes, or why it cannot. Rows that are
 * merely shorter than the header are fine (trailing empty cells are often left out).
 */
export function readGuestCsv(
  result: ParseResult<Record<string, string | undefined>>,
): GuestCsvPreview {
  // Papaparse renames a repeated header ("name", "name_1"); read the names as the file has them.
  const renamed = (result.meta as { renamedHeaders?: Record<string, string> | null })
    .renamedHeaders;
  const fields = (result.meta.fields ?? []).map((f) => renamed?.[f] ?? f);
  const fileErrors: string[] = [];
  const ignoredColumns = [
    ...new Set(fields.filter((f) => f.startsWith('ignored:')).map((f) => f.slice(8))),
  ];
  const known = fields.filter((f) => !f.startsWith('ignored:'));
  const duplicated = known.filter((f, i) => known.indexOf(f) !== i);
  if (!known.includes('name')) {
    fileErrors.push(
      'The file needs a “name” column in its first row (the header). Download the template to see the layout.',
    );
  }
  if (duplicated.length > 0) {
    fileErrors.push(
      `The file has two columns for ${[...new Set(duplicated)].map((c) => `“${c}”`).join(' and ')}. Keep one.`,
    );
  }
  if (result.data.length === 0) fileErrors.push('The file has a header but no guests under it.');
  if (result.data.length > GUEST_COUNT_MAX) {
    fileErrors.push(
      `The file lists ${result.data.length} guests; at most ${GUEST_COUNT_MAX} can be imported.`,
    );
  }
  const rowErrors = new Map<number, string[]>();
  for (const error of result.errors) {
    if (error.code === 'TooFewFields' || error.row === undefined) continue;
    rowErrors.set(error.row, [...(rowErrors.get(error.row) ?? []), parseErrorMessage(error)]);
  }

  const rows = result.data.slice(0, GUEST_COUNT_MAX).map((record, index): GuestCsvRow => {
    const cell = (c: GuestCsvColumn) => (record[c] ?? '').trim();
    const cells = {
      name: cell('name'),
      table: cell('table'),
      allergens: cell('allergens'),
      diets: cell('diets'),
      notes: cell('notes'),
    };
    const errors = [...(rowErrors.get(index) ?? [])];
    const allergens: GuestAllergen[] = [];
    for (const word of splitList(cells.allergens)) {
      const allergen = allergenFromWord(word);
      if (!allergen) {
        errors.push(
          `“${word}” is not an allergen we recognise. Use one of the 14 groups (such as milk, eggs, nuts, gluten) or a specific food (such as almonds or coconut).`,
        );
      } else if (!allergens.includes(allergen)) allergens.push(allergen);
    }
    const diets: Diet[] = [];
    for (const word of splitList(cells.diets)) {
      const diet = dietFromWord(word);
      if (!diet) {
        errors.push(
          `“${word}” is not a diet we recognise. Use ${DIETS.map((d) => DIET_LABELS[d].toLowerCase()).join(', ')}.`,
        );
      } else if (!diets.includes(diet)) diets.push(diet);
    }
    if (cells.name.length > LABEL_MAX) {
      errors.push(
        `Keep the name under ${LABEL_MAX} characters (this one has ${cells.name.length}).`,
      );
    }
    if (cells.table.length > TABLE_MAX) {
      errors.push(
        `Keep the table under ${TABLE_MAX} characters (this one has ${cells.table.length}).`,
      );
    }
    if (cells.notes.length > NOTES_MAX) {
      errors.push(
        `Keep the notes under ${NOTES_MAX} characters (these have ${cells.notes.length}).`,
      );
    }
    const candidate = {
      label: cells.name,
      ...(cells.table ? { table: cells.table } : {}),
      allergens,
      diets,
      ...(cells.notes ? { notes: cells.notes } : {}),
    };
    const checked = guestRequirementSchema.safeParse(candidate);
    if (!checked.success && errors.length === 0) {
      errors.push(...new Set(checked.error.issues.map((i) => i.message)));
    } else if (!checked.success && cells.name === '') {
      errors.unshift('Give the guest a name or a label (for example “Table 3, seat 2”).');
    }
    return {
      rowNumber: index + 1,
      cells,
      requirement: errors.length === 0 && checked.success ? checked.data : null,
      errors,
    };
  });
  return { rows, fileErrors, ignoredColumns };
}

/** Papaparse's options for a guest list. */
export const GUEST_CSV_PARSE_OPTIONS = {
  header: true,
  skipEmptyLines: 'greedy',
  transformHeader: columnFor,
} as const;
