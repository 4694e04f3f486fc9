import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { staffUser } from '../../../testing/fixtures';
import { renderKitchen, section } from '../../../testing/kitchen-render';

/** The live figures beside the editor. */
const figures = () => within(screen.getByRole('complementary', { name: 'Recipe figures' }));
const costPerKg = () =>
  within(figures().getByRole('region', { name: 'Cost' })).getByTestId('cost-per-kg');
const allergens = () => within(figures().getByRole('region', { name: 'Allergens' }));

describe('Kitchen → Recipes → editor', () => {
  it('updates cost, allergens and mix balance as a line changes, before saving', async () => {
    const { user, api } = renderKitchen('/kitchen/recipes/rec-base');
    await screen.findByRole('heading', { level: 1, name: 'Vanilla ice-cream base' });

    // Cost by hand (fixture prices; densities from USDA FDC 171265 and 170859):
    //   milk 500 g × 115 c / 1031 g = 55.771 c; cream 250 g × 520 c / 1006 g = 129.225 c;
    //   yolks 80 g × 950 c / 1000 g = 76 c; sugar 150 g × 145 c / 1000 g = 21.75 c;
    //   282.746 c per 980 g → 288.52 c per kg → €2.89.
    expect(await screen.findByTestId('cost-per-kg')).toHaveTextContent('€2.89');
    expect(allergens().queryByText(/Wheat/)).not.toBeInTheDocument();

    // Mix balance, by hand from the USDA compositions: water 440.65 + 144.275 + 41.848 + 0.03
    // = 626.803 g in 980 g → total solids 36.04 %, inside Goff's 36–45 % band.
    const mix = within(figures().getByRole('region', { name: 'Mix balance' }));
    expect(mix.getByRole('meter', { name: 'Total solids' })).toHaveAttribute(
      'aria-valuetext',
      'Total solids 36 %, within the 36–45 % band',
    );
    // 21 CFR 135.110(a)(2): milkfat (16.25 + 90.2) / 980 = 10.86 % needs 10 % milk solids non-fat;
    // the mix has (43.1 + 15.525) / 980 = 5.98 %, so it is neither ice cream nor frozen custard.
    expect(
      mix.getByText('21 CFR 135.110: Neither ice cream nor frozen custard'),
    ).toBeInTheDocument();
    expect(
      mix.getByText(/Milk solids non-fat 5\.98 % is below the 10 % required/),
    ).toBeInTheDocument();

    // More yolks: 120 g → 114 c; 320.746 c per 980 g → €3.27. The lines now weigh 1020 g for a
    // 980 g yield: the 40 g difference counts as evaporated water. Water 440.65 + 144.275 + 62.772
    // (120 g × 52.31 %) + 0.03 = 647.727 g, less 40 g = 607.727 g in 980 g → solids 37.99 %.
    const line3 = within(screen.getByRole('group', { name: 'Line 3' }));
    await user.clear(line3.getByRole('textbox', { name: 'Line 3: quantity' }));
    await user.type(line3.getByRole('textbox', { name: 'Line 3: quantity' }), '120');
    await waitFor(() => expect(costPerKg()).toHaveTextContent('€3.27'));
    expect(mix.getByRole('meter', { name: 'Total solids' })).toHaveAttribute(
      'aria-valuetext',
      'Total solids 38 %, within the 36–45 % band',
    );

    // Swap the sugar for wheat glucose syrup: the US declares wheat; the EU exempts it (Annex II 1(a)).
    const line4 = within(screen.getByRole('group', { name: 'Line 4' }));
    const picker = line4.getByRole('combobox', { name: 'Line 4: ingredient or recipe' });
    await user.clear(picker);
    // One letter: Ark moves the caret as it filters, which user-event's fast typing trips over.
    await user.type(picker, 'g');
    await user.click(await screen.findByRole('option', { name: /Glucose syrup \(wheat\)/ }));
    expect(picker).toHaveValue('Glucose syrup (wheat)');
    // 150 g × 690 c / 1400 g = 73.929 c; 55.771 + 129.225 + 114 + 73.929 = 372.925 c / 980 g → €3.81.
    await waitFor(() => expect(costPerKg()).toHaveTextContent('€3.81'));
    const us = allergens().getByText('US (FD&C Act, 9 major allergens)').parentElement!;
    expect(within(us).getByText('Wheat')).toBeInTheDocument();
    expect(
      allergens().getByText(/Not declared: wheat as glucose syrup in Glucose syrup \(wheat\)/),
    ).toHaveTextContent('Annex II 1(a)');
    // The component label emphasises allergens as <strong>, never as HTML text.
    const label = allergens().getByText('Component label').nextElementSibling!;
    // Regulation (EU) 1169/2011 Art. 21: the allergen word inside the name is emphasised.
    const strong = [...label.querySelectorAll('strong')].map((s) => s.textContent);
    expect(strong).toEqual(expect.arrayContaining(['egg', 'milk']));
    expect(label.textContent).toMatch(/^Ingredients: whole milk, cream \(milk\), glucose syrup/);
    expect(label.innerHTML).not.toContain('&lt;');

    // Nothing was sent: all of this ran in the browser.
    expect(api.state.requests).toHaveLength(0);
  }, 60_000);

  it('shows the server’s loop message at the line that makes the loop', async () => {
    const { user, api } = renderKitchen('/kitchen/recipes/rec-sable');
    await screen.findByRole('heading', { level: 1, name: 'Sablé dough' });
    const lines = await section('Lines');
    await user.click(lines.getByRole('button', { name: 'Add a line' }));
    const line5 = within(screen.getByRole('group', { name: 'Line 5' }));
    await user.type(line5.getByRole('combobox', { name: 'Line 5: ingredient or recipe' }), 't');
    await user.click(await screen.findByRole('option', { name: /Crumble tartlet/ }));
    await user.type(line5.getByRole('textbox', { name: 'Line 5: quantity' }), '100');
    expect(
      await line5.findByText('This sub-recipe uses the recipe you are editing: a loop.'),
    ).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Save changes' }));

    // The API refuses with 400 and RecipeCycleError's message (shared/src/kitchen/errors.ts).
    const message =
      'These recipes use each other in a loop: Crumble tartlet → Sablé dough → Crumble tartlet. Remove one of the sub-recipe lines to break it.';
    expect(await line5.findByText(message)).toBeInTheDocument();
    expect(screen.getByText('Not saved')).toBeInTheDocument();
    expect(api.state.requests.map((r) => `${r.method} ${r.path}`)).toEqual([
      'PUT /api/recipes/rec-sable',
    ]);
  }, 60_000);
});

describe('Kitchen → Recipes, as staff', () => {
  it('reads a recipe with its cautions and figures, and has no edit controls', async () => {
    renderKitchen('/kitchen/recipes/rec-base', staffUser);
    await screen.findByRole('heading', { level: 1, name: 'Vanilla ice-cream base' });
    expect(await screen.findByText('Read-only')).toBeInTheDocument();
    await screen.findByRole('complementary', { name: 'Recipe figures' });

    // Nothing to edit: no form, and the only field is the what-if overrun of the mix balance.
    expect(document.querySelector('form')).toBeNull();
    expect(screen.getAllByRole('textbox').map((t) => t.getAttribute('inputmode'))).toEqual([
      'decimal',
    ]);
    expect(screen.getByRole('textbox', { name: /Overrun/ })).toBeInTheDocument();
    expect(screen.queryByRole('combobox')).not.toBeInTheDocument();
    expect(
      screen.queryByRole('button', { name: /Save|Delete|Add a line|Add a step/ }),
    ).not.toBeInTheDocument();
    // Costs are the chef's.
    expect(figures().queryByRole('region', { name: 'Cost' })).not.toBeInTheDocument();
    expect(allergens().getAllByText('Milk').length).toBeGreaterThan(0);

    // The custard step carries the shared safety caution and the deferral to the local code.
    const method = await section('Method');
    expect(method.getByText(/Cook the custard to 82–85 °C/)).toBeInTheDocument();
    expect(
      method.getAllByText(/follow your local food code and licensed practice/).length,
    ).toBeGreaterThanOrEqual(3);
  });

  it('lists recipes without a way to add one', async () => {
    renderKitchen('/kitchen/recipes', staffUser);
    await screen.findByRole('table', { name: 'Recipes of the kitchen' });
    expect(screen.queryByRole('link', { name: /New recipe/ })).not.toBeInTheDocument();
  });
});
