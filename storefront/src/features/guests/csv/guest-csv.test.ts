import Papa from 'papaparse';
import { afterEach, describe, expect, it, vi } from 'vitest';
import {
  allergenFromWord,
  dietFromWord,
  GUEST_CSV_PARSE_OPTIONS,
  GUEST_CSV_TEMPLATE,
  readGuestCsv,
} from './guest-csv';

afterEach(() => vi.restoreAllMocks());

const read = (text: string) =>
  readGuestCsv(
    Papa.parse<Record<string, string | undefined>>(text, { ...GUEST_CSV_PARSE_OPTIONS }),
  );

describe('reading a guest list (RFC 4180 CSV through papaparse)', () => {
  it('reads quoted fields: commas, doubled quotes and line breaks inside quotes (RFC 4180 §2.5–2.7)', () => {
    const preview = read(
      'name,table,allergens,diets,notes\r\n' +
        '"Table 3, seat 2",3,nuts,,"Says ""no nuts at all"""\r\n' +
        'Aunt Mireille,1,milk;eggs,vegetarian,"Two lines:\r\nsevere"\r\n',
    );
    expect(preview.fileErrors).toEqual([]);
    expect(preview.rows.map((r) => r.requirement)).toEqual([
      {
        label: 'Table 3, seat 2',
        table: '3',
        allergens: ['nuts'],
        diets: [],
        notes: 'Says "no nuts at all"',
      },
      {
        label: 'Aunt Mireille',
        table: '1',
        allergens: ['milk', 'eggs'],
        diets: ['vegetarian'],
        notes: 'Two lines:\r\nsevere',
      },
    ]);
  });

  it('accepts a header in other words and cases, a byte order mark, and short rows', () => {
    const preview = read(
      '\uFEFFGuest Name;Allergies\nLéon;Soy | Sesame\nMarta;\n'.replace(/;/g, ','),
    );
    expect(preview.fileErrors).toEqual([]);
    expect(preview.rows.map((r) => r.requirement?.allergens)).toEqual([['soybeans', 'sesame'], []]);
  });

  it('names each word it cannot read, row by row, and takes nothing from such a row', () => {
    const preview = read('name,allergens,diets\nPaul,milc,vegan\nAnna,nuts,keto\n,eggs,\n');
    expect(preview.rows[0]!.requirement).toBeNull();
    expect(preview.rows[0]!.errors[0]).toMatch(/^“milc” is not an allergen we recognise/);
    expect(preview.rows[1]!.errors[0]).toMatch(/^“keto” is not a diet we recognise/);
    expect(preview.rows[2]!.errors).toEqual([
      'Give the guest a name or a label (for example “Table 3, seat 2”).',
    ]);
  });

  it('refuses a row with more cells than the header: its columns would be shifted', () => {
    const preview = read('name,allergens,notes\nPaul,milk,Allergic, severe\n');
    expect(preview.rows[0]!.errors[0]).toMatch(/more cells than the header/);
    expect(preview.rows[0]!.requirement).toBeNull();
  });

  it('needs a name column, and says which columns it leaves out', () => {
    // papaparse warns on the console when it renames a repeated header.
    vi.spyOn(console, 'warn').mockImplementation(() => {});
    expect(read('guest_allergies,seat\nmilk,4\n').fileErrors[0]).toMatch(/needs a “name” column/);
    expect(read('name,seat\nPaul,4\n').ignoredColumns).toEqual(['seat']);
    expect(read('name,label\nPaul,P\n').fileErrors[0]).toMatch(/two columns for “name”/);
    expect(read('name,allergens\n').fileErrors).toEqual([
      'The file has a header but no guests under it.',
    ]);
  });

  it('checks lengths with the limits of the shared guest schema', () => {
    const preview = read(`name,notes\nPaul,"${'x'.repeat(501)}"\n`);
    expect(preview.rows[0]!.errors).toEqual([
      'Keep the notes under 500 characters (these have 501).',
    ]);
  });

  it('the template it offers reads back without a single problem', () => {
    const preview = read(GUEST_CSV_TEMPLATE);
    expect(preview.fileErrors).toEqual([]);
    expect(preview.rows).toHaveLength(3);
    expect(preview.rows.every((r) => r.errors.length === 0)).toBe(true);
    expect(preview.rows[2]!.requirement?.diets).toEqual(['vegan', 'no_alcohol']);
  });
});

describe('allergen and diet words', () => {
  it('reads the 14 groups of Regulation (EU) 1169/2011 Annex II by key and by name', () => {
    expect(allergenFromWord('Cereals containing gluten')).toBe('gluten');
    expect(allergenFromWord('Sulphur dioxide and sulphites')).toBe('sulphites');
    expect(allergenFromWord('sulfites')).toBe('sulphites');
    expect(allergenFromWord('Crustaceans')).toBe('crustaceans');
    expect(allergenFromWord('mollusc')).toBe('molluscs');
  });

  it('stores a food that is its group’s only food as the group, and keeps the others precise', () => {
    // Annex II lists eggs, soybeans, celery… as one food each; "nuts" and "gluten" cover several.
    expect(allergenFromWord('egg')).toBe('eggs');
    expect(allergenFromWord('soya')).toBe('soybeans');
    expect(allergenFromWord('almonds')).toBe('almond');
    expect(allergenFromWord('wheat')).toBe('wheat');
    // Coconut is in neither list of the shared allergen rules (which follow Annex II and FDA's
    // guidance, Edition 5): it is kept as the food itself.
    expect(allergenFromWord('coconut')).toBe('coconut');
    expect(allergenFromWord('Pine nuts')).toBe('pine_nut');
    expect(allergenFromWord('tree nuts')).toBe('tree_nuts');
    expect(allergenFromWord('chocolate')).toBeUndefined();
  });

  it('reads diets by key or label', () => {
    expect(dietFromWord('No alcohol')).toBe('no_alcohol');
    expect(dietFromWord('no_gelatin')).toBe('no_gelatin');
    expect(dietFromWord('gelatine-free')).toBe('no_gelatin');
    expect(dietFromWord('paleo')).toBeUndefined();
  });
});
