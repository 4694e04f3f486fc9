import { Alert, List, Stack, Text } from '@chakra-ui/react';
import {
  LOCAL_CODE_DEFERRAL,
  plural,
  type PrepConflict,
  type PrepDaySchedule,
  type PrepWarning,
} from '@nappe/shared';
import { CautionIcon } from '../../../components/ui/icons';
import { duration } from '../lib/format';
import { ClockIcon } from './prep-icons';
import { TaskCard } from './task-card';

export const CONFLICT_TITLES: Record<PrepConflict['kind'], string> = {
  lead_time: 'Not enough time',
  shelf_life: 'Will not keep until it is used',
  sequence: 'A sub-recipe is ready too late',
};

/** The run a conflict is about, to mark its tasks. */
const runOf = (c: PrepConflict) => c.runId;

/**
 * What cannot work on this day, in words, at the top where it cannot be missed: not enough
 * time before a service, a product that expires before it is used, a sub-recipe finished after
 * the recipe that needs it starts; then cooling steps longer than the food code allows.
 */
export function ConflictsPanel({
  conflicts,
  warnings,
}: {
  conflicts: readonly PrepConflict[];
  warnings: readonly PrepWarning[];
}) {
  if (conflicts.length === 0 && warnings.length === 0) return null;
  return (
    <Stack gap="3">
      {conflicts.length > 0 && (
        <Alert.Root status="error" role="alert" borderRadius="l3" alignItems="start">
          <Alert.Indicator>
            <ClockIcon />
          </Alert.Indicator>
          <Alert.Content gap="2">
            <Alert.Title textStyle="md">
              {conflicts.length === 1
                ? `1 conflict: ${CONFLICT_TITLES[conflicts[0]!.kind].toLowerCase()}`
                : `${conflicts.length} conflicts in this day’s prep`}
            </Alert.Title>
            <Alert.Description>
              <List.Root ps="4" gap="2">
                {conflicts.map((c, i) => (
                  <List.Item key={`${c.kind}-${runOf(c)}-${i}`}>
                    <Text as="span" fontWeight="semibold">
                      {CONFLICT_TITLES[c.kind]}.
                    </Text>{' '}
                    {c.message}
                  </List.Item>
                ))}
              </List.Root>
            </Alert.Description>
          </Alert.Content>
        </Alert.Root>
      )}
      {warnings.length > 0 && (
        <Alert.Root status="warning" borderRadius="l3" alignItems="start">
          <Alert.Indicator>
            <CautionIcon />
          </Alert.Indicator>
          <Alert.Content gap="2">
            <Alert.Title>Cooling takes too long</Alert.Title>
            <Alert.Description>
              <List.Root ps="4" gap="2">
                {warnings.map((w, i) => (
                  <List.Item key={`${w.recipeId}-${w.stepName}-${i}`}>{w.message}</List.Item>
                ))}
              </List.Root>
            </Alert.Description>
          </Alert.Content>
        </Alert.Root>
      )}
    </Stack>
  );
}

/** "8 tasks · 2 h 55 min hands-on · 3 done" for the day, read out as ticks change. */
export function DaySummary({ schedule }: { schedule: PrepDaySchedule }) {
  const done = schedule.tasks.filter((t) => t.done).length;
  return (
    <Text aria-live="polite" color="fg.muted" fontWeight="medium">
      {plural(schedule.tasks.length, 'task')} · {duration(schedule.activeMinutes)} hands-on · {done}{' '}
      of {schedule.tasks.length} done
    </Text>
  );
}

/** The deferral every caution ends with, said once under the list. */
export function SafetyFootnote() {
  return (
    <Text textStyle="sm" color="fg.muted">
      Cautions are {LOCAL_CODE_DEFERRAL.charAt(0).toLowerCase()}
      {LOCAL_CODE_DEFERRAL.slice(1)}
    </Text>
  );
}

/** The day's tasks in order, each with its tick and its cautions. */
export function TaskList({
  schedule,
  me,
  label,
}: {
  schedule: PrepDaySchedule;
  me: string;
  label: string;
}) {
  const conflictByRun = new Map<string, string>();
  for (const c of schedule.conflicts) {
    if (!conflictByRun.has(c.runId)) conflictByRun.set(c.runId, CONFLICT_TITLES[c.kind]);
  }
  return (
    <Stack gap="3">
      <Stack as="ol" gap="3" aria-label={label} ps="0" m="0">
        {schedule.tasks.map((task) => (
          <TaskCard
            key={task.taskKey}
            task={task}
            day={schedule.date}
            timeZone={schedule.timeZone}
            me={me}
            conflict={conflictByRun.get(task.runId)}
          />
        ))}
      </Stack>
      <SafetyFootnote />
    </Stack>
  );
}
