import type { PrepDaySchedule, ScheduledTask, TaskTick } from '@nappe/shared';
import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { prepKeys } from './prep-keys';

/** `POST /api/prep/tasks/:taskKey/done` (tick) or `DELETE` (untick); answers with the task. */
export function setTaskDone(taskKey: string, done: boolean): Promise<ScheduledTask> {
  const path = `/prep/tasks/${encodeURIComponent(taskKey)}/done`;
  return done ? api.post<ScheduledTask>(path) : api.delete<ScheduledTask>(path);
}

export interface TickVariables {
  taskKey: string;
  done: boolean;
}

function patchTask(
  queryClient: QueryClient,
  date: string,
  taskKey: string,
  done: TaskTick | null,
): void {
  queryClient.setQueryData<PrepDaySchedule>(prepKeys.schedule(date), (day) =>
    day
      ? { ...day, tasks: day.tasks.map((t) => (t.taskKey === taskKey ? { ...t, done } : t)) }
      : day,
  );
}

/**
 * Ticks a task of `date` done (or clears it) at once on screen, in the name of `me`; on an error
 * only that task goes back to how it was (other ticks in flight keep theirs), and the error is
 * the mutation's for the task card to show.
 */
export function useTickPrepTask(date: string, me: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ taskKey, done }: TickVariables) => setTaskDone(taskKey, done),
    onMutate: async ({ taskKey, done }) => {
      await queryClient.cancelQueries({ queryKey: prepKeys.schedule(date) });
      const task = queryClient
        .getQueryData<PrepDaySchedule>(prepKeys.schedule(date))
        ?.tasks.find((t) => t.taskKey === taskKey);
      patchTask(
        queryClient,
        date,
        taskKey,
        done ? { by: me, at: new Date().toISOString(), batches: task?.batches ?? 1 } : null,
      );
      return { before: task?.done ?? null };
    },
    onError: (_error, { taskKey }, context) => {
      patchTask(queryClient, date, taskKey, context?.before ?? null);
    },
    onSuccess: (task, { taskKey }) => {
      patchTask(queryClient, date, taskKey, task.done);
    },
    onSettled: () => {
      // Refetch only when this is the last tick in flight, so an older answer does not undo a newer tick.
      if (queryClient.isMutating({ mutationKey: prepKeys.schedule(date) }) <= 1) {
        return queryClient.invalidateQueries({ queryKey: prepKeys.schedule(date) });
      }
      return undefined;
    },
    mutationKey: prepKeys.schedule(date),
  });
}
