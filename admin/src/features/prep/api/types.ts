import type {
  DessertPlatesTotal,
  IngredientLabel,
  PlanDay,
  PlannedOrder,
  PlanRecipeTotal,
  PrepConflict,
  PrepSchedule,
  PrepTask,
  PrepWarning,
  PurchaseLine,
} from '@nappe/shared';

/** A date range of event dates, both ends included, written YYYY-MM-DD. */
export interface DateRange {
  from: string;
  to: string;
}

type CostFields = 'packPriceMinor' | 'totalMinor' | 'usedCostMinor';

/** A purchase line as sent: the cost fields are the chef's only (absent for staff). */
export type PurchaseLineView = Omit<PurchaseLine, CostFields> &
  Partial<Pick<PurchaseLine, CostFields>>;

/** `GET /api/prep/plan` (api/src/prep/prep.types.ts `PrepPlanView`). */
export interface PrepPlanView {
  range: DateRange;
  currency: string;
  sparePercent: number;
  orders: PlannedOrder[];
  skippedOrderIds: string[];
  plates: DessertPlatesTotal[];
  recipes: PlanRecipeTotal[];
  days: PlanDay[];
  purchaseList: { lines: PurchaseLineView[]; totalMinor?: number; usedCostMinor?: number };
  schedule: PrepSchedule;
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
  /** Stable across re-plans; the path segment of the tick endpoints. */
  taskKey: string;
  done: TaskTick | null;
}

/** `GET /api/prep/schedule?date=`: one production day. */
export interface PrepDaySchedule {
  date: string;
  timeZone: string;
  activeMinutes: number;
  tasks: ScheduledTask[];
  conflicts: PrepConflict[];
  warnings: PrepWarning[];
}

/** The part of `GET /api/recipes/:id/allergens` a component label prints. */
export interface RecipeLabelView {
  subject: { kind: 'recipe'; id: string; name: string };
  label: IngredientLabel;
}
