import type { PrepConflict, PrepTask, PrepWarning } from '../prep-schedule/prep-schedule.js';
import type { PrepPlan, PurchaseLine } from './prep-plan.js';

/**
 * The prep API's answers: the server builds them (from `planPrep`), the admin shows them. Dates
 * are ISO `YYYY-MM-DD`, instants ISO 8601 date-times (zoned ones in the studio's zone), money
 * integer minor units in the plan's `currency`.
 *
 * Routes (all under /api; chef and staff):
 *   GET    /prep/plan?from&to              → PrepPlanView (costs for the chef only)
 *   GET    /prep/plan.csv?from&to          → text/csv     (the same plan)
 *   GET    /prep/plan.pdf?from&to          → application/pdf
 *   GET    /prep/schedule?date             → PrepDaySchedule
 *   POST   /prep/tasks/:taskKey/done       → ScheduledTask (ticked)
 *   DELETE /prep/tasks/:taskKey/done       → ScheduledTask (unticked)
 *   GET    /prep/labels.pdf?date           → application/pdf
 */

type CostFields = 'packPriceMinor' | 'totalMinor' | 'usedCostMinor';

/** A purchase line as sent: the cost fields are the chef's only (absent for staff). */
export type PurchaseLineView = Omit<PurchaseLine, CostFields> &
  Partial<Pick<PurchaseLine, CostFields>>;

/** `GET /prep/plan`: the plan as sent, without its cost figures for staff. */
export interface PrepPlanView extends Omit<PrepPlan, 'purchaseList'> {
  purchaseList: { lines: PurchaseLineView[]; totalMinor?: number; usedCostMinor?: number };
  /** True for the chef: the purchase list carries prices and totals. */
  costsShown: boolean;
}

/** Who ticked a task done, when (an ISO instant), and for how many batches. */
export interface TaskTick {
  by: string;
  at: string;
  /** The task's batches when ticked: fewer than now if orders joined the batch since. */
  batches: number;
}

export interface ScheduledTask extends PrepTask {
  /**
   * Stable across re-plans (production date, recipe, step, batch part and run of the day): the
   * path segment of the tick endpoints.
   */
  taskKey: string;
  done: TaskTick | null;
}

/** `GET /prep/schedule?date=`: one production day. */
export interface PrepDaySchedule {
  date: string;
  timeZone: string;
  activeMinutes: number;
  tasks: ScheduledTask[];
  conflicts: PrepConflict[];
  warnings: PrepWarning[];
}
