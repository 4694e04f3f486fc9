import {
  addIsoDays,
  createKitchenIndex,
  DEMO_CATALOGUE,
  OrderStatus,
  planPrep,
  recipeIngredientLabel,
  type AuthUser,
  type OrderSummary,
  type PrepDaySchedule,
  type PrepOrderInput,
  type PrepPlan,
  type PrepPlanView,
  type ScheduledTask,
} from '@nappe/shared';
import { http, HttpResponse } from 'msw';
import { studioCard } from './fixtures';

/**
 * A stand-in for the prep API (api/src/prep/prep.service.ts) over the shared demo catalogue:
 * every plan, schedule and label text is computed by the same shared functions the server calls
 * (`planPrep`, `recipeIngredientLabel`), with the server's rules re-stated here — staff get no
 * costs, the schedule of a day plans the events of the next 21 days, ticks record who and when.
 */

export const TIME_ZONE = studioCard.timeZone;
export const SPARE_PERCENT = 10;
const HORIZON_DAYS = 21;
const index = createKitchenIndex(DEMO_CATALOGUE);

/** An invented confirmed event of the demo catalogue. */
export interface PrepEvent {
  id: string;
  reference: string;
  clientName: string;
  eventDate: string;
  serviceTime: string;
  menuId: string;
  guestCount: number;
  guestChanges?: PrepOrderInput['guestChanges'];
}

export interface PrepApiOptions {
  user: AuthUser;
  events: PrepEvent[];
  /** Requests waiting for the chef (GET /orders?status=requested). */
  waitingRequests?: number;
  /** Checks lead times from this instant, as `planPrep` can (conflicts in the schedule). */
  now?: string;
}

export interface PrepApiState {
  /** Every prep and orders request: its URL and the Authorization header it carried. */
  requests: Array<{ url: URL; auth: string | null }>;
  ticks: Map<string, { by: string; at: string; batches: number }>;
  /** When set, tick and untick answer with this status and message. */
  tickFailure: { status: number; message: string } | null;
  /** When set, tick and untick wait for it before answering (to see the optimistic state). */
  tickGate: Promise<void> | null;
}

function menuName(menuId: string): string {
  return index.menu(menuId).name;
}

export function createPrepApi(options: PrepApiOptions) {
  const state: PrepApiState = {
    requests: [],
    ticks: new Map(),
    tickFailure: null,
    tickGate: null,
  };
  const seen = (request: Request): URL => {
    const url = new URL(request.url);
    state.requests.push({ url, auth: request.headers.get('Authorization') });
    return url;
  };
  const chef = options.user.role === 'chef';

  const plan = (from: string, to: string): PrepPlan =>
    planPrep(
      index,
      options.events.map((e) => ({
        id: e.id,
        eventDate: e.eventDate,
        serviceTime: e.serviceTime,
        timeZone: TIME_ZONE,
        menuId: e.menuId,
        guestCount: e.guestCount,
        guestChanges: e.guestChanges ?? [],
      })),
      {
        from,
        to,
        settings: { studioTimeZone: TIME_ZONE },
        sparePercent: SPARE_PERCENT,
        ...(options.now ? { now: options.now } : {}),
      },
    );

  const view = (p: PrepPlan): PrepPlanView => {
    if (chef) return { ...p, costsShown: true };
    return {
      ...p,
      purchaseList: {
        lines: p.purchaseList.lines.map(
          ({ packPriceMinor: _p, totalMinor: _t, usedCostMinor: _u, ...line }) => line,
        ),
      },
      costsShown: false,
    };
  };

  const schedule = (date: string): PrepDaySchedule => {
    const p = plan(date, addIsoDays(date, HORIZON_DAYS));
    const day = p.schedule.days.find((d) => d.date === date);
    const tasks: ScheduledTask[] = (day?.tasks ?? []).map((t) => {
      // URL-safe like the server's hex keys, and unique per task of the day.
      const taskKey = `${date}-${t.taskId.replace(/[^a-z0-9]+/gi, '-')}`;
      return { ...t, taskKey, done: state.ticks.get(taskKey) ?? null };
    });
    const runIds = new Set(tasks.map((t) => t.runId));
    return {
      date,
      timeZone: p.schedule.timeZone,
      activeMinutes: day?.activeMinutes ?? 0,
      tasks,
      conflicts: p.schedule.conflicts.filter((c) => runIds.has(c.runId)),
      warnings: p.schedule.warnings.filter((w) => tasks.some((t) => t.recipeId === w.recipeId)),
    };
  };

  const taskOf = (taskKey: string): ScheduledTask | undefined => {
    const date = taskKey.slice(0, 10);
    return schedule(date).tasks.find((t) => t.taskKey === taskKey);
  };

  const summary = (e: PrepEvent): OrderSummary => ({
    id: e.id,
    reference: e.reference,
    status: OrderStatus.Confirmed,
    menuId: e.menuId,
    menuName: menuName(e.menuId),
    eventDate: e.eventDate,
    serviceTime: e.serviceTime,
    guestCount: e.guestCount,
    currency: 'EUR',
    totalMinor: 0,
    paidMinor: 0,
    balanceMinor: 0,
    balanceDueDate: null,
    clientName: e.clientName,
    createdAt: '2026-01-05T09:00:00.000Z',
  });

  const range = (url: URL) => ({
    from: url.searchParams.get('from') ?? '',
    to: url.searchParams.get('to') ?? '',
  });

  const tick =
    (done: boolean) =>
    async ({
      params,
      request,
    }: {
      params: Record<string, string | readonly string[] | undefined>;
      request: Request;
    }) => {
      seen(request);
      if (state.tickGate) await state.tickGate;
      const key = String(params.taskKey);
      if (state.tickFailure) {
        return HttpResponse.json(
          { statusCode: state.tickFailure.status, message: state.tickFailure.message },
          { status: state.tickFailure.status },
        );
      }
      const task = taskOf(key);
      if (!task) {
        return HttpResponse.json(
          { statusCode: 404, message: 'There is no prep task with that key.' },
          { status: 404 },
        );
      }
      if (done)
        state.ticks.set(key, {
          by: options.user.name,
          at: new Date().toISOString(),
          batches: task.batches,
        });
      else state.ticks.delete(key);
      return HttpResponse.json({ ...task, done: state.ticks.get(key) ?? null });
    };

  const file = (name: string, type: string, body: string) =>
    new HttpResponse(body, {
      headers: { 'Content-Type': type, 'Content-Disposition': `attachment; filename="${name}"` },
    });

  const handlers = [
    http.get('/api/prep/plan', ({ request }) => {
      const url = seen(request);
      const { from, to } = range(url);
      return HttpResponse.json(view(plan(from, to)));
    }),
    http.get('/api/prep/plan.csv', ({ request }) => {
      const url = seen(request);
      const { from, to } = range(url);
      return file(`prep-plan-${from}-${to}.csv`, 'text/csv', 'Prep sheet\r\nPurchase list\r\n');
    }),
    http.get('/api/prep/plan.pdf', ({ request }) => {
      const url = seen(request);
      const { from, to } = range(url);
      return file(`prep-sheet-${from}-${to}.pdf`, 'application/pdf', '%PDF-1.3');
    }),
    http.get('/api/prep/labels.pdf', ({ request }) => {
      const url = seen(request);
      return file(
        `component-labels-${url.searchParams.get('date')}.pdf`,
        'application/pdf',
        '%PDF-1.3',
      );
    }),
    http.get('/api/prep/schedule', ({ request }) => {
      const url = seen(request);
      return HttpResponse.json(schedule(url.searchParams.get('date') ?? ''));
    }),
    http.post('/api/prep/tasks/:taskKey/done', tick(true)),
    http.delete('/api/prep/tasks/:taskKey/done', tick(false)),
    http.get('/api/recipes/:id/allergens', ({ params }) => {
      const recipe = index.recipe(String(params.id));
      return HttpResponse.json({
        subject: { kind: 'recipe', id: recipe.id, name: recipe.name },
        label: recipeIngredientLabel(index, recipe.id),
      });
    }),
    http.get('/api/orders', ({ request }) => {
      const url = seen(request);
      if (url.searchParams.get('status') === OrderStatus.Requested) {
        if (!chef)
          return HttpResponse.json({ statusCode: 403, message: 'Forbidden' }, { status: 403 });
        return HttpResponse.json({
          items: [],
          total: options.waitingRequests ?? 0,
          page: 1,
          pageSize: 1,
        });
      }
      const { from, to } = range(url);
      const items = options.events
        .filter((e) => e.eventDate >= from && e.eventDate <= to)
        .map(summary);
      return HttpResponse.json({ items, total: items.length, page: 1, pageSize: 100 });
    }),
  ];

  return { state, handlers, plan, schedule };
}
