import type { IngredientLabel } from '@nappe/shared';

/**
 * The admin's own prep shapes. The JSON the prep API answers (PrepPlanView, PrepDaySchedule,
 * ScheduledTask…) is the shared contract: shared/src/prep-plan/prep-api.ts.
 */

/** A date range of event dates, both ends included, written YYYY-MM-DD. */
export interface DateRange {
  from: string;
  to: string;
}

/** The part of `GET /api/recipes/:id/allergens` a component label prints. */
export interface RecipeLabelView {
  subject: { kind: 'recipe'; id: string; name: string };
  label: IngredientLabel;
}
