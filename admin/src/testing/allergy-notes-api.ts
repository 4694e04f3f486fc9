import {
  applySubstitutions,
  checkGuestAgainstDessert,
  createKitchenIndex,
  isKitchenError,
  type KitchenIndex,
  type Substitution,
} from '@nappe/shared';
import { http, HttpResponse } from 'msw';
import type {
  AccessLogEntry,
  AllergyCounts,
  AllergyNotes,
  Briefing,
  BriefingTable,
  GuestNote,
  SubstitutionBody,
} from '../features/allergy-notes/api/types';
import {
  AN_CATALOGUE,
  type FixtureGuest,
  type FixtureOrder,
  type FixtureSubstitution,
} from './allergy-notes-fixtures';

/**
 * A stand-in for the allergy-notes API over the fixture catalogue, for route tests. The notes
 * are computed as api/src/allergy-notes/order-allergy-notes.ts computes them, with the same
 * shared conflict check, so a re-check after a substitution is the real one. Writes and the
 * openings the API would log are recorded for the tests.
 */
export interface AllergyApiOptions {
  role: 'chef' | 'staff';
  orders: FixtureOrder[];
  /** Answer these routes with an error instead (status, message). */
  fail?: Partial<
    Record<
      'events' | 'counts' | 'notes' | 'briefing' | 'pdf' | 'put' | 'delete' | 'log',
      { status: number; message?: string }
    >
  >;
}

const json = HttpResponse.json;
const error = (status: number, message: string) =>
  json({ statusCode: status, message, error: status === 403 ? 'Forbidden' : 'Error' }, { status });

function describeChanges(index: KitchenIndex, changes: readonly Substitution[]): string[] {
  return changes.map((c) => {
    const name = index.recipe(c.componentRecipeId).name;
    return c.replacementRecipeId === undefined
      ? `Leave out ${name}`
      : `Replace ${name} with ${index.recipe(c.replacementRecipeId).name}`;
  });
}

function notesOf(index: KitchenIndex, order: FixtureOrder): AllergyNotes {
  const menu = index.menu(order.summary.menuId);
  const desserts = menu.dessertIds.map((id) => index.dessert(id));
  const unresolved: AllergyNotes['unresolved'] = [];
  let advisoryCount = 0;
  const guests: GuestNote[] = [...order.guests]
    .sort((a, b) => a.position - b.position)
    .map((guest) => ({
      guestId: guest.position,
      label: guest.label,
      table: guest.table ?? null,
      allergens: guest.allergens,
      diets: guest.diets,
      notes: guest.notes ?? null,
      plates: desserts.map((dessert) => {
        const original = checkGuestAgainstDessert(index, dessert, guest);
        const sub = order.substitutions.find(
          (s) => s.guestPosition === guest.position && s.dessertId === dessert.id,
        );
        const after =
          sub && sub.changes.length > 0
            ? checkGuestAgainstDessert(index, dessert, guest, sub.changes)
            : null;
        const final = after ?? original;
        advisoryCount += final.advisories.length;
        if (!final.clear) {
          unresolved.push({
            guestId: guest.position,
            guest: guest.label,
            dessertId: dessert.id,
            dessertName: dessert.name,
            messages: final.conflicts.map((c) => c.message),
          });
        }
        return {
          dessertId: dessert.id,
          dessertName: dessert.name,
          clear: original.clear,
          conflicts: original.conflicts,
          advisories: original.advisories,
          substitution: sub
            ? {
                changes: sub.changes,
                described: describeChanges(index, sub.changes),
                note: sub.note,
                recordedAt: sub.recordedAt,
              }
            : null,
          afterSubstitution: after,
          resolved: final.clear,
        };
      }),
    }));
  return {
    orderId: order.summary.id,
    reference: order.summary.reference,
    status: order.summary.status,
    eventDate: order.summary.eventDate,
    serviceTime: order.summary.serviceTime,
    guestCount: order.summary.guestCount,
    desserts: desserts.map((d) => ({ id: d.id, name: d.name })),
    guests,
    unresolved,
    advisoryCount,
  };
}

/** As briefingOf in api/src/allergy-notes/order-allergy-notes.ts. */
function briefingOf(notes: AllergyNotes, order: FixtureOrder): Briefing {
  const tables = new Map<string, BriefingTable>();
  let changedGuests = 0;
  for (const guest of notes.guests) {
    const lines = guest.plates.flatMap((plate) => {
      const why = plate.conflicts.map((c) => c.message);
      const advisories = (plate.afterSubstitution ?? plate).advisories.map((a) => a.message);
      if (why.length === 0 && advisories.length === 0 && !plate.substitution) return [];
      const change = plate.substitution
        ? [
            ...plate.substitution.described,
            ...(plate.substitution.note ? [plate.substitution.note] : []),
          ].join('; ')
        : why.length > 0
          ? 'NOT RESOLVED — ask the chef before serving'
          : 'Standard plate';
      return [
        {
          guest: guest.label,
          dessert: plate.dessertName,
          change,
          why,
          advisories,
          unresolved: !plate.resolved,
        },
      ];
    });
    if (lines.length === 0) continue;
    changedGuests += 1;
    const key = guest.table ?? 'No table given';
    const table = tables.get(key) ?? { table: key, guests: [] };
    table.guests.push(...lines);
    tables.set(key, table);
  }
  return {
    orderId: order.summary.id,
    reference: order.summary.reference,
    occasion: order.occasion,
    eventDate: order.summary.eventDate,
    serviceTime: order.summary.serviceTime,
    venue: order.venue,
    guestCount: order.summary.guestCount,
    standardPlates: Math.max(0, order.summary.guestCount - changedGuests),
    tables: [...tables.values()].sort((a, b) =>
      a.table.localeCompare(b.table, 'en', { numeric: true }),
    ),
  };
}

export function createAllergyNotesApi(options: AllergyApiOptions) {
  const index = createKitchenIndex(AN_CATALOGUE);
  const state = {
    orders: structuredClone(options.orders),
    requests: [] as Array<{ method: string; path: string; body?: unknown }>,
    /** What the API would log as openings of guest data. */
    accessLog: [] as AccessLogEntry[],
  };
  const orderOf = (id: unknown) => state.orders.find((o) => o.summary.id === id);
  const noOrder = () => error(404, 'There is no booking with that id.');
  const failure = (key: keyof NonNullable<AllergyApiOptions['fail']>) => {
    const f = options.fail?.[key];
    return f ? error(f.status, f.message ?? 'Internal server error') : null;
  };
  const logOpening = (orderId: string, what: AccessLogEntry['what']) =>
    state.accessLog.unshift({
      at: new Date(Date.UTC(2026, 0, 20, 9, state.accessLog.length)).toISOString(),
      userId: options.role === 'chef' ? 'u-chef-1' : 'u-staff-1',
      name: options.role === 'chef' ? 'Inès Carreau' : 'Tomás Reyes',
      role: options.role,
      what,
    });
  const chefOnly = () => (options.role === 'chef' ? null : error(403, 'Forbidden resource'));

  const handlers = [
    http.get('/api/orders', ({ request }) => {
      const failed = failure('events');
      if (failed) return failed;
      const url = new URL(request.url);
      state.requests.push({ method: 'GET', path: `/api/orders?${url.searchParams}` });
      const from = url.searchParams.get('from') ?? '0000-00-00';
      const page = Number(url.searchParams.get('page') ?? 1);
      const size = Number(url.searchParams.get('pageSize') ?? 20);
      const all = state.orders.map((o) => o.summary).filter((o) => o.eventDate >= from);
      return json({
        items: all.slice((page - 1) * size, page * size),
        total: all.length,
        page,
        pageSize: size,
      });
    }),
    http.get('/api/allergy-notes/counts', ({ request }) => {
      const failed = failure('counts');
      if (failed) return failed;
      const ids = (new URL(request.url).searchParams.get('orderIds') ?? '')
        .split(',')
        .filter(Boolean);
      state.requests.push({
        method: 'GET',
        path: `/api/allergy-notes/counts?orderIds=${ids.join(',')}`,
      });
      return json(
        ids.flatMap((id): AllergyCounts[] => {
          const order = orderOf(id);
          if (!order) return [];
          const notes = notesOf(index, order);
          return [
            {
              orderId: id,
              guestsWithRequirements: order.guests.filter(
                (g) => g.allergens.length + g.diets.length > 0 || !!g.notes,
              ).length,
              unresolvedPlates: notes.unresolved.length,
              unresolvedGuests: new Set(notes.unresolved.map((u) => u.guestId)).size,
              substitutions: order.substitutions.length,
              advisoryCount: notes.advisoryCount,
              problem: null,
            },
          ];
        }),
      );
    }),
    http.get('/api/orders/:id/allergy-notes', ({ params }) => {
      const failed = failure('notes');
      if (failed) return failed;
      const order = orderOf(params.id);
      if (!order) return noOrder();
      logOpening(order.summary.id, 'allergy_notes');
      return json(notesOf(index, order));
    }),
    http.get('/api/orders/:id/briefing', ({ params }) => {
      const failed = failure('briefing');
      if (failed) return failed;
      const order = orderOf(params.id);
      if (!order) return noOrder();
      logOpening(order.summary.id, 'briefing');
      return json(briefingOf(notesOf(index, order), order));
    }),
    http.get('/api/orders/:id/briefing.pdf', ({ params, request }) => {
      state.requests.push({
        method: 'GET',
        path: `/api/orders/${String(params.id)}/briefing.pdf`,
        body: request.headers.get('Authorization'),
      });
      const failed = failure('pdf');
      if (failed) return failed;
      const order = orderOf(params.id);
      if (!order) return noOrder();
      logOpening(order.summary.id, 'briefing_pdf');
      return new HttpResponse('%PDF-1.7 fixture', {
        headers: {
          'Content-Type': 'application/pdf',
          'Content-Disposition': `inline; filename="allergy-briefing-${order.summary.reference}.pdf"`,
        },
      });
    }),
    http.get('/api/orders/:id/access-log', ({ params }) => {
      const refused = chefOnly() ?? failure('log');
      if (refused) return refused;
      if (!orderOf(params.id)) return noOrder();
      return json(state.accessLog);
    }),
    http.put(
      '/api/orders/:id/guests/:guestId/substitutions/:dessertId',
      async ({ params, request }) => {
        const body = (await request.json()) as SubstitutionBody;
        const path = `/api/orders/${String(params.id)}/guests/${String(params.guestId)}/substitutions/${String(params.dessertId)}`;
        state.requests.push({ method: 'PUT', path, body });
        const refused = chefOnly() ?? failure('put');
        if (refused) return refused;
        const order = orderOf(params.id);
        if (!order) return noOrder();
        const guest = order.guests.find((g) => g.position === Number(params.guestId));
        if (!guest) return error(404, 'This booking has no guest with that id.');
        const dessertId = String(params.dessertId);
        const changes: Substitution[] = [
          ...body.leaveOut.map((componentRecipeId) => ({ componentRecipeId })),
          ...body.replace,
        ];
        try {
          applySubstitutions(index, index.dessert(dessertId), changes);
        } catch (e) {
          if (isKitchenError(e)) return error(400, e.message);
          throw e;
        }
        const sub: FixtureSubstitution = {
          guestPosition: guest.position,
          dessertId,
          changes,
          note: body.note?.trim() || null,
          recordedAt: '2026-01-20T10:00:00.000Z',
        };
        order.substitutions = [
          ...order.substitutions.filter(
            (s) => !(s.guestPosition === guest.position && s.dessertId === dessertId),
          ),
          sub,
        ];
        return json(guestNoteOf(order, guest));
      },
    ),
    http.delete('/api/orders/:id/guests/:guestId/substitutions/:dessertId', ({ params }) => {
      const path = `/api/orders/${String(params.id)}/guests/${String(params.guestId)}/substitutions/${String(params.dessertId)}`;
      state.requests.push({ method: 'DELETE', path });
      const refused = chefOnly() ?? failure('delete');
      if (refused) return refused;
      const order = orderOf(params.id);
      if (!order) return noOrder();
      const guest = order.guests.find((g) => g.position === Number(params.guestId));
      if (!guest) return error(404, 'This booking has no guest with that id.');
      const before = order.substitutions.length;
      order.substitutions = order.substitutions.filter(
        (s) => !(s.guestPosition === guest.position && s.dessertId === params.dessertId),
      );
      if (order.substitutions.length === before)
        return error(404, 'No substitution is recorded for that guest and dessert.');
      return json(guestNoteOf(order, guest));
    }),
    // The substitution form's lists (the kitchen API's answers, the fields it reads).
    http.get('/api/desserts/:id', ({ params }) => {
      const dessert = AN_CATALOGUE.desserts.find((d) => d.id === params.id);
      if (!dessert) return error(404, 'There is no dessert with that id.');
      return json({
        ...dessert,
        referenceNames: Object.fromEntries(
          dessert.components.map((c) => [c.recipeId, index.recipe(c.recipeId).name]),
        ),
      });
    }),
    http.get('/api/recipes', () =>
      json({
        items: AN_CATALOGUE.recipes,
        total: AN_CATALOGUE.recipes.length,
        page: 1,
        pageSize: 100,
      }),
    ),
  ];

  function guestNoteOf(order: FixtureOrder, guest: FixtureGuest): GuestNote {
    return notesOf(index, order).guests.find((g) => g.guestId === guest.position)!;
  }

  return { state, handlers };
}
