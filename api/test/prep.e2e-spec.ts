import { randomUUID } from 'node:crypto';
import {
  addIsoDays,
  dateInTimeZone,
  DEMO_CATALOGUE,
  OrderStatus,
  type KitchenCatalogue,
  type PrepPlan,
} from '@nappe/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { OrderSubstitutionEntity } from '../src/allergy-notes/entities/order-substitution.entity.js';
import { withDemoUuids } from '../src/database/demo-catalogue-seed.js';
import { OrderEventEntity } from '../src/orders/entities/order-event.entity.js';
import { OrderEntity } from '../src/orders/entities/order.entity.js';
import { StudioSettings } from '../src/studio/entities/studio-settings.entity.js';
import { bearer } from './factories/booking.js';
import { createDemoStudio, type DemoStudio } from './factories/demo-studio.js';
import { pdfText } from './factories/pdf-text.js';

/**
 * The prep plan over the seeded demo (8+ confirmed events in the next two weeks). Totals are
 * checked against a hand sum computed here from the catalogue's own figures: plates =
 * ceil(guests × (1 + spare)), grams per plate per component, sub-recipes scaled by
 * line grams ÷ recipe yield (proportional scaling — common practice, no source).
 */

let d: DemoStudio;
let from: string;
let to: string;
const SPARE = 10;
const catalogue: KitchenCatalogue = withDemoUuids(DEMO_CATALOGUE);

beforeAll(async () => {
  d = await createDemoStudio();
  await d.t.dataSource.getRepository(StudioSettings).update({ id: 1 }, { sparePercent: SPARE });
  const studio = await d.t.dataSource.getRepository(StudioSettings).findOneByOrFail({ id: 1 });
  from = dateInTimeZone(d.clock.now(), studio.timeZone);
  to = addIsoDays(from, 13);
});
afterAll(async () => d.t.close());

const binary = (res: unknown, cb: (e: Error | null, b: Buffer) => void) => {
  const r = res as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  r.on('data', (c: Buffer) => chunks.push(c));
  r.on('end', () => cb(null, Buffer.concat(chunks)));
};

async function getPlan(token: string): Promise<PrepPlan & { costsShown: boolean }> {
  const started = performance.now();
  const res = await d.t.http
    .get(`/api/prep/plan?from=${from}&to=${to}`)
    .set(bearer(token))
    .expect(200);
  // Measured once per call, for the report (not an assertion).
  console.info(
    `prep plan ${from}..${to}: ${(performance.now() - started).toFixed(0)} ms over HTTP`,
  );
  return res.body as PrepPlan & { costsShown: boolean };
}

/** Grams of every recipe the demo range needs, by hand. */
async function handSum(): Promise<Map<string, number>> {
  const recipes = new Map(catalogue.recipes.map((r) => [r.id, r]));
  const desserts = new Map(catalogue.desserts.map((x) => [x.id, x]));
  const menus = new Map(catalogue.menus.map((x) => [x.id, x]));
  const need = new Map<string, number>();
  const add = (recipeId: string, grams: number): void => {
    need.set(recipeId, (need.get(recipeId) ?? 0) + grams);
    const recipe = recipes.get(recipeId)!;
    for (const line of recipe.lines) {
      if (line.kind !== 'recipe') continue;
      expect(line.unit, `${recipe.name} uses its sub-recipe in grams`).toBe('g');
      add(line.recipeId, (line.quantity * grams) / recipe.yieldG);
    }
  };
  const orders = (await d.t.dataSource.getRepository(OrderEntity).find()).filter(
    (o) => o.status === 'confirmed' && o.eventDate >= from && o.eventDate <= to,
  );
  expect(orders.length).toBeGreaterThanOrEqual(8);
  const subs = await d.t.dataSource.getRepository(OrderSubstitutionEntity).find();
  for (const order of orders) {
    const plates = Math.ceil((order.guestCount * (100 + SPARE)) / 100);
    for (const dessertId of menus.get(order.menuId)!.dessertIds) {
      const dessert = desserts.get(dessertId)!;
      const changed = subs.filter(
        (s) => s.orderId === order.id && s.dessertId === dessertId && s.changes.length > 0,
      );
      for (const c of dessert.components) {
        const recipe = recipes.get(c.recipeId)!;
        const perPlate =
          c.unit === 'g' ? c.quantity : c.quantity * (c.pieceWeightG ?? recipe.unitWeightG!);
        add(c.recipeId, perPlate * (plates - changed.length));
        for (const sub of changed) {
          const change = sub.changes.find((x) => x.componentRecipeId === c.recipeId);
          if (!change) add(c.recipeId, perPlate);
          else if (change.replacementRecipeId) add(change.replacementRecipeId, perPlate);
        }
      }
    }
  }
  return need;
}

describe('prep plan', () => {
  it('totals equal the hand sum through sub-recipes, with the spare % and the substitutions', async () => {
    const plan = await getPlan(d.chef);
    expect(plan.sparePercent).toBe(SPARE);
    const expected = await handSum();
    const got = new Map(plan.recipes.map((r) => [r.recipeId, r.exactGrams]));
    expect([...got.keys()].sort()).toEqual([...expected.keys()].sort());
    for (const [recipeId, grams] of expected) {
      expect(got.get(recipeId), recipeId).toBeCloseTo(grams, 0);
    }
    // Per-day rows add up to the totals.
    for (const total of plan.recipes) {
      const rows = plan.days
        .flatMap((day) => day.recipes)
        .filter((r) => r.recipeId === total.recipeId);
      expect(rows.reduce((s, r) => s + r.exactGrams, 0)).toBeCloseTo(total.exactGrams, 0);
    }
  });

  it('never exceeds a batch capacity; packs cover the need with no pack to spare', async () => {
    const plan = await getPlan(d.chef);
    for (const row of plan.days.flatMap((day) => day.recipes)) {
      if (row.equipment) {
        expect(row.exactGramsPerBatch, row.recipeName).toBeLessThanOrEqual(
          row.equipment.batchCapacityG,
        );
        expect(row.batches).toBe(
          Math.max(1, Math.ceil(row.exactGrams / row.equipment.batchCapacityG - 1e-9)),
        );
      } else {
        expect(row.batches).toBe(1);
      }
    }
    expect(plan.purchaseList.lines.length).toBeGreaterThan(0);
    for (const line of plan.purchaseList.lines) {
      expect(line.packs * line.packGrams, line.name).toBeGreaterThanOrEqual(line.neededGrams);
      expect((line.packs - 1) * line.packGrams, line.name).toBeLessThan(line.neededGrams);
      expect(Number.isInteger(line.totalMinor)).toBe(true);
      expect(line.totalMinor).toBe(line.packs * line.packPriceMinor);
    }
    expect(plan.purchaseList.totalMinor).toBe(
      plan.purchaseList.lines.reduce((s, l) => s + l.totalMinor, 0),
    );
  });

  it('starts every rested or frozen component early enough for its first use', async () => {
    const plan = await getPlan(d.chef);
    const recipes = new Map(catalogue.recipes.map((r) => [r.id, r]));
    const long = plan.schedule.runs.filter((run) =>
      recipes.get(run.recipeId)!.steps.some((s) => s.waitMinutes >= 60),
    );
    expect(long.length).toBeGreaterThan(0);
    for (const run of long) {
      const recipe = recipes.get(run.recipeId)!;
      const minimum = recipe.steps.reduce(
        (s, step) => s + step.waitMinutes + step.activeMinutes,
        0,
      );
      const start = Date.parse(run.startAt);
      expect(Date.parse(run.finishAt) - start, run.recipeName).toBeGreaterThanOrEqual(
        minimum * 60_000,
      );
      expect(Date.parse(run.finishAt), run.recipeName).toBeLessThanOrEqual(
        Date.parse(run.neededByAt),
      );
    }
    expect(plan.schedule.conflicts.filter((c) => c.kind === 'lead_time')).toEqual([]);
  });

  it('shows staff the plan without costs, and exports CSV and PDF', async () => {
    const staff = await getPlan(d.staff);
    expect(staff.costsShown).toBe(false);
    for (const line of staff.purchaseList.lines) {
      expect(line).not.toHaveProperty('packPriceMinor');
      expect(line).not.toHaveProperty('totalMinor');
    }
    expect(staff.purchaseList).not.toHaveProperty('totalMinor');
    const csv = await d.t.http
      .get(`/api/prep/plan.csv?from=${from}&to=${to}`)
      .set(bearer(d.chef))
      .expect(200);
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    expect(csv.text).toContain('Purchase list');
    expect(csv.text).toContain('pack price');
    const staffCsv = await d.t.http
      .get(`/api/prep/plan.csv?from=${from}&to=${to}`)
      .set(bearer(d.staff))
      .expect(200);
    expect(staffCsv.text).not.toContain('pack price');
    const pdf = await d.t.http
      .get(`/api/prep/plan.pdf?from=${from}&to=${to}`)
      .set(bearer(d.chef))
      .buffer(true)
      .parse(binary)
      .expect(200);
    const text = pdfText(pdf.body as Buffer).join(' ');
    expect(text).toContain('Prep sheet');
    expect(text).toContain('Purchase list');
    await d.t.http.get('/api/prep/plan?from=2026-02-30').set(bearer(d.chef)).expect(400);
    await d.t.http.get(`/api/prep/plan?from=${to}&to=${from}`).set(bearer(d.chef)).expect(400);
  });
});

describe('prep schedule, ticks and labels', () => {
  it('lists a day’s tasks in order; staff tick one done with who and when, and untick it', async () => {
    const plan = await getPlan(d.chef);
    const busy = plan.schedule.days.find((day) => day.tasks.length > 0)!;
    const res = await d.t.http
      .get(`/api/prep/schedule?date=${busy.date}`)
      .set(bearer(d.staff))
      .expect(200);
    const tasks = res.body.tasks as Array<{
      taskKey: string;
      startAt: string;
      latestStartAt: string;
      done: { by: string } | null;
      activeMinutes: number;
      waitMinutes: number;
    }>;
    expect(tasks.length).toBeGreaterThan(0);
    for (let i = 1; i < tasks.length; i += 1) {
      expect(Date.parse(tasks[i]!.startAt)).toBeGreaterThanOrEqual(
        Date.parse(tasks[i - 1]!.startAt),
      );
    }
    const key = tasks[0]!.taskKey;
    const ticked = await d.t.http
      .post(`/api/prep/tasks/${key}/done`)
      .set(bearer(d.staff))
      .expect(200);
    expect(ticked.body.done).toMatchObject({ by: 'Idris Okafor' });
    const again = await d.t.http
      .get(`/api/prep/schedule?date=${busy.date}`)
      .set(bearer(d.chef))
      .expect(200);
    expect(again.body.tasks.find((t: { taskKey: string }) => t.taskKey === key).done.by).toBe(
      'Idris Okafor',
    );
    await d.t.http.delete(`/api/prep/tasks/${key}/done`).set(bearer(d.staff)).expect(200);
    const cleared = await d.t.http
      .get(`/api/prep/schedule?date=${busy.date}`)
      .set(bearer(d.chef))
      .expect(200);
    expect(cleared.body.tasks.find((t: { taskKey: string }) => t.taskKey === key).done).toBeNull();
    await d.t.http
      .post(`/api/prep/tasks/${busy.date}-${'0'.repeat(40)}/done`)
      .set(bearer(d.staff))
      .expect(404);
    await d.t.http.post('/api/prep/tasks/not-a-key/done').set(bearer(d.staff)).expect(404);
  });

  it('prints component labels for a production day with use-by and allergens', async () => {
    const plan = await getPlan(d.chef);
    const run = plan.schedule.runs.find((r) => r.recipeName === 'Brown-butter almond crumble')!;
    const pdf = await d.t.http
      .get(`/api/prep/labels.pdf?date=${run.productionDate}`)
      .set(bearer(d.staff))
      .buffer(true)
      .parse(binary)
      .expect(200);
    const text = pdfText(pdf.body as Buffer).join(' ');
    expect(text).toContain('Brown-butter almond crumble');
    expect(text).toContain('Use by');
    expect(text.toLowerCase()).toContain('almond');
  });

  it('prints a frozen label’s storage temperature with its minus sign', async () => {
    const plan = await getPlan(d.chef);
    const run = plan.schedule.runs.find((r) => r.storage === 'frozen')!;
    const pdf = await d.t.http
      .get(`/api/prep/labels.pdf?date=${run.productionDate}`)
      .set(bearer(d.staff))
      .buffer(true)
      .parse(binary)
      .expect(200);
    const text = pdfText(pdf.body as Buffer).join(' ');
    // Frozen storage at −18 °C (0 °F) or below: USDA FSIS, "Freezing and Food Safety". The
    // standard PDF fonts have no U+2212, so it is printed as a hyphen-minus, never as "?".
    expect(text).toMatch(/Keep frozen at -18 °C or below/);
    expect(text).not.toContain('?18');
  });

  it('refuses clients and anonymous callers, and staff writes to the kitchen', async () => {
    await d.t.http.get('/api/prep/plan').expect(401);
    await d.t.http.get('/api/prep/plan').set(bearer(d.client)).expect(403);
    await d.t.http.get('/api/prep/schedule').set(bearer(d.client)).expect(403);
    await d.t.http.post('/api/ingredients').set(bearer(d.staff)).send({}).expect(403);
    await d.t.http.post('/api/menus').set(bearer(d.staff)).send({}).expect(403);
  });
});

/**
 * Another confirmed order for `eventDate`, cloned from a demo order on the same menu, with its
 * confirmation written to the audit trail at `confirmedAt`.
 */
async function confirmedClone(
  template: OrderEntity,
  changes: Pick<OrderEntity, 'eventDate' | 'serviceTime' | 'guestCount'>,
  confirmedAt: Date,
): Promise<string> {
  const id = randomUUID();
  await d.t.dataSource.getRepository(OrderEntity).insert({
    ...template,
    ...changes,
    id,
    reference: `T-${id.slice(0, 8).toUpperCase()}`,
    clientRequestId: randomUUID(),
    status: OrderStatus.Confirmed,
  });
  await d.t.dataSource.getRepository(OrderEventEntity).insert({
    id: randomUUID(),
    orderId: id,
    seq: 1,
    actorUserId: null,
    actorRole: 'chef',
    fromStatus: OrderStatus.Requested,
    toStatus: OrderStatus.Confirmed,
    summary: 'Confirmed (test record)',
    reason: null,
    at: confirmedAt,
  });
  return id;
}

interface ScheduleBody {
  tasks: Array<{
    taskKey: string;
    recipeId: string;
    batches: number;
    orderIds: string[];
    done: { by: string; at: string; batches: number } | null;
  }>;
  conflicts: Array<{
    kind: string;
    orderId?: string;
    checkedFrom?: string;
    checkedFromAt?: string;
    readyAt?: string;
    neededByAt?: string;
    message: string;
  }>;
}

describe('ticks and lead times as orders come in', () => {
  it('keeps a tick when another order joins the batch, and shows the batches added since', async () => {
    const plan = await getPlan(d.chef);
    // A run on plates with equipment: more guests on its event means more batches.
    const row = plan.days
      .flatMap((day) => day.recipes.map((r) => ({ day: day.date, r })))
      .find(({ r }) => r.equipment && r.onPlates && r.orderIds.length > 0)!;
    expect(row, 'the demo plan has a run limited by its equipment').toBeDefined();
    const read = async () =>
      (await d.t.http.get(`/api/prep/schedule?date=${row.day}`).set(bearer(d.staff)).expect(200))
        .body as ScheduleBody;
    const before = (await read()).tasks.find(
      (t) => t.recipeId === row.r.recipeId && t.orderIds.join() === [...row.r.orderIds].join(),
    )!;
    await d.t.http.post(`/api/prep/tasks/${before.taskKey}/done`).set(bearer(d.staff)).expect(200);

    const template = await d.t.dataSource
      .getRepository(OrderEntity)
      .findOneByOrFail({ id: row.r.orderIds[0]! });
    const joined = await confirmedClone(
      template,
      { eventDate: template.eventDate, serviceTime: template.serviceTime, guestCount: 400 },
      d.clock.now(),
    );
    const after = (await read()).tasks.find((t) => t.taskKey === before.taskKey)!;
    expect(after.orderIds).toContain(joined);
    expect(after.batches).toBeGreaterThan(before.batches);
    expect(after.done).toMatchObject({ by: 'Idris Okafor', batches: before.batches });
    await d.t.dataSource.getRepository(OrderEntity).update(
      { id: joined },
      {
        status: OrderStatus.Cancelled,
      },
    );
  });

  it('flags on today’s schedule and dashboard an order confirmed too late, not one confirmed in time', async () => {
    const studio = await d.t.dataSource.getRepository(StudioSettings).findOneByOrFail({ id: 1 });
    const today = dateInTimeZone(d.clock.now(), studio.timeZone);
    const tomorrow = addIsoDays(today, 1);
    // 17:55 UTC is 18:55 (winter) or 19:55 (summer) in Brussels: any hands-on work can start
    // only at 07:00 tomorrow, when plating for an 08:00 service must already begin.
    const confirmedNow = new Date(`${today}T17:55:00.000Z`);
    d.clock.set(confirmedNow);
    try {
      const template = await d.t.dataSource
        .getRepository(OrderEntity)
        .findOneByOrFail({ status: OrderStatus.Confirmed });
      const slot = { eventDate: tomorrow, serviceTime: '08:00', guestCount: 12 };
      const late = await confirmedClone(template, slot, confirmedNow);
      const early = await confirmedClone(
        template,
        slot,
        new Date(confirmedNow.getTime() - 10 * 24 * 3600_000),
      );

      const body = (await d.t.http.get('/api/prep/schedule').set(bearer(d.staff)).expect(200))
        .body as ScheduleBody;
      const leadTime = body.conflicts.filter((c) => c.kind === 'lead_time');
      expect(leadTime.length).toBeGreaterThan(0);
      const { reference } = await d.t.dataSource
        .getRepository(OrderEntity)
        .findOneByOrFail({ id: late });
      for (const c of leadTime) {
        expect(c.orderId).toBe(late);
        // Named as the chef knows the order, never by its internal id.
        expect(c.message).toContain(`for order ${reference} cannot be ready`);
        expect(c.message).not.toContain(late);
        expect(c.checkedFrom).toBe('confirmation');
        expect(Date.parse(c.checkedFromAt!)).toBe(confirmedNow.getTime());
        expect(Date.parse(c.readyAt!)).toBeGreaterThan(Date.parse(c.neededByAt!));
        expect(c.message).toMatch(/Started when the order was confirmed/);
      }
      // Another day lists only conflicts of its own tasks.
      const later = (
        await d.t.http
          .get(`/api/prep/schedule?date=${addIsoDays(today, 2)}`)
          .set(bearer(d.staff))
          .expect(200)
      ).body as ScheduleBody;
      expect(later.conflicts.filter((c) => c.orderId === late)).toEqual([]);

      const dash = await d.t.http.get('/api/insights/dashboard').set(bearer(d.chef)).expect(200);
      const alerts = dash.body.alerts as Array<{ kind: string; orderId: string }>;
      const alert = alerts.find((a) => a.kind === 'lead_time' && a.orderId === late);
      // One alert for the order, however many of its components are late.
      expect((alert as { message?: string } | undefined)?.message).toMatch(
        /cannot be ready in time/,
      );
      expect(alerts.some((a) => a.kind === 'lead_time' && a.orderId === early)).toBe(false);
      // The demo's own orders were confirmed days ahead: none of them is late.
      expect(alerts.filter((a) => a.kind === 'lead_time').map((a) => a.orderId)).toEqual([late]);
    } finally {
      d.clock.set(new Date());
    }
  });
});
