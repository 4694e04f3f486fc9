import {
  declineRefund,
  formatMoney,
  isIsoDate,
  isOrderStatus,
  OrderStatus,
  refundFor,
  transition,
  type OrderDetail,
  type OrderEvent,
  type OrderMoney,
  type OrderSummary,
  type PaymentRecord,
  type RefundResult,
} from '@nappe/shared';
import { http, HttpResponse } from 'msw';
import { beforeEach } from 'vitest';
import type { AuthUser } from '@nappe/shared';
import { configure, screen } from '@testing-library/react';
import { chefUser, sessionFor, studioCard } from './fixtures';
import {
  calendarSettings,
  ORDERS_NOW,
  ORDERS_TODAY,
  STUDIO_TIME_ZONE,
  type FixtureOrder,
} from './orders-fixtures';
import { renderApp } from './render-app';
import { server } from './server';

// These tests render whole screens with their tables; on the shared 2-core machine under load
// a render can take several seconds, so the waits are longer than the app-wide 4 s.
configure({ asyncUtilTimeout: 15_000 });

/**
 * React Router applies each navigation in a transition once its loaders have finished — after
 * an await, outside any act() scope. In the act environment React held those renders back
 * until the next act() (a filter's new page stayed off screen for seconds, or until the next
 * click). These screens are driven through the URL on every filter change, so their tests let
 * React schedule as it does in a browser; Testing Library's waitFor still waits for the result.
 */
export function scheduleLikeABrowser(): void {
  beforeEach(() => {
    (globalThis as { IS_REACT_ACT_ENVIRONMENT?: boolean }).IS_REACT_ACT_ENVIRONMENT = false;
  });
}

/**
 * A stand-in for the orders API over fixture bookings, for route tests. Its rules follow the
 * API's: the shared transition table decides what may happen (409 otherwise), refunds come from
 * the shared `refundFor` / `declineRefund`, the confirmation gate refuses while a guest plate
 * still conflicts unless an override reason of 5+ characters is sent, and the list filters and
 * pages as `OrdersService.list` does (newest booking first). Requests are recorded.
 */
export interface OrdersApiState {
  orders: FixtureOrder[];
  requests: Array<{ method: string; path: string; search: string; body?: unknown }>;
}

const summaryOf = (o: OrderDetail): OrderSummary => ({
  id: o.id,
  reference: o.reference,
  status: o.status,
  menuId: o.menuId,
  menuName: o.menuName,
  eventDate: o.eventDate,
  serviceTime: o.serviceTime,
  guestCount: o.guestCount,
  plates: o.plates,
  currency: o.currency,
  totalMinor: o.totalMinor,
  paidMinor: o.paidMinor,
  balanceMinor: o.balanceMinor,
  balanceDueDate: o.balanceDueDate,
  clientName: o.clientName,
  createdAt: o.createdAt,
});

const bad = (message: string | string[]) =>
  HttpResponse.json({ statusCode: 400, message, error: 'Bad Request' }, { status: 400 });
const conflict = (message: string) =>
  HttpResponse.json({ statusCode: 409, message, error: 'Conflict' }, { status: 409 });
const notFound = () =>
  HttpResponse.json(
    { statusCode: 404, message: 'There is no order with that id.', error: 'Not Found' },
    { status: 404 },
  );

/** Only these body fields are accepted (the API's strict schemas). */
function strict(body: unknown, allowed: readonly string[]): string | null {
  const extra = Object.keys((body ?? {}) as object).filter((k) => !allowed.includes(k));
  return extra.length ? `These fields are not accepted here: ${extra.join(', ')}.` : null;
}

export function createOrdersApi(orders: FixtureOrder[]) {
  const state: OrdersApiState = { orders, requests: [] };
  const find = (id: unknown) => state.orders.find((o) => o.detail.id === id);
  let events = 100;

  const record = async (request: Request) => {
    const url = new URL(request.url);
    const text = request.method === 'GET' ? '' : await request.clone().text();
    const body = text ? (JSON.parse(text) as unknown) : undefined;
    state.requests.push({ method: request.method, path: url.pathname, search: url.search, body });
    return body as Record<string, unknown> | undefined;
  };

  const money = (o: OrderDetail): OrderMoney => ({
    pricing: o.quote.pricing,
    eventDate: o.eventDate,
    guestCount: o.guestCount,
    paidMinor: o.paidMinor,
  });

  function move(
    o: FixtureOrder,
    to: OrderStatus,
    summary: string,
    reason: unknown,
    refund?: RefundResult,
  ) {
    const d = o.detail;
    const event: OrderEvent = {
      id: `ev-${(events += 1)}`,
      at: new Date().toISOString(),
      actor: { role: 'chef', name: chefUser.name },
      fromStatus: d.status,
      toStatus: to,
      summary,
      reason: typeof reason === 'string' && reason.trim() ? reason.trim() : null,
    };
    const payments: PaymentRecord[] =
      refund && refund.refundMinor > 0
        ? [
            ...d.payments,
            {
              id: `refund-${events}`,
              kind: 'refund',
              status: 'succeeded',
              amountMinor: refund.refundMinor,
              currency: d.currency,
              createdAt: event.at,
              settledAt: event.at,
              receiptAvailable: true,
            },
          ]
        : d.payments;
    const paidMinor = d.paidMinor - (refund?.refundMinor ?? 0);
    o.detail = {
      ...d,
      status: to,
      payments,
      paidMinor,
      balanceMinor: to === OrderStatus.Confirmed ? d.balanceMinor : 0,
      timeline: [...d.timeline, event],
    };
  }

  function allowed(o: FixtureOrder, to: OrderStatus) {
    const result = transition(o.detail.status, to, 'chef');
    return result.ok ? null : conflict(result.error.message);
  }

  const handlers = [
    http.get('/api/studio', () => HttpResponse.json({ ...studioCard, timeZone: STUDIO_TIME_ZONE })),
    http.get('/api/studio/settings', () =>
      HttpResponse.json({ ...calendarSettings, currency: 'EUR' }),
    ),
    // As OrdersService.list.
    http.get('/api/orders', async ({ request }) => {
      await record(request);
      const q = new URL(request.url).searchParams;
      const page = Number(q.get('page') ?? 1);
      const pageSize = Number(q.get('pageSize') ?? 20);
      const status = q.get('status');
      const from = q.get('from');
      const to = q.get('to');
      const search = (q.get('q') ?? '').trim().toLowerCase();
      if (status !== null && !isOrderStatus(status)) return bad(['status must be a known status']);
      if ((from !== null && !isIsoDate(from)) || (to !== null && !isIsoDate(to)))
        return bad(['from and to must be dates written YYYY-MM-DD']);
      if (from && to && from > to) return bad(['from must be on or before to.']);
      const matching = state.orders
        .map((o) => o.detail)
        .filter(
          (o) =>
            (!status || o.status === status) &&
            (!from || o.eventDate >= from) &&
            (!to || o.eventDate <= to) &&
            (!search ||
              o.reference.toLowerCase().includes(search) ||
              o.clientName.toLowerCase().includes(search)),
        )
        .sort((a, b) => b.createdAt.localeCompare(a.createdAt) || b.id.localeCompare(a.id));
      return HttpResponse.json({
        items: matching.slice((page - 1) * pageSize, page * pageSize).map(summaryOf),
        total: matching.length,
        page,
        pageSize,
      });
    }),
    http.get('/api/orders/:id', async ({ request, params }) => {
      await record(request);
      const o = find(params.id);
      return o ? HttpResponse.json(o.detail) : notFound();
    }),
    http.get('/api/orders/:id/allergy-notes', async ({ request, params }) => {
      await record(request);
      const o = find(params.id);
      if (!o) return notFound();
      return HttpResponse.json({
        orderId: o.detail.id,
        guests: o.detail.guests.map((g, i) => ({ guestId: i, label: g.label })),
        unresolved: o.unresolved,
        advisoryCount: 0,
      });
    }),
    // As OrdersController.receipt: a settled payment's receipt, named by the order's reference.
    http.get('/api/orders/:id/receipts/:file', async ({ request, params }) => {
      await record(request);
      const o = find(params.id);
      const paymentId = String(params.file).replace(/\.pdf$/, '');
      const payment = o?.detail.payments.find((p) => p.id === paymentId && p.receiptAvailable);
      if (!o || !payment || request.headers.get('Authorization') === null) return notFound();
      return new HttpResponse('%PDF-1.7 receipt', {
        headers: {
          'Content-Type': 'application/pdf',
          'Content-Disposition': `inline; filename="receipt-${o.detail.reference}-${payment.kind}.pdf"`,
        },
      });
    }),
    http.get('/api/orders/:id/access-log', async ({ request, params }) => {
      await record(request);
      const o = find(params.id);
      return o ? HttpResponse.json(o.accessLog) : notFound();
    }),
    // As AllergyNotesService.assertConfirmable and OrdersService.confirm.
    http.post('/api/orders/:id/confirm', async ({ request, params }) => {
      const body = (await record(request)) ?? {};
      const o = find(params.id);
      if (!o) return notFound();
      const extra = strict(body, ['reason', 'overrideReason']);
      if (extra) return bad([extra]);
      const override =
        typeof body.overrideReason === 'string' ? body.overrideReason.trim() : undefined;
      if (override !== undefined && override.length < 5)
        return bad(['overrideReason: Give the reason for confirming anyway in a few words.']);
      const refused = allowed(o, OrderStatus.Confirmed);
      if (refused) return refused;
      const n = o.unresolved.length;
      const problem =
        n > 0
          ? `${n} guest plate${n === 1 ? '' : 's'} still conflict${n === 1 ? 's' : ''} with a guest’s requirement`
          : null;
      if (problem && !override) {
        return conflict(
          `This booking cannot be confirmed yet: ${problem}. Record a substitution, or confirm anyway with a reason.`,
        );
      }
      move(o, OrderStatus.Confirmed, 'Confirmed by the chef; added to the prep plan', body.reason);
      if (problem) {
        o.detail.timeline.push({
          id: `ev-${(events += 1)}`,
          at: new Date().toISOString(),
          actor: { role: 'chef', name: chefUser.name },
          fromStatus: null,
          toStatus: null,
          summary: `Confirmed despite: ${problem}`,
          reason: override ?? null,
        });
      }
      return HttpResponse.json(o.detail);
    }),
    http.post('/api/orders/:id/decline', async ({ request, params }) => {
      const body = (await record(request)) ?? {};
      const o = find(params.id);
      if (!o) return notFound();
      const extra = strict(body, ['reason']);
      if (extra) return bad([extra]);
      const refused = allowed(o, OrderStatus.Declined);
      if (refused) return refused;
      const refund = declineRefund(money(o.detail));
      move(
        o,
        OrderStatus.Declined,
        `Declined by the studio; ${formatMoney(refund.refundMinor, o.detail.currency)} refunded`,
        body.reason,
        refund,
      );
      return HttpResponse.json(o.detail);
    }),
    http.post('/api/orders/:id/cancellation-preview', async ({ request, params }) => {
      await record(request);
      const o = find(params.id);
      if (!o) return notFound();
      const refused = allowed(o, OrderStatus.Cancelled);
      if (refused) return refused;
      return HttpResponse.json({
        refund: refundFor(money(o.detail), ORDERS_TODAY),
        nextStatus: OrderStatus.Cancelled,
      });
    }),
    http.post('/api/orders/:id/cancel', async ({ request, params }) => {
      const body = (await record(request)) ?? {};
      const o = find(params.id);
      if (!o) return notFound();
      const extra = strict(body, ['reason', 'refund']);
      if (extra) return bad([extra]);
      const refused = allowed(o, OrderStatus.Cancelled);
      if (refused) return refused;
      const full = body.refund === 'full';
      const refund = full
        ? declineRefund(money(o.detail))
        : refundFor(money(o.detail), ORDERS_TODAY);
      const amount = formatMoney(refund.refundMinor, o.detail.currency);
      move(
        o,
        OrderStatus.Cancelled,
        full
          ? `Cancelled by the studio; ${amount} refunded in full (the studio’s choice)`
          : `Cancelled by the studio; ${amount} refunded (${refund.refundPercent} % under the policy)`,
        body.reason,
        refund,
      );
      return HttpResponse.json(o.detail);
    }),
    http.post('/api/orders/:id/complete', async ({ request, params }) => {
      const body = (await record(request)) ?? {};
      const o = find(params.id);
      if (!o) return notFound();
      const refused = allowed(o, OrderStatus.Completed);
      if (refused) return refused;
      move(o, OrderStatus.Completed, 'Marked as served', body.reason);
      return HttpResponse.json(o.detail);
    }),
  ];
  return { state, handlers };
}

/** Signs `user` in, serves the fixture orders, and renders the app at `url`. */
export function renderOrders(url: string, orders: FixtureOrder[], user: AuthUser = chefUser) {
  const api = createOrdersApi(orders);
  server.use(
    http.post('/api/auth/refresh', () => HttpResponse.json(sessionFor(user))),
    ...api.handlers,
  );
  return { ...renderApp(url), api };
}

/** The requests made to the list, as their query strings. */
export const listSearches = (api: ReturnType<typeof createOrdersApi>) =>
  api.state.requests
    .filter((r) => r.method === 'GET' && r.path === '/api/orders')
    .map((r) => r.search);

export { ORDERS_NOW };

/** The page's main heading, once the route's code has arrived. */
export const pageHeading = (name: string | RegExp) =>
  screen.findByRole('heading', { level: 1, name });
