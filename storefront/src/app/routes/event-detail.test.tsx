import { OrderStatus, requote, type OrderDetail } from '@nappe/shared';
import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { browser } from '../../lib/browser';
import { makeOrder, pageOf, pricing, quoteFor, TODAY } from '../../testing/booking-fixtures';
import { clientUser, sessionFor } from '../../testing/fixtures';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

const TOKEN = `token-for-${clientUser.id}`;

function serveOrder(order: OrderDetail) {
  server.use(
    http.get('/api/orders/:id', ({ params }) =>
      params.id === order.id
        ? HttpResponse.json(order)
        : HttpResponse.json({ statusCode: 404, message: 'Order not found.' }, { status: 404 }),
    ),
  );
}

beforeEach(() => {
  server.use(http.post('/api/auth/refresh', () => HttpResponse.json(sessionFor(clientUser))));
});
afterEach(() => vi.restoreAllMocks());

describe('My events', () => {
  it('lists each event with its status, date, menu, guests and balance', async () => {
    const order = makeOrder();
    server.use(
      http.get('/api/orders', ({ request }) => {
        expect(request.headers.get('Authorization')).toBe(`Bearer ${TOKEN}`);
        return HttpResponse.json(
          pageOf([
            order,
            makeOrder({
              id: 'order-2',
              reference: 'N-2026-0043',
              status: OrderStatus.Cancelled,
              menuName: 'Orchard Table',
              eventDate: '2026-09-05',
              guestCount: 12,
              balanceMinor: 0,
            }),
          ]),
        );
      }),
    );
    renderApp('/my-events');
    const first = await screen.findByRole('article', { name: 'Midsummer Garden' });
    expect(first).toHaveTextContent('Paid — waiting for the chef');
    expect(first).toHaveTextContent('Saturday 18 July 2026');
    expect(first).toHaveTextContent('40 guests');
    expect(first).toHaveTextContent('Balance €1,624.00, due by Saturday 4 July 2026');
    expect(within(first).getByRole('link', { name: 'Midsummer Garden' })).toHaveAttribute(
      'href',
      '/my-events/order-1',
    );
    const second = screen.getByRole('article', { name: 'Orchard Table' });
    expect(second).toHaveTextContent('Cancelled');
    expect(second).toHaveTextContent('Nothing to pay');
  });
});

describe('An event', () => {
  it('shows the overview with its timeline, then guests, payments and documents in tabs', async () => {
    serveOrder(makeOrder());
    const { user, router } = renderApp('/my-events/order-1');
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Midsummer Garden' }),
    ).toBeInTheDocument();
    expect(
      screen.getByText('We have your payment. The chef will confirm your event shortly.'),
    ).toBeInTheDocument();

    const overview = screen.getByRole('tabpanel', { name: 'Overview' });
    expect(overview).toHaveTextContent('Domaine des Tilleuls');
    const timeline = within(overview).getAllByRole('listitem');
    expect(timeline.map((li) => li.textContent)).toEqual([
      expect.stringContaining('Booking made, waiting for payment'),
      expect.stringContaining('Deposit of €696.00 received'),
    ]);
    expect(timeline[1]).toHaveTextContent('automatically');

    await user.click(screen.getByRole('tab', { name: 'Guests and diets' }));
    expect(router.state.location.search).toBe('?tab=guests');
    const guests = await screen.findByRole('tabpanel', { name: 'Guests and diets' });
    expect(
      within(guests).getByRole('list', { name: 'Allergies of Aunt Mireille' }),
    ).toHaveTextContent('Milk');
    expect(
      within(guests).getByRole('list', { name: 'Allergies of Aunt Mireille' }),
    ).toHaveTextContent('Eggs');
    expect(guests).toHaveTextContent('Nuts: 1 guest (Léon)');
    expect(guests).toHaveTextContent('“Carries an adrenaline pen”');

    await user.click(screen.getByRole('tab', { name: 'Payments' }));
    const payments = await screen.findByRole('tabpanel', { name: 'Payments' });
    const rows = within(payments).getAllByRole('row');
    expect(rows[1]).toHaveTextContent('Deposit');
    expect(rows[1]).toHaveTextContent('€696.00');
  });

  it('downloads documents with the session token and saves them as files', async () => {
    serveOrder(makeOrder());
    const saved: { name: string; type: string; text: string }[] = [];
    vi.spyOn(browser, 'save').mockImplementation((file, fallback) => {
      void file.blob
        .text()
        .then((text) =>
          saved.push({ name: file.fileName ?? fallback, type: file.blob.type, text }),
        );
    });
    const auth: (string | null)[] = [];
    server.use(
      http.get('/api/orders/:id/event.ics', ({ request }) => {
        auth.push(request.headers.get('Authorization'));
        return new HttpResponse('BEGIN:VCALENDAR\r\nEND:VCALENDAR\r\n', {
          headers: {
            'Content-Type': 'text/calendar',
            'Content-Disposition': 'attachment; filename="nappe-N-2026-0042.ics"',
          },
        });
      }),
      http.get('/api/orders/:id/receipts/:file', ({ request, params }) => {
        auth.push(request.headers.get('Authorization'));
        expect(params.file).toBe('pay-1.pdf');
        return new HttpResponse('%PDF-1.7', { headers: { 'Content-Type': 'application/pdf' } });
      }),
    );
    const { user } = renderApp('/my-events/order-1?tab=documents');
    const documents = await screen.findByRole('tabpanel', { name: 'Documents' });
    await user.click(
      within(documents).getByRole('button', { name: /Download Event file \(\.ics\)/ }),
    );
    await user.click(
      within(documents).getByRole('button', { name: /Download Receipt: deposit of €696.00/ }),
    );
    await waitFor(() => expect(saved).toHaveLength(2));
    expect(auth).toEqual([`Bearer ${TOKEN}`, `Bearer ${TOKEN}`]);
    expect(saved).toContainEqual({
      name: 'nappe-N-2026-0042.ics',
      type: 'text/calendar',
      text: 'BEGIN:VCALENDAR\r\nEND:VCALENDAR\r\n',
    });
    expect(saved).toContainEqual({
      name: 'receipt-N-2026-0042.pdf',
      type: 'application/pdf',
      text: '%PDF-1.7',
    });
  });

  it('an event that is not the client’s (or does not exist) gets a not-found page', async () => {
    serveOrder(makeOrder());
    renderApp('/my-events/order-of-someone-else');
    expect(
      await screen.findByRole('heading', { level: 1, name: 'We cannot find this event' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Back to My events' })).toHaveAttribute(
      'href',
      '/my-events',
    );
  });

  it('pays the balance through a new checkout', async () => {
    serveOrder(makeOrder());
    const assign = vi.spyOn(browser, 'assign').mockImplementation(() => {});
    const plans: unknown[] = [];
    server.use(
      http.post('/api/orders/:id/checkout', async ({ request }) => {
        plans.push(await request.json());
        return HttpResponse.json({
          checkoutUrl: 'http://localhost:12111/pay/cs_balance',
          sessionId: 'cs_balance',
          amountMinor: 162_400,
          currency: 'EUR',
          expiresAt: '2026-06-01T10:30:00Z',
        });
      }),
    );
    const { user } = renderApp('/my-events/order-1');
    await user.click(await screen.findByRole('button', { name: 'Pay the balance: €1,624.00' }));
    await waitFor(() =>
      expect(assign).toHaveBeenCalledWith('http://localhost:12111/pay/cs_balance'),
    );
    expect(plans).toEqual([{ plan: 'balance' }]);
  });

  it('shows the refund the policy gives before the cancellation is confirmed', async () => {
    serveOrder(makeOrder());
    let cancelled: unknown = null;
    server.use(
      http.post('/api/orders/:id/cancellation-preview', async () => {
        // Slow enough that the dialog is seen working it out.
        await new Promise((resolve) => setTimeout(resolve, 400));
        return HttpResponse.json({
          refund: {
            currency: 'EUR',
            daysBeforeEvent: 47,
            tier: { daysBefore: 30, refundPercent: 100 },
            refundPercent: 100,
            paidMinor: 69_600,
            refundableBaseMinor: 69_600,
            refundMinor: 69_600,
            keptMinor: 0,
            message:
              'Cancelled 47 days before the event: 100 % of what you paid is refunded (€696.00 of €696.00).',
          },
          nextStatus: OrderStatus.Cancelled,
        });
      }),
      http.post('/api/orders/:id/cancel', async ({ request }) => {
        cancelled = await request.json();
        return HttpResponse.json(
          makeOrder({
            status: OrderStatus.Cancelled,
            actions: { pay: null, cancel: false, changeGuests: false },
          }),
        );
      }),
    );
    const { user } = renderApp('/my-events/order-1');
    await user.click(await screen.findByRole('button', { name: 'Cancel booking' }));

    const dialog = await screen.findByRole('alertdialog', { name: 'Cancel this booking?' });
    expect(await within(dialog).findByText('Working out your refund…')).toBeInTheDocument();
    expect(within(dialog).getByRole('button', { name: 'Cancel the booking' })).toBeDisabled();

    const confirm = await within(dialog).findByRole('button', {
      name: 'Cancel and refund €696.00',
    });
    expect(dialog).toHaveTextContent(
      'Cancelling today, 47 days before it, refunds 100 % of what you paid under the cancellation policy.',
    );
    expect(dialog).toHaveTextContent('Refund€696.00 (100 %)');
    expect(cancelled).toBeNull();

    await user.type(within(dialog).getByLabelText(/Reason/), 'The venue fell through');
    await user.click(confirm);
    await waitFor(() => expect(cancelled).toEqual({ reason: 'The venue fell through' }));
    expect(await screen.findByText('Your booking is cancelled')).toBeInTheDocument();
    expect(
      screen.getByText(/€696.00 will be refunded to the card you paid with/),
    ).toBeInTheDocument();
    expect(screen.queryByRole('alertdialog')).toBeNull();
  });

  it('keeping the booking closes the dialog and cancels nothing', async () => {
    serveOrder(makeOrder());
    let cancels = 0;
    server.use(
      http.post('/api/orders/:id/cancellation-preview', () =>
        HttpResponse.json({
          refund: {
            currency: 'EUR',
            daysBeforeEvent: 10,
            tier: { daysBefore: 0, refundPercent: 0 },
            refundPercent: 0,
            paidMinor: 69_600,
            refundableBaseMinor: 69_600,
            refundMinor: 0,
            keptMinor: 69_600,
            message:
              'Cancelled 10 days before the event: no refund under the cancellation policy (0 % of what you paid).',
          },
          nextStatus: OrderStatus.Cancelled,
        }),
      ),
      http.post('/api/orders/:id/cancel', () => {
        cancels += 1;
        return HttpResponse.json(makeOrder());
      }),
    );
    const { user } = renderApp('/my-events/order-1');
    await user.click(await screen.findByRole('button', { name: 'Cancel booking' }));
    const dialog = await screen.findByRole('alertdialog');
    expect(await within(dialog).findByText(/refunds 0 % of what you paid/)).toBeInTheDocument();
    expect(within(dialog).getByRole('button', { name: 'Cancel the booking' })).toBeEnabled();
    await user.click(within(dialog).getByRole('button', { name: 'Keep my booking' }));
    await waitFor(() => expect(screen.queryByRole('alertdialog')).toBeNull());
    expect(cancels).toBe(0);
  });
});

describe('Change guests', () => {
  const order = makeOrder();
  const money = { pricing, eventDate: order.eventDate, guestCount: 40, paidMinor: 69_600 };

  it('previews what more guests cost, then sends the client to pay it', async () => {
    serveOrder(order);
    const assign = vi.spyOn(browser, 'assign').mockImplementation(() => {});
    const previews: unknown[] = [];
    const puts: unknown[] = [];
    server.use(
      http.post('/api/orders/:id/guest-change-preview', async ({ request }) => {
        const body = (await request.json()) as { guestCount: number };
        previews.push(body);
        // The server's re-quote, made here by the same shared function.
        return HttpResponse.json({ requote: requote(money, body.guestCount, TODAY) });
      }),
      http.put('/api/orders/:id/guests', async ({ request }) => {
        puts.push(await request.json());
        return HttpResponse.json({
          order: makeOrder({ guestCount: 44, quote: quoteFor(44) }),
          checkout: {
            checkoutUrl: 'http://localhost:12111/pay/cs_top_up',
            sessionId: 'cs_top_up',
            amountMinor: 6_960,
            currency: 'EUR',
            expiresAt: '2026-06-01T10:30:00Z',
          },
          refundedMinor: 0,
        });
      }),
    );
    const { user } = renderApp('/my-events/order-1/change-guests');
    const count = await screen.findByLabelText(/Number of guests/);
    expect(count).toHaveValue(40);
    expect(screen.getByRole('group', { name: 'Guest 1: Aunt Mireille' })).toHaveTextContent(
      'Table 1 · Eggs, Milk · Vegetarian · with notes',
    );
    await user.clear(count);
    await user.type(count, '44');
    await user.click(screen.getByLabelText(/My guests agreed to share/));
    await user.click(screen.getByRole('button', { name: 'Preview the change' }));

    const preview = await screen.findByRole('region', { name: 'What this change means' });
    // 4 more guests at €58: the total rises by €232; 30 % of the new total is due now.
    expect(preview).toHaveTextContent(
      'From 40 guests to 44: the total rises from €2,320.00 to €2,552.00.',
    );
    expect(preview).toHaveTextContent('To pay now€69.60');
    expect(puts).toHaveLength(0);

    await user.click(within(preview).getByRole('button', { name: 'Confirm and pay €69.60' }));
    await waitFor(() =>
      expect(assign).toHaveBeenCalledWith('http://localhost:12111/pay/cs_top_up'),
    );
    expect(previews).toEqual(puts);
    expect(puts[0]).toMatchObject({ guestCount: 44, guestDataConsent: true });
  });

  it('previews the refund for fewer guests by today’s tier, and an edit asks for a new preview', async () => {
    serveOrder(order);
    server.use(
      http.post('/api/orders/:id/guest-change-preview', async ({ request }) => {
        const body = (await request.json()) as { guestCount: number };
        return HttpResponse.json({ requote: requote(money, body.guestCount, TODAY) });
      }),
    );
    const { user } = renderApp('/my-events/order-1/change-guests');
    const count = await screen.findByLabelText(/Number of guests/);
    await user.clear(count);
    await user.type(count, '30');
    await user.click(screen.getByLabelText(/My guests agreed to share/));
    await user.click(screen.getByRole('button', { name: 'Preview the change' }));
    const preview = await screen.findByRole('region', { name: 'What this change means' });
    // 47 days ahead the tier refunds 100 %: the quarter of the deposit that stood for 10 guests.
    expect(preview).toHaveTextContent('Refunded now€174.00');
    expect(
      within(preview).getByRole('button', { name: 'Confirm and refund €174.00' }),
    ).toBeInTheDocument();

    await user.type(count, '1');
    await waitFor(() =>
      expect(screen.queryByRole('region', { name: 'What this change means' })).toBeNull(),
    );
  });

  it('after the final-count deadline, says the guests can no longer be changed online', async () => {
    serveOrder(
      makeOrder({
        actions: { pay: 'balance', cancel: true, changeGuests: false },
        changeGuestsUntil: null,
      }),
    );
    renderApp('/my-events/order-1/change-guests');
    expect(await screen.findByText(/can no longer be changed online/)).toBeInTheDocument();
    expect(screen.queryByLabelText(/Number of guests/)).toBeNull();
  });
});
