import type { PrepConflict, PrepPlan, PrepTask, PrepWarning, LabelSegment } from '@nappe/shared';

/** The plan as sent: cost fields are the chef's only (removed for staff). */
export type PrepPlanView = PrepPlan & { costsShown: boolean };

export interface ScheduledTask extends PrepTask {
  /** Stable across re-plans: production date, recipe, step, batch part and run of the day. */
  taskKey: string;
  /** Who ticked it, when, and for how many batches (fewer than `batches` if orders joined since). */
  done: { by: string; at: string; batches: number } | null;
}

export interface PrepDaySchedule {
  date: string;
  timeZone: string;
  activeMinutes: number;
  tasks: ScheduledTask[];
  conflicts: PrepConflict[];
  warnings: PrepWarning[];
}

export interface ComponentLabel {
  recipeId: string;
  recipeName: string;
  madeOn: string;
  useBy: string;
  storage: string;
  storageCaution?: string;
  grams: number;
  segments: LabelSegment[];
  mayContain: string[];
}
