import { configure, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { harvestDinner } from '../../../testing/allergy-notes-fixtures';
import { renderAllergyNotes } from '../../../testing/allergy-notes-render';
import { chefUser, staffUser } from '../../../testing/fixtures';

// Whole routes, lazy chunks and all, on a busy 2-core machine: give first renders time.
configure({ asyncUtilTimeout: 15_000 });

/**
 * The staff briefing over the fixture event (src/testing/allergy-notes-fixtures.ts): a tree-nut
 * guest against almonds and pistachios (Reg. (EU) No 1169/2011, Annex II item 8) and a
 * vegetarian against gelatin (common practice, no source), neither resolved yet.
 */

const URL = '/allergy-notes/o-harvest/briefing';

afterEach(() => vi.restoreAllMocks());

describe('Staff briefing', () => {
  it('shows, by table, each guest, what changes on their plate and why', async () => {
    renderAllergyNotes(URL, staffUser, { orders: [harvestDinner()] });
    expect(await screen.findByRole('heading', { level: 1, name: 'Harvest dinner' })).toBeVisible();
    expect(screen.getByText('30 guests: 28 standard plates, 2 guests below.')).toBeVisible();
    expect(
      screen.getByText('Domaine des Tilleuls, 12 chemin des Vignes, 69400 Villefranche'),
    ).toBeVisible();
    expect(screen.getAllByRole('heading', { level: 2 }).map((h) => h.textContent)).toEqual([
      'Table 2',
      'Table 5',
    ]);

    const seat = within(screen.getByRole('article', { name: 'Table 2, seat 1' }));
    expect(seat.getByText('Pear, Almond and Pistachio')).toBeVisible();
    expect(seat.getByText('NOT RESOLVED — ask the chef before serving')).toBeVisible();
    // The words say it already: no second "Not resolved" badge.
    expect(seat.queryByText('Not resolved')).toBeNull();
    expect(
      seat.getByText(
        'Tree nuts (almonds, pistachios): in Toasted almond crumble (Ground almonds); Pistachio tuile (Pistachios, shelled).',
      ),
    ).toBeVisible();
    expect(seat.getByText('Tell or ask the guest')).toBeVisible();

    const jonas = within(screen.getByRole('article', { name: 'Jonas' }));
    expect(jonas.getByText('Ask about a sorbet instead')).toBeVisible();
    // A note alone leaves the plate as it was: marked, since the words do not say so.
    expect(jonas.getByText('Not resolved')).toBeVisible();
    expect(
      jonas.getByText(/Vegetarian: Set chocolate mousse \(Gelatin powder \(pork\)\)/),
    ).toBeVisible();
    // Mireille's plates do not change: she is not on the briefing.
    expect(screen.queryByRole('article', { name: 'Mireille' })).toBeNull();
    expect(screen.getByText('2 plates not resolved yet')).toBeVisible();
    expect(screen.getByText(/cross-contact is the kitchen’s responsibility/)).toBeVisible();
    // Staff read: there is nothing to change here.
    expect(
      screen.queryByRole('button', { name: /Record a change|Edit the change|Remove/ }),
    ).toBeNull();
  });

  it('downloads the PDF with the session’s token, under the server’s file name', async () => {
    const click = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(() => {});
    const { user, api } = renderAllergyNotes(URL, staffUser, { orders: [harvestDinner()] });
    await user.click(await screen.findByRole('button', { name: 'Download PDF' }));
    await waitFor(() => expect(click).toHaveBeenCalledTimes(1));
    const link = click.mock.contexts[0] as HTMLAnchorElement;
    expect(link.download).toBe('allergy-briefing-N-2026-0101.pdf');
    expect(link.href).toMatch(/^blob:/);
    expect(api.state.requests.find((r) => r.path.endsWith('briefing.pdf'))).toEqual({
      method: 'GET',
      path: '/api/orders/o-harvest/briefing.pdf',
      body: 'Bearer token-for-u-staff-1',
    });
    expect(api.state.accessLog.map((e) => e.what)).toEqual(['briefing_pdf', 'briefing']);
  });

  it('says in words when the PDF cannot be made', async () => {
    const { user } = renderAllergyNotes(URL, chefUser, {
      orders: [harvestDinner()],
      fail: { pdf: { status: 500 } },
    });
    await user.click(await screen.findByRole('button', { name: 'Download PDF' }));
    const alert = within(await screen.findByRole('alert'));
    expect(alert.getByText('The PDF could not be downloaded')).toBeVisible();
    expect(
      alert.getByText('The server ran into a problem. Please try again in a moment.'),
    ).toBeVisible();
  });

  it('says when every guest gets the standard plate', async () => {
    const event = harvestDinner();
    event.guests = [
      { position: 0, label: 'Mireille', table: '5', allergens: ['sesame'], diets: [] },
    ];
    event.substitutions = [];
    renderAllergyNotes(URL, staffUser, { orders: [event] });
    expect(await screen.findByText(/Every guest gets the standard plate/)).toBeVisible();
    expect(screen.queryByText(/not resolved yet/)).toBeNull();
  });

  it('explains in words when the briefing cannot be opened', async () => {
    renderAllergyNotes(URL, staffUser, {
      orders: [harvestDinner()],
      fail: { briefing: { status: 403, message: 'Forbidden resource' } },
    });
    const alert = within(await screen.findByRole('alert'));
    expect(alert.getByText('The briefing could not be loaded')).toBeVisible();
    expect(alert.getByText('Your role is not allowed to do this. Ask the chef.')).toBeVisible();
  });
});
