import { configure, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { listOrders, manyOrders, studioDay } from '../../../testing/allergy-notes-fixtures';
import { renderAllergyNotes } from '../../../testing/allergy-notes-render';
import { chefUser, staffUser } from '../../../testing/fixtures';

// Whole routes, lazy chunks and all, on a busy 2-core machine: give first renders time.
configure({ asyncUtilTimeout: 15_000 });

/** The card of the event whose link names this reference. */
async function eventCard(reference: string) {
  const link = await screen.findByRole('link', { name: `Open notes, ${reference}` });
  return within(link.closest('li')!);
}

describe('Allergy notes list', () => {
  it('lists upcoming and recent events with their counts, soonest first, and leaves out bookings without plates', async () => {
    const { api } = renderAllergyNotes('/allergy-notes', chefUser, { orders: listOrders() });
    expect(await screen.findByRole('heading', { level: 1, name: 'Allergy notes' })).toBeVisible();
    const upcoming = within(
      screen.getByRole('heading', { level: 2, name: 'Upcoming' }).closest('section')!,
    );
    const titles = (await upcoming.findAllByRole('heading', { level: 3 })).map(
      (h) => h.textContent,
    );
    expect(titles).toHaveLength(2);
    expect(titles[0]).toContain('Orchard Evening');
    // Cancelled and unpaid bookings have no plates to check.
    expect(screen.queryByText('N-2026-0103')).toBeNull();
    expect(screen.queryByText('N-2026-0104')).toBeNull();

    // Harvest dinner: three guests stated something. The tree-nut guest meets almonds and
    // pistachios on the pear plate (Reg. (EU) 1169/2011 Annex II item 8); the vegetarian meets
    // the gelatin mousse, and a note alone does not change his plate: 2 plates to resolve.
    const harvest = await eventCard('N-2026-0101');
    expect(await harvest.findByText('3 guests with requirements')).toBeVisible();
    expect(harvest.getByText('2 plates to resolve')).toBeVisible();
    expect(harvest.getByText('1 plate changed')).toBeVisible();
    // Ground almonds "may contain" hazelnuts: an advisory, counted apart.
    expect(harvest.getByText('1 cross-contact advisory')).toBeVisible();

    // The other event's almond crumble is replaced by an oat crumble: no conflict left.
    const garden = await eventCard('N-2026-0102');
    expect(await garden.findByText('No conflict left')).toBeVisible();
    expect(garden.getByText('Awaiting the chef')).toBeVisible();

    const recent = within(
      screen.getByRole('heading', { level: 2, name: 'Recent' }).closest('section')!,
    );
    expect(recent.getByText('N-2026-0090')).toBeVisible();
    expect(recent.getByText('No guest stated an allergy or a diet.')).toBeVisible();

    // The list asked from a week back, and the counts for the events on screen only.
    expect(api.state.requests[0]!.path).toContain(`from=${studioDay(-7)}`);
    const counts = api.state.requests.find((r) => r.path.startsWith('/api/allergy-notes/counts'));
    expect(counts!.path).toBe('/api/allergy-notes/counts?orderIds=o-harvest,o-garden,o-recent');
    // Listing is not an opening of any guest's data.
    expect(api.state.accessLog).toEqual([]);
  });

  it('links each event to its notes and its staff briefing', async () => {
    renderAllergyNotes('/allergy-notes', staffUser, { orders: listOrders() });
    const link = await screen.findByRole('link', { name: 'Open notes, N-2026-0101' });
    expect(link).toHaveAttribute('href', '/allergy-notes/o-harvest');
    expect(screen.getByRole('link', { name: 'Staff briefing, N-2026-0101' })).toHaveAttribute(
      'href',
      '/allergy-notes/o-harvest/briefing',
    );
  });

  it('pages the upcoming events, twenty at a time, asking counts for the page shown', async () => {
    const { user, api } = renderAllergyNotes('/allergy-notes', chefUser, {
      orders: manyOrders(23),
    });
    const pager = await screen.findByRole('navigation', { name: 'Pages of upcoming events' });
    expect(within(pager).getByText('Page 1 of 2 · 23 upcoming events')).toBeVisible();
    expect(screen.getAllByRole('link', { name: /^Open notes/ })).toHaveLength(20);
    await user.click(within(pager).getByRole('button', { name: 'Next' }));
    expect(await within(pager).findByText('Page 2 of 2 · 23 upcoming events')).toBeVisible();
    expect(screen.getAllByRole('link', { name: /^Open notes/ })).toHaveLength(3);
    expect(within(pager).getByRole('button', { name: 'Next' })).toBeDisabled();
    const last = api.state.requests.filter((r) => r.path.startsWith('/api/allergy-notes/counts'));
    expect(last.at(-1)!.path).toBe(
      '/api/allergy-notes/counts?orderIds=o-many-21,o-many-22,o-many-23',
    );
  });

  it('says so when there are no events', async () => {
    renderAllergyNotes('/allergy-notes', chefUser, { orders: [] });
    expect(await screen.findByText('No upcoming events')).toBeVisible();
    expect(screen.getByText('No events in the last 7 days.')).toBeVisible();
  });

  it('explains a failed list in words, with a retry', async () => {
    renderAllergyNotes('/allergy-notes', chefUser, {
      orders: listOrders(),
      fail: { events: { status: 500 } },
    });
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('The events could not be loaded')).toBeVisible();
    expect(
      within(alert).getByText('The server ran into a problem. Please try again in a moment.'),
    ).toBeVisible();
    expect(within(alert).getByRole('button', { name: 'Try again' })).toBeVisible();
  });

  it('still lists the events when only the counts fail, and says so', async () => {
    renderAllergyNotes('/allergy-notes', chefUser, {
      orders: listOrders(),
      fail: { counts: { status: 503 } },
    });
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('The allergy counts could not be loaded')).toBeVisible();
    expect(within(alert).getByText(/The server ran into a problem/)).toBeVisible();
    expect(screen.getByRole('link', { name: 'Open notes, N-2026-0101' })).toBeVisible();
  });
});
