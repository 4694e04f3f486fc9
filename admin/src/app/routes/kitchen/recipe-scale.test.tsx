import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { staffUser } from '../../../testing/fixtures';
import { renderKitchen } from '../../../testing/kitchen-render';

/** The row of `name` in the table called `table`, as text cells. */
function row(table: string, name: string): string[] {
  const t = screen.getByRole('table', { name: table });
  const r = within(t).getByRole('cell', { name }).closest('tr')!;
  return within(r)
    .getAllByRole('cell')
    .map((c) => c.textContent ?? '');
}

const TOTALS = 'Ingredients in all, sub-recipes included';

describe('Kitchen → Recipes → Scale', () => {
  it('scales by weight through sub-recipes, rounding as the kitchen weighs', async () => {
    const { user, router } = renderKitchen('/kitchen/recipes/rec-tartlet/scale', staffUser);
    const grams = await screen.findByRole('textbox', { name: 'Grams to make' });
    await user.clear(grams);
    await user.type(grams, '1000');
    await user.click(screen.getByRole('button', { name: 'Scale' }));
    await waitFor(() => expect(router.state.location.search).toBe('?grams=1000'));

    // By hand. Crumble tartlet (400 g) = sablé 300 g + crumble 100 g; 1000 g is 2.5 ×.
    // Sablé dough for 750 g (yield 540 g, factor 1.38889): flour 250 → 347.22 g, butter 150 →
    // 208.33 g, sugar 100 → 138.89 g, 1 egg → 1.389 eggs → 2 whole eggs of 50 g (USDA FDC 171287).
    // Almond crumble for 250 g (yield 380 g, factor 0.657895): 100 g each → 65.79 g.
    // Totals: flour 347.22 + 65.79 = 413.01 → 413 g (≥ 100 g: to the gram); butter 274.12 → 274 g;
    // sugar 204.68 → 205 g; almond flour 65.79 → 65.8 g (< 100 g: to 0.1 g); eggs 2 (100 g).
    expect(await screen.findByText('1,000 g of Crumble tartlet')).toBeInTheDocument();
    expect(row(TOTALS, 'Wheat flour T55')).toEqual(['Wheat flour T55', '413 g', '0.413 kg']);
    expect(row(TOTALS, 'Butter 82 %')).toEqual(['Butter 82 %', '274 g', '0.274 kg']);
    expect(row(TOTALS, 'Caster sugar')).toEqual(['Caster sugar', '205 g', '0.205 kg']);
    expect(row(TOTALS, 'Almond flour')).toEqual(['Almond flour', '65.8 g', '0.066 kg']);
    expect(row(TOTALS, 'Eggs, large')).toEqual(['Eggs, large', '2 pieces (100 g)', '2 pieces']);

    // Sub-recipes expanded, each line at its own scale.
    const tree = 'Each recipe and sub-recipe with its lines';
    expect(row(tree, 'Sub-recipe: Sablé dough')).toEqual(['Sub-recipe: Sablé dough', '750 g']);
    expect(row(tree, 'Sub-recipe: Almond crumble')).toEqual([
      'Sub-recipe: Almond crumble',
      '250 g',
    ]);
    const sableFlour = within(screen.getByRole('table', { name: tree }))
      .getAllByRole('cell', { name: 'Wheat flour T55' })
      .map((c) => within(c.closest('tr')!).getAllByRole('cell').at(-1)!.textContent);
    expect(sableFlour).toEqual(['347 g', '65.8 g']);
    // "1 piece" as written becomes 1.39 pieces, weighed as 2 whole eggs.
    expect(row(tree, 'Eggs, large')).toEqual(['Eggs, large', '1.39 piece', '2 pieces (100 g)']);
  });

  it('scales by plates of a dessert that uses the recipe', async () => {
    const { user } = renderKitchen('/kitchen/recipes/rec-tartlet/scale');
    await user.click(await screen.findByRole('radio', { name: 'Plates of a dessert' }));
    const plates = screen.getByRole('textbox', { name: 'Plates' });
    await user.clear(plates);
    await user.type(plates, '10');
    await user.click(screen.getByRole('button', { name: 'Scale' }));
    // 10 plates × 80 g of tartlet = 800 g = 2 ×: sablé 600 g (factor 1.1111) and crumble 200 g
    // (factor 0.5263). Flour 277.78 + 52.63 = 330.41 → 330 g; butter 166.67 + 52.63 = 219.30 →
    // 219 g; 1.11 eggs → 2 whole eggs.
    expect(
      await screen.findByText(
        '10 plates of Tartlet and vanilla ice × 80 g = 800 g of Crumble tartlet',
      ),
    ).toBeInTheDocument();
    expect(row(TOTALS, 'Wheat flour T55')).toEqual(['Wheat flour T55', '330 g', '0.33 kg']);
    expect(row(TOTALS, 'Butter 82 %')).toEqual(['Butter 82 %', '219 g', '0.219 kg']);
    expect(row(TOTALS, 'Eggs, large')).toEqual(['Eggs, large', '2 pieces (100 g)', '2 pieces']);
  });
});
