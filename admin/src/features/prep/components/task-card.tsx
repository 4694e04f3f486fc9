import {
  Alert,
  Badge,
  Box,
  Checkbox,
  Flex,
  HStack,
  Stack,
  Text,
  VisuallyHidden,
} from '@chakra-ui/react';
import { LOCAL_CODE_DEFERRAL, plural, type PrepTask, type ScheduledTask } from '@nappe/shared';
import { CautionIcon } from '../../../components/ui/icons';
import { useTickPrepTask } from '../api/tick-prep-task';
import { celsius, clockOf, duration, instantInZone, STEP_KIND_LABELS, when } from '../lib/format';
import { errorMessage } from '../../../lib/error-message';
import { ClockIcon, FrozenIcon } from './prep-icons';

/** A caution without the closing deferral to the local food code: the list states that once. */
export function cautionText(text: string): string {
  const trimmed = text.trim();
  return trimmed.endsWith(LOCAL_CODE_DEFERRAL)
    ? trimmed.slice(0, -LOCAL_CODE_DEFERRAL.length).trim()
    : trimmed;
}

function batchText(task: PrepTask): string {
  if (task.batches === task.totalBatches) return plural(task.batches, 'batch', 'batches');
  return `${task.batches} of ${task.totalBatches} batches (the rest on another day)`;
}

/** Hands-on time, the wait after it, the temperature, the batches. */
function workLine(task: PrepTask): string {
  const parts = [
    task.activeMinutes > 0 ? `Hands-on ${duration(task.activeMinutes)}` : 'No hands-on work',
    task.waitMinutes > 0
      ? `${task.activeMinutes > 0 ? 'then wait' : 'wait'} ${duration(task.waitMinutes)}`
      : null,
    task.temperatureC !== undefined ? celsius(task.temperatureC) : null,
    batchText(task),
  ];
  return parts.filter(Boolean).join(' · ');
}

/** The cautions on a task: the step's (hot sugar, custard, cooling…) and how to keep the product. */
export function TaskCautions({ task }: { task: PrepTask }) {
  if (!task.caution && !task.storageCaution) return null;
  return (
    <Stack gap="2">
      {task.caution && (
        <Alert.Root status="warning" size="sm" borderRadius="l2" alignItems="start">
          <Alert.Indicator>
            <CautionIcon />
          </Alert.Indicator>
          <Alert.Content>
            <Alert.Title>Safety</Alert.Title>
            <Alert.Description>{cautionText(task.caution)}</Alert.Description>
          </Alert.Content>
        </Alert.Root>
      )}
      {task.storageCaution && (
        <Alert.Root status="info" size="sm" borderRadius="l2" alignItems="start">
          <Alert.Indicator>
            <FrozenIcon />
          </Alert.Indicator>
          <Alert.Content>
            <Alert.Title>Storage</Alert.Title>
            <Alert.Description>{cautionText(task.storageCaution)}</Alert.Description>
          </Alert.Content>
        </Alert.Root>
      )}
    </Stack>
  );
}

/** What a task is and when: shared by the tick-able card and the read-only preview. */
function TaskBody({ task, day, conflict }: { task: PrepTask; day: string; conflict?: string }) {
  return (
    <Stack gap="1.5" minW="0" flex="1">
      <HStack gap="2" wrap="wrap">
        <Text fontWeight="semibold" fontVariantNumeric="tabular-nums" textStyle="lg">
          {clockOf(task.startAt)}
        </Text>
        <Badge variant="subtle" colorPalette="caramel">
          {STEP_KIND_LABELS[task.kind]}
        </Badge>
        <Text fontWeight="semibold">{task.recipeName}</Text>
      </HStack>
      <Text>{task.stepName}</Text>
      <Text textStyle="sm" color="fg.muted">
        {workLine(task)}
      </Text>
      <Text textStyle="sm" color="fg.muted">
        Latest start {when(task.latestStartAt, day)} · earliest {when(task.earliestStartAt, day)}{' '}
        (shelf life)
        {task.waitMinutes > 0 ? ` · ready ${when(task.readyAt, day)}` : ''} · for{' '}
        {plural(task.orderIds.length, 'event')}
      </Text>
      {conflict && (
        <HStack gap="1.5" color="fg.error" fontWeight="semibold" textStyle="sm">
          <ClockIcon aria-hidden />
          <Text>{conflict} — see the conflict above.</Text>
        </HStack>
      )}
      <TaskCautions task={task} />
    </Stack>
  );
}

/**
 * One task of the day's list with its tick: ticking shows at once in the signed-in person's name
 * and is saved; if saving fails, the tick goes back and the card says why.
 */
export function TaskCard({
  task,
  day,
  timeZone,
  me,
  conflict,
}: {
  task: ScheduledTask;
  day: string;
  timeZone: string;
  me: string;
  conflict?: string;
}) {
  const tick = useTickPrepTask(day, me);
  const done = task.done !== null;
  return (
    <Box
      as="li"
      listStyleType="none"
      borderWidth="1px"
      borderColor={conflict ? 'border.error' : done ? 'border.success' : 'border'}
      borderRadius="l3"
      bg={done ? 'bg.success' : 'bg.panel'}
      p={{ base: '3', md: '4' }}
    >
      <Stack gap="3">
        <TaskBody task={task} day={day} conflict={conflict} />
        <Flex
          gap="3"
          align="center"
          wrap="wrap"
          borderTopWidth="1px"
          borderColor={done ? 'border.success' : 'border'}
          pt="2"
        >
          <Checkbox.Root
            size="lg"
            checked={done}
            onCheckedChange={(e) =>
              tick.mutate({ taskKey: task.taskKey, done: e.checked === true })
            }
          >
            <Checkbox.HiddenInput />
            <Checkbox.Control />
            <Checkbox.Label fontWeight="semibold">
              {/* One name for every reader: browsers put a space before text that is laid out apart. */}
              <span aria-hidden>Done</span>
              <VisuallyHidden>
                Done: {task.stepName} ({task.recipeName}, {clockOf(task.startAt)})
              </VisuallyHidden>
            </Checkbox.Label>
          </Checkbox.Root>
          <Box aria-live="polite" textStyle="sm" flex="1" minW="12rem">
            {task.done && (
              <Text color="fg.success" fontWeight="medium">
                by {task.done.by} at {instantInZone(task.done.at, timeZone, day)}
                {tick.isPending && (
                  <Text as="span" color="fg.muted" fontWeight="normal">
                    {' '}
                    · saving…
                  </Text>
                )}
              </Text>
            )}
            {task.done && task.done.batches < task.batches && (
              <Text color="fg.warning" fontWeight="semibold">
                Ticked for {plural(task.done.batches, 'batch', 'batches')}; orders confirmed since
                need {task.batches}. Make{' '}
                {plural(task.batches - task.done.batches, 'more batch', 'more batches')}.
              </Text>
            )}
          </Box>
        </Flex>
        {tick.isError && (
          <Text role="alert" color="fg.error" fontWeight="semibold" textStyle="sm">
            {tick.variables.done ? 'The tick was not saved' : 'The tick was not cleared'}:{' '}
            {errorMessage(tick.error)} Try again.
          </Text>
        )}
      </Stack>
    </Box>
  );
}

/** A task shown but not ticked here (another day's, on Today). */
export function TaskPreview({ task, day }: { task: PrepTask; day: string }) {
  return (
    <Box
      as="li"
      listStyleType="none"
      borderWidth="1px"
      borderColor="border"
      borderRadius="l3"
      bg="bg.panel"
      p={{ base: '3', md: '4' }}
    >
      <VisuallyHidden>Not due today. </VisuallyHidden>
      <TaskBody task={task} day={day} />
    </Box>
  );
}
