import { formatMoney } from '@nappe/shared';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { staffUser } from '../../../testing/fixtures';
import {
  listSearches,
  pageHeading,
  renderOrders,
  scheduleLikeABrowser,
} from '../../../testing/orders-api';
import { manyOrders, ORDERS_NOW, standardOrders } from '../../../testing/orders-fixtures';
import { server } from '../../../testing/server';

// Only Date is faked: the app's timers (the search's pause) and msw run in real time.
scheduleLikeABrowser();
beforeEach(() => {
  vi.useFakeTimers({ toFake: ['Date'] });
  vi.setSystemTime(new Date(ORDERS_NOW));
});
afterEach(() => vi.useRealTimers());

const table = () => screen.findByRole('table', { name: 'Orders, newest booking first' });
const bodyRows = async () =>
  within(await table())
    .getAllByRole('row')
    .slice(1);
const expectRows = (count: number) =>
  waitFor(async () => expect(await bodyRows()).toHaveLength(count));

describe('Orders inbox', () => {
  it('lists the newest bookings first, with status in words and money paid of total', async () => {
    const { api } = renderOrders('/orders', standardOrders());
    await pageHeading('Orders');

    const rows = await bodyRows();
    expect(rows.map((r) => within(r).getAllByRole('cell')[0]!.textContent)).toEqual([
      expect.stringContaining('N-2026-0041'), // booked 2 March
      expect.stringContaining('N-2026-0040'), // 1 March
      expect.stringContaining('N-2026-0038'), // 25 February
      expect.stringContaining('N-2026-0037'), // 24 February
      expect.stringContaining('N-2026-0035'), // 10 February
    ]);
    const first = within(rows[0]!);
    expect(first.getByText('Fri 20 Mar 2026')).toBeInTheDocument();
    expect(first.getByText('19:30')).toBeInTheDocument();
    expect(first.getByText('To confirm')).toBeInTheDocument();
    // 18 guests × €18.00 (the fixture menu) = €324.00, tax included; 30 % deposit = €97.20
    // (DEFAULT_STUDIO_SETTINGS) — worked by hand, not by the code under test.
    expect(first.getByText(formatMoney(9720, 'EUR'))).toBeInTheDocument();
    expect(first.getByText(`/ ${formatMoney(32400, 'EUR')}`)).toBeInTheDocument();
    expect(first.getByRole('link', { name: 'N-2026-0041' })).toHaveAttribute(
      'href',
      '/orders/ord-41',
    );
    expect(within(rows[3]!).getByText('Cancelled')).toBeInTheDocument();
    expect(screen.getByText('Showing 1–5 of 5 orders')).toBeInTheDocument();

    // Requests waiting for a decision come first, soonest event first.
    const waiting = screen.getByRole('region', { name: '2 requests wait for your decision' });
    expect(
      within(waiting)
        .getAllByRole('link')
        .map((a) => a.textContent),
    ).toEqual(['N-2026-0041', 'N-2026-0040']);
    expect(listSearches(api)).toEqual(
      expect.arrayContaining(['?page=1&pageSize=20', '?page=1&pageSize=20&status=requested']),
    );
  });

  it('sends the status, dates and search to the server and keeps them in the address bar', async () => {
    const { api, user, router } = renderOrders('/orders', standardOrders());
    await table();

    await user.selectOptions(screen.getByLabelText('Status'), 'Confirmed');
    await waitFor(() => expect(router.state.location.search).toBe('?status=confirmed'));
    await expectRows(1);
    expect(listSearches(api)).toContain('?page=1&pageSize=20&status=confirmed');
    // With a filter set, the waiting requests are not shown above the list.
    expect(screen.queryByRole('region', { name: /wait for your decision/ })).toBeNull();

    fireEvent.change(screen.getByLabelText('Event from'), { target: { value: '2026-03-01' } });
    fireEvent.change(screen.getByLabelText('Event to'), { target: { value: '2026-03-31' } });
    await waitFor(() =>
      expect(router.state.location.search).toBe('?status=confirmed&from=2026-03-01&to=2026-03-31'),
    );
    await user.type(screen.getByLabelText('Search'), 'marchetti');
    await waitFor(() =>
      expect(router.state.location.search).toBe(
        '?status=confirmed&from=2026-03-01&to=2026-03-31&q=marchetti',
      ),
    );
    expect(listSearches(api)).toContain(
      '?page=1&pageSize=20&status=confirmed&from=2026-03-01&to=2026-03-31&q=marchetti',
    );
    // Odile Marchetti's booking waits for a decision: none of hers is confirmed.
    expect(await screen.findByText('No orders match these filters')).toBeInTheDocument();

    // Back returns to the list before the search, with the box emptied to match.
    // (Typing may search several times on the way: together they are one step of history.)
    await router.navigate(-1);
    await waitFor(() =>
      expect(router.state.location.search).toBe('?status=confirmed&from=2026-03-01&to=2026-03-31'),
    );
    await waitFor(() => expect(screen.getByLabelText('Search')).toHaveValue(''));
    await expectRows(1);

    await user.click(screen.getByRole('button', { name: 'Clear filters' }));
    await waitFor(() => expect(router.state.location.search).toBe(''));
    await expectRows(5);
  }, 90_000);

  it('opens with the filters of a link, and drops values the API would refuse', async () => {
    const { api } = renderOrders(
      '/orders?status=requested&from=2026-13-40&page=0',
      standardOrders(),
    );
    await expectRows(2);
    expect(screen.getByLabelText('Status')).toHaveValue('requested');
    expect(screen.getByLabelText('Event from')).toHaveValue('');
    expect(listSearches(api)).toEqual(['?page=1&pageSize=20&status=requested']);
  });

  it('pages through the server’s pages, and a new filter starts again at page 1', async () => {
    const { api, user, router } = renderOrders('/orders', manyOrders(45));
    await table();
    expect(screen.getByText('Showing 1–20 of 45 orders')).toBeInTheDocument();
    expect(screen.getByText('Page 1 of 3')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Previous page' })).toBeDisabled();

    await user.click(screen.getByRole('button', { name: 'Next page' }));
    expect(await screen.findByText('Showing 21–40 of 45 orders')).toBeInTheDocument();
    expect(router.state.location.search).toBe('?page=2');
    expect(listSearches(api)).toContain('?page=2&pageSize=20');
    // Newest booking first: the 45th booked is row 1 of page 1, so row 1 of page 2 is the 25th.
    await waitFor(async () =>
      expect(
        within((await bodyRows())[0]!).getByRole('link', { name: 'N-2026-0025' }),
      ).toBeVisible(),
    );

    await user.click(screen.getByRole('button', { name: 'Next page' }));
    expect(await screen.findByText('Showing 41–45 of 45 orders')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Next page' })).toBeDisabled();

    await user.selectOptions(screen.getByLabelText('Status'), 'To confirm');
    await waitFor(() => expect(router.state.location.search).toBe('?status=requested'));
    // Every third booking is a request: 15 of 45.
    expect(await screen.findByText('Showing 1–15 of 15 orders')).toBeInTheDocument();
  }, 90_000);

  it('says so when there are no bookings, and when nothing matches the filters', async () => {
    const { user } = renderOrders('/orders', []);
    expect(await screen.findByText('No bookings yet')).toBeInTheDocument();

    await user.type(screen.getByLabelText('Search'), 'nobody');
    expect(await screen.findByText('No orders match these filters')).toBeInTheDocument();
    await user.click(screen.getAllByRole('button', { name: 'Clear filters' }).at(-1)!);
    expect(await screen.findByText('No bookings yet')).toBeInTheDocument();
  });

  it('refuses a “from” date after the “to” date in words, without asking the server', async () => {
    const { api } = renderOrders('/orders?from=2026-04-01&to=2026-03-01', standardOrders());
    expect(
      await screen.findByText(
        'The “from” date is after the “to” date. Change one of them to see orders.',
      ),
    ).toBeInTheDocument();
    expect(listSearches(api).filter((s) => s.includes('from='))).toEqual([]);
  });

  it('shows a server error in words, with a retry that works', async () => {
    const { user } = renderOrders('/orders', standardOrders());
    let broken = true;
    server.use(
      http.get('/api/orders', ({ request }) =>
        broken && !new URL(request.url).searchParams.has('status')
          ? HttpResponse.json(
              { statusCode: 500, message: 'Internal server error' },
              { status: 500 },
            )
          : undefined,
      ),
    );
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('The orders could not be loaded')).toBeInTheDocument();
    expect(
      within(alert).getByText('The server ran into a problem. Please try again in a moment.'),
    ).toBeInTheDocument();
    broken = false;
    await user.click(within(alert).getByRole('button', { name: 'Try again' }));
    await expectRows(5);
  });

  it('is the chef’s: staff are told so, and no order is fetched', async () => {
    const { api } = renderOrders('/orders', standardOrders(), staffUser);
    expect(await pageHeading('Not available for your role')).toBeInTheDocument();
    expect(listSearches(api)).toEqual([]);
  });
});
