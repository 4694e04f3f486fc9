import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { staffUser } from '../../../testing/fixtures';
import { renderKitchen, section } from '../../../testing/kitchen-render';
import { server } from '../../../testing/server';

describe('Kitchen → Ingredients', () => {
  it('lists ingredients with allergens in words and the price per kg, searchable and sortable', async () => {
    const { user } = renderKitchen('/kitchen/ingredients');
    const table = await screen.findByRole('table', { name: 'Ingredients of the kitchen' });
    const rows = within(table).getAllByRole('row');
    expect(rows).toHaveLength(10); // header + 9
    // Sorted by name: "Almond flour" first.
    expect(within(rows[1]!).getByRole('link', { name: 'Almond flour' })).toHaveAttribute(
      'href',
      '/kitchen/ingredients/ing-almond',
    );
    expect(
      within(rows[1]!).getByText('Contains almonds · may contain hazelnuts'),
    ).toBeInTheDocument();
    // Price per kg of milk: €1.15 per 1 l at 1.031 g/ml (USDA FDC 171265) = 115 / 1.031 = 111.54 → €1.12.
    const milk = within(table).getByRole('link', { name: 'Whole milk' }).closest('tr')!;
    expect(within(milk).getByText('€1.12')).toBeInTheDocument();
    // Eggs are bought by 30 pieces of 50 g: 690 / 1.5 kg = 460 → €4.60 per kg.
    const eggs = within(table).getByRole('link', { name: 'Eggs, large' }).closest('tr')!;
    expect(within(eggs).getByText('€4.60')).toBeInTheDocument();

    await user.click(within(table).getByRole('button', { name: /Price per kg/ }));
    const cheapest = within(table).getAllByRole('row')[1]!;
    // Whole milk at €1.12 per kg is the cheapest of the nine, then wheat flour at €1.20.
    expect(within(cheapest).getByRole('link', { name: 'Whole milk' })).toBeInTheDocument();
    expect(
      within(within(table).getAllByRole('row')[2]!).getByRole('link', { name: 'Wheat flour T55' }),
    ).toBeInTheDocument();
    expect(within(table).getByRole('columnheader', { name: /Price per kg/ })).toHaveAttribute(
      'aria-sort',
      'ascending',
    );

    await user.type(screen.getByRole('searchbox', { name: /Search ingredients/ }), 'egg');
    expect(within(table).getAllByRole('row')).toHaveLength(3);
    expect(screen.getByText('Showing 1–2 of 2 ingredients')).toBeInTheDocument();
  }, 20_000);

  it('shows staff the list without prices and without a way to add', async () => {
    renderKitchen('/kitchen/ingredients', staffUser);
    const table = await screen.findByRole('table', { name: 'Ingredients of the kitchen' });
    expect(within(table).queryByText(/Price per kg/)).not.toBeInTheDocument();
    expect(screen.queryByRole('link', { name: /New ingredient/ })).not.toBeInTheDocument();
  });

  it('shows an error with a retry that works', async () => {
    let fixed = false;
    const { user } = renderKitchen('/kitchen/ingredients');
    server.use(
      http.get('/api/ingredients', () =>
        fixed
          ? HttpResponse.json({ items: [], total: 0, page: 1, pageSize: 100 })
          : HttpResponse.json(
              { statusCode: 500, message: 'Internal server error' },
              { status: 500 },
            ),
      ),
    );
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('The ingredients could not be loaded')).toBeInTheDocument();
    fixed = true;
    await user.click(within(alert).getByRole('button', { name: 'Try again' }));
    expect(await screen.findByText('No ingredients yet')).toBeInTheDocument();
  });
});

describe('Kitchen → Ingredients → form', () => {
  it('sends "12.50" as 1250 minor units and shows the shared schema’s messages', async () => {
    const { user, api, router } = renderKitchen('/kitchen/ingredients/new');
    const basics = await section('What it is');
    const buying = await section('Buying');

    await user.type(buying.getByLabelText(/Pack size/), '0');
    await user.type(buying.getByLabelText(/Pack price/), '12.505');
    await user.click(screen.getByRole('button', { name: 'Create ingredient' }));

    // Messages of ingredientSchema in shared/src/kitchen/types.ts, and of the price parser.
    expect(await basics.findByText('Give it a name.')).toBeInTheDocument();
    expect(buying.getByText('The pack size must be more than 0.')).toBeInTheDocument();
    expect(buying.getByText('Use at most 2 decimals (EUR cents).')).toBeInTheDocument();
    expect(api.state.requests).toHaveLength(0);

    await user.type(basics.getByRole('textbox', { name: 'Name' }), 'Mascarpone');
    await user.clear(buying.getByLabelText(/Pack size/));
    await user.type(buying.getByLabelText(/Pack size/), '0.5');
    await user.clear(buying.getByLabelText(/Pack price/));
    await user.type(buying.getByLabelText(/Pack price/), '12.50');
    // 12.50 € for 0.5 kg = 25.00 € per kg, shown as you type.
    expect(buying.getByText('€25.00 per kg')).toBeInTheDocument();
    const allergens = await section('Allergens');
    await user.click(allergens.getByRole('checkbox', { name: /^Contains milk$/i }));
    // The US view beside the EU groups, worked out by the shared roll-up.
    const declared = within(screen.getByRole('region', { name: 'As declared' }));
    expect(declared.getAllByText('Milk')).toHaveLength(2); // EU "Milk" and US "Milk"
    await user.click(screen.getByRole('button', { name: 'Create ingredient' }));

    await waitFor(() =>
      expect(router.state.location.pathname).toMatch(/^\/kitchen\/ingredients\/ing-new/),
    );
    const post = api.state.requests.find((r) => r.method === 'POST')!;
    expect(post.body).toMatchObject({
      name: 'Mascarpone',
      purchase: { packSize: 0.5, packUnit: 'kg', packPriceMinor: 1250 },
      allergens: { contains: [{ food: 'milk' }], mayContain: [] },
    });
    expect(post.body).not.toHaveProperty('id');
  }, 60_000);
});

describe('Kitchen → editors', () => {
  it('asks before leaving unsaved changes', async () => {
    const { user, router } = renderKitchen('/kitchen/ingredients/ing-sugar');
    const basics = await section('What it is');
    await user.type(basics.getByRole('textbox', { name: 'Name' }), ', fine');
    expect(screen.getByText('Unsaved changes')).toBeInTheDocument();

    await user.click(screen.getByRole('link', { name: 'All ingredients' }));
    const dialog = await screen.findByRole('alertdialog', { name: 'Leave without saving?' });
    await user.click(within(dialog).getByRole('button', { name: 'Stay and keep editing' }));
    expect(router.state.location.pathname).toBe('/kitchen/ingredients/ing-sugar');
    expect(basics.getByRole('textbox', { name: 'Name' })).toHaveValue('Caster sugar, fine');

    await user.click(screen.getByRole('link', { name: 'All ingredients' }));
    await user.click(
      within(await screen.findByRole('alertdialog')).getByRole('button', {
        name: 'Leave without saving',
      }),
    );
    await waitFor(() => expect(router.state.location.pathname).toBe('/kitchen/ingredients'));
  });
});
