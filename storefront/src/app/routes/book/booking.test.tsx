import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import {
  DRAFT_STORAGE_KEY,
  emptyDraft,
  readBookingDraft,
  writeBookingDraft,
  type BookingDraft,
} from '../../../features/booking/draft/booking-draft';
import { browser } from '../../../lib/browser';
import { bookingHandlers, makeOrder, quoteFor } from '../../../testing/booking-fixtures';
import { clientUser, sessionFor } from '../../../testing/fixtures';
import { renderApp } from '../../../testing/render-app';
import { server } from '../../../testing/server';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/;

/** A booking with the event and the guests filled in, as the wizard leaves it. */
function filledDraft(overrides: Partial<BookingDraft> = {}): BookingDraft {
  return {
    ...emptyDraft('menu-summer'),
    event: {
      eventDate: '2026-07-18',
      serviceTime: '21:30',
      venueAddress: 'Domaine des Tilleuls\n12 chemin des Vignes\n69005 Lyon',
      occasion: 'Wedding',
      contactPhone: '+33 6 12 34 56 78',
    },
    guests: {
      guestCount: 40,
      guestRequirements: [
        { label: 'Aunt Mireille', table: '1', allergens: ['milk'], diets: ['vegetarian'] },
      ],
      guestDataConsent: true,
    },
    ...overrides,
  };
}

function signedIn() {
  server.use(http.post('/api/auth/refresh', () => HttpResponse.json(sessionFor(clientUser))));
}

beforeEach(() => server.use(...bookingHandlers));
afterEach(() => vi.restoreAllMocks());

describe('Booking: Your event', () => {
  it('checks each field with the shared booking rules before going on', async () => {
    const { user, router } = renderApp('/book/menu-summer/event');
    expect(
      await screen.findByRole('heading', { level: 2, name: 'Your event' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('navigation', { name: 'Booking steps' })).toHaveTextContent(
      'Your event',
    );

    await user.click(screen.getByRole('button', { name: /Continue to your guests/ }));

    expect(await screen.findByText('Choose a date in the calendar.')).toBeInTheDocument();
    expect(screen.getByText('Enter the time dessert is served.')).toBeInTheDocument();
    expect(screen.getByText('Enter the venue’s address.')).toBeInTheDocument();
    expect(screen.getByText('Enter the occasion.')).toBeInTheDocument();
    expect(
      screen.getByText('Enter a phone number with its country code, like +32 470 12 34 56.'),
    ).toBeInTheDocument();
    expect(screen.getByLabelText(/Service time/)).toHaveAttribute('aria-invalid', 'true');
    expect(router.state.location.pathname).toBe('/book/menu-summer/event');
  });

  it('takes the date chosen on Dates, keeps the answers in this tab only, and goes on to the guests', async () => {
    const { user, router } = renderApp('/book/menu-summer/event?date=2026-07-18');
    expect(await screen.findByText('Your date: Saturday 18 July 2026')).toBeInTheDocument();
    const chosen = await screen.findByRole('button', { name: /^Saturday 18 July 2026: open/ });
    expect(chosen.closest('[role="gridcell"]')).toHaveAttribute('aria-selected', 'true');

    // Another open day replaces it.
    await user.click(await screen.findByRole('button', { name: /^Saturday 25 July 2026: open/ }));
    expect(screen.getByText('Your date: Saturday 25 July 2026')).toBeInTheDocument();

    await user.type(screen.getByLabelText(/Service time/), '21:30');
    await user.type(
      screen.getByLabelText(/Venue address/),
      '12 chemin des Vignes{Enter}69005 Lyon',
    );
    await user.type(screen.getByLabelText(/Occasion/), 'Wedding');
    await user.type(screen.getByLabelText(/Phone on the day/), '+33 6 12 34 56 78');

    expect(readBookingDraft()?.event).toEqual({
      eventDate: '2026-07-25',
      serviceTime: '21:30',
      venueAddress: '12 chemin des Vignes\n69005 Lyon',
      occasion: 'Wedding',
      contactPhone: '+33 6 12 34 56 78',
    });
    expect(window.localStorage.length).toBe(0);

    await user.click(screen.getByRole('button', { name: /Continue to your guests/ }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/book/menu-summer/guests'));
    expect(await screen.findByRole('heading', { level: 2, name: 'Your guests' })).toHaveFocus();
  });
});

describe('Booking: Your guests', () => {
  it('will not go on while a guest is listed and the consent box is not ticked', async () => {
    writeBookingDraft(filledDraft({ guests: null }));
    const { user, router } = renderApp('/book/menu-summer/guests');
    await user.type(await screen.findByLabelText(/Number of guests/), '40');
    await user.click(screen.getByRole('button', { name: /Add a guest with requirements/ }));
    const guest = screen.getByRole('group', { name: /^Guest 1/ });
    await user.type(within(guest).getByLabelText(/Name or label/), 'Aunt Mireille');
    // Labelled checkboxes (queried by their label: a role query over 20 boxes is slow in jsdom).
    await user.click(within(guest).getByLabelText('Milk'));
    await user.click(within(guest).getByLabelText('Vegetarian'));

    const consent = screen.getByLabelText(/My guests agreed to share/);
    expect(consent).toHaveAttribute('type', 'checkbox');
    expect(consent).not.toBeChecked();
    expect(screen.getByText(/Allergies and diets are health information/)).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: /Continue to review/ }));
    expect(
      await screen.findByText(
        'Please confirm that your guests agreed to share their allergies and diets with the studio.',
      ),
    ).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/book/menu-summer/guests');

    // The summary by allergen follows the list.
    const summary = screen.getByRole('region', { name: 'Summary by allergen' });
    expect(summary).toHaveTextContent('Milk: 1 guest (Aunt Mireille)');
    expect(summary).toHaveTextContent('Vegetarian: 1 guest (Aunt Mireille)');

    await user.click(consent);
    await user.click(screen.getByRole('button', { name: /Continue to review/ }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/book/menu-summer/review'));
    expect(readBookingDraft()?.guests).toEqual({
      guestCount: 40,
      guestRequirements: [{ label: 'Aunt Mireille', allergens: ['milk'], diets: ['vegetarian'] }],
      guestDataConsent: true,
    });
    // Health details stay in this tab's session only.
    expect(window.localStorage.length).toBe(0);
    expect(window.sessionStorage.getItem(DRAFT_STORAGE_KEY)).toContain('Aunt Mireille');
  });

  it('imports a CSV guest list only once every row is right', async () => {
    writeBookingDraft(filledDraft({ guests: null }));
    const { user } = renderApp('/book/menu-summer/guests');
    await user.type(await screen.findByLabelText(/Number of guests/), '40');

    // The layout is explained, with a template to download.
    await user.click(screen.getByText('How to lay out the file'));
    const template = screen.getByRole('link', { name: /Download the template/ });
    expect(template).toHaveAttribute('download', 'guest-list-template.csv');
    expect(decodeURIComponent(template.getAttribute('href')!)).toContain(
      'name,table,allergens,diets,notes',
    );

    const input = screen.getByLabelText('Choose a CSV file');
    const bad = new File(
      ['name,table,allergens,diets,notes\r\nJoséphine,2,eggs,,\r\nPaul,3,milc; nuts,vegan,\r\n'],
      'guests.csv',
      { type: 'text/csv' },
    );
    await user.upload(input, bad);

    const preview = await screen.findByRole('region', { name: 'Preview of guests.csv' });
    const rows = within(preview).getAllByRole('row');
    expect(rows).toHaveLength(3);
    expect(rows[2]).toHaveTextContent('Row 2: “milc” is not an allergen we recognise.');
    expect(rows[1]).toHaveTextContent('Ready');
    expect(within(preview).getByText(/1 row has a problem/)).toBeInTheDocument();
    expect(within(preview).getByRole('button', { name: 'Add these guests' })).toBeDisabled();
    expect(screen.queryByRole('group', { name: /^Guest 1/ })).toBeNull();

    // The corrected file is accepted.
    const fixed = new File(
      [
        'name,table,allergens,diets,notes\r\nJoséphine,2,eggs,,\r\nPaul,3,milk; nuts,vegan,"Severe, carries a pen"\r\n',
      ],
      'guests-fixed.csv',
      { type: 'text/csv' },
    );
    await user.upload(input, fixed);
    const fixedPreview = await screen.findByRole('region', { name: 'Preview of guests-fixed.csv' });
    expect(within(fixedPreview).queryByText(/is not an allergen/)).toBeNull();
    await user.click(
      within(fixedPreview).getByRole('button', { name: 'Add 2 guests to the list' }),
    );

    expect(screen.queryByRole('region', { name: /Preview of/ })).toBeNull();
    expect(screen.getByRole('group', { name: 'Guest 1: Joséphine' })).toHaveTextContent(
      'Table 2 · Eggs',
    );
    expect(screen.getByRole('group', { name: 'Guest 2: Paul' })).toHaveTextContent(
      'Milk, Nuts · Vegan · with notes',
    );
    const summary = screen.getByRole('region', { name: 'Summary by allergen' });
    expect(summary).toHaveTextContent('Nuts: 1 guest (Paul)');
    expect(summary).toHaveTextContent('2 guests of 40 with an allergy or a diet.');
  });

  it('refuses more guests than the plates left on the chosen day', async () => {
    // 25 July has 30 plates left; this menu serves two desserts to each guest.
    writeBookingDraft(
      filledDraft({ guests: null, event: { ...filledDraft().event, eventDate: '2026-07-25' } }),
    );
    const { user } = renderApp('/book/menu-summer/guests');
    await user.type(await screen.findByLabelText(/Number of guests/), '16');
    await user.click(screen.getByRole('button', { name: /Continue to review/ }));
    expect(
      await screen.findByText(
        'Only 30 plates are left on Saturday 25 July 2026; 16 guests need 32 (2 desserts each). Choose fewer guests or another date.',
      ),
    ).toBeInTheDocument();
    await user.clear(screen.getByLabelText(/Number of guests/));
    await user.type(screen.getByLabelText(/Number of guests/), '8');
    await user.click(screen.getByRole('button', { name: /Continue to review/ }));
    expect(
      await screen.findByText('This menu is served to at least 10 guests.'),
    ).toBeInTheDocument();
  });
});

describe('Booking: Review', () => {
  it('shows the quote exactly as the server sent it, with the cancellation tiers and the terms', async () => {
    writeBookingDraft(filledDraft());
    // Figures no client arithmetic would produce from €58 × 40: only the server's are shown.
    const quote = {
      ...quoteFor(40),
      totalMinor: 232_001,
      subtotalMinor: 232_001,
      taxMinor: 40_265,
      depositMinor: 69_613,
      balanceMinor: 162_388,
      balanceDueDate: '2026-07-04',
    };
    const bodies: unknown[] = [];
    server.use(
      http.post('/api/quotes', async ({ request }) => {
        bodies.push(await request.json());
        return HttpResponse.json(quote);
      }),
    );
    const { user, router } = renderApp('/book/menu-summer/review');
    const price = await screen.findByRole('region', { name: 'Price' });
    await within(price).findByText('€2,320.01');
    expect(price).toHaveTextContent('Midsummer Garden, per guest');
    expect(price).toHaveTextContent('€58.00 × 40 guests');
    expect(price).toHaveTextContent('Includes €402.65 tax (21 %).');
    expect(price).toHaveTextContent('Deposit, to pay when booking (30 %)€696.13');
    expect(price).toHaveTextContent('Due by Saturday 4 July 2026');
    expect(price).toHaveTextContent('€1,623.88');
    expect(bodies).toEqual([{ menuId: 'menu-summer', eventDate: '2026-07-18', guestCount: 40 }]);

    const policy = screen.getByRole('region', { name: 'If you cancel' });
    expect(policy).toHaveTextContent(
      'Cancel 30 days or more before the event: 100 % of what you paid is refunded.',
    );
    expect(policy).toHaveTextContent(
      'Cancel 14 to 29 days before the event: 50 % of what you paid is refunded.',
    );
    expect(await screen.findByRole('region', { name: 'The full booking terms' })).toHaveTextContent(
      'Allergies and diets given with the booking are checked against every component.',
    );

    await user.click(screen.getByRole('button', { name: /Continue to payment/ }));
    expect(
      await screen.findByText(
        'Please accept the booking terms and the cancellation policy to continue.',
      ),
    ).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/book/menu-summer/review');

    // Paying needs an account: a visitor signs in and comes straight back.
    await user.click(screen.getByRole('checkbox', { name: /I accept the booking terms/ }));
    await user.click(screen.getByRole('button', { name: /Continue to payment/ }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/sign-in'));
    expect(router.state.location.search).toBe('?redirectTo=%2Fbook%2Fmenu-summer%2Fpayment');
  });

  it('sends a client who skipped ahead back to the first step still to do', async () => {
    writeBookingDraft(filledDraft({ guests: null }));
    const { router } = renderApp('/book/menu-summer/review');
    await waitFor(() => expect(router.state.location.pathname).toBe('/book/menu-summer/guests'));
  });
});

describe('Booking: Payment', () => {
  it('books with ids and counts only, under one idempotency key reused on every retry', async () => {
    signedIn();
    writeBookingDraft(filledDraft({ acceptTerms: true }));
    const assign = vi.spyOn(browser, 'assign').mockImplementation(() => {});
    const orderCalls: { key: string | null; body: Record<string, unknown> }[] = [];
    const checkoutCalls: unknown[] = [];
    server.use(
      http.post('/api/orders', async ({ request }) => {
        orderCalls.push({
          key: request.headers.get('Idempotency-Key'),
          body: (await request.json()) as Record<string, unknown>,
        });
        return orderCalls.length === 1
          ? HttpResponse.json({ statusCode: 503, message: 'Service unavailable' }, { status: 503 })
          : HttpResponse.json(makeOrder({ status: 'pending_payment' as never }), { status: 201 });
      }),
      http.post('/api/orders/:id/checkout', async ({ request, params }) => {
        checkoutCalls.push({ id: params.id, body: await request.json() });
        return checkoutCalls.length === 1
          ? HttpResponse.json({ statusCode: 502, message: 'Bad gateway' }, { status: 502 })
          : HttpResponse.json({
              checkoutUrl: 'http://localhost:12111/pay/cs_test_1',
              sessionId: 'cs_test_1',
              amountMinor: 232_000,
              currency: 'EUR',
              expiresAt: '2026-06-01T10:30:00Z',
            });
      }),
    );
    const { user } = renderApp('/book/menu-summer/payment');

    await user.click(await screen.findByRole('radio', { name: /Pay in full: €2,320.00/ }));
    await user.click(screen.getByRole('button', { name: 'Pay €2,320.00' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('you will not be charged twice');

    await user.click(screen.getByRole('button', { name: 'Try again' }));
    await waitFor(() => expect(checkoutCalls).toHaveLength(1));
    expect(await screen.findByRole('alert')).toHaveTextContent('Something went wrong on our side');

    await user.click(screen.getByRole('button', { name: 'Try again' }));
    await waitFor(() =>
      expect(assign).toHaveBeenCalledWith('http://localhost:12111/pay/cs_test_1'),
    );

    // Two tries at booking, one key; the order was made once, then only the payment was retried.
    expect(orderCalls).toHaveLength(2);
    expect(orderCalls[0]!.key).toMatch(UUID);
    expect(orderCalls[1]!.key).toBe(orderCalls[0]!.key);
    expect(checkoutCalls).toEqual([
      { id: 'order-1', body: { plan: 'full' } },
      { id: 'order-1', body: { plan: 'full' } },
    ]);
    // Never a price, a total or a status: ids, the date, the venue and counts.
    const body = orderCalls[1]!.body;
    expect(Object.keys(body).sort()).toEqual(
      [
        'acceptTerms',
        'contactPhone',
        'eventDate',
        'guestCount',
        'guestDataConsent',
        'guestRequirements',
        'menuId',
        'occasion',
        'serviceTime',
        'venueAddressLines',
      ].sort(),
    );
    expect(JSON.stringify(body)).not.toMatch(/price|total|amount|status|minor/i);
    expect(body).toMatchObject({
      menuId: 'menu-summer',
      eventDate: '2026-07-18',
      guestCount: 40,
      contactPhone: '+33612345678',
      venueAddressLines: ['Domaine des Tilleuls', '12 chemin des Vignes', '69005 Lyon'],
      acceptTerms: true,
      guestDataConsent: true,
    });
    expect(readBookingDraft()?.attempt).toMatchObject({
      key: orderCalls[0]!.key,
      orderId: 'order-1',
    });
  });

  it('a new booking attempt (changed answers) gets a new key', async () => {
    signedIn();
    writeBookingDraft(
      filledDraft({
        acceptTerms: true,
        attempt: {
          key: '00000000-0000-4000-8000-000000000000',
          fingerprint: '{"old":true}',
          orderId: null,
        },
      }),
    );
    vi.spyOn(browser, 'assign').mockImplementation(() => {});
    const keys: (string | null)[] = [];
    server.use(
      http.post('/api/orders', ({ request }) => {
        keys.push(request.headers.get('Idempotency-Key'));
        return HttpResponse.json(
          { statusCode: 409, message: 'Only 12 plates are left on Saturday 18 July 2026.' },
          { status: 409 },
        );
      }),
    );
    const { user } = renderApp('/book/menu-summer/payment');
    await user.click(await screen.findByRole('button', { name: 'Pay €696.00' }));
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('This date can no longer be booked');
    expect(within(alert).getByRole('link', { name: 'Choose another date' })).toHaveAttribute(
      'href',
      '/book/menu-summer/event',
    );
    expect(keys).toHaveLength(1);
    expect(keys[0]).toMatch(UUID);
    expect(keys[0]).not.toBe('00000000-0000-4000-8000-000000000000');
  });
});
