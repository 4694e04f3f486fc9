import { formatMoney } from '@nappe/shared';
import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { staffUser } from '../../../testing/fixtures';
import { pageHeading, renderOrders, scheduleLikeABrowser } from '../../../testing/orders-api';
import {
  CLEAN_REQUEST,
  CONFIRMED_ORDER,
  ORDERS_NOW,
  REQUEST_WITH_CONFLICT,
  standardOrders,
} from '../../../testing/orders-fixtures';
import { server } from '../../../testing/server';

// Only Date is faked: "today" is Friday 6 March 2026 in Paris; timers and msw run in real time.
scheduleLikeABrowser();
beforeEach(() => {
  vi.useFakeTimers({ toFake: ['Date'] });
  vi.setSystemTime(new Date(ORDERS_NOW));
});
afterEach(() => vi.useRealTimers());

const region = async (name: string | RegExp) => within(await screen.findByRole('region', { name }));
const dialog = async (name: string | RegExp) =>
  within(await screen.findByRole('alertdialog', { name }));
const statusMessage = (text: string | RegExp) =>
  waitFor(() =>
    expect(screen.getAllByRole('status').some((s) => s.textContent?.match(text))).toBe(true),
  );

// Money worked by hand from the fixtures, not by the code under test: the menu is €18.00 a
// guest, tax included; the deposit is 30 % (DEFAULT_STUDIO_SETTINGS).
const DEPOSIT_18 = formatMoney((18 * 1800 * 30) / 100, 'EUR'); // €97.20
const DEPOSIT_24 = formatMoney((24 * 1800 * 30) / 100, 'EUR'); // €129.60

describe('Order detail', () => {
  it('shows the client, event, guests with the unresolved conflicts, money, history and who opened the guest details', async () => {
    renderOrders('/orders/ord-41', standardOrders());
    expect(await pageHeading('N-2026-0041')).toBeInTheDocument();
    expect(screen.getAllByText('To confirm')[0]).toBeInTheDocument();

    const client = await region('Client');
    expect(client.getByText('Odile Marchetti')).toBeInTheDocument();
    expect(client.getByRole('link', { name: 'odile.marchetti@example.test' })).toHaveAttribute(
      'href',
      'mailto:odile.marchetti@example.test',
    );
    expect(client.getByRole('link', { name: '+33612345678' })).toHaveAttribute(
      'href',
      'tel:+33612345678',
    );

    const event = await region('Event');
    expect(event.getByText('Friday 20 March 2026')).toBeInTheDocument();
    expect(event.getByText('19:30')).toBeInTheDocument();
    expect(event.getByText('41 quai des Tanneurs')).toBeInTheDocument();
    expect(event.getByText('Garden supper')).toBeInTheDocument();
    expect(event.getByText('18 guests')).toBeInTheDocument();
    // Booked 2026-03-02 10:00 UTC = 11:00 in Paris (CET, UTC+1).
    expect(event.getByText('2 Mar 2026, 11:00')).toBeInTheDocument();

    const guests = await region('Guests and their requirements');
    expect(guests.getByText('18 guests; 2 with allergies, diets or notes.')).toBeInTheDocument();
    expect(await guests.findByText(/1 unresolved conflict/)).toBeInTheDocument();
    expect(
      guests.getByRole('link', { name: 'Record substitutions in the allergy notes' }),
    ).toHaveAttribute('href', '/allergy-notes/ord-41');
    expect(guests.getByText('Tree nuts')).toBeInTheDocument();
    expect(guests.getByText('Vegetarian')).toBeInTheDocument();

    const payments = await region('Payments and refunds');
    expect(payments.getByRole('cell', { name: 'Deposit' })).toBeInTheDocument();
    expect(payments.getAllByText(DEPOSIT_18).length).toBeGreaterThan(0);

    const history = await region('History');
    expect(
      history.getByText('Booked Garden supper for 18 guests; awaiting payment'),
    ).toBeInTheDocument();
    expect(history.getByText(/Odile Marchetti \(client\)/)).toBeInTheDocument();
    expect(history.getByText('Status: Checkout open → To confirm')).toBeInTheDocument();

    const access = await region('Who opened the guest details');
    expect(
      await access.findByText('Opened 2 times by 2 people; last by Tomás Reyes (staff).'),
    ).toBeInTheDocument();
    // 2026-03-05 08:12 UTC = 09:12 in Paris.
    expect(access.getByText(/5 Mar 2026, 09:12/)).toBeInTheDocument();
  });

  it('downloads a payment’s receipt with the chef’s token', async () => {
    const clicks: string[] = [];
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (
      this: HTMLAnchorElement,
    ) {
      clicks.push(this.download);
    });
    const { api, user } = renderOrders('/orders/ord-41', standardOrders());
    const payments = await region('Payments and refunds');
    await user.click(
      payments.getByRole('button', { name: `PDF receipt for the deposit of ${DEPOSIT_18}` }),
    );
    await waitFor(() => expect(clicks).toEqual(['receipt-N-2026-0041-deposit.pdf']));
    expect(
      api.state.requests.filter((r) => r.path.includes('/receipts/')).map((r) => r.path),
    ).toEqual(['/api/orders/ord-41/receipts/ord-41-pay-1.pdf']);
  });

  it('offers only what the status allows the chef', async () => {
    renderOrders('/orders/ord-38', standardOrders());
    await pageHeading('N-2026-0038');
    expect(screen.getByRole('button', { name: 'Mark as served…' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Cancel booking…' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Confirm…' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Decline…' })).toBeNull();
  });

  it('shows no action on a served order', async () => {
    renderOrders('/orders/ord-35', standardOrders());
    await pageHeading('N-2026-0035');
    expect(
      screen.queryByRole('button', { name: /Confirm|Decline|Cancel|Mark as served/ }),
    ).toBeNull();
  });

  it('confirms: the gate’s reasons, a required reason to confirm anyway, then the new status and history', async () => {
    const { api, user } = renderOrders('/orders/ord-41', [REQUEST_WITH_CONFLICT()]);
    await pageHeading('N-2026-0041');
    await (await region('Guests and their requirements')).findByText(/1 unresolved conflict/);

    await user.click(screen.getByRole('button', { name: 'Confirm…' }));
    let d = await dialog('Confirm N-2026-0041?');
    expect(d.getByText(/It joins the prep plan/)).toBeInTheDocument();
    expect(
      d.getByText(/1 guest plate still conflicts with a guest’s requirement/),
    ).toBeInTheDocument();
    await user.click(d.getByRole('button', { name: 'Confirm booking' }));

    d = await dialog('Confirm N-2026-0041?');
    expect(
      await d.findByText(
        'This booking cannot be confirmed yet: 1 guest plate still conflicts with a guest’s requirement. Record a substitution, or confirm anyway with a reason.',
      ),
    ).toBeInTheDocument();
    expect(
      d.getByText('Amira, Tartlet and vanilla ice: Contains almond (tree nuts) in Almond crumble.'),
    ).toBeInTheDocument();
    expect(
      d.getByRole('link', { name: 'Open the allergy notes to record substitutions' }),
    ).toHaveAttribute('href', '/allergy-notes/ord-41');

    // The reason is required (5+ characters, as the API checks).
    await user.click(d.getByRole('button', { name: 'Confirm anyway' }));
    expect(
      await d.findByText(
        'Give the reason for confirming anyway in a few words (5 characters or more).',
      ),
    ).toBeInTheDocument();
    const posts = () => api.state.requests.filter((r) => r.path === '/api/orders/ord-41/confirm');
    expect(posts()).toHaveLength(1);

    await user.type(d.getByLabelText(/Why confirm anyway/), 'Nut-free plate agreed with the host');
    await user.click(d.getByRole('button', { name: 'Confirm anyway' }));

    await statusMessage(/N-2026-0041 is confirmed despite the kitchen’s checks/);
    expect(screen.queryByRole('alertdialog')).toBeNull();
    expect(posts().map((r) => r.body)).toEqual([
      {},
      { overrideReason: 'Nut-free plate agreed with the host' },
    ]);
    const history = await region('History');
    expect(await history.findByText('Status: To confirm → Confirmed')).toBeInTheDocument();
    expect(
      history.getByText(
        'Confirmed despite: 1 guest plate still conflicts with a guest’s requirement',
      ),
    ).toBeInTheDocument();
    expect(history.getByText('Reason: “Nut-free plate agreed with the host”')).toBeInTheDocument();
    // The actions follow the new status.
    expect(await screen.findByRole('button', { name: 'Mark as served…' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Confirm…' })).toBeNull();
    // The order's other views were asked again after the change.
    const lastConfirm = api.state.requests.findLastIndex((r) => r.path.endsWith('/confirm'));
    await waitFor(() =>
      expect(
        api.state.requests
          .slice(lastConfirm)
          .some((r) => r.path === '/api/orders/ord-41/access-log'),
      ).toBe(true),
    );
  }, 90_000);

  it('confirms a request with nothing in the way at once; the inbox shows it confirmed after', async () => {
    const { api, user } = renderOrders('/orders', [CLEAN_REQUEST()]);
    expect(await screen.findByRole('cell', { name: /To confirm/ })).toBeInTheDocument();
    const inbox = within(
      await screen.findByRole('table', { name: 'Orders, newest booking first' }),
    );
    await user.click(inbox.getByRole('link', { name: 'N-2026-0040' }));
    await pageHeading('N-2026-0040');
    await user.click(screen.getByRole('button', { name: 'Confirm…' }));
    const d = await dialog('Confirm N-2026-0040?');
    await user.type(d.getByLabelText(/Note for the order’s history/), 'Called the host');
    await user.click(d.getByRole('button', { name: 'Confirm booking' }));
    await statusMessage(
      'N-2026-0040 is confirmed and added to the prep plan. The client is e-mailed.',
    );
    expect(api.state.requests.find((r) => r.path.endsWith('/confirm'))?.body).toEqual({
      reason: 'Called the host',
    });
    expect(
      await (await region('History')).findByText('Reason: “Called the host”'),
    ).toBeInTheDocument();

    await user.click(screen.getByRole('link', { name: 'All orders' }));
    expect(await screen.findByRole('cell', { name: /Confirmed/ })).toBeInTheDocument();
    expect(screen.queryByRole('cell', { name: /To confirm/ })).toBeNull();
  }, 90_000);

  it('declines with a required reason; the dialog says the full refund and the e-mail happen', async () => {
    const { api, user } = renderOrders('/orders/ord-40', [CLEAN_REQUEST()]);
    await pageHeading('N-2026-0040');
    await user.click(screen.getByRole('button', { name: 'Decline…' }));
    const d = await dialog('Decline N-2026-0040?');
    // 12 guests × €18.00 × 30 % = €64.80 paid.
    const paid = formatMoney((12 * 1800 * 30) / 100, 'EUR');
    expect(
      d.getByText(
        new RegExp(`Everything the client paid, ${paid.replace('.', '\\.')}, is refunded in full`),
      ),
    ).toBeInTheDocument();
    expect(
      d.getByText(/receives an e-mail that the studio cannot take the booking/),
    ).toBeInTheDocument();

    await user.click(d.getByRole('button', { name: `Decline and refund ${paid}` }));
    expect(
      await d.findByText('Say why you decline: it is kept in the order’s history.'),
    ).toBeInTheDocument();
    expect(api.state.requests.filter((r) => r.path.endsWith('/decline'))).toHaveLength(0);

    await user.type(d.getByLabelText(/Reason/), 'The kitchen is closed that week');
    await user.click(d.getByRole('button', { name: `Decline and refund ${paid}` }));
    await statusMessage(
      `N-2026-0040 is declined. ${paid} is refunded to the client, who is e-mailed.`,
    );
    expect(api.state.requests.find((r) => r.path.endsWith('/decline'))?.body).toEqual({
      reason: 'The kitchen is closed that week',
    });
    const payments = await region('Payments and refunds');
    expect(await payments.findByRole('cell', { name: 'Refund' })).toBeInTheDocument();
    expect(payments.getByText(`−${paid}`)).toBeInTheDocument();
  }, 60_000);

  it('cancels with the refund shown first: by the policy, or in full when the chef chooses', async () => {
    const { api, user } = renderOrders('/orders/ord-38', [CONFIRMED_ORDER()]);
    await pageHeading('N-2026-0038');
    await user.click(screen.getByRole('button', { name: 'Cancel booking…' }));
    const d = await dialog('Cancel N-2026-0038?');
    // 6 → 14 March is 8 days: the tier "0 days or more" (DEFAULT_STUDIO_SETTINGS: 30 d → 100 %,
    // 14 d → 50 %, 0 d → 0 %) refunds nothing, and the studio keeps the deposit.
    const policy = await d.findByRole('radio', {
      name: `By the cancellation policy: ${formatMoney(0, 'EUR')} (0 %, 8 days before the event); the studio keeps ${DEPOSIT_24}.`,
    });
    expect(policy).toBeChecked();
    expect(d.getByRole('button', { name: 'Cancel booking' })).toBeInTheDocument();

    await user.click(d.getByRole('radio', { name: /In full/ }));
    await user.click(d.getByRole('button', { name: `Cancel and refund ${DEPOSIT_24}` }));
    await statusMessage(
      `N-2026-0038 is cancelled. ${DEPOSIT_24} is refunded; the client is e-mailed.`,
    );
    expect(api.state.requests.find((r) => r.path.endsWith('/cancel'))?.body).toEqual({
      refund: 'full',
    });
    const history = await region('History');
    expect(
      await history.findByText(
        `Cancelled by the studio; ${DEPOSIT_24} refunded in full (the studio’s choice)`,
      ),
    ).toBeInTheDocument();
  }, 60_000);

  it('cancels by the policy without sending a refund choice (the API’s default)', async () => {
    const { api, user } = renderOrders('/orders/ord-38', [CONFIRMED_ORDER()]);
    await pageHeading('N-2026-0038');
    await user.click(screen.getByRole('button', { name: 'Cancel booking…' }));
    const d = await dialog('Cancel N-2026-0038?');
    await d.findByText(/By the cancellation policy:/);
    await user.type(d.getByLabelText(/Reason/), 'Client moved abroad');
    await user.click(d.getByRole('button', { name: 'Cancel booking' }));
    await statusMessage('N-2026-0038 is cancelled. Nothing is refunded; the client is e-mailed.');
    expect(api.state.requests.find((r) => r.path.endsWith('/cancel'))?.body).toEqual({
      reason: 'Client moved abroad',
    });
  }, 60_000);

  it('marks as served, warning first when the event is still to come', async () => {
    const { user } = renderOrders('/orders/ord-38', [CONFIRMED_ORDER()]);
    await pageHeading('N-2026-0038');
    await user.click(screen.getByRole('button', { name: 'Mark as served…' }));
    const d = await dialog('Mark N-2026-0038 as served?');
    expect(d.getByText(/The event is on Saturday 14 March 2026, after today/)).toBeInTheDocument();
    await user.click(d.getByRole('button', { name: 'Mark as served' }));
    await statusMessage('N-2026-0038 is marked as served.');
    expect(await screen.findAllByText('Served')).not.toHaveLength(0);
  }, 60_000);

  it('keeps the dialog open with the server’s reason in words when the action fails', async () => {
    const { user } = renderOrders('/orders/ord-40', [CLEAN_REQUEST()]);
    server.use(
      http.post('/api/orders/:id/decline', () =>
        HttpResponse.json(
          {
            statusCode: 503,
            message: 'The payment service did not answer; nothing was changed. Please try again.',
          },
          { status: 503 },
        ),
      ),
    );
    await pageHeading('N-2026-0040');
    await user.click(screen.getByRole('button', { name: 'Decline…' }));
    const d = await dialog('Decline N-2026-0040?');
    await user.type(d.getByLabelText(/Reason/), 'Fully booked');
    await user.click(d.getByRole('button', { name: /Decline and refund/ }));
    expect(await d.findByText('Not declined')).toBeInTheDocument();
    expect(
      d.getByText('The payment service did not answer; nothing was changed. Please try again.'),
    ).toBeInTheDocument();
    expect(d.getByLabelText(/Reason/)).toHaveValue('Fully booked');
  }, 60_000);

  it('says so when the guests’ details were removed, and does not ask for the allergy check', async () => {
    const past = CONFIRMED_ORDER();
    past.detail.guests = [];
    const message =
      'Guest details removed after 30 days: the number of guests and anonymous counts are kept for planning.';
    Object.assign(past.detail, {
      guestDetailsRemoved: {
        removed: true,
        reason: 'retention',
        removedFrom: '2026-04-13',
        message,
      },
    });
    const { api } = renderOrders('/orders/ord-38', [past]);
    await pageHeading('N-2026-0038');
    const guests = await region('Guests and their requirements');
    expect(guests.getByText(`24 guests. ${message}`)).toBeInTheDocument();
    expect(guests.queryByText(/unresolved conflict/)).toBeNull();
    expect(api.state.requests.some((r) => r.path.endsWith('/allergy-notes'))).toBe(false);
  });

  it('says so when the order does not exist', async () => {
    renderOrders('/orders/nope', standardOrders());
    expect(await screen.findByText('There is no such order')).toBeInTheDocument();
  });

  it('is the chef’s: staff are told so', async () => {
    renderOrders('/orders/ord-41', standardOrders(), staffUser);
    expect(await pageHeading('Not available for your role')).toBeInTheDocument();
  });
});
