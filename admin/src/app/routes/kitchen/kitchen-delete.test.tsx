import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderKitchen } from '../../../testing/kitchen-render';

describe('Kitchen → deleting', () => {
  it('asks first, and shows the 409 message naming what still uses the ingredient', async () => {
    const { user, api, router } = renderKitchen('/kitchen/ingredients/ing-butter');
    await screen.findByRole('heading', { level: 1, name: 'Butter 82 %' });

    await user.click(screen.getByRole('button', { name: 'Delete' }));
    const dialog = await screen.findByRole('alertdialog', {
      name: 'Delete the ingredient “Butter 82 %”?',
    });
    // Keeping it sends nothing.
    await user.click(within(dialog).getByRole('button', { name: 'Keep it' }));
    await waitFor(() => expect(screen.queryByRole('alertdialog')).not.toBeInTheDocument());
    expect(api.state.requests).toHaveLength(0);

    await user.click(screen.getByRole('button', { name: 'Delete' }));
    const again = await screen.findByRole('alertdialog');
    await user.click(within(again).getByRole('button', { name: 'Delete ingredient' }));
    // Butter is in the almond crumble and the sablé dough.
    expect(
      await within(again).findByText(
        '“Butter 82 %” cannot be deleted: used by the recipe “Almond crumble” and 1 more. Remove it from them first.',
      ),
    ).toBeInTheDocument();
    expect(api.state.requests.map((r) => `${r.method} ${r.path}`)).toEqual([
      'DELETE /api/ingredients/ing-butter',
    ]);
    expect(router.state.location.pathname).toBe('/kitchen/ingredients/ing-butter');
  }, 30_000);

  it('deletes what nothing uses and returns to the list', async () => {
    const { user, router } = renderKitchen('/kitchen/menus/menu-garden');
    await screen.findByRole('heading', { level: 1, name: 'Garden supper' });
    await user.click(screen.getByRole('button', { name: 'Delete' }));
    const dialog = await screen.findByRole('alertdialog');
    await user.click(within(dialog).getByRole('button', { name: 'Delete menu' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/kitchen/menus'));
    expect(await screen.findByText('No menus yet')).toBeInTheDocument();
  }, 30_000);
});
