import { cautionForStep, COLD_HOLDING_MAX_C, storageCaution } from '../kitchen/safety.js';
import type { MethodStep, Recipe, StepKind, StorageKind } from '../kitchen/types.js';
import {
  PrepInputError,
  WorkingCalendar,
  parsePrepSettings,
  type PrepSettings,
  type PrepSettingsInput,
} from './working-calendar.js';
import {
  formatDurationForChef,
  formatForChef,
  parseInstant,
  toZonedIso,
  wallClockAt,
  type EpochMinutes,
} from './zoned-time.js';

/**
 * Prep schedule (DESIGN.md §8). From each recipe's steps and waits, working back from the time
 * a product is needed:
 *
 * - **Latest start.** The last step's wait ends no later than the time needed (service minus
 *   the plating buffer for a plate component; the start of the parent run for a sub-recipe —
 *   a sub-recipe is finished before its parent's *first* step, because a step does not say
 *   which lines it uses). Each earlier step is ready before the next one starts.
 * - **Working hours.** Hands-on minutes fall inside the studio's working hours (a setting,
 *   07:00–19:00 by default, in the studio's time zone); waits — chilling, freezing, resting —
 *   run at any hour, overnight included. A step's hands-on minutes are per batch. Batches flow
 *   through the steps: batch k of a step follows batch k of the step before (once its wait is
 *   over) and batch k − 1 of the same step (one pair of hands, one machine); their waits
 *   overlap. One batch of one step is never split across a closing time.
 * - **Waits are minimums.** When the next step cannot start as soon as a wait ends (it has to
 *   wait for opening time), the product stays where the wait left it until then; a step that
 *   is only a wait (a rest in the cold room) starts as soon as the step before it is ready.
 * - **Earliest start by shelf life.** A run is finished when its last step's wait ends and
 *   keeps `shelfLifeHours` from then; started too early, it expires before its last use. The
 *   earliest start is the earliest moment from which working forward still ends late enough.
 * - **Conflicts.** With `now`, every plate use of a service still to come is checked: started
 *   from the moment the order could first be worked on, is the component (with its sub-recipes)
 *   ready by the plating time? If not, a message says why, by how much and by when it had to
 *   start. That moment is `now` for an order not yet confirmed, and the moment it was confirmed
 *   for a confirmed one (`leadTimeFrom`): work under way since then is not flagged again, while
 *   an order confirmed too late stays flagged until its service. A run that expires before a
 *   use, and a cooling step longer than FDA Food Code §3-501.14(A) allows, are reported too.
 *
 * Not modelled: who does the work. Two runs may be scheduled at the same minute; the day's
 * task list shows them side by side for the chef to share out.
 */

// ---------------------------------------------------------------- timing one recipe

export interface ActiveBlock {
  start: EpochMinutes;
  end: EpochMinutes;
}

export interface StepTiming {
  index: number;
  step: MethodStep;
  /**
   * One block per batch, in order: the batch's hands-on work, or for a step that is only a
   * wait a zero-length mark where that batch's wait begins.
   */
  blocks: ActiveBlock[];
  /** When the step begins: its first batch. */
  start: EpochMinutes;
  /** The last batch's hands-on end. */
  activeEnd: EpochMinutes;
  /** When the last batch's wait is over: the earliest the next step can be finished for all batches. */
  readyAt: EpochMinutes;
}

export interface RecipeTiming {
  recipe: Recipe;
  batches: number;
  steps: StepTiming[];
  /** The first step's start (= `finish` for a recipe without steps). */
  start: EpochMinutes;
  /** The last step's readyAt: the product is finished. */
  finish: EpochMinutes;
}

export interface BackwardTiming extends RecipeTiming {
  /** The latest start of each step (its first batch) that still meets `readyBy`. */
  latestStarts: EpochMinutes[];
  readyBy: EpochMinutes;
}

function assertBatches(batches: number, recipe: Recipe): void {
  if (!Number.isInteger(batches) || batches < 1) {
    throw new PrepInputError(
      `The number of batches of “${recipe.name}” must be a whole number, 1 or more; got ${String(batches)}.`,
    );
  }
}

const isPureWait = (s: MethodStep) => s.activeMinutes === 0;

function stepTiming(index: number, step: MethodStep, blocks: ActiveBlock[]): StepTiming {
  let readyAt = -Infinity;
  for (const b of blocks) readyAt = Math.max(readyAt, b.end + step.waitMinutes);
  return {
    index,
    step,
    blocks,
    start: blocks[0]!.start,
    activeEnd: blocks[blocks.length - 1]!.end,
    readyAt,
  };
}

/**
 * The latest timing of `batches` batches of `recipe` that is finished by `readyBy`.
 *
 * Batches flow through the steps: batch k of a step starts once batch k of the step before is
 * ready (its wait over) and once batch k − 1 of the same step is done by hand. Worked from the
 * last step back, each batch's hands-on block is placed as late as its working window allows.
 */
export function timeRecipeBackward(
  recipe: Recipe,
  readyBy: EpochMinutes,
  batches: number,
  calendar: WorkingCalendar,
): BackwardTiming {
  assertBatches(batches, recipe);
  const steps = recipe.steps;
  const out: StepTiming[] = new Array<StepTiming>(steps.length);
  const latestStarts: EpochMinutes[] = new Array<EpochMinutes>(steps.length);
  // limit[k]: batch k of the current step must be ready (wait over) by then.
  let limit: EpochMinutes[] = new Array<EpochMinutes>(batches).fill(readyBy);
  for (let i = steps.length - 1; i >= 0; i -= 1) {
    const step = steps[i]!;
    const a = step.activeMinutes;
    const w = step.waitMinutes;
    const blocks: ActiveBlock[] = new Array<ActiveBlock>(batches);
    if (a === 0) {
      for (let k = 0; k < batches; k += 1) {
        const begin = limit[k]! - w;
        blocks[k] = { start: begin, end: begin };
      }
    } else {
      const context = { recipeName: recipe.name, stepName: step.name };
      let nextBatchStart = Infinity;
      for (let k = batches - 1; k >= 0; k -= 1) {
        const end = calendar.latestBlockEnd(Math.min(limit[k]! - w, nextBatchStart), a, context);
        blocks[k] = { start: end - a, end };
        nextBatchStart = end - a;
      }
    }
    out[i] = stepTiming(i, step, blocks);
    latestStarts[i] = blocks[0]!.start;
    limit = blocks.map((b) => b.start);
  }
  // A step that is only a wait (a rest in the cold room) begins as soon as the step before it is
  // ready: its wait is a minimum and simply runs on until the next step.
  for (let i = 1; i < out.length; i += 1) {
    const s = out[i]!;
    if (!isPureWait(s.step)) continue;
    const before = out[i - 1]!;
    const blocks = before.blocks.map((b) => {
      const begin = b.end + before.step.waitMinutes;
      return { start: begin, end: begin };
    });
    out[i] = stepTiming(i, s.step, blocks);
  }
  const finish = out.length > 0 ? out[out.length - 1]!.readyAt : readyBy;
  const start = out.length > 0 ? out[0]!.start : readyBy;
  return { recipe, batches, steps: out, start, finish, latestStarts, readyBy };
}

/** The earliest timing of `batches` batches of `recipe` started no earlier than `from` (waits at their minimum). */
export function timeRecipeForward(
  recipe: Recipe,
  from: EpochMinutes,
  batches: number,
  calendar: WorkingCalendar,
): RecipeTiming {
  assertBatches(batches, recipe);
  const out: StepTiming[] = [];
  // avail[k]: batch k is ready for its next step.
  const avail: EpochMinutes[] = new Array<EpochMinutes>(batches).fill(from);
  recipe.steps.forEach((step, index) => {
    const a = step.activeMinutes;
    const w = step.waitMinutes;
    const blocks: ActiveBlock[] = [];
    const context = { recipeName: recipe.name, stepName: step.name };
    let handsFree = -Infinity;
    for (let k = 0; k < batches; k += 1) {
      const s =
        a === 0
          ? avail[k]!
          : calendar.earliestBlockStart(Math.max(avail[k]!, handsFree), a, context);
      blocks.push({ start: s, end: s + a });
      if (a > 0) handsFree = s + a;
      avail[k] = s + a + w;
    }
    out.push(stepTiming(index, step, blocks));
  });
  const finish = out.length > 0 ? out[out.length - 1]!.readyAt : from;
  return { recipe, batches, steps: out, start: out[0]?.start ?? from, finish };
}

/** timeRecipeForward(...).finish without building the timing (the bisection below calls it often). */
function forwardFinish(
  recipe: Recipe,
  from: EpochMinutes,
  batches: number,
  calendar: WorkingCalendar,
  avail: EpochMinutes[],
): EpochMinutes {
  avail.fill(from, 0, batches);
  for (const step of recipe.steps) {
    const a = step.activeMinutes;
    const w = step.waitMinutes;
    const context = { recipeName: recipe.name, stepName: step.name };
    let handsFree = -Infinity;
    for (let k = 0; k < batches; k += 1) {
      const s =
        a === 0
          ? avail[k]!
          : calendar.earliestBlockStart(Math.max(avail[k]!, handsFree), a, context);
      if (a > 0) handsFree = s + a;
      avail[k] = s + a + w;
    }
  }
  let finish = from;
  if (recipe.steps.length > 0)
    for (let k = 0; k < batches; k += 1) finish = Math.max(finish, avail[k]!);
  return finish;
}

/** Shelf life in whole minutes (a fraction of a minute is not kept). */
export function shelfLifeMinutes(recipe: Recipe): number {
  return Math.floor(recipe.shelfLifeHours * 60);
}

/**
 * The earliest timing whose product still keeps until `lastUse`: the earliest start `s` with
 * forward(s).finish ≥ lastUse − shelf life, waits at their minimum, found by bisection (the
 * finish never moves earlier when the start moves later). Null when even the latest timing
 * expires before `lastUse`.
 */
export function earliestTimingForShelfLife(
  recipe: Recipe,
  batches: number,
  calendar: WorkingCalendar,
  lastUse: EpochMinutes,
  latest: RecipeTiming,
): RecipeTiming | null {
  const target = lastUse - shelfLifeMinutes(recipe);
  if (latest.finish < target) return null;
  const avail = new Array<EpochMinutes>(batches);
  const finishFrom = (s: EpochMinutes) => forwardFinish(recipe, s, batches, calendar, avail);
  let hi = latest.start;
  // Worked without holding from the latest start, it may finish too early: then only the latest
  // timing (with its waits run long) keeps long enough, and it is also the earliest.
  if (finishFrom(hi) < target) return latest;
  let lo = target - (latest.finish - latest.start) - 7 * 24 * 60;
  if (finishFrom(lo) >= target) return timeRecipeForward(recipe, lo, batches, calendar);
  while (hi - lo > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (finishFrom(mid) >= target) hi = mid;
    else lo = mid;
  }
  return timeRecipeForward(recipe, hi, batches, calendar);
}

// ---------------------------------------------------------------- runs

/** One use of a run's product. */
export interface RunUse {
  /** The product must be finished by then: service minus plating time, or the parent run's start. */
  neededBy: EpochMinutes;
  /** …and still within its shelf life then: the service, or the parent run's start. */
  usedAt: EpochMinutes;
  /** Set for a plate component of an order. */
  orderId?: string;
  /** The order as messages name it for the chef (its reference); the id when not given. */
  orderName?: string;
  /** The order's time zone, for messages. */
  serviceTimeZone?: string;
  /** Set when another run uses this one as a sub-recipe. */
  parentRunId?: string;
}

/** A recipe made once, in `batches` batches, for one or more uses. */
export interface ProductionRun {
  runId: string;
  recipe: Recipe;
  batches: number;
  orderIds: string[];
  uses: RunUse[];
  /** Runs of sub-recipes this run takes from. */
  subRunIds: string[];
}

export interface StepSchedule {
  index: number;
  name: string;
  kind: StepKind;
  temperatureC?: number;
  batches: number;
  activeMinutesPerBatch: number;
  /** Hands-on minutes for all batches. */
  activeMinutes: number;
  waitMinutes: number;
  /** Scheduled start (= latest start for hands-on steps; a pure wait starts when the step before is ready). */
  startAt: string;
  latestStartAt: string;
  /** Start in the earliest timing the shelf life allows. */
  earliestStartAt: string;
  activeEndAt: string;
  /** The wait's minimum end. */
  readyAt: string;
  /** The product waits here until this moment (the next step's start, or when it is first needed). */
  holdUntilAt: string;
  caution?: string;
}

export interface RunSchedule {
  runId: string;
  recipeId: string;
  recipeName: string;
  storage: StorageKind;
  shelfLifeHours: number;
  batches: number;
  orderIds: string[];
  /** Runs of sub-recipes this run takes from (each is finished before this run starts). */
  usesRunIds: string[];
  /** Studio-local date of the first step: the production day. */
  productionDate: string;
  startAt: string;
  finishAt: string;
  /** finish + shelf life. */
  expiresAt: string;
  /** The earliest any use needs it finished. */
  neededByAt: string;
  /** The last use (service or parent run start) it must keep until. */
  lastUseAt: string;
  earliestStartAt: string;
  earliestFinishAt: string;
  storageCaution?: string;
  steps: StepSchedule[];
}

export interface PrepTask {
  taskId: string;
  runId: string;
  recipeId: string;
  recipeName: string;
  stepIndex: number;
  stepName: string;
  kind: StepKind;
  temperatureC?: number;
  /** Batches worked in this task (a step with many batches may carry on the next working day). */
  batches: number;
  totalBatches: number;
  activeMinutes: number;
  waitMinutes: number;
  startAt: string;
  activeEndAt: string;
  readyAt: string;
  holdUntilAt: string;
  latestStartAt: string;
  earliestStartAt: string;
  orderIds: string[];
  caution?: string;
  /** On the last step of a run: how to keep the product. */
  storageCaution?: string;
}

export interface PrepDay {
  date: string;
  activeMinutes: number;
  tasks: PrepTask[];
}

export type PrepConflict =
  | {
      kind: 'lead_time';
      orderId: string;
      /** What the readiness was worked from: now, or when the order was confirmed. */
      checkedFrom: 'now' | 'confirmation';
      checkedFromAt: string;
      runId: string;
      recipeId: string;
      recipeName: string;
      serviceAt: string;
      neededByAt: string;
      readyAt: string;
      lateByMinutes: number;
      latestStartAt: string;
      message: string;
    }
  | {
      kind: 'shelf_life';
      runId: string;
      recipeId: string;
      recipeName: string;
      orderId?: string;
      parentRunId?: string;
      finishAt: string;
      expiresAt: string;
      usedAt: string;
      message: string;
    }
  | {
      kind: 'sequence';
      runId: string;
      subRunId: string;
      message: string;
    };

export interface PrepWarning {
  kind: 'cooling_time';
  recipeId: string;
  recipeName: string;
  stepName: string;
  minutes: number;
  limitMinutes: number;
  source: string;
  message: string;
}

export interface PrepSchedule {
  timeZone: string;
  workingHours: { start: string; end: string };
  platingBufferMinutes: number;
  /** The moment lead times were checked against, when given. */
  now?: string;
  runs: RunSchedule[];
  days: PrepDay[];
  conflicts: PrepConflict[];
  warnings: PrepWarning[];
}

/** Internal timing of a run, shared with the plan. */
export interface RunTiming {
  run: ProductionRun;
  latest: BackwardTiming;
  earliest: RecipeTiming;
  expires: EpochMinutes;
  lastUse: EpochMinutes;
  shelfLifeOk: boolean;
}

export function readyByOf(run: ProductionRun): EpochMinutes {
  if (run.uses.length === 0) {
    throw new PrepInputError(`The run ${run.runId} of “${run.recipe.name}” has no use.`);
  }
  return Math.min(...run.uses.map((u) => u.neededBy));
}

export function timeRun(run: ProductionRun, calendar: WorkingCalendar): RunTiming {
  const latest = timeRecipeBackward(run.recipe, readyByOf(run), run.batches, calendar);
  const lastUse = Math.max(...run.uses.map((u) => u.usedAt));
  const earliest = earliestTimingForShelfLife(run.recipe, run.batches, calendar, lastUse, latest);
  return {
    run,
    latest,
    earliest: earliest ?? latest,
    expires: latest.finish + shelfLifeMinutes(run.recipe),
    lastUse,
    shelfLifeOk: earliest !== null,
  };
}

// FDA Food Code §3-501.14(A): 57 → 21 °C within 2 h, and to 5 °C or below within 6 h in total.
const COOLING_FIRST_STAGE_MINUTES = 120;
const COOLING_TOTAL_MINUTES = 360;

function coolingWarnings(recipe: Recipe): PrepWarning[] {
  const warnings: PrepWarning[] = [];
  for (const step of recipe.steps) {
    if (step.kind !== 'cool') continue;
    const minutes = step.activeMinutes + step.waitMinutes;
    const toCold = step.temperatureC !== undefined && step.temperatureC <= COLD_HOLDING_MAX_C;
    const limit = toCold ? COOLING_TOTAL_MINUTES : COOLING_FIRST_STAGE_MINUTES;
    if (minutes > limit) {
      warnings.push({
        kind: 'cooling_time',
        recipeId: recipe.id,
        recipeName: recipe.name,
        stepName: step.name,
        minutes,
        limitMinutes: limit,
        source: 'FDA Food Code §3-501.14(A)',
        message: toCold
          ? `“${step.name}” in “${recipe.name}” takes ${formatDurationForChef(minutes)}; cooked food must reach ${COLD_HOLDING_MAX_C} °C or below within 6 h in total (FDA Food Code §3-501.14(A)). Use shallow containers, an ice bath or a blast chiller.`
          : `“${step.name}” in “${recipe.name}” takes ${formatDurationForChef(minutes)}; cooked food must cool from 57 °C to 21 °C within 2 h (FDA Food Code §3-501.14(A)). Use shallow containers, an ice bath or a blast chiller.`,
      });
    }
  }
  return warnings;
}

function stepCaution(step: MethodStep): string | undefined {
  return step.caution ?? cautionForStep(step);
}

export interface ScheduleRunsOptions {
  /** ISO date-time with offset: check lead times as if nothing has been started yet. */
  now?: string;
  /**
   * Per order id, when the order was confirmed (ISO date-time with offset): its lead time is
   * checked from then instead of from `now`, since work on it may have begun at that moment.
   * Orders not listed are checked from `now`. Used only with `now`.
   */
  leadTimeFrom?: Readonly<Record<string, string>>;
  /** Timings already worked out (the plan passes its own, to avoid working them twice). */
  timings?: ReadonlyMap<string, RunTiming>;
}

/**
 * The schedule of a set of runs: per-run step times, the day-by-day task list in the studio's
 * time zone, conflicts and warnings.
 */
export function scheduleRuns(
  runs: readonly ProductionRun[],
  settingsInput: PrepSettingsInput | PrepSettings,
  options: ScheduleRunsOptions = {},
): PrepSchedule {
  const settings = parsePrepSettings(settingsInput);
  const calendar = new WorkingCalendar(settings);
  const tz = settings.studioTimeZone;
  const iso = (t: EpochMinutes) => toZonedIso(t, tz);
  const byId = new Map<string, ProductionRun>();
  for (const run of runs) {
    if (byId.has(run.runId)) throw new PrepInputError(`Two runs share the id ${run.runId}.`);
    byId.set(run.runId, run);
  }
  const timings = new Map<string, RunTiming>();
  for (const run of runs) {
    timings.set(run.runId, options.timings?.get(run.runId) ?? timeRun(run, calendar));
  }

  const conflicts: PrepConflict[] = [];
  const warnings: PrepWarning[] = [];
  const warnedRecipes = new Set<string>();
  const runSchedules: RunSchedule[] = [];
  const tasks: Array<PrepTask & { sortKey: number }> = [];

  for (const run of runs) {
    const timing = timings.get(run.runId)!;
    const { latest, earliest } = timing;
    const recipe = run.recipe;
    if (!warnedRecipes.has(recipe.id)) {
      warnedRecipes.add(recipe.id);
      warnings.push(...coolingWarnings(recipe));
    }
    for (const use of run.uses) {
      if (use.usedAt > timing.expires) {
        const where = use.orderId
          ? `service of order ${use.orderName ?? use.orderId} at ${formatForChef(use.usedAt, use.serviceTimeZone ?? tz)}`
          : `the parent run ${use.parentRunId ?? ''} at ${formatForChef(use.usedAt, tz)}`;
        conflicts.push({
          kind: 'shelf_life',
          runId: run.runId,
          recipeId: recipe.id,
          recipeName: recipe.name,
          ...(use.orderId ? { orderId: use.orderId } : {}),
          ...(use.parentRunId ? { parentRunId: use.parentRunId } : {}),
          finishAt: iso(latest.finish),
          expiresAt: iso(timing.expires),
          usedAt: iso(use.usedAt),
          message: `“${recipe.name}” keeps ${formatDurationForChef(shelfLifeMinutes(recipe))}. Worked within hours ${calendar.hours.start}–${calendar.hours.end} it is finished at the latest ${formatForChef(latest.finish, tz)} and expires ${formatForChef(timing.expires, tz)}, before the ${where}. Make it as close to service as the hours allow, widen the working hours, or check its shelf life.`,
        });
      }
    }
    for (const subId of run.subRunIds) {
      const sub = timings.get(subId);
      if (!sub) throw new PrepInputError(`The run ${run.runId} uses an unknown run ${subId}.`);
      if (sub.latest.finish > latest.start) {
        conflicts.push({
          kind: 'sequence',
          runId: run.runId,
          subRunId: subId,
          message: `“${sub.run.recipe.name}” is finished ${formatForChef(sub.latest.finish, tz)}, after “${recipe.name}” that uses it starts at ${formatForChef(latest.start, tz)}.`,
        });
      }
    }

    const caution = storageCaution(recipe.storage);
    const steps: StepSchedule[] = latest.steps.map((s, i) => {
      const next = latest.steps[i + 1];
      const holdUntil = next ? next.start : Math.max(latest.readyBy, s.readyAt);
      const c = stepCaution(s.step);
      return {
        index: s.index,
        name: s.step.name,
        kind: s.step.kind,
        ...(s.step.temperatureC !== undefined ? { temperatureC: s.step.temperatureC } : {}),
        batches: run.batches,
        activeMinutesPerBatch: s.step.activeMinutes,
        activeMinutes: s.step.activeMinutes * run.batches,
        waitMinutes: s.step.waitMinutes,
        startAt: iso(s.start),
        latestStartAt: iso(latest.latestStarts[i]!),
        earliestStartAt: iso(earliest.steps[i]!.start),
        activeEndAt: iso(s.activeEnd),
        readyAt: iso(s.readyAt),
        holdUntilAt: iso(holdUntil),
        ...(c ? { caution: c } : {}),
      };
    });

    runSchedules.push({
      runId: run.runId,
      recipeId: recipe.id,
      recipeName: recipe.name,
      storage: recipe.storage,
      shelfLifeHours: recipe.shelfLifeHours,
      batches: run.batches,
      orderIds: [...run.orderIds],
      usesRunIds: [...run.subRunIds],
      productionDate: wallClockAt(latest.start, tz).date,
      startAt: iso(latest.start),
      finishAt: iso(latest.finish),
      expiresAt: iso(timing.expires),
      neededByAt: iso(latest.readyBy),
      lastUseAt: iso(timing.lastUse),
      earliestStartAt: iso(earliest.start),
      earliestFinishAt: iso(earliest.finish),
      ...(caution ? { storageCaution: caution } : {}),
      steps,
    });

    // Tasks: a step that is only a wait is one task; a hands-on step is one task per working
    // day its batches fall on.
    latest.steps.forEach((s, i) => {
      const schedule = steps[i]!;
      const isLast = i === latest.steps.length - 1;
      const base = {
        runId: run.runId,
        recipeId: recipe.id,
        recipeName: recipe.name,
        stepIndex: s.index,
        stepName: s.step.name,
        kind: s.step.kind,
        ...(s.step.temperatureC !== undefined ? { temperatureC: s.step.temperatureC } : {}),
        totalBatches: run.batches,
        waitMinutes: s.step.waitMinutes,
        holdUntilAt: schedule.holdUntilAt,
        latestStartAt: schedule.latestStartAt,
        earliestStartAt: schedule.earliestStartAt,
        orderIds: [...run.orderIds],
        ...(schedule.caution ? { caution: schedule.caution } : {}),
        ...(isLast && caution ? { storageCaution: caution } : {}),
      };
      if (isPureWait(s.step)) {
        tasks.push({
          ...base,
          taskId: `${run.runId}/${s.index + 1}`,
          batches: run.batches,
          activeMinutes: 0,
          startAt: iso(s.start),
          activeEndAt: iso(s.start),
          readyAt: iso(s.readyAt),
          sortKey: s.start,
        });
        return;
      }
      const groups: ActiveBlock[][] = [];
      let day = Number.NaN;
      for (const b of s.blocks) {
        const d = calendar.localDay(b.start);
        if (d !== day) {
          groups.push([]);
          day = d;
        }
        groups[groups.length - 1]!.push(b);
      }
      groups.forEach((g, gi) => {
        const first = g[0]!;
        const last = g[g.length - 1]!;
        tasks.push({
          ...base,
          taskId: `${run.runId}/${s.index + 1}${groups.length > 1 ? `.${gi + 1}` : ''}`,
          batches: g.length,
          activeMinutes: s.step.activeMinutes * g.length,
          startAt: iso(first.start),
          activeEndAt: iso(last.end),
          readyAt: iso(last.end + s.step.waitMinutes),
          sortKey: first.start,
        });
      });
    });
  }

  let now: EpochMinutes | undefined;
  if (options.now !== undefined) {
    now = parseInstant(options.now, 'The current time');
    const from = new Map<string, EpochMinutes>();
    for (const [orderId, at] of Object.entries(options.leadTimeFrom ?? {})) {
      from.set(orderId, parseInstant(at, `The confirmation time of order ${orderId}`));
    }
    conflicts.push(...leadTimeConflicts(runs, timings, calendar, now, from));
  }

  tasks.sort(
    (a, b) =>
      a.sortKey - b.sortKey ||
      a.recipeName.localeCompare(b.recipeName) ||
      a.runId.localeCompare(b.runId) ||
      a.stepIndex - b.stepIndex,
  );
  const days = new Map<string, PrepDay>();
  for (const { sortKey: _sortKey, ...task } of tasks) {
    const date = task.startAt.slice(0, 10);
    const day = days.get(date) ?? { date, activeMinutes: 0, tasks: [] };
    day.tasks.push(task);
    day.activeMinutes += task.activeMinutes;
    days.set(date, day);
  }

  return {
    timeZone: tz,
    workingHours: { ...settings.workingHours },
    platingBufferMinutes: settings.platingBufferMinutes,
    ...(now !== undefined ? { now: iso(now) } : {}),
    runs: runSchedules,
    days: [...days.values()].sort((a, b) => a.date.localeCompare(b.date)),
    conflicts,
    warnings,
  };
}

interface Readiness {
  finish: EpochMinutes;
  timing: RecipeTiming;
  /** The sub-run that held this run back, if any. */
  via?: string;
}

function leadTimeConflicts(
  runs: readonly ProductionRun[],
  timings: ReadonlyMap<string, RunTiming>,
  calendar: WorkingCalendar,
  now: EpochMinutes,
  confirmedAt: ReadonlyMap<string, EpochMinutes>,
): PrepConflict[] {
  // One memo per starting moment: orders confirmed at different times are worked separately.
  const memos = new Map<EpochMinutes, Map<string, Readiness>>();
  const readyFrom = (start: EpochMinutes, runId: string, open = new Set<string>()): Readiness => {
    let memo = memos.get(start);
    if (!memo) {
      memo = new Map();
      memos.set(start, memo);
    }
    const known = memo.get(runId);
    if (known) return known;
    if (open.has(runId)) throw new PrepInputError(`Runs use each other in a loop at ${runId}.`);
    open.add(runId);
    const run = timings.get(runId)!.run;
    let from = start;
    let via: string | undefined;
    for (const sub of run.subRunIds) {
      const r = readyFrom(start, sub, open);
      if (r.finish > from) {
        from = r.finish;
        via = sub;
      }
    }
    const timing = timeRecipeForward(run.recipe, from, run.batches, calendar);
    const result: Readiness = { finish: timing.finish, timing, ...(via ? { via } : {}) };
    open.delete(runId);
    memo.set(runId, result);
    return result;
  };

  const tz = calendar.timeZone;
  const conflicts: PrepConflict[] = [];
  for (const run of runs) {
    for (const use of run.uses) {
      if (!use.orderId || use.usedAt <= now) continue;
      const confirmed = confirmedAt.get(use.orderId);
      const start = confirmed ?? now;
      const ready = readyFrom(start, run.runId);
      if (ready.finish <= use.neededBy) continue;
      const memo = memos.get(start)!;

      // The chain that held it back, to name its longest wait and when it had to start.
      let longest: { step: MethodStep; recipe: Recipe } | undefined;
      let mustStart = timings.get(run.runId)!.latest.start;
      for (let id: string | undefined = run.runId; id; id = memo.get(id)?.via) {
        const t = timings.get(id)!;
        mustStart = Math.min(mustStart, t.latest.start);
        for (const step of t.run.recipe.steps) {
          if (!longest || step.waitMinutes > longest.step.waitMinutes) {
            longest = { step, recipe: t.run.recipe };
          }
        }
      }
      const serviceTz = use.serviceTimeZone ?? tz;
      const late = ready.finish - use.neededBy;
      const wait =
        longest && longest.step.waitMinutes >= 60
          ? ` It needs ${formatDurationForChef(longest.step.waitMinutes)} for “${longest.step.name}”${longest.recipe.id !== run.recipe.id ? ` (in “${longest.recipe.name}”)` : ''}.`
          : '';
      conflicts.push({
        kind: 'lead_time',
        orderId: use.orderId,
        checkedFrom: confirmed === undefined ? 'now' : 'confirmation',
        checkedFromAt: toZonedIso(start, tz),
        runId: run.runId,
        recipeId: run.recipe.id,
        recipeName: run.recipe.name,
        serviceAt: toZonedIso(use.usedAt, serviceTz),
        neededByAt: toZonedIso(use.neededBy, tz),
        readyAt: toZonedIso(ready.finish, tz),
        lateByMinutes: late,
        latestStartAt: toZonedIso(mustStart, tz),
        message:
          `“${run.recipe.name}” for order ${use.orderName ?? use.orderId} cannot be ready in time.${wait}` +
          ` ${confirmed === undefined ? 'Started now' : 'Started when the order was confirmed'} (${formatForChef(start, tz)}), with hands-on work between ${calendar.hours.start} and ${calendar.hours.end}, it is ready ${formatForChef(ready.finish, tz)} —` +
          ` ${formatDurationForChef(late)} after plating must begin (${formatForChef(use.neededBy, tz)}) for service at ${formatForChef(use.usedAt, serviceTz)}.` +
          ` It had to start by ${formatForChef(mustStart, tz)}. Move the service, agree a later date, or leave the component out.`,
      });
    }
  }
  return conflicts;
}
