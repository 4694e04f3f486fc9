import { createHash } from 'node:crypto';
import type { PrepTask } from '@nappe/shared';

/**
 * A key for a task that survives re-planning: the production date, the recipe, the step, the
 * batch part of the step (a step split over days), the batches and the orders it serves. The
 * date leads the key so a tick can be checked against that day's schedule.
 */
export function prepTaskKey(date: string, task: PrepTask): string {
  const part = task.taskId.slice(task.taskId.lastIndexOf('/') + 1);
  const basis = [
    date,
    task.recipeId,
    task.stepIndex,
    part,
    task.batches,
    [...task.orderIds].sort().join(','),
  ].join('|');
  return `${date}-${createHash('sha256').update(basis).digest('hex').slice(0, 40)}`;
}

export function dateOfTaskKey(key: string): string | null {
  const m = /^(\d{4}-\d{2}-\d{2})-[0-9a-f]{40}$/.exec(key);
  return m ? m[1]! : null;
}
