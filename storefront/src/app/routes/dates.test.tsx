import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeEach, describe, expect, it } from 'vitest';
import {
  availabilityFor,
  bookingHandlers,
  MENUS,
  orchardMenu,
  summerMenu,
} from '../../testing/booking-fixtures';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

/** Availability requests seen by the fake, as "menuId from to". */
let asked: string[] = [];

beforeEach(() => {
  asked = [];
  server.use(
    http.get('/api/availability', ({ request }) => {
      const url = new URL(request.url);
      const menu = MENUS.find((m) => m.id === url.searchParams.get('menuId'))!;
      const from = url.searchParams.get('from')!;
      const to = url.searchParams.get('to')!;
      asked.push(`${menu.id} ${from} ${to}`);
      return HttpResponse.json(availabilityFor(menu, from, to));
    }),
    ...bookingHandlers.slice(1),
  );
});

const day = (label: RegExp) =>
  within(screen.getByRole('grid')).getByRole('button', { name: label });

describe('Dates', () => {
  it('shows every day of the month with its status in words, and a legend', async () => {
    renderApp('/dates?menu=menu-summer&month=2026-07');
    const grid = await screen.findByRole('grid', { name: 'July 2026' });
    await waitFor(() => expect(grid).toHaveAttribute('aria-busy', 'false'));

    // Today is 1 June (the fake's "today"); the menu needs 14 days' notice, so 15 June is the first.
    expect(
      within(grid)
        .getAllByRole('gridcell')
        .filter((c) => c.querySelector('button')),
    ).toHaveLength(31);
    expect(day(/^Friday 3 July 2026: full$/)).toHaveAttribute('aria-disabled', 'true');
    expect(
      day(/^Tuesday 14 July 2026: closed, the studio takes no events that day$/),
    ).toBeInTheDocument();
    expect(day(/^Saturday 18 July 2026: open, 96 plates left/)).toHaveAttribute(
      'aria-disabled',
      'false',
    );
    expect(day(/^Saturday 25 July 2026: open, 30 plates left/)).toBeInTheDocument();
    // On screen, a status is a word or a figure beside its mark, never a colour alone.
    expect(day(/^Friday 3 July 2026/)).toHaveTextContent('Full');
    expect(day(/^Tuesday 14 July 2026/)).toHaveTextContent('Closed');
    expect(day(/^Saturday 25 July 2026/)).toHaveTextContent('30');

    const legend = screen.getByRole('region', { name: 'What the calendar shows' });
    for (const words of ['Open:', 'Full:', 'Closed:', 'Too soon:', 'Past:']) {
      expect(within(legend).getByText(new RegExp(`^${words}`))).toBeInTheDocument();
    }
    expect(asked[0]).toBe('menu-summer 2026-07-01 2026-07-31');
  });

  it('marks past days and days inside the notice period', async () => {
    renderApp('/dates?menu=menu-summer&month=2026-06');
    await screen.findByRole('grid', { name: 'June 2026' });
    await waitFor(() => expect(day(/^Monday 1 June 2026 \(today\): too soon/)).toBeInTheDocument());
    expect(day(/^Sunday 14 June 2026: too soon, this menu needs more notice$/)).toHaveAttribute(
      'aria-disabled',
      'true',
    );
    expect(day(/^Monday 15 June 2026: open/)).toBeInTheDocument();
    expect(screen.getByText(/the earliest date you can book is/)).toHaveTextContent(
      'Monday 15 June 2026',
    );
    // Today's month is the first one offered.
    expect(screen.getByRole('button', { name: 'Previous month' })).toBeDisabled();
  });

  it('moves between days with the arrow keys, Home, End and Page Down, one day in the tab order', async () => {
    const { user } = renderApp('/dates?menu=menu-summer&month=2026-07');
    const grid = await screen.findByRole('grid', { name: 'July 2026' });
    await waitFor(() => expect(grid).toHaveAttribute('aria-busy', 'false'));

    // One day is reachable with Tab: the first open one.
    const tabbable = within(grid)
      .getAllByRole('button')
      .filter((b) => b.tabIndex === 0);
    expect(tabbable).toHaveLength(1);
    tabbable[0]!.focus();
    expect(document.activeElement).toHaveAccessibleName(/^Wednesday 1 July 2026: open/);

    await user.keyboard('{ArrowRight}');
    expect(document.activeElement).toHaveAccessibleName(/^Thursday 2 July 2026/);
    await user.keyboard('{ArrowDown}');
    expect(document.activeElement).toHaveAccessibleName(/^Thursday 9 July 2026/);
    await user.keyboard('{End}');
    expect(document.activeElement).toHaveAccessibleName(/^Sunday 12 July 2026/);
    await user.keyboard('{Home}');
    expect(document.activeElement).toHaveAccessibleName(/^Monday 6 July 2026/);
    await user.keyboard('{ArrowUp}{ArrowUp}');
    // Past the first of the month: the calendar turns back to June and keeps the focus.
    expect(await screen.findByRole('grid', { name: 'June 2026' })).toBeInTheDocument();
    await waitFor(() =>
      expect(document.activeElement).toHaveAccessibleName(/^Monday 22 June 2026/),
    );
    expect(document.activeElement!.getAttribute('tabindex')).toBe('0');

    await user.keyboard('{PageDown}{PageDown}');
    expect(await screen.findByRole('grid', { name: 'August 2026' })).toBeInTheDocument();
    await waitFor(() =>
      expect(document.activeElement).toHaveAccessibleName(/^Saturday 22 August 2026/),
    );
    await waitFor(() => expect(asked).toContain('menu-summer 2026-08-01 2026-08-31'));
  });

  it('choosing an open day starts booking; a full day does nothing', async () => {
    const { user, router } = renderApp('/dates?menu=menu-summer&month=2026-07');
    await screen.findByRole('grid', { name: 'July 2026' });
    await waitFor(() => expect(day(/^Friday 3 July 2026: full$/)).toBeInTheDocument());

    await user.click(day(/^Friday 3 July 2026/));
    expect(router.state.location.pathname).toBe('/dates');

    await user.click(day(/^Saturday 18 July 2026/));
    await waitFor(() => expect(router.state.location.pathname).toBe('/book/menu-summer/event'));
    expect(router.state.location.search).toBe('?date=2026-07-18');
  });

  it('shows the dates of the menu chosen', async () => {
    const { user, router } = renderApp('/dates?month=2026-06');
    await screen.findByRole('grid', { name: 'June 2026' });
    // Without a menu in the address, the first one is shown.
    expect(screen.getByRole('combobox', { name: 'Menu' })).toHaveValue(summerMenu.id);

    await user.selectOptions(screen.getByRole('combobox', { name: 'Menu' }), orchardMenu.name);
    await waitFor(() => expect(router.state.location.search).toContain('menu=menu-orchard'));
    // Orchard Table needs only 5 days' notice.
    await waitFor(() => expect(day(/^Saturday 6 June 2026: open/)).toBeInTheDocument());
    expect(asked).toContain('menu-orchard 2026-06-01 2026-06-30');
  });
});
