import { Alert, Box, Flex, Stack } from '@chakra-ui/react';
import type { QueryClient } from '@tanstack/react-query';
import { redirect, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { WhiskIcon } from '../../../components/ui/icons';
import { LoadError } from '../../../components/ui/load-error';
import { paths } from '../../../config/paths';
import {
  prepScheduleQueryOptions,
  usePrepSchedule,
} from '../../../features/prep/api/get-prep-schedule';
import { DayPicker } from '../../../features/prep/components/day-picker';
import {
  PrepEmpty,
  PrepPageHeader,
  PrepSkeleton,
} from '../../../features/prep/components/prep-states';
import { ConflictsPanel, DaySummary, TaskList } from '../../../features/prep/components/task-list';
import { dayFromParams } from '../../../features/prep/lib/dates';
import { longDate } from '../../../features/prep/lib/format';
import { warm } from '../kitchen/kitchen-shell';
import { loaderToday, WithPrepViewer, type PrepViewer } from './prep-shell';

/** Without a day in the URL, the schedule opens on today, written into the URL. */
export const prepScheduleLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const inUrl = dayFromParams(new URL(request.url).searchParams);
    if (inUrl.kind === 'missing') {
      return redirect(paths.prepSchedule.getHref(await loaderToday(queryClient)));
    }
    if (inUrl.kind === 'ok') warm(queryClient, prepScheduleQueryOptions(inUrl.date));
    return null;
  };

export function PrepScheduleRoute() {
  return (
    <WithPrepViewer title="Prep schedule">
      {(viewer) => <Schedule viewer={viewer} />}
    </WithPrepViewer>
  );
}

function Schedule({ viewer }: { viewer: PrepViewer }) {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const inUrl = dayFromParams(params);
  const date = inUrl.kind === 'ok' ? inUrl.date : inUrl.kind === 'missing' ? viewer.today : null;
  const schedule = usePrepSchedule(date);
  const go = (next: string) => navigate(paths.prepSchedule.getHref(next));

  return (
    <>
      <PrepPageHeader
        eyebrow="Prep · Schedule"
        title={date ? `Schedule: ${longDate(date)}` : 'Schedule'}
        description="The day’s tasks in order, worked back from every service time. Tick each one when it is done."
      />
      <Flex mb="6" gap="4" wrap="wrap" justify="space-between" align="end">
        <DayPicker label="Day" date={date ?? viewer.today} today={viewer.today} onChange={go} />
        {schedule.data && schedule.data.tasks.length > 0 && <DaySummary schedule={schedule.data} />}
      </Flex>
      {date === null ? (
        <Alert.Root status="error" role="alert" borderRadius="l2">
          <Alert.Indicator />
          <Alert.Content>
            <Alert.Title>That is not a date</Alert.Title>
            <Alert.Description>Pick the day again above.</Alert.Description>
          </Alert.Content>
        </Alert.Root>
      ) : schedule.isPending ? (
        <PrepSkeleton label="Loading the day’s tasks…" />
      ) : schedule.isError ? (
        <LoadError
          title="The schedule could not be loaded"
          error={schedule.error}
          onRetry={() => void schedule.refetch()}
          retrying={schedule.isFetching}
        />
      ) : (
        <Stack gap="5">
          <ConflictsPanel conflicts={schedule.data.conflicts} warnings={schedule.data.warnings} />
          {schedule.data.tasks.length === 0 ? (
            <PrepEmpty icon={<WhiskIcon />} title="Nothing to prep on this day">
              No confirmed event needs work started on {longDate(date)}. Try the next day.
            </PrepEmpty>
          ) : (
            <Box maxW="3xl">
              <TaskList
                schedule={schedule.data}
                me={viewer.user.name}
                label={`Tasks for ${longDate(date)}`}
              />
            </Box>
          )}
        </Stack>
      )}
    </>
  );
}
