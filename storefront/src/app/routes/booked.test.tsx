import { OrderStatus, type OrderDetail } from '@nappe/shared';
import { screen, waitFor } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeEach, describe, expect, it } from 'vitest';
import {
  emptyDraft,
  readBookingDraft,
  writeBookingDraft,
} from '../../features/booking/draft/booking-draft';
import { makeOrder } from '../../testing/booking-fixtures';
import { clientUser, sessionFor } from '../../testing/fixtures';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

beforeEach(() => {
  server.use(http.post('/api/auth/refresh', () => HttpResponse.json(sessionFor(clientUser))));
});

const pending = makeOrder({
  status: OrderStatus.PendingPayment,
  paidMinor: 0,
  payments: [],
  actions: { pay: 'deposit_or_full', cancel: true, changeGuests: false },
});

describe('Booked', () => {
  it('reports the return from the payment page, then follows the order until the payment is recorded', async () => {
    writeBookingDraft({ ...emptyDraft('menu-summer'), acceptTerms: true });
    const returns: unknown[] = [];
    const statuses: OrderStatus[] = [];
    // The payment service confirms a moment later: two answers still waiting, then paid.
    const answers: OrderDetail[] = [pending, pending, makeOrder()];
    server.use(
      http.post('/api/orders/:id/checkout/return', async ({ request, params }) => {
        returns.push({ id: params.id, body: await request.json() });
        return HttpResponse.json(pending);
      }),
      http.get('/api/orders/:id', () => {
        const order = answers.length > 1 ? answers.shift()! : answers[0]!;
        statuses.push(order.status);
        return HttpResponse.json(order);
      }),
    );

    renderApp('/my-events/order-1/booked?session_id=cs_test_1');

    expect(
      await screen.findByRole('heading', { name: 'Recording your payment…' }),
    ).toBeInTheDocument();
    expect(screen.getByText(/there is nothing more to do/)).toBeInTheDocument();

    expect(
      await screen.findByRole(
        'heading',
        { name: 'Thank you: your payment of €696.00 is recorded' },
        { timeout: 8000 },
      ),
    ).toBeInTheDocument();
    expect(returns).toEqual([{ id: 'order-1', body: { sessionId: 'cs_test_1' } }]);
    expect(statuses.slice(-1)).toEqual([OrderStatus.Requested]);
    expect(statuses.filter((s) => s === OrderStatus.PendingPayment).length).toBeGreaterThanOrEqual(
      1,
    );
    expect(screen.getByText('Paid — waiting for the chef')).toBeInTheDocument();
    expect(screen.getByText(/Balance €1,624.00, due by Saturday 4 July 2026/)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'See your event' })).toHaveAttribute(
      'href',
      '/my-events/order-1',
    );
    // The booking is made: the draft with its guests' details is gone from the tab.
    expect(readBookingDraft()).toBeNull();
    expect(document.title).toBe('Booked · Nappe');
  });

  it('says so when the payment was not completed in time', async () => {
    server.use(
      http.post('/api/orders/:id/checkout/return', () => HttpResponse.json(pending)),
      http.get('/api/orders/:id', () =>
        HttpResponse.json(makeOrder({ status: OrderStatus.Expired, paidMinor: 0, payments: [] })),
      ),
    );
    renderApp('/my-events/order-1/booked?session_id=cs_test_2');
    expect(await screen.findByText('Payment not completed')).toBeInTheDocument();
    expect(screen.getByText(/the date was released/)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Book again' })).toHaveAttribute('href', '/menus');
  });

  it('shows a failed check with a way to try again', async () => {
    let calls = 0;
    server.use(
      http.get('/api/orders/:id', () => {
        calls += 1;
        return calls === 1
          ? HttpResponse.json({ statusCode: 503, message: 'Service unavailable' }, { status: 503 })
          : HttpResponse.json(makeOrder());
      }),
    );
    const { user } = renderApp('/my-events/order-1/booked');
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('We could not check your booking');
    await user.click(screen.getByRole('button', { name: 'Try again' }));
    await waitFor(() =>
      expect(screen.getByRole('heading', { name: /is recorded/ })).toBeInTheDocument(),
    );
  });
});
