import { OrderStatus } from '@nappe/shared';
import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { staffUser } from '../../testing/fixtures';
import {
  listSearches,
  pageHeading,
  renderOrders,
  scheduleLikeABrowser,
} from '../../testing/orders-api';
import { makeOrder, ORDERS_NOW, standardOrders } from '../../testing/orders-fixtures';
import { server } from '../../testing/server';

/** Wide screens get the month grid: every `min-width` media query matches. */
function wideScreen() {
  vi.spyOn(window, 'matchMedia').mockImplementation(
    (query: string) =>
      ({
        matches: query.includes('min-width'),
        media: query,
        onchange: null,
        addListener: () => {},
        removeListener: () => {},
        addEventListener: () => {},
        removeEventListener: () => {},
        dispatchEvent: () => false,
      }) as MediaQueryList,
  );
}

const cell = (date: string) => {
  const found = document.querySelector<HTMLElement>(`td[data-date="${date}"]`);
  if (!found) throw new Error(`no cell for ${date}`);
  return within(found);
};

scheduleLikeABrowser();
beforeEach(() => {
  vi.useFakeTimers({ toFake: ['Date'] });
  vi.setSystemTime(new Date(ORDERS_NOW)); // Friday 6 March 2026, 10:00 in Paris
});
afterEach(() => {
  vi.useRealTimers();
  vi.restoreAllMocks();
});

describe('Calendar', () => {
  it('opens on the studio’s month with each event on its day, closed days and the plates used', async () => {
    wideScreen();
    const { api } = renderOrders('/calendar', standardOrders());
    expect(await pageHeading('Calendar')).toBeInTheDocument();
    expect(
      await screen.findByRole('heading', { level: 2, name: 'March 2026' }),
    ).toBeInTheDocument();
    const grid = await screen.findByRole('table', { name: 'Events in March 2026' });
    // March 2026 starts on a Sunday: the grid runs Monday 23 February – Sunday 5 April (6 weeks).
    expect(within(grid).getAllByRole('row')).toHaveLength(7);
    expect(listSearches(api)).toContain('?page=1&pageSize=100&from=2026-02-23&to=2026-04-05');

    const saturday = cell('2026-03-14');
    expect(saturday.getByRole('link', { name: /N-2026-0038/ })).toHaveAttribute(
      'href',
      '/orders/ord-38',
    );
    expect(saturday.getByText('20:00 · 24 guests')).toBeInTheDocument();
    expect(saturday.getByText('Confirmed')).toBeInTheDocument();
    // The cancelled booking of the same day takes nothing from the kitchen and is left out.
    expect(saturday.queryByText(/N-2026-0037/)).toBeNull();
    // 24 guests × 1 dessert on the menu = 24 plates, of the 120 the studio makes a day.
    expect(saturday.getByText('24 of 120 plates')).toBeInTheDocument();

    expect(cell('2026-03-20').getByRole('link', { name: /N-2026-0041/ })).toBeInTheDocument();
    expect(cell('2026-03-20').getByText('19:30 · 18 guests')).toBeInTheDocument();
    expect(cell('2026-03-20').getByText('To confirm')).toBeInTheDocument();
    expect(cell('2026-03-25').getByText('Closed')).toBeInTheDocument();
    expect(cell('2026-03-06').getByText('Today')).toBeInTheDocument();
    // The served event of 27 February shows in the grid's leading days.
    expect(cell('2026-02-27').getByText(/N-2026-0035/)).toBeInTheDocument();
    expect(screen.getByRole('status', { name: '' }).textContent).toMatch(
      /^2 events in March 2026\./,
    );
  });

  it('moves between months with previous, next and today, keeping the month in the address', async () => {
    wideScreen();
    const { api, user, router } = renderOrders('/calendar', standardOrders());
    await screen.findByRole('table', { name: 'Events in March 2026' });

    await user.click(screen.getByRole('link', { name: 'Next month' }));
    expect(await screen.findByRole('table', { name: 'Events in April 2026' })).toBeInTheDocument();
    expect(router.state.location.search).toBe('?month=2026-04');
    expect(listSearches(api)).toContain('?page=1&pageSize=100&from=2026-03-30&to=2026-05-03');
    expect(cell('2026-04-02').getByText('N-2026-0040')).toBeInTheDocument();

    await user.click(screen.getByRole('link', { name: 'Previous month' }));
    await screen.findByRole('table', { name: 'Events in March 2026' });
    await user.click(screen.getByRole('link', { name: 'Previous month' }));
    expect(
      await screen.findByRole('table', { name: 'Events in February 2026' }),
    ).toBeInTheDocument();
    expect(router.state.location.search).toBe('?month=2026-02');

    await user.click(screen.getByRole('link', { name: 'Today' }));
    expect(await screen.findByRole('table', { name: 'Events in March 2026' })).toBeInTheDocument();

    // Back returns to the month before.
    await router.navigate(-1);
    expect(
      await screen.findByRole('table', { name: 'Events in February 2026' }),
    ).toBeInTheDocument();
  }, 90_000);

  it('reads “today” on the studio’s clock, and keeps each event on its own date on a device elsewhere', async () => {
    wideScreen();
    // 31 March 2026 22:30 UTC is already 1 April, 00:30 in Paris (CEST, UTC+2, since 29 March —
    // IANA tz database); the device runs on Los Angeles time, still 31 March afternoon.
    vi.setSystemTime(new Date('2026-03-31T22:30:00Z'));
    const deviceZone = process.env.TZ;
    process.env.TZ = 'America/Los_Angeles';
    try {
      const april1 = makeOrder({
        id: 'ord-50',
        reference: 'N-2026-0050',
        status: OrderStatus.Confirmed,
        eventDate: '2026-04-01',
        serviceTime: '12:30',
        guestCount: 16,
        createdAt: '2026-03-10T10:00:00.000Z',
      });
      renderOrders('/calendar', [april1]);
      expect(
        await screen.findByRole('table', { name: 'Events in April 2026' }),
      ).toBeInTheDocument();
      expect(cell('2026-04-01').getByText('Today')).toBeInTheDocument();
      expect(cell('2026-04-01').getByText('N-2026-0050')).toBeInTheDocument();
      expect(cell('2026-04-01').getByText('12:30 · 16 guests')).toBeInTheDocument();
      expect(cell('2026-03-31').queryByText(/N-2026-0050/)).toBeNull();
    } finally {
      process.env.TZ = deviceZone;
    }
  });

  it('shows three events in a day’s cell and links the rest to that day in the inbox', async () => {
    wideScreen();
    const busy = Array.from({ length: 5 }, (_, i) =>
      makeOrder({
        id: `ord-b${i}`,
        reference: `N-2026-010${i}`,
        status: OrderStatus.Confirmed,
        eventDate: '2026-03-21',
        serviceTime: `1${i}:00`,
        guestCount: 10,
        createdAt: '2026-03-01T10:00:00.000Z',
      }),
    );
    renderOrders('/calendar', busy);
    await screen.findByRole('table', { name: 'Events in March 2026' });
    const day = cell('2026-03-21');
    expect(day.getAllByRole('link', { name: /N-2026-010/ }).map((a) => a.textContent)).toEqual([
      expect.stringContaining('N-2026-0100'),
      expect.stringContaining('N-2026-0101'),
      expect.stringContaining('N-2026-0102'),
    ]);
    const more = day.getByRole('link', { name: /^\+2 more/ });
    expect(more).toHaveTextContent('+2 more on Saturday 21 March');
    expect(more).toHaveAttribute('href', '/orders?from=2026-03-21&to=2026-03-21');
    // 5 × 10 plates, all counted, not only those shown.
    expect(day.getByText('50 of 120 plates')).toBeInTheDocument();
  });

  it('lists the month day by day on a phone', async () => {
    // jsdom's default: no media query matches, as on a narrow screen.
    renderOrders('/calendar', standardOrders());
    const day = await screen.findByRole('heading', { level: 3, name: 'Saturday 14 March' });
    const item = within(day.closest('li')!);
    expect(item.getByRole('link', { name: /N-2026-0038/ })).toBeInTheDocument();
    expect(item.getByText('Confirmed')).toBeInTheDocument();
    expect(item.getByText('24 of 120 plates, 96 left')).toBeInTheDocument();
    const closed = screen.getByRole('heading', { level: 3, name: /Wednesday 25 March/ });
    expect(
      within(closed.closest('li')!).getByText('The studio takes no events this day.'),
    ).toBeInTheDocument();
    expect(screen.queryByRole('table')).toBeNull();
  });

  it('shows an error in words with a retry, and still the month without capacity when settings fail', async () => {
    const { user } = renderOrders('/calendar', standardOrders());
    let broken = true;
    server.use(
      http.get('/api/orders', () =>
        broken
          ? HttpResponse.json(
              { statusCode: 500, message: 'Internal server error' },
              { status: 500 },
            )
          : undefined,
      ),
      http.get('/api/studio/settings', () =>
        HttpResponse.json({ statusCode: 500, message: 'Internal server error' }, { status: 500 }),
      ),
    );
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('The events could not be loaded')).toBeInTheDocument();
    broken = false;
    await user.click(within(alert).getByRole('button', { name: 'Try again' }));
    const day = await screen.findByRole('heading', { level: 3, name: 'Saturday 14 March' });
    expect(within(day.closest('li')!).getByText('24 plates')).toBeInTheDocument();
    await waitFor(() =>
      expect(screen.getByText(/capacity and closed days could not be loaded/)).toBeInTheDocument(),
    );
  }, 60_000);

  it('is the chef’s: staff are told so', async () => {
    renderOrders('/calendar', standardOrders(), staffUser);
    expect(await pageHeading('Not available for your role')).toBeInTheDocument();
  });
});
