import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { staffUser } from '../../../testing/fixtures';
import { renderKitchen, section } from '../../../testing/kitchen-render';
import { server } from '../../../testing/server';

// The frame every catalogue item's screen shares (catalogue-item-screen.tsx) and the saving every
// editor shares (features/kitchen/components/item-editor.tsx), driven through the real routes.

describe('Kitchen → one item', () => {
  it('says why an item could not be loaded, keeps the way back, and retries', async () => {
    let fixed = false;
    const { user } = renderKitchen('/kitchen/desserts/des-tartlet-plate');
    server.use(
      http.get('/api/desserts/:id', () =>
        fixed
          ? undefined
          : HttpResponse.json(
              { statusCode: 500, message: 'Internal server error' },
              { status: 500 },
            ),
      ),
    );
    expect(await screen.findByRole('heading', { level: 1, name: 'Dessert' })).toBeInTheDocument();
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('This dessert could not be loaded')).toBeInTheDocument();
    expect(
      within(alert).getByText('The server ran into a problem. Please try again in a moment.'),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'All desserts' })).toHaveAttribute(
      'href',
      '/kitchen/desserts',
    );

    fixed = true; // the fake kitchen answers again
    await user.click(within(alert).getByRole('button', { name: 'Try again' }));
    expect(
      await screen.findByRole(
        'heading',
        { level: 1, name: 'Tartlet and vanilla ice' },
        { timeout: 10_000 },
      ),
    ).toBeInTheDocument();
  });

  it('gives the server’s words for an item that is not there', async () => {
    renderKitchen('/kitchen/menus/menu-gone');
    expect(await screen.findByRole('heading', { level: 1, name: 'Menu' })).toBeInTheDocument();
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('This menu could not be loaded')).toBeInTheDocument();
    expect(within(alert).getByText('There is no menu with that id.')).toBeInTheDocument();
  });

  it('leaves starting a new item to the chef', async () => {
    renderKitchen('/kitchen/recipes/new', staffUser);
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Not available for your role' }),
    ).toBeInTheDocument();
    expect(document.querySelector('form')).toBeNull();
  });

  it('puts a new item at its own address in place of /new once created', async () => {
    const { user, router } = renderKitchen('/kitchen/ingredients/new');
    expect(
      await screen.findByRole('heading', { level: 1, name: 'New ingredient' }),
    ).toBeInTheDocument();
    const basics = await section('What it is');
    const buying = await section('Buying');
    await user.type(basics.getByRole('textbox', { name: 'Name' }), 'Mascarpone');
    await user.type(buying.getByLabelText(/Pack size/), '0.5');
    await user.type(buying.getByLabelText(/Pack price/), '12.50');
    await user.click(screen.getByRole('button', { name: 'Create ingredient' }));

    expect(
      await screen.findByRole('heading', { level: 1, name: 'Mascarpone' }, { timeout: 10_000 }),
    ).toBeInTheDocument();
    expect(router.state.location.pathname).toMatch(/^\/kitchen\/ingredients\/ing-new-\d+$/);
    // Replaced, not pushed: Back does not return to an empty form.
    expect(router.state.historyAction).toBe('REPLACE');
    expect(screen.getByRole('button', { name: 'Save changes' })).toBeInTheDocument();
  }, 30_000);

  it('saves changes in place and says so until the next change', async () => {
    const { user, api, router } = renderKitchen('/kitchen/recipes/rec-sable');
    const notes = await section('Notes');
    const field = notes.getByRole('textbox', { name: 'Notes for the kitchen' });
    await user.clear(field);
    await user.type(field, 'Rest overnight before rolling.');
    expect(screen.getByText('Unsaved changes')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Save changes' }));
    expect(
      await screen.findByText('Saved “Sablé dough”.', undefined, { timeout: 10_000 }),
    ).toBeInTheDocument();
    expect(api.state.requests.map((r) => `${r.method} ${r.path}`)).toEqual([
      'PUT /api/recipes/rec-sable',
    ]);
    expect(api.state.requests[0]?.body).toMatchObject({ notes: 'Rest overnight before rolling.' });
    expect(router.state.location.pathname).toBe('/kitchen/recipes/rec-sable');

    await user.type(field, ' Chill 1 h.');
    expect(screen.getByText('Unsaved changes')).toBeInTheDocument();
    expect(screen.queryByText('Saved “Sablé dough”.')).not.toBeInTheDocument();
  }, 30_000);

  it('shows a refused save’s messages at their fields and keeps what was typed', async () => {
    const { user } = renderKitchen('/kitchen/recipes/rec-sable');
    const notes = await section('Notes');
    const field = notes.getByRole('textbox', { name: 'Notes for the kitchen' });
    await user.clear(field);
    await user.type(field, 'Chill well.');
    // As the API's ZodValidationPipe words a refusal: `path: message`, here the shared schema's.
    server.use(
      http.put('/api/recipes/:id', () =>
        HttpResponse.json(
          {
            statusCode: 400,
            message: ['yieldG: The yield must be more than 0.'],
            error: 'Bad Request',
          },
          { status: 400 },
        ),
      ),
    );
    await user.click(screen.getByRole('button', { name: 'Save changes' }));

    const alert = await screen.findByRole('alert', undefined, { timeout: 10_000 });
    expect(within(alert).getByText('Not saved')).toBeInTheDocument();
    expect(within(alert).getByText('Please check the fields marked below.')).toBeInTheDocument();
    const basics = await section('Recipe');
    expect(basics.getByText('The yield must be more than 0.')).toBeInTheDocument();
    expect(field).toHaveValue('Chill well.');
    expect(screen.getByText('Unsaved changes')).toBeInTheDocument();
  }, 30_000);
});
