import { createHash } from 'node:crypto';
import type { PrepTask } from '@nappe/shared';

/**
 * Keys for a production day's tasks that survive re-planning: the date, the recipe, the step,
 * the batch part of the step (a step split over days) and, when one recipe is made in several
 * runs that day, which of them (in the day's order). The orders a run serves and its batch count
 * are left out on purpose: confirming another order into the same batch keeps the tick, and the
 * schedule compares the batches ticked with the batches now needed. The date leads the key so a
 * tick can be checked against that day's schedule.
 */
export function prepTaskKeys(date: string, tasks: readonly PrepTask[]): string[] {
  const seen = new Map<string, number>();
  return tasks.map((task) => {
    const part = task.taskId.slice(task.taskId.lastIndexOf('/') + 1);
    const slot = [task.recipeId, task.stepIndex, part].join('|');
    const ordinal = (seen.get(slot) ?? 0) + 1;
    seen.set(slot, ordinal);
    const basis = [date, slot, ordinal].join('|');
    return `${date}-${createHash('sha256').update(basis).digest('hex').slice(0, 40)}`;
  });
}

export function dateOfTaskKey(key: string): string | null {
  const m = /^(\d{4}-\d{2}-\d{2})-[0-9a-f]{40}$/.exec(key);
  return m ? m[1]! : null;
}
