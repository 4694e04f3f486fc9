import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import {
  addIsoDays,
  dateInTimeZone,
  daysBetween,
  isIsoDate,
  OrderStatus,
  planPrep,
  recipeIngredientLabel,
  Role,
  type PrepDaySchedule,
  type PrepPlan,
  type PrepPlanView,
  type ScheduledTask,
} from '@nappe/shared';
import { Between, DataSource, In, type EntityManager } from 'typeorm';
import { prepOrderOf } from '../allergy-notes/order-allergy-notes.js';
import { OrderSubstitutionEntity } from '../allergy-notes/entities/order-substitution.entity.js';
import type { Principal } from '../auth/principal.js';
import { Clock } from '../common/clock.js';
import {
  computeView,
  KitchenCatalogueService,
} from '../kitchen/catalogue/kitchen-catalogue.service.js';
import { OrderGuestEntity } from '../orders/entities/order-guest.entity.js';
import { OrderEntity } from '../orders/entities/order.entity.js';
import { confirmationTimes } from '../orders/order-records.js';
import { OrderGuestSummaryEntity } from '../privacy/entities/order-guest-summary.entity.js';
import { keptPlateChanges } from '../privacy/guest-retention.js';
import { loadStudio } from '../studio/booking-settings.js';
import { PrepTaskTickEntity } from './entities/prep-task-tick.entity.js';
import { dateOfTaskKey, prepTaskKeys } from './prep-task-key.js';
import type { ComponentLabel } from './prep.types.js';

/** How far ahead of a production day the schedule looks for events it prepares. */
export const SCHEDULE_HORIZON_DAYS = 21;
export const PLAN_MAX_DAYS = 92;

function badDate(what: string): BadRequestException {
  return new BadRequestException(`Write ${what} as a real date, like 2026-06-21.`);
}

/** Removes what a plan costs: the chef's figures only. */
function withoutCosts(plan: PrepPlan): Omit<PrepPlanView, 'costsShown'> {
  return {
    ...plan,
    purchaseList: {
      lines: plan.purchaseList.lines.map(
        ({ packPriceMinor: _p, totalMinor: _t, usedCostMinor: _u, ...line }) => line,
      ),
    },
  };
}

/**
 * Prep plan, schedule, ticks and labels over the `confirmed` orders, through the shared
 * `planPrep` (shelf-life sharing, batches, packs, the schedule). Substituted plates count as the
 * recipes they really use; the studio's spare % is added to every dessert.
 */
@Injectable()
export class PrepService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly catalogue: KitchenCatalogueService,
    private readonly clock: Clock,
  ) {}

  /**
   * The plan for [from, to]. With `now`, lead times are checked too: each confirmed order from
   * the moment it was confirmed (work under way since then is not flagged again).
   */
  private async compute(m: EntityManager, from: string, to: string, now?: Date): Promise<PrepPlan> {
    const studio = await loadStudio(m);
    const { index } = await this.catalogue.load(m);
    const orders = await m.find(OrderEntity, {
      where: { status: OrderStatus.Confirmed, eventDate: Between(from, to) },
      order: { eventDate: 'ASC', serviceTime: 'ASC' },
    });
    const ids = orders.map((o) => o.id);
    const guests = ids.length
      ? await m.find(OrderGuestEntity, { where: { orderId: In(ids) } })
      : [];
    const subs = ids.length
      ? await m.find(OrderSubstitutionEntity, { where: { orderId: In(ids) } })
      : [];
    // Past events whose guest details were removed still count their changed plates.
    const kept = ids.length
      ? await m.find(OrderGuestSummaryEntity, { where: { orderId: In(ids) } })
      : [];
    const inputs = orders.map((o) => {
      const input = prepOrderOf(
        o,
        studio.settings.timeZone,
        guests.filter((g) => g.orderId === o.id),
        subs.filter((s) => s.orderId === o.id),
      );
      const keptChanges = keptPlateChanges(kept.find((k) => k.orderId === o.id));
      return keptChanges.length === 0
        ? input
        : { ...input, guestChanges: [...(input.guestChanges ?? []), ...keptChanges] };
    });
    const leadTime = now
      ? { now: now.toISOString(), leadTimeFrom: await confirmationTimes(m, ids) }
      : {};
    return computeView(() =>
      planPrep(index, inputs, {
        from,
        to,
        settings: { studioTimeZone: studio.settings.timeZone },
        sparePercent: studio.settings.sparePercent,
        ...leadTime,
      }),
    );
  }

  private async today(): Promise<string> {
    const studio = await this.dataSource.transaction((m) => loadStudio(m));
    return dateInTimeZone(this.clock.now(), studio.settings.timeZone);
  }

  /** The plan for [from, to] (default: today and the six days after, in the studio's zone). */
  async plan(principal: Principal, from?: string, to?: string): Promise<PrepPlanView> {
    const start = from ?? (await this.today());
    if (!isIsoDate(start)) throw badDate('“from”');
    const end = to ?? addIsoDays(start, 6);
    if (!isIsoDate(end)) throw badDate('“to”');
    const days = daysBetween(start, end) + 1;
    if (days < 1) throw new BadRequestException('“to” must be on or after “from”.');
    if (days > PLAN_MAX_DAYS) {
      throw new BadRequestException(`Plan at most ${PLAN_MAX_DAYS} days at a time.`);
    }
    const plan = await this.dataSource.transaction((m) => this.compute(m, start, end));
    const costsShown = principal.role === Role.Chef;
    return { ...(costsShown ? plan : withoutCosts(plan)), costsShown };
  }

  /**
   * The production day `date`: its tasks in order, with ticks, conflicts and warnings. Lead-time
   * conflicts are checked against now; the studio's today lists every one still open, since a
   * component confirmed too late may have had to start on a day already past.
   */
  async schedule(date?: string): Promise<PrepDaySchedule> {
    const now = this.clock.now();
    const today = await this.today();
    const day = date ?? today;
    if (!isIsoDate(day)) throw badDate('the date');
    return this.dataSource.transaction(async (m) => {
      const plan = await this.compute(m, day, addIsoDays(day, SCHEDULE_HORIZON_DAYS), now);
      const found = plan.schedule.days.find((d) => d.date === day);
      const tasks = found?.tasks ?? [];
      const keys = prepTaskKeys(day, tasks);
      const ticks = keys.length
        ? await m.find(PrepTaskTickEntity, { where: { taskKey: In(keys) } })
        : [];
      const tickOf = new Map(ticks.map((t) => [t.taskKey, t]));
      const runIds = new Set(tasks.map((t) => t.runId));
      return {
        date: day,
        timeZone: plan.schedule.timeZone,
        activeMinutes: found?.activeMinutes ?? 0,
        tasks: tasks.map((task, i): ScheduledTask => {
          const taskKey = keys[i]!;
          const tick = tickOf.get(taskKey);
          return {
            ...task,
            taskKey,
            done: tick
              ? {
                  by: tick.doneByName,
                  at: new Date(tick.doneAt).toISOString(),
                  batches: tick.batches ?? task.batches,
                }
              : null,
          };
        }),
        conflicts: plan.schedule.conflicts.filter(
          (c) => runIds.has(c.runId) || (c.kind === 'lead_time' && day === today),
        ),
        warnings: plan.schedule.warnings.filter((w) =>
          tasks.some((t) => t.recipeId === w.recipeId),
        ),
      };
    });
  }

  private async taskOf(taskKey: string): Promise<ScheduledTask> {
    const date = dateOfTaskKey(taskKey);
    if (!date || !isIsoDate(date))
      throw new NotFoundException('There is no prep task with that key.');
    const day = await this.schedule(date);
    const task = day.tasks.find((t) => t.taskKey === taskKey);
    if (!task) throw new NotFoundException('There is no prep task with that key on today’s plan.');
    return task;
  }

  async tick(principal: Principal, taskKey: string): Promise<ScheduledTask> {
    const task = await this.taskOf(taskKey);
    const at = this.clock.now();
    await this.dataSource.transaction(async (m) => {
      await m.delete(PrepTaskTickEntity, { taskKey });
      await m.insert(PrepTaskTickEntity, {
        taskKey,
        productionDate: dateOfTaskKey(taskKey)!,
        recipeId: task.recipeId,
        stepIndex: task.stepIndex,
        batches: task.batches,
        doneBy: principal.id,
        doneByName: principal.name,
        doneAt: at,
      });
    });
    return { ...task, done: { by: principal.name, at: at.toISOString(), batches: task.batches } };
  }

  async untick(taskKey: string): Promise<ScheduledTask> {
    const task = await this.taskOf(taskKey);
    await this.dataSource.transaction((m) => m.delete(PrepTaskTickEntity, { taskKey }));
    return { ...task, done: null };
  }

  /** One label per component made on `date`: name, made on, use by, storage, allergens. */
  async labels(date?: string): Promise<{ date: string; labels: ComponentLabel[] }> {
    const day = date ?? (await this.today());
    if (!isIsoDate(day)) throw badDate('the date');
    return this.dataSource.transaction(async (m) => {
      const plan = await this.compute(m, day, addIsoDays(day, SCHEDULE_HORIZON_DAYS));
      const { index } = await this.catalogue.load(m);
      const rows = new Map(plan.days.flatMap((d) => d.recipes).map((r) => [r.runId, r]));
      const labels = plan.schedule.runs
        .filter((run) => run.productionDate === day)
        .map((run): ComponentLabel => {
          const label = computeView(() => recipeIngredientLabel(index, run.recipeId));
          return {
            recipeId: run.recipeId,
            recipeName: run.recipeName,
            madeOn: run.finishAt,
            useBy: run.expiresAt,
            storage: run.storage,
            ...(run.storageCaution ? { storageCaution: run.storageCaution } : {}),
            grams: rows.get(run.runId)?.grams ?? 0,
            segments: label.segments,
            mayContain: label.mayContain,
          };
        });
      return { date: day, labels };
    });
  }
}
