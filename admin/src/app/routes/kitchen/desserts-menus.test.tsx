import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { staffUser } from '../../../testing/fixtures';
import { renderKitchen, section } from '../../../testing/kitchen-render';
import { server } from '../../../testing/server';

describe('Kitchen → Desserts', () => {
  it('works out the plate cost and allergens of the dessert as its portions change', async () => {
    const { user } = renderKitchen('/kitchen/desserts/des-tartlet-plate');
    await screen.findByRole('heading', { level: 1, name: 'Tartlet and vanilla ice' });
    // By hand, from the fixture prices (cents per gram):
    //   sablé: (250 × 0.12 + 150 × 1.09 + 100 × 0.145 + 50 × 690/1500) / 540 = 231 / 540 = 0.427778;
    //   crumble: (12 + 139 + 109 + 14.5) / 380 = 0.722368;
    //   tartlet: (300 × 0.427778 + 100 × 0.722368) / 400 = 0.501425;
    //   ice-cream base: 282.746 / 980 = 0.288516.
    //   80 g tartlet 40.114 + 60 g base 17.311 = 57.425 c → €0.57.
    expect(await screen.findByTestId('plate-cost')).toHaveTextContent('€0.57');
    const plate = within(screen.getByRole('complementary', { name: 'Plate figures' }));
    // Almonds from the crumble inside the tartlet; "may contain" hazelnuts from the almond flour.
    expect(plate.getAllByText(/Nuts \(almonds\)/).length).toBeGreaterThan(0);
    expect(plate.getAllByText(/hazelnuts/).length).toBeGreaterThan(0);

    // 120 g of tartlet: 60.171 + 17.311 = 77.482 c → €0.77.
    const first = within(screen.getByRole('group', { name: 'Component 1' }));
    await user.clear(first.getByRole('textbox', { name: 'Component 1: portion' }));
    await user.type(first.getByRole('textbox', { name: 'Component 1: portion' }), '120');
    await waitFor(() => expect(screen.getByTestId('plate-cost')).toHaveTextContent('€0.77'));
  }, 30_000);

  it('uploads a photo with a preview, and shows the server’s 413 in words', async () => {
    const { user, api } = renderKitchen('/kitchen/desserts/des-tartlet-plate');
    const photos = await section('Photos');
    // A proxy or the API may refuse a file the browser let through: its words are shown.
    server.use(
      http.post(
        '/api/desserts/:id/photo',
        () =>
          HttpResponse.json(
            { statusCode: 413, message: 'The photo is larger than 5 MB; send a smaller one.' },
            { status: 413 },
          ),
        { once: true },
      ),
    );
    const file = new File([new Uint8Array([0xff, 0xd8, 0xff, 0xe0])], 'plate.jpg', {
      type: 'image/jpeg',
    });
    await user.upload(photos.getByLabelText('Add a photo of Tartlet and vanilla ice'), file);
    const alert = await photos.findByRole('alert');
    expect(alert).toHaveTextContent(
      'The photo is larger than 5 MB; send a smaller one. Photos up to 5 MB are accepted.',
    );

    // A file that is not a photo never leaves the browser.
    const text = new File(['hello'], 'notes.txt', { type: 'text/plain' });
    await userEvent
      .setup({ applyAccept: false })
      .upload(photos.getByLabelText('Add a photo of Tartlet and vanilla ice'), text);
    expect(await photos.findByText('Use a JPEG, PNG or WebP photo.')).toBeInTheDocument();

    // Now the fake API stores it, as the real one does, and the thumbnail appears.
    await user.upload(photos.getByLabelText('Add a photo of Tartlet and vanilla ice'), file);
    // Sent in the multipart field the API reads (api/src/files/photo-upload.decorator.ts).
    await waitFor(() =>
      expect(api.state.requests.at(-1)?.body).toMatchObject({ type: 'image/jpeg' }),
    );
    const img = await photos.findByRole('img', { name: 'Tartlet and vanilla ice, photo 1' });
    expect(img.getAttribute('src')).toMatch(/^\/api\/files\/photo-\d+-400\.webp$/);
  }, 30_000);

  it('shows staff the dessert to plate from, with nothing to edit and no cost', async () => {
    renderKitchen('/kitchen/desserts/des-tartlet-plate', staffUser);
    await screen.findByRole('heading', { level: 1, name: 'Tartlet and vanilla ice' });
    expect(
      await screen.findByText('Quenelle on the tartlet, at the last moment.'),
    ).toBeInTheDocument();
    expect(document.querySelector('form')).toBeNull();
    expect(screen.queryByRole('textbox')).not.toBeInTheDocument();
    expect(
      screen.queryByRole('button', { name: /Save|Delete|Add a photo/ }),
    ).not.toBeInTheDocument();
    expect(screen.queryByTestId('plate-cost')).not.toBeInTheDocument();
  });
});

describe('Kitchen → Menus', () => {
  it('shows the food cost and the price that meets a target food cost', async () => {
    const { user } = renderKitchen('/kitchen/menus/menu-garden');
    const costing = within(await screen.findByRole('complementary', { name: 'Menu costing' }));
    // One plate costs 57.425 c (see the dessert test); at €18.00 per guest that is
    // 57.425 / 1800 = 3.19 % → 3.2 %. At a 30 % target: 57.425 × 100 / 30 = 191.42 c, rounded up
    // so the target is met: €1.92.
    expect(await costing.findByTestId('food-cost-percent')).toHaveTextContent('3.2 %');
    expect(costing.getByTestId('suggested-price')).toHaveTextContent('€1.92');
    // At 25 %: 229.70 c → €2.30.
    const target = costing.getByRole('textbox', { name: 'Target food cost' });
    await user.clear(target);
    await user.type(target, '25');
    await waitFor(() => expect(costing.getByTestId('suggested-price')).toHaveTextContent('€2.30'));
  }, 30_000);

  it('shows staff the menu without costs or edit controls', async () => {
    renderKitchen('/kitchen/menus/menu-garden', staffUser);
    await screen.findByRole('heading', { level: 1, name: 'Garden supper' });
    expect(await screen.findByText('Tartlet and vanilla ice')).toBeInTheDocument();
    expect(screen.queryByRole('complementary', { name: 'Menu costing' })).not.toBeInTheDocument();
    expect(document.querySelector('form')).toBeNull();
    expect(screen.queryByRole('button', { name: /Save|Delete/ })).not.toBeInTheDocument();
  });
});
