import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEMO_RECIPES } from '../../kitchen/demo-catalogue.js';
import { recipe } from '../../kitchen/__tests__/fixtures.js';
import type { MethodStep, Recipe } from '../../kitchen/types.js';
import {
  scheduleRuns,
  timeRecipeBackward,
  timeRecipeForward,
  type ProductionRun,
} from '../prep-schedule.js';
import {
  PrepInputError,
  StepLongerThanWorkingDayError,
  WorkingCalendar,
  parsePrepSettings,
  prepSettingsSchema,
} from '../working-calendar.js';
import { toZonedIso, zonedToInstant } from '../zoned-time.js';

const BXL = 'Europe/Brussels';
const settings = parsePrepSettings({ studioTimeZone: BXL });
const calendar = new WorkingCalendar(settings);
const at = (date: string, time: string, tz = BXL) => zonedToInstant(date, time, tz);
const iso = (t: number) => toZonedIso(t, BXL);

function step(
  name: string,
  kind: MethodStep['kind'],
  activeMinutes: number,
  waitMinutes: number,
  temperatureC?: number,
): MethodStep {
  return {
    name,
    kind,
    activeMinutes,
    waitMinutes,
    ...(temperatureC !== undefined ? { temperatureC } : {}),
  };
}

const demo = (id: string): Recipe => DEMO_RECIPES.find((r) => r.id === id)!;

// A custard ice-cream base rested 6 h 30 min: at least six hours before churning is common
// practice, no source. Test data, not the demo catalogue.
const restedBase = recipe(
  'base-6h',
  [{ kind: 'ingredient', ingredientId: 'milk', quantity: 1000, unit: 'g' }],
  {
    name: 'Vanilla base',
    storage: 'frozen',
    shelfLifeHours: 7 * 24,
    steps: [
      step('Cook the custard to 85 °C', 'custard', 20, 0, 85),
      step('Cool over an ice bath to 21 °C', 'cool', 10, 30, 21),
      step('Rest in the cold room (at least 6 h)', 'chill', 0, 390, 4),
      step('Churn', 'churn', 20, 0, -6),
      step('Firm in the freezer', 'freeze', 0, 30, -20),
    ],
  },
);

function runOf(r: Recipe, serviceAt: number, extra: Partial<ProductionRun> = {}): ProductionRun {
  return {
    runId: `${r.id}#1`,
    recipe: r,
    batches: 1,
    orderIds: ['order-1'],
    uses: [
      { neededBy: serviceAt - 60, usedAt: serviceAt, orderId: 'order-1', serviceTimeZone: BXL },
    ],
    subRunIds: [],
    ...extra,
  };
}

describe('working back from service: the demo vanilla custard ice cream, one batch (hand-worked)', () => {
  // Service Tue 24 March 2026 19:30 in Brussels (UTC+1); plating buffer 60 min → ready by 18:30.
  const timing = timeRecipeBackward(
    demo('rec-vanilla-base'),
    at('2026-03-24', '18:30'),
    1,
    calendar,
  );

  it('places each step as late as working hours 07:00–19:00 allow', () => {
    expect(timing.latestStarts.map(iso)).toEqual([
      '2026-03-23T18:05:00+01:00', // infuse 10 + 20 min wait, ends 18:15 Mon
      '2026-03-23T18:35:00+01:00', // custard 15 min
      '2026-03-23T18:50:00+01:00', // cool 10 min before closing, 30 min wait
      '2026-03-24T05:40:00+01:00', // the 12 h rest must have begun by 05:40 Tue
      '2026-03-24T17:40:00+01:00', // churn 20 min
      '2026-03-24T18:00:00+01:00', // firm 30 min
    ]);
    expect(iso(timing.finish)).toBe('2026-03-24T18:30:00+01:00');
  });

  it('starts the rest as soon as the base is cool (19:30 Mon), so it rests 22 h 10 min, not just 12 h', () => {
    const rest = timing.steps[3]!;
    expect(iso(rest.start)).toBe('2026-03-23T19:30:00+01:00');
    const churn = timing.steps[4]!;
    expect(churn.start - rest.start).toBe(22 * 60 + 10);
  });

  // Check values, common practice, no source: a custard base rests at least 6 h before churning;
  // churned ice cream is firmed 30 min in the freezer.
  it('rests the custard at least 6 h before churning and firms the ice cream 30 min before plating', () => {
    const cool = timing.steps[2]!;
    const churn = timing.steps[4]!;
    expect(churn.start - cool.readyAt).toBeGreaterThanOrEqual(6 * 60);
    expect(timing.readyBy - churn.activeEnd).toBeGreaterThanOrEqual(30);
  });

  it('keeps hands-on work inside working hours, waits at any hour', () => {
    for (const s of timing.steps) {
      for (const b of s.blocks) {
        if (s.step.activeMinutes === 0) continue;
        expect(iso(b.start).slice(11, 16) >= '07:00').toBe(true);
        expect(iso(b.end).slice(11, 16) <= '19:00').toBe(true);
      }
    }
  });
});

describe('batches flow through the steps (hand-worked)', () => {
  const r = recipe(
    'two-steps',
    [{ kind: 'ingredient', ingredientId: 'x', quantity: 1, unit: 'g' }],
    {
      steps: [step('Mix', 'prep', 20, 0), step('Pipe, then set', 'assemble', 10, 30)],
    },
  );

  it('three batches: mix 10:20–11:20, pipe 11:00–11:30, set until 12:00', () => {
    const t = timeRecipeBackward(r, at('2026-01-21', '12:00'), 3, calendar);
    expect(t.steps[0]!.blocks.map((b) => iso(b.start).slice(11, 16))).toEqual([
      '10:20',
      '10:40',
      '11:00',
    ]);
    expect(t.steps[1]!.blocks.map((b) => iso(b.start).slice(11, 16))).toEqual([
      '11:00',
      '11:10',
      '11:20',
    ]);
    expect(iso(t.finish)).toBe('2026-01-21T12:00:00+01:00');
    // Worked forward from the latest start it finishes exactly on time.
    expect(timeRecipeForward(r, t.start, 3, calendar).finish).toBe(t.finish);
  });

  it('moves a block that does not fit before opening to the evening before', () => {
    const whip = recipe(
      'whip',
      [{ kind: 'ingredient', ingredientId: 'x', quantity: 1, unit: 'g' }],
      {
        steps: [step('Whip', 'whip', 40, 0)],
      },
    );
    // Brunch at 08:30 → ready by 07:30: 30 min would fit from 07:00, 40 min does not.
    expect(iso(timeRecipeBackward(whip, at('2026-01-21', '07:30'), 1, calendar).start)).toBe(
      '2026-01-20T18:20:00+01:00',
    );
  });

  it('refuses a step longer than the working day, naming it', () => {
    const long = recipe(
      'long',
      [{ kind: 'ingredient', ingredientId: 'x', quantity: 1, unit: 'g' }],
      {
        name: 'Slow caramel',
        steps: [step('Stir the caramel', 'caramel', 13 * 60, 0, 170)],
      },
    );
    expect(() => timeRecipeBackward(long, at('2026-01-21', '18:00'), 1, calendar)).toThrow(
      StepLongerThanWorkingDayError,
    );
    expect(() => timeRecipeBackward(long, at('2026-01-21', '18:00'), 1, calendar)).toThrow(
      /“Stir the caramel” in “Slow caramel” needs 780 minutes.*07:00–19:00/,
    );
    expect(() => timeRecipeBackward(long, at('2026-01-21', '18:00'), 0, calendar)).toThrow(
      PrepInputError,
    );
  });
});

describe('across the clock changes in Brussels (Directive 2000/84/EC: last Sundays of March and October)', () => {
  const overnight = recipe(
    'overnight',
    [{ kind: 'ingredient', ingredientId: 'x', quantity: 1, unit: 'g' }],
    {
      steps: [step('Make and cover', 'prep', 60, 720), step('Finish', 'assemble', 30, 0)],
    },
  );

  it('spring: a 12 h rest from Saturday 19:00 (UTC+1) ends Sunday 08:00 (UTC+2)', () => {
    // Service Sun 29 March 19:30 → ready by 18:30 CEST.
    const t = timeRecipeBackward(overnight, at('2026-03-29', '18:30'), 1, calendar);
    expect(iso(t.steps[1]!.start)).toBe('2026-03-29T18:00:00+02:00');
    expect(iso(t.steps[0]!.start)).toBe('2026-03-28T18:00:00+01:00');
    expect(iso(t.steps[0]!.readyAt)).toBe('2026-03-29T08:00:00+02:00');
  });

  it('autumn: a 12 h rest from Saturday 19:00 (UTC+2) ends Sunday 06:00 (UTC+1), before opening', () => {
    const t = timeRecipeBackward(overnight, at('2026-10-25', '08:00'), 1, calendar);
    // Ready by 08:00 Sunday: the last 30 min from 07:30 (UTC+1). The hour of work would have to
    // end 12 h before that, 20:30 Saturday (UTC+2), after closing: so 18:00–19:00 Saturday.
    expect(iso(t.steps[1]!.start)).toBe('2026-10-25T07:30:00+01:00');
    expect(iso(t.steps[0]!.start)).toBe('2026-10-24T18:00:00+02:00');
    expect(iso(t.steps[0]!.readyAt)).toBe('2026-10-25T06:00:00+01:00');
  });

  it('opens at 07:00 on the wall both sides of each change', () => {
    for (const date of ['2026-03-28', '2026-03-29', '2026-10-24', '2026-10-25']) {
      const [open, close] = calendar.windowOnDate(date);
      expect(iso(open).slice(11, 16)).toBe('07:00');
      expect(iso(close).slice(11, 16)).toBe('19:00');
      expect(close - open).toBe(12 * 60);
    }
  });
});

describe('lead time: an order confirmed Monday evening for a Tuesday brunch', () => {
  const service = at('2026-03-24', '09:00');

  it('is a conflict at 18:45 Monday, with a message a chef can read', () => {
    const s = scheduleRuns([runOf(restedBase, service)], settings, {
      now: '2026-03-23T18:45:00+01:00',
    });
    expect(s.conflicts).toHaveLength(1);
    const c = s.conflicts[0]!;
    expect(c.kind).toBe('lead_time');
    if (c.kind !== 'lead_time') return;
    // Hand-worked: the custard (20 min) no longer fits before 19:00, so it is cooked Tue 07:00,
    // cooled by 08:00, rested until 14:30, churned 14:30–14:50 and firm at 15:20.
    expect(c.readyAt).toBe('2026-03-24T15:20:00+01:00');
    expect(c.neededByAt).toBe('2026-03-24T08:00:00+01:00');
    expect(c.lateByMinutes).toBe(7 * 60 + 20);
    expect(c.latestStartAt).toBe('2026-03-23T18:30:00+01:00');
    expect(c.message).toBe(
      '“Vanilla base” for order order-1 cannot be ready in time. It needs 6 h 30 min for “Rest in the cold room (at least 6 h)”. ' +
        'Started now (Mon 23 Mar 18:45), with hands-on work between 07:00 and 19:00, it is ready Tue 24 Mar 15:20 — ' +
        '7 h 20 min after plating must begin (Tue 24 Mar 08:00) for service at Tue 24 Mar 09:00. ' +
        'It had to start by Mon 23 Mar 18:30. Move the service, agree a later date, or leave the component out.',
    );
  });

  it('is no conflict at 18:00 Monday: cooked and cooled before closing, rested overnight, churned at 07:00', () => {
    const s = scheduleRuns([runOf(restedBase, service)], settings, {
      now: '2026-03-23T18:00:00+01:00',
    });
    expect(s.conflicts).toEqual([]);
  });

  it('a confirmed order is checked from its confirmation: work started then is not flagged later', () => {
    // Confirmed Monday 08:00: cooked and cooled by 09:00, rested until 15:30, churned and firm
    // well before Tuesday 08:00. At 18:45 that evening the base is resting, not late.
    const s = scheduleRuns([runOf(restedBase, service)], settings, {
      now: '2026-03-23T18:45:00+01:00',
      leadTimeFrom: { 'order-1': '2026-03-23T08:00:00+01:00' },
    });
    expect(s.conflicts).toEqual([]);
  });

  it('an order confirmed too late stays flagged, worked from the confirmation', () => {
    const s = scheduleRuns([runOf(restedBase, service)], settings, {
      now: '2026-03-24T07:30:00+01:00',
      leadTimeFrom: { 'order-1': '2026-03-23T18:45:00+01:00' },
    });
    expect(s.conflicts).toHaveLength(1);
    const c = s.conflicts[0]!;
    if (c.kind !== 'lead_time') throw new Error('expected a lead-time conflict');
    // The same hand-worked figures as "now = 18:45 Monday" above.
    expect(c.checkedFrom).toBe('confirmation');
    expect(c.checkedFromAt).toBe('2026-03-23T18:45:00+01:00');
    expect(c.readyAt).toBe('2026-03-24T15:20:00+01:00');
    expect(c.lateByMinutes).toBe(7 * 60 + 20);
    expect(c.message).toContain(
      'Started when the order was confirmed (Mon 23 Mar 18:45), with hands-on work',
    );
  });

  it('orders not listed in leadTimeFrom are still checked from now', () => {
    const s = scheduleRuns([runOf(restedBase, service)], settings, {
      now: '2026-03-23T18:45:00+01:00',
      leadTimeFrom: { 'another-order': '2026-03-20T08:00:00+01:00' },
    });
    const c = s.conflicts[0];
    expect(c?.kind === 'lead_time' ? [c.checkedFrom, c.checkedFromAt] : []).toEqual([
      'now',
      '2026-03-23T18:45:00+01:00',
    ]);
  });

  it('ignores uses whose service is already past', () => {
    const s = scheduleRuns([runOf(restedBase, service)], settings, {
      now: '2026-03-24T10:00:00+01:00',
    });
    expect(s.conflicts).toEqual([]);
  });

  it('blames a late sub-recipe: the parent is ready only once its sub-recipe is', () => {
    const sauce = recipe(
      'sauce',
      [{ kind: 'ingredient', ingredientId: 'x', quantity: 1, unit: 'g' }],
      {
        name: 'Caramel sauce',
        steps: [
          step('Cook the caramel', 'caramel', 20, 0, 175),
          step('Set overnight', 'chill', 0, 600, 4),
        ],
      },
    );
    const tart = recipe('tart', [{ kind: 'recipe', recipeId: 'sauce', quantity: 100, unit: 'g' }], {
      name: 'Caramel tart',
      steps: [step('Fill the shells', 'assemble', 15, 0)],
    });
    const parent = runOf(tart, at('2026-03-24', '12:00'), {
      runId: 'tart#1',
      subRunIds: ['sauce#1'],
    });
    const parentStart = timeRecipeBackward(tart, at('2026-03-24', '11:00'), 1, calendar).start;
    const child: ProductionRun = {
      runId: 'sauce#1',
      recipe: sauce,
      batches: 1,
      orderIds: ['order-1'],
      uses: [{ neededBy: parentStart, usedAt: parentStart, parentRunId: 'tart#1' }],
      subRunIds: [],
    };
    const s = scheduleRuns([parent, child], settings, { now: '2026-03-24T08:00:00+01:00' });
    const c = s.conflicts.find((x) => x.kind === 'lead_time');
    expect(c?.message).toMatch(/It needs 10 h for “Set overnight” \(in “Caramel sauce”\)/);
    // Caramel 08:00–08:20, set until 18:20, tarts filled 18:20–18:35.
    expect(c && c.kind === 'lead_time' ? c.readyAt : '').toBe('2026-03-24T18:35:00+01:00');
  });
});

describe('the day’s task list', () => {
  const service = at('2026-03-24', '19:30');
  const s = scheduleRuns(
    [
      runOf(demo('rec-vanilla-base'), service, { runId: 'vanilla#1', batches: 2 }),
      runOf(demo('rec-almond-crumble'), service, { runId: 'crumble#1' }),
    ],
    settings,
  );

  it('is in order of start, per studio-local day', () => {
    expect(s.days.map((d) => d.date)).toEqual(['2026-03-23', '2026-03-24']);
    for (const day of s.days) {
      const starts = day.tasks.map((t) => Date.parse(t.startAt));
      expect([...starts].sort((a, b) => a - b)).toEqual(starts);
      expect(day.activeMinutes).toBe(day.tasks.reduce((n, t) => n + t.activeMinutes, 0));
    }
  });

  it('carries the step’s safety caution: custard 82–85 °C, cooling per FDA Food Code §3-501.14(A), frozen ≤ −18 °C (USDA FSIS)', () => {
    const tasks = s.days.flatMap((d) => d.tasks);
    const custard = tasks.find((t) => t.kind === 'custard')!;
    expect(custard.caution).toMatch(/82–85 °C/);
    expect(custard.caution).toMatch(
      /57 °C to 21 °C within 2 hours, then to 5 °C or below within 6 hours/,
    );
    expect(custard.caution).toMatch(/local food code/);
    const cool = tasks.find((t) => t.kind === 'cool')!;
    expect(cool.caution).toMatch(/57 °C to 21 °C within 2 hours/);
    const firm = tasks.find((t) => t.kind === 'freeze')!;
    expect(firm.caution).toMatch(/−18 °C \(0 °F\) or below/);
    expect(firm.storageCaution).toMatch(/Keep frozen at −18 °C or below \(USDA FSIS\)/);
  });

  // Check value, common practice, no source: a crumble bakes about 20 minutes at 160 °C and is
  // stirred every 5 minutes. 160 °C = 320 °F by definition (°F = °C × 9/5 + 32).
  it('bakes the crumble about 20 min at 160 °C (320 °F), stirring every 5 min', () => {
    const bake = s.days
      .flatMap((d) => d.tasks)
      .find((t) => t.recipeId === 'rec-almond-crumble' && t.kind === 'bake')!;
    expect(bake.temperatureC).toBe(160);
    expect(bake.waitMinutes).toBeGreaterThanOrEqual(15);
    expect(bake.waitMinutes).toBeLessThanOrEqual(25);
    expect(bake.stepName).toMatch(/every 5 minutes/);
    expect(bake.caution).toMatch(/160 °C \(320 °F\)/);
  });

  it('shows two batches of churning as one 40-minute task and the rest as one wait for both batches', () => {
    const tasks = s.days.flatMap((d) => d.tasks).filter((t) => t.runId === 'vanilla#1');
    const churn = tasks.find((t) => t.kind === 'churn')!;
    expect(churn.batches).toBe(2);
    expect(churn.activeMinutes).toBe(40);
    const rest = tasks.find((t) => t.kind === 'chill')!;
    expect(rest.activeMinutes).toBe(0);
    expect(rest.waitMinutes).toBe(720);
  });

  it('gives each step its latest and earliest start; made too early it would expire', () => {
    const run = s.runs.find((r) => r.runId === 'crumble#1')!;
    // Shelf life 5 days: finished no earlier than service − 120 h.
    expect(Date.parse(run.earliestFinishAt)).toBeGreaterThanOrEqual(
      service * 60_000 - 120 * 3_600_000,
    );
    expect(Date.parse(run.earliestStartAt)).toBeLessThanOrEqual(Date.parse(run.startAt));
    for (const st of run.steps) {
      expect(Date.parse(st.earliestStartAt)).toBeLessThanOrEqual(Date.parse(st.latestStartAt));
    }
  });
});

describe('shelf life, sequence and cooling checks', () => {
  it('reports a product that expires before service', () => {
    const fragile = recipe(
      'fragile',
      [{ kind: 'ingredient', ingredientId: 'x', quantity: 1, unit: 'g' }],
      {
        name: 'Soufflé base',
        shelfLifeHours: 0.5,
        steps: [step('Whisk', 'whip', 10, 0)],
      },
    );
    const s = scheduleRuns([runOf(fragile, at('2026-03-24', '19:30'))], settings);
    expect(s.conflicts.map((c) => c.kind)).toEqual(['shelf_life']);
    expect(s.conflicts[0]!.message).toMatch(/keeps 30 min.*before the service of order order-1/);
  });

  it('reports a sub-recipe finished after its parent starts', () => {
    const sub = recipe('sub', [{ kind: 'ingredient', ingredientId: 'x', quantity: 1, unit: 'g' }], {
      steps: [step('Cook', 'cook', 10, 0, 90)],
    });
    const parentRecipe = recipe(
      'parent',
      [{ kind: 'recipe', recipeId: 'sub', quantity: 1, unit: 'g' }],
      {
        steps: [step('Assemble', 'assemble', 10, 0)],
      },
    );
    const service = at('2026-03-24', '19:30');
    const s = scheduleRuns(
      [
        runOf(parentRecipe, service, { runId: 'p', subRunIds: ['s'] }),
        runOf(sub, service, { runId: 's' }), // wrongly timed for the plate, not for the parent
      ],
      settings,
    );
    expect(s.conflicts.map((c) => c.kind)).toContain('sequence');
  });

  it('warns when a cooling step is longer than FDA Food Code §3-501.14(A) allows (2 h to 21 °C, 6 h to 5 °C)', () => {
    const slow = recipe(
      'slow',
      [{ kind: 'ingredient', ingredientId: 'x', quantity: 1, unit: 'g' }],
      {
        name: 'Pastry cream',
        steps: [
          step('Cook', 'custard', 15, 0, 85),
          step('Cool to 21 °C', 'cool', 5, 150, 21),
          step('Cool to 4 °C', 'cool', 0, 300, 4),
        ],
      },
    );
    const s = scheduleRuns([runOf(slow, at('2026-03-24', '19:30'))], settings);
    expect(s.warnings.map((w) => [w.stepName, w.limitMinutes])).toEqual([['Cool to 21 °C', 120]]);
    expect(s.warnings[0]!.source).toBe('FDA Food Code §3-501.14(A)');
    // The demo recipes stay inside both limits.
    const demoRuns = DEMO_RECIPES.map((r, i) =>
      runOf(r, at('2026-03-24', '19:30'), { runId: `d${i}` }),
    );
    expect(scheduleRuns(demoRuns, settings).warnings).toEqual([]);
  });

  it('refuses settings a chef got wrong, in words', () => {
    expect(() => parsePrepSettings({ studioTimeZone: 'Nowhere/Town' })).toThrow(/time zone/);
    expect(() =>
      parsePrepSettings({ studioTimeZone: BXL, workingHours: { start: '19:00', end: '07:00' } }),
    ).toThrow(/end after they start/);
    expect(() => parsePrepSettings({ studioTimeZone: BXL, platingBufferMinutes: -5 })).toThrow(
      /negative/,
    );
    expect(settings.workingHours).toEqual({ start: '07:00', end: '19:00' });
    expect(settings.platingBufferMinutes).toBe(60);
  });
});

// ---------------------------------------------------------------- properties

const ZONES = ['Europe/Brussels', 'America/New_York', 'Asia/Kolkata', 'Australia/Sydney', 'UTC'];

const stepArb = fc.record({
  activeMinutes: fc.oneof(fc.constant(0), fc.integer({ min: 1, max: 180 })),
  waitMinutes: fc.oneof(fc.constant(0), fc.integer({ min: 1, max: 24 * 60 })),
});

const caseArb = fc.record({
  steps: fc.array(stepArb, { minLength: 1, maxLength: 5 }),
  batches: fc.integer({ min: 1, max: 4 }),
  zone: fc.constantFrom(...ZONES),
  open: fc.integer({ min: 5 * 60, max: 9 * 60 }),
  close: fc.integer({ min: 15 * 60, max: 22 * 60 }),
  // Any minute of 2026, clock changes included.
  readyBy: fc.integer({ min: Date.UTC(2026, 0, 5) / 60_000, max: Date.UTC(2026, 11, 20) / 60_000 }),
});

const hhmm = (m: number) =>
  `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;

type Case = typeof caseArb extends fc.Arbitrary<infer T> ? T : never;

function build(c: Case) {
  const r = recipe('r', [{ kind: 'ingredient', ingredientId: 'x', quantity: 1, unit: 'g' }], {
    steps: c.steps.map((s, i) => step(`Step ${i + 1}`, 'prep', s.activeMinutes, s.waitMinutes)),
  });
  const cal = new WorkingCalendar(
    parsePrepSettings({
      studioTimeZone: c.zone,
      workingHours: { start: hhmm(c.open), end: hhmm(c.close) },
    }),
  );
  return { r, cal };
}

/** Wall-clock HH:MM and date through the platform's own formatter, not ours. */
function wall(t: number, zone: string): { date: string; time: string } {
  const parts = new Intl.DateTimeFormat('en-CA', {
    timeZone: zone,
    hourCycle: 'h23',
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
  }).formatToParts(new Date(t * 60_000));
  const g = (k: string) => parts.find((p) => p.type === k)!.value;
  return { date: `${g('year')}-${g('month')}-${g('day')}`, time: `${g('hour')}:${g('minute')}` };
}

describe('schedule properties (fast-check)', () => {
  it('every latest start ≤ the time needed minus the durations from that step on', () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const { r, cal } = build(c);
        const t = timeRecipeBackward(r, c.readyBy, c.batches, cal);
        let after = 0;
        for (let i = c.steps.length - 1; i >= 0; i -= 1) {
          const s = c.steps[i]!;
          after += s.activeMinutes + s.waitMinutes;
          const bound = c.readyBy - after - (c.batches - 1) * s.activeMinutes;
          expect(t.latestStarts[i]!).toBeLessThanOrEqual(bound);
        }
        expect(t.finish).toBeLessThanOrEqual(c.readyBy);
      }),
      { numRuns: 300 },
    );
  });

  it('keeps every hands-on block inside one day’s working hours, in batch and step order', () => {
    fc.assert(
      fc.property(caseArb, fc.boolean(), (c, backward) => {
        const { r, cal } = build(c);
        const t = backward
          ? timeRecipeBackward(r, c.readyBy, c.batches, cal)
          : timeRecipeForward(r, c.readyBy, c.batches, cal);
        t.steps.forEach((s, i) => {
          s.blocks.forEach((b, k) => {
            if (s.step.activeMinutes > 0) {
              const from = wall(b.start, c.zone);
              const to = wall(b.end, c.zone);
              expect(from.date).toBe(to.date);
              expect(from.time >= hhmm(c.open)).toBe(true);
              expect(to.time <= hhmm(c.close)).toBe(true);
              if (k > 0) expect(b.start).toBeGreaterThanOrEqual(s.blocks[k - 1]!.end);
            }
            if (i > 0) {
              const prev = t.steps[i - 1]!;
              expect(b.start).toBeGreaterThanOrEqual(prev.blocks[k]!.end + prev.step.waitMinutes);
            }
          });
        });
        if (!backward) expect(t.start).toBeGreaterThanOrEqual(c.readyBy);
      }),
      { numRuns: 300 },
    );
  });

  it('the latest start is feasible and tight: worked forward from it the recipe is on time, a minute later it is late', () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const { r, cal } = build(c);
        const t = timeRecipeBackward(r, c.readyBy, c.batches, cal);
        expect(timeRecipeForward(r, t.start, c.batches, cal).finish).toBeLessThanOrEqual(c.readyBy);
        expect(timeRecipeForward(r, t.start + 1, c.batches, cal).finish).toBeGreaterThan(c.readyBy);
      }),
      { numRuns: 300 },
    );
  });
});

describe('prep settings validation', () => {
  it('gives a readable message for a malformed time instead of throwing inside the check', () => {
    const parsed = prepSettingsSchema.safeParse({
      studioTimeZone: 'Europe/Brussels',
      workingHours: { start: '7am', end: '19:00' },
    });
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues.map((i) => i.path.join('.'))).toContain('workingHours.start');
  });
});
