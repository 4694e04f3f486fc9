import { checkGuestAgainstDessert, createKitchenIndex, type GuestRequirement } from '@nappe/shared';
import { describe, expect, it } from 'vitest';
import { AN_CATALOGUE } from '../../../../testing/allergy-notes-fixtures';
import { fileNameFrom } from '../../../../lib/api-client';
import { advisoryRows, allergenWithFoods, conflictRows } from '../allergen-words';

/**
 * The words the screens use, over the shared conflict check on the fixture catalogue.
 * Regulation (EU) No 1169/2011, Annex II: item 8 names almonds and pistachio nuts among the
 * nuts; item 1 cereals containing gluten, oats among them. Gelatin is of animal origin, so not
 * vegetarian (common practice, no source).
 */
const index = createKitchenIndex(AN_CATALOGUE);
const check = (guest: Partial<GuestRequirement>, dessertId: string) =>
  checkGuestAgainstDessert(index, dessertId, { label: 'G', allergens: [], diets: [], ...guest });

describe('conflictRows', () => {
  it('gives one row per component: the component, the allergen with its foods, the ingredient', () => {
    const report = check({ allergens: ['tree_nuts'] }, 'd-pear');
    expect(
      conflictRows(report.conflicts).map(({ component, what, carriers }) => ({
        component,
        what,
        carriers,
      })),
    ).toEqual([
      {
        component: 'Toasted almond crumble',
        what: 'contains tree nuts (almonds)',
        carriers: ['Ground almonds'],
      },
      {
        component: 'Pistachio tuile',
        what: 'contains tree nuts (pistachios)',
        carriers: ['Pistachios, shelled'],
      },
    ]);
  });

  it('says a diet in words and names what breaks it', () => {
    const report = check({ diets: ['vegetarian'] }, 'd-mousse');
    expect(conflictRows(report.conflicts)).toEqual([
      expect.objectContaining({
        component: 'Set chocolate mousse',
        what: 'not vegetarian',
        carriers: ['Gelatin powder (pork)'],
      }),
    ]);
  });

  it('finds gluten in oats once the almond crumble is replaced by the oat crumble', () => {
    const report = checkGuestAgainstDessert(
      index,
      'd-pear',
      { label: 'G', allergens: ['gluten'], diets: [] },
      [{ componentRecipeId: 'r-almond-crumble', replacementRecipeId: 'r-oat-crumble' }],
    );
    expect(conflictRows(report.conflicts).map((r) => `${r.component} — ${r.what}`)).toEqual([
      'Oat crumble — contains cereals containing gluten (oats)',
    ]);
  });
});

describe('advisoryRows', () => {
  it('keeps "may contain" apart, naming the food and the component', () => {
    const report = check({ allergens: ['tree_nuts'] }, 'd-pear');
    expect(advisoryRows(report.advisories)).toEqual([
      expect.objectContaining({
        kind: 'may_contain',
        title: 'Tree nuts: may contain hazelnuts (cross-contact)',
        components: [{ name: 'Toasted almond crumble', carriers: ['Ground almonds'] }],
      }),
    ]);
  });
});

describe('allergenWithFoods', () => {
  it('does not repeat a food that is the allergen itself', () => {
    expect(allergenWithFoods('almond', ['almond'])).toBe('Almonds');
    expect(allergenWithFoods('nuts', ['almond', 'pistachio'])).toBe('Nuts (almonds, pistachios)');
  });
});

describe('fileNameFrom', () => {
  it('reads the file name of a Content-Disposition header (RFC 6266)', () => {
    expect(fileNameFrom('inline; filename="allergy-briefing-N-2026-0005.pdf"')).toBe(
      'allergy-briefing-N-2026-0005.pdf',
    );
    expect(fileNameFrom('attachment; filename=briefing.pdf')).toBe('briefing.pdf');
    expect(fileNameFrom(null)).toBeNull();
  });
});
