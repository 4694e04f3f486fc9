import { applySubstitutions, type Substitution } from '../conflicts/conflicts.js';
import { ingredientCostPerGramExact, ingredientPackGrams } from '../costing/costing.js';
import type { KitchenIndex } from '../kitchen/catalogue.js';
import { isKitchenError, RecipeCycleError } from '../kitchen/errors.js';
import { piecesCovering, roundKitchenGrams, roundMinorUnits, tidy } from '../kitchen/rounding.js';
import type { Recipe, StorageKind } from '../kitchen/types.js';
import {
  scheduleRuns,
  timeRecipeBackward,
  timeRun,
  shelfLifeMinutes,
  type PrepConflict,
  type PrepSchedule,
  type ProductionRun,
  type RunTiming,
  type RunUse,
} from '../prep-schedule/prep-schedule.js';
import {
  PrepInputError,
  WorkingCalendar,
  parsePrepSettings,
  type PrepSettingsInput,
} from '../prep-schedule/working-calendar.js';
import {
  calendarDayNumber,
  isCalendarDate,
  toZonedIso,
  zonedToInstant,
} from '../prep-schedule/zoned-time.js';
import {
  componentGramsPerPlate,
  expandRecipe,
  totalIngredients,
  type ExpandedRecipe,
} from '../scaling/scaling.js';
import type { Unit } from '../units/units.js';
import { prepOrderSchema, type PrepOrder, type PrepOrderInput } from './prep-order.js';

/**
 * Prep plan (DESIGN.md §7): the confirmed orders of a date range turned into what to make, when,
 * in how many batches, and what to buy.
 *
 * 1. **Plates.** Per order and dessert: guests × (1 + spare %), rounded up to a whole plate.
 *    Spare plates are standard plates. A guest with a changed plate counts as the recipes it
 *    really uses: a component left out removes its grams, a replacement adds the other recipe's
 *    grams at the same weight (`applySubstitutions`).
 * 2. **Grams per component** per order, summed over the menu's desserts.
 * 3. **Sharing across events** (greedy, earliest first). A recipe's uses are sorted by when they
 *    need it finished. The first opens a run timed as late as the schedule allows (the schedule's
 *    back-calculation, working hours included); each next use joins that run while its use time
 *    is within the shelf life of the run's finish (finish + shelf-life hours ≥ use), otherwise it
 *    opens a new run. Finishing each run as late as its first use allows is what lets it reach
 *    the most later uses, so this makes each recipe as few times as shelf life allows.
 * 4. **Sub-recipes**, recipe by recipe from the plate down: a run of a recipe asks its
 *    sub-recipes for the grams its lines need (`expandRecipe`), to be finished when the run's
 *    first step starts; those asks are shared into runs the same way.
 * 5. **Batches** per run: ceil(grams ÷ equipment capacity), split evenly (every batch is
 *    grams ÷ batches, so none exceeds the capacity); one batch when the recipe names no equipment.
 * 6. **Purchase list**: each run's own ingredient lines (sub-recipes are bought for in their own
 *    runs), totalled by `totalIngredients` (counted items in whole pieces per run), then rounded
 *    up to whole packs: packs = the least whole number with packs × pack ≥ grams needed. Cost =
 *    packs × pack price, in integer minor units; the cost of what is used is shown beside it.
 *
 * The production day of a run is the studio-local date its first step starts in the latest
 * timing. Every figure is plain data for a CSV or a PDF.
 */

export interface PrepPlanOptions {
  /** First event date of the range, YYYY-MM-DD (inclusive). */
  from: string;
  /** Last event date of the range, YYYY-MM-DD (inclusive). */
  to: string;
  settings: PrepSettingsInput;
  /** Extra plates per dessert and order, in per cent of the guests (the studio's spare %). Default 0. */
  sparePercent?: number;
  /** ISO date-time with offset: check every order's lead time as if nothing has been started. */
  now?: string;
  /** Per order id, when it was confirmed: its lead time is checked from then (see `scheduleRuns`). */
  leadTimeFrom?: Readonly<Record<string, string>>;
}

export interface PlannedDessertPlates {
  dessertId: string;
  dessertName: string;
  /** All plates, spares included. */
  plates: number;
  sparePlates: number;
  /** Plates that differ from the standard one. */
  changedPlates: number;
}

export interface PlannedOrder {
  orderId: string;
  menuId: string;
  menuName: string;
  eventDate: string;
  serviceTime: string;
  timeZone: string;
  serviceAt: string;
  guestCount: number;
  desserts: PlannedDessertPlates[];
}

export interface DessertPlatesTotal {
  dessertId: string;
  dessertName: string;
  plates: number;
  orderIds: string[];
}

export interface PlanRecipeRow {
  runId: string;
  recipeId: string;
  recipeName: string;
  storage: StorageKind;
  exactGrams: number;
  /** Kitchen rounding: ≥ 100 g to 1 g, < 100 g to 0.1 g. */
  grams: number;
  batches: number;
  exactGramsPerBatch: number;
  gramsPerBatch: number;
  equipment?: { name: string; batchCapacityG: number };
  orderIds: string[];
  /** Recipes this run is a sub-recipe of (empty when it goes on plates only). */
  forRecipes: string[];
  /** Runs of its own sub-recipes, finished before this one starts. */
  usesRunIds: string[];
  /** True when some of it goes straight onto plates. */
  onPlates: boolean;
  startAt: string;
  finishAt: string;
  expiresAt: string;
}

export interface PlanDay {
  date: string;
  recipes: PlanRecipeRow[];
}

export interface PlanRecipeTotal {
  recipeId: string;
  recipeName: string;
  exactGrams: number;
  grams: number;
  runs: number;
  batches: number;
}

export interface PurchaseLine {
  ingredientId: string;
  name: string;
  exactGrams: number;
  /** What the packs must cover: exact grams, or whole pieces × piece weight for counted items. */
  neededGrams: number;
  /** Kitchen rounding of the need, for display. */
  grams: number;
  counted?: { countUnit: 'piece' | 'leaf'; pieces: number };
  packSize: number;
  packUnit: Unit;
  packGrams: number;
  packs: number;
  packPriceMinor: number;
  totalMinor: number;
  /** What the grams needed cost at the pack price (the rest of the last pack is left over). */
  usedCostMinor: number;
}

export interface PrepPlan {
  range: { from: string; to: string };
  currency: string;
  sparePercent: number;
  orders: PlannedOrder[];
  /** Orders given but outside the range. */
  skippedOrderIds: string[];
  plates: DessertPlatesTotal[];
  recipes: PlanRecipeTotal[];
  days: PlanDay[];
  purchaseList: { lines: PurchaseLine[]; totalMinor: number; usedCostMinor: number };
  schedule: PrepSchedule;
}

const MAX_RANGE_DAYS = 366;

interface Demand {
  recipeId: string;
  grams: number;
  use: RunUse;
  orderIds: string[];
  /** Set for a sub-recipe ask: the run that asks. */
  parent?: ProductionRun;
}

function parseOrder(input: PrepOrderInput): PrepOrder {
  const parsed = prepOrderSchema.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const id = typeof input?.id === 'string' ? input.id : '(no id)';
    const field = issue?.path.join('.') ?? '';
    throw new PrepInputError(
      `Order ${id}${field ? ` (${field})` : ''}: ${issue?.message ?? 'not valid.'}`,
    );
  }
  return parsed.data;
}

function assertRange(from: string, to: string): void {
  for (const [what, d] of [
    ['first', from],
    ['last', to],
  ] as const) {
    if (!isCalendarDate(d)) {
      throw new PrepInputError(`The ${what} day of the plan must be a date written YYYY-MM-DD.`);
    }
  }
  const days = calendarDayNumber(to) - calendarDayNumber(from) + 1;
  if (days < 1) throw new PrepInputError('The plan’s last day is before its first day.');
  if (days > MAX_RANGE_DAYS) {
    throw new PrepInputError(`Plan at most ${MAX_RANGE_DAYS} days at a time.`);
  }
}

/** Plates for `guests` with `sparePercent` more, rounded up to a whole plate. */
export function platesWithSpare(guests: number, sparePercent: number): number {
  if (!Number.isInteger(guests) || guests < 0) {
    throw new PrepInputError(`The number of guests must be a whole number; got ${guests}.`);
  }
  if (!(sparePercent >= 0 && sparePercent <= 100)) {
    throw new PrepInputError(`The spare percentage must be 0–100; got ${sparePercent}.`);
  }
  return piecesCovering(guests * (100 + sparePercent), 100);
}

/** Batches that fit `capacity`: ceil(grams ÷ capacity), at least 1; one when there is no capacity. */
export function batchesFor(grams: number, capacityG: number | undefined): number {
  if (capacityG === undefined) return 1;
  return Math.max(1, piecesCovering(grams, capacityG));
}

/** The least whole number of packs with packs × packGrams ≥ neededGrams. */
export function packsCovering(neededGrams: number, packGrams: number): number {
  if (!(packGrams > 0)) throw new PrepInputError('A pack must hold more than 0 g.');
  if (!(neededGrams > 0)) return 0;
  let packs = piecesCovering(neededGrams, packGrams);
  while (packs * packGrams < neededGrams) packs += 1;
  while (packs > 1 && (packs - 1) * packGrams >= neededGrams) packs -= 1;
  return packs;
}

/** Recipes reachable from `ids` with every user before the recipes it uses. */
function recipesParentsFirst(index: KitchenIndex, ids: Iterable<string>): Recipe[] {
  const state = new Map<string, 'open' | 'done'>();
  const stack: Recipe[] = [];
  const postOrder: Recipe[] = [];
  const visit = (recipe: Recipe) => {
    state.set(recipe.id, 'open');
    stack.push(recipe);
    for (const line of recipe.lines) {
      if (line.kind !== 'recipe') continue;
      const sub = index.recipe(line.recipeId, recipe.name);
      const s = state.get(sub.id);
      if (s === 'open') {
        const loop = [...stack.slice(stack.findIndex((r) => r.id === sub.id)), sub];
        throw new RecipeCycleError(
          loop.map((r) => r.name),
          loop.map((r) => r.id),
        );
      }
      if (s === undefined) visit(sub);
    }
    stack.pop();
    state.set(recipe.id, 'done');
    postOrder.push(recipe);
  };
  for (const id of ids) {
    const recipe = index.recipe(id);
    if (!state.has(recipe.id)) visit(recipe);
  }
  return postOrder.reverse();
}

const byNeed = (a: Demand, b: Demand) =>
  a.use.neededBy - b.use.neededBy ||
  a.use.usedAt - b.use.usedAt ||
  (a.orderIds[0] ?? '').localeCompare(b.orderIds[0] ?? '');

/** Plan the confirmed orders whose event date falls in [from, to]. */
export function planPrep(
  index: KitchenIndex,
  orderInputs: readonly PrepOrderInput[],
  options: PrepPlanOptions,
): PrepPlan {
  assertRange(options.from, options.to);
  const settings = parsePrepSettings(options.settings);
  const sparePercent = options.sparePercent ?? 0;
  platesWithSpare(0, sparePercent); // validates the percentage
  const calendar = new WorkingCalendar(settings);
  const buffer = settings.platingBufferMinutes;

  const all = orderInputs.map(parseOrder);
  const seen = new Set<string>();
  for (const o of all) {
    if (seen.has(o.id)) throw new PrepInputError(`Order ${o.id} is listed twice.`);
    seen.add(o.id);
  }
  const inRange = (o: PrepOrder) => o.eventDate >= options.from && o.eventDate <= options.to;
  const orders = all.filter(inRange);
  const skippedOrderIds = all.filter((o) => !inRange(o)).map((o) => o.id);

  // ---- 1–2. plates and grams per component, per order
  const demandsByRecipe = new Map<string, Demand[]>();
  const addDemand = (d: Demand) => {
    const list = demandsByRecipe.get(d.recipeId);
    if (list) list.push(d);
    else demandsByRecipe.set(d.recipeId, [d]);
  };
  const plannedOrders: PlannedOrder[] = [];
  const platesByDessert = new Map<string, DessertPlatesTotal>();

  for (const order of orders) {
    const menu = index.menu(order.menuId);
    const serviceAt = zonedToInstant(order.eventDate, order.serviceTime, order.timeZone);
    const changesByDessert = new Map<string, Map<string, { changes: Substitution[]; n: number }>>();
    const guestsSeen = new Set<string>();
    for (const change of order.guestChanges) {
      if (!menu.dessertIds.includes(change.dessertId)) {
        throw new PrepInputError(
          `Order ${order.id}: ${change.guest}’s plate changes dessert ${change.dessertId}, which is not on the menu “${menu.name}”.`,
        );
      }
      const key = `${change.dessertId}\u0000${change.guest.toLowerCase()}`;
      if (guestsSeen.has(key)) {
        throw new PrepInputError(
          `Order ${order.id}: ${change.guest} has two changed plates of the same dessert; put the changes in one.`,
        );
      }
      guestsSeen.add(key);
      const groups = changesByDessert.get(change.dessertId) ?? new Map();
      const sig = JSON.stringify(
        change.changes.map((c) => [c.componentRecipeId, c.replacementRecipeId ?? null]),
      );
      const g = groups.get(sig) ?? { changes: change.changes, n: 0 };
      g.n += 1;
      groups.set(sig, g);
      changesByDessert.set(change.dessertId, groups);
    }

    const grams = new Map<string, number>();
    const add = (recipeId: string, g: number) =>
      grams.set(recipeId, (grams.get(recipeId) ?? 0) + g);
    const dessertsPlanned: PlannedDessertPlates[] = [];
    for (const dessertId of menu.dessertIds) {
      const dessert = index.dessert(dessertId, menu.name);
      const plates = platesWithSpare(order.guestCount, sparePercent);
      const groups = [...(changesByDessert.get(dessertId)?.values() ?? [])];
      const changed = groups.reduce((s, g) => s + g.n, 0);
      if (changed > order.guestCount) {
        throw new PrepInputError(
          `Order ${order.id}: ${changed} guests have a changed “${dessert.name}”, more than the ${order.guestCount} guests booked.`,
        );
      }
      const standard = plates - changed;
      for (const c of dessert.components) {
        add(c.recipeId, componentGramsPerPlate(index, dessert, c) * standard);
      }
      for (const g of groups) {
        let plate;
        try {
          plate = applySubstitutions(index, dessert, g.changes);
        } catch (e) {
          if (isKitchenError(e)) throw new PrepInputError(`Order ${order.id}: ${e.message}`);
          throw e;
        }
        for (const c of plate.components) {
          add(c.recipeId, componentGramsPerPlate(index, plate, c) * g.n);
        }
      }
      dessertsPlanned.push({
        dessertId,
        dessertName: dessert.name,
        plates,
        sparePlates: plates - order.guestCount,
        changedPlates: changed,
      });
      const total = platesByDessert.get(dessertId) ?? {
        dessertId,
        dessertName: dessert.name,
        plates: 0,
        orderIds: [],
      };
      total.plates += plates;
      if (total.orderIds[total.orderIds.length - 1] !== order.id) total.orderIds.push(order.id);
      platesByDessert.set(dessertId, total);
    }

    for (const [recipeId, g] of grams) {
      if (!(g > 0)) continue;
      addDemand({
        recipeId,
        grams: g,
        orderIds: [order.id],
        use: {
          neededBy: serviceAt - buffer,
          usedAt: serviceAt,
          orderId: order.id,
          orderName: order.reference ?? order.id,
          serviceTimeZone: order.timeZone,
        },
      });
    }
    plannedOrders.push({
      orderId: order.id,
      menuId: menu.id,
      menuName: menu.name,
      eventDate: order.eventDate,
      serviceTime: order.serviceTime,
      timeZone: order.timeZone,
      serviceAt: toZonedIso(serviceAt, order.timeZone),
      guestCount: order.guestCount,
      desserts: dessertsPlanned,
    });
  }

  // ---- 3–5. runs, recipe by recipe from the plate down
  const runs: ProductionRun[] = [];
  const timings = new Map<string, RunTiming>();
  const runGrams = new Map<string, number>();
  const runTrees = new Map<string, ExpandedRecipe>();
  const parentNames = new Map<string, Set<string>>();

  for (const recipe of recipesParentsFirst(index, demandsByRecipe.keys())) {
    const demands = (demandsByRecipe.get(recipe.id) ?? []).sort(byNeed);
    if (demands.length === 0) continue;
    const keeps = shelfLifeMinutes(recipe);
    const groups: Array<{ demands: Demand[]; finish: number }> = [];
    for (const d of demands) {
      const open = groups[groups.length - 1];
      if (open && d.use.usedAt <= open.finish + keeps) {
        open.demands.push(d);
      } else {
        groups.push({
          demands: [d],
          finish: timeRecipeBackward(recipe, d.use.neededBy, 1, calendar).finish,
        });
      }
    }

    groups.forEach((group, gi) => {
      const grams = group.demands.reduce((s, d) => s + d.grams, 0);
      const run: ProductionRun = {
        runId: `${recipe.id}#${gi + 1}`,
        recipe,
        batches: batchesFor(grams, recipe.equipment?.batchCapacityG),
        orderIds: [...new Set(group.demands.flatMap((d) => d.orderIds))].sort(),
        uses: group.demands.map((d) => d.use),
        subRunIds: [],
      };
      const names = new Set<string>();
      for (const d of group.demands) {
        if (d.parent) {
          d.parent.subRunIds.push(run.runId);
          names.add(d.parent.recipe.name);
        }
      }
      parentNames.set(run.runId, names);
      const timing = timeRun(run, calendar);
      const tree = expandRecipe(index, recipe.id, grams);
      runs.push(run);
      timings.set(run.runId, timing);
      runGrams.set(run.runId, grams);
      runTrees.set(run.runId, tree);

      const subGrams = new Map<string, number>();
      for (const line of tree.lines) {
        if (line.kind !== 'recipe') continue;
        subGrams.set(
          line.node.recipe.id,
          (subGrams.get(line.node.recipe.id) ?? 0) + line.node.grams,
        );
      }
      for (const [subId, g] of subGrams) {
        addDemand({
          recipeId: subId,
          grams: g,
          orderIds: run.orderIds,
          parent: run,
          use: {
            neededBy: timing.latest.start,
            usedAt: timing.latest.start,
            parentRunId: run.runId,
          },
        });
      }
    });
  }

  const schedule = scheduleRuns(runs, settings, {
    timings,
    ...(options.now !== undefined ? { now: options.now } : {}),
    ...(options.leadTimeFrom !== undefined ? { leadTimeFrom: options.leadTimeFrom } : {}),
  });
  const runSchedules = new Map(schedule.runs.map((r) => [r.runId, r]));

  // ---- plan rows per production day, totals per recipe
  const dayRows = new Map<string, PlanRecipeRow[]>();
  const recipeTotals = new Map<string, PlanRecipeTotal & { exact: number }>();
  for (const run of runs) {
    const s = runSchedules.get(run.runId)!;
    const exact = runGrams.get(run.runId)!;
    const perBatch = exact / run.batches;
    const capacity = run.recipe.equipment?.batchCapacityG;
    let gramsPerBatch = roundKitchenGrams(perBatch);
    // Never show a batch above the capacity because of rounding up.
    if (capacity !== undefined && gramsPerBatch > capacity) {
      gramsPerBatch = perBatch >= 100 ? Math.floor(perBatch) : Math.floor(perBatch * 10) / 10;
    }
    const row: PlanRecipeRow = {
      runId: run.runId,
      recipeId: run.recipe.id,
      recipeName: run.recipe.name,
      storage: run.recipe.storage,
      exactGrams: tidy(exact),
      grams: roundKitchenGrams(exact),
      batches: run.batches,
      exactGramsPerBatch: tidy(perBatch),
      gramsPerBatch,
      ...(run.recipe.equipment ? { equipment: { ...run.recipe.equipment } } : {}),
      orderIds: [...run.orderIds],
      forRecipes: [...(parentNames.get(run.runId) ?? [])].sort(),
      usesRunIds: [...run.subRunIds],
      onPlates: run.uses.some((u) => u.orderId !== undefined),
      startAt: s.startAt,
      finishAt: s.finishAt,
      expiresAt: s.expiresAt,
    };
    const rows = dayRows.get(s.productionDate) ?? [];
    rows.push(row);
    dayRows.set(s.productionDate, rows);

    const total = recipeTotals.get(run.recipe.id) ?? {
      recipeId: run.recipe.id,
      recipeName: run.recipe.name,
      exactGrams: 0,
      grams: 0,
      runs: 0,
      batches: 0,
      exact: 0,
    };
    total.exact += exact;
    total.runs += 1;
    total.batches += run.batches;
    recipeTotals.set(run.recipe.id, total);
  }
  const days: PlanDay[] = [...dayRows.entries()]
    .sort(([a], [b]) => a.localeCompare(b))
    .map(([date, rows]) => ({
      date,
      // By instant: two ISO strings on either side of a clock change do not sort as text.
      recipes: rows.sort(
        (a, b) =>
          Date.parse(a.startAt) - Date.parse(b.startAt) ||
          a.recipeName.localeCompare(b.recipeName) ||
          a.runId.localeCompare(b.runId),
      ),
    }));

  // ---- purchase list: each run's own ingredient lines
  const shallowTrees = [...runTrees.values()].map((tree) => ({
    ...tree,
    lines: tree.lines.filter((l) => l.kind === 'ingredient'),
  }));
  const lines: PurchaseLine[] = totalIngredients(shallowTrees).map((t) => {
    const ingredient = index.ingredient(t.ingredientId);
    const packGrams = ingredientPackGrams(ingredient);
    const neededGrams = t.counted ? t.grams : t.exactGrams;
    const packs = packsCovering(neededGrams, packGrams);
    return {
      ingredientId: t.ingredientId,
      name: t.name,
      exactGrams: t.exactGrams,
      neededGrams,
      grams: t.grams,
      ...(t.counted
        ? { counted: { countUnit: t.counted.countUnit, pieces: t.counted.pieces } }
        : {}),
      packSize: ingredient.purchase.packSize,
      packUnit: ingredient.purchase.packUnit,
      packGrams: tidy(packGrams),
      packs,
      packPriceMinor: ingredient.purchase.packPriceMinor,
      totalMinor: packs * ingredient.purchase.packPriceMinor,
      usedCostMinor: roundMinorUnits(neededGrams * ingredientCostPerGramExact(ingredient)),
    };
  });

  return {
    range: { from: options.from, to: options.to },
    currency: index.currency,
    sparePercent,
    orders: plannedOrders,
    skippedOrderIds,
    plates: [...platesByDessert.values()],
    recipes: [...recipeTotals.values()].map(({ exact, ...t }) => ({
      ...t,
      exactGrams: tidy(exact),
      grams: roundKitchenGrams(exact),
    })),
    days,
    purchaseList: {
      lines,
      totalMinor: lines.reduce((s, l) => s + l.totalMinor, 0),
      usedCostMinor: lines.reduce((s, l) => s + l.usedCostMinor, 0),
    },
    schedule,
  };
}

/**
 * The lead-time conflicts of one order planned on its own: what the chef sees before confirming
 * it (checked from `now`), or, once it is confirmed, from the moment it was (`confirmedAt`).
 */
export function checkOrderLeadTime(
  index: KitchenIndex,
  order: PrepOrderInput,
  settings: PrepSettingsInput,
  now: string,
  confirmedAt?: string,
): PrepConflict[] {
  const parsed = parseOrder(order);
  return planPrep(index, [parsed], {
    from: parsed.eventDate,
    to: parsed.eventDate,
    settings,
    now,
    ...(confirmedAt !== undefined ? { leadTimeFrom: { [parsed.id]: confirmedAt } } : {}),
  }).schedule.conflicts;
}
