import {
  Box,
  Button,
  Container,
  Flex,
  Grid,
  Heading,
  HStack,
  Link,
  Skeleton,
  Stack,
  Text,
} from '@chakra-ui/react';
import {
  addIsoDays,
  plural,
  Role,
  type AuthUser,
  type PrepDay,
  type PrepPlanView,
} from '@nappe/shared';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router';
import { ChevronRightIcon, InboxIcon } from '../../components/ui/icons';
import { LoadError } from '../../components/ui/load-error';
import { PageTitle } from '../../components/ui/page-title';
import { RoleBadge } from '../../components/ui/role-badge';
import { paths } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';
import { useConfirmedEvents, useWaitingRequestCount } from '../../features/prep/api/get-day-events';
import { usePrepPlan } from '../../features/prep/api/get-prep-plan';
import { usePrepSchedule } from '../../features/prep/api/get-prep-schedule';
import { DayRecipes } from '../../features/prep/components/day-recipes';
import { EventList } from '../../features/prep/components/event-list';
import { PrepSection, PrepSkeleton } from '../../features/prep/components/prep-states';
import { TaskPreview } from '../../features/prep/components/task-card';
import {
  ConflictsPanel,
  DaySummary,
  SafetyFootnote,
  TaskList,
} from '../../features/prep/components/task-list';
import { studioToday } from '../../features/prep/lib/dates';
import { duration, longDate, shortDate } from '../../features/prep/lib/format';
import { useStudio } from '../../features/studio/api/get-studio';
import { deviceTimeZone, formatStudioDate, greeting } from '../../lib/studio-time';

/** Events shown after today's: the coming week, at most this many. */
const UPCOMING_DAYS = 7;
const UPCOMING_SHOWN = 5;
/** Tasks of the next prep day shown on Today before "and N more". */
const PREVIEW_TASKS = 3;
/** The planner looks this far ahead for what today's prep serves (as the schedule does). */
const PREP_HORIZON_DAYS = 21;

export function TodayRoute() {
  const me = useMe();
  const user = me.data;
  if (!user) return null; // The layout renders only for a signed-in team member.
  return <Today user={user} />;
}

function Today({ user }: { user: AuthUser }) {
  const studio = useStudio();
  const [now] = useState(() => new Date());
  const timeZone = studio.data?.timeZone ?? deviceTimeZone();
  const firstName = user.name.split(/\s+/)[0] ?? user.name;
  const chef = user.role === Role.Chef;

  return (
    <>
      <PageTitle>Today</PageTitle>
      <Container maxW="6xl" py={{ base: '5', md: '10' }} px={{ base: '4', md: '8' }}>
        <Stack gap="2">
          {studio.isPending ? (
            <Skeleton height="5" width="64" />
          ) : (
            <Text color="caramel.fg" fontWeight="semibold" textStyle="sm">
              {formatStudioDate(now, timeZone)}
              <Text as="span" color="fg.muted" fontWeight="normal">
                {studio.data
                  ? ` · studio time (${studio.data.timeZone})`
                  : ` · your device’s time zone; the studio’s could not be loaded`}
              </Text>
            </Text>
          )}
          <Heading as="h1" fontSize={{ base: '3xl', md: '4xl' }} fontWeight="normal">
            {greeting(now, timeZone)}, {firstName}
          </Heading>
          <HStack gap="2" wrap="wrap">
            <Text color="fg.muted">Signed in as</Text>
            <RoleBadge role={user.role} />
            {studio.data && <Text color="fg.muted">at {studio.data.name}</Text>}
          </HStack>
        </Stack>

        {studio.isPending ? (
          <Box mt="8">
            <PrepSkeleton label="Loading today…" />
          </Box>
        ) : (
          <TodayBody today={studioToday(timeZone, now)} user={user} chef={chef} />
        )}
      </Container>
    </>
  );
}

function TodayBody({ today, user, chef }: { today: string; user: AuthUser; chef: boolean }) {
  const plan = usePrepPlan({ from: today, to: addIsoDays(today, PREP_HORIZON_DAYS) });
  const schedule = usePrepSchedule(today);
  const nextDay =
    schedule.data && schedule.data.tasks.length === 0 && plan.data
      ? plan.data.schedule.days.find((d) => d.date > today && d.tasks.length > 0)
      : undefined;

  return (
    <Stack gap={{ base: '6', md: '8' }} mt={{ base: '6', md: '8' }}>
      {chef && <WaitingRequests />}
      <Grid
        gap={{ base: '8', lg: '10' }}
        templateColumns={{ base: 'minmax(0, 1fr)', lg: 'minmax(0, 3fr) minmax(0, 2fr)' }}
        templateAreas={{
          base: '"events" "tasks" "recipes"',
          lg: '"tasks events" "tasks recipes"',
        }}
        alignItems="start"
      >
        <Box gridArea="events" minW="0">
          <Services today={today} />
        </Box>
        <Box gridArea="tasks" minW="0">
          <PrepSection
            id="today-prep"
            title="Prep today"
            aside={
              <Link asChild textStyle="sm" fontWeight="medium">
                <RouterLink to={paths.prepSchedule.getHref(today)}>Open the schedule</RouterLink>
              </Link>
            }
          >
            {schedule.isPending ? (
              <PrepSkeleton label="Loading today’s tasks…" rows={3} />
            ) : schedule.isError ? (
              <LoadError
                title="Today’s tasks could not be loaded"
                error={schedule.error}
                onRetry={() => void schedule.refetch()}
                retrying={schedule.isFetching}
              />
            ) : schedule.data.tasks.length > 0 ? (
              <Stack gap="4">
                <DaySummary schedule={schedule.data} />
                <ConflictsPanel
                  conflicts={schedule.data.conflicts}
                  warnings={schedule.data.warnings}
                />
                <TaskList schedule={schedule.data} me={user.name} label="Today’s tasks" />
              </Stack>
            ) : (
              <NothingToday today={today} nextDay={nextDay} planLoading={plan.isPending} />
            )}
          </PrepSection>
        </Box>
        <Box gridArea="recipes" minW="0">
          <TodayRecipes
            today={today}
            taskRunIds={schedule.data?.tasks.map((t) => t.runId)}
            nextDay={nextDay}
            plan={plan}
          />
        </Box>
      </Grid>
    </Stack>
  );
}

/** The chef's line: how many booking requests wait for a decision. */
function WaitingRequests() {
  const count = useWaitingRequestCount(true);
  if (count.isPending) return <Skeleton height="12" borderRadius="l3" />;
  if (count.isError) return null; // Orders shows its own errors; Today stays useful without this.
  return (
    <Flex
      as="aside"
      aria-label="Requests"
      gap="3"
      align="center"
      wrap="wrap"
      borderWidth="1px"
      borderColor={count.data > 0 ? 'caramel.border' : 'border'}
      bg={count.data > 0 ? 'caramel.subtle' : 'bg.panel'}
      borderRadius="l3"
      px="4"
      py="3"
    >
      <InboxIcon aria-hidden boxSize="5" flexShrink="0" color="caramel.fg" />
      <Text fontWeight="medium" flex="1">
        {count.data > 0
          ? `${plural(count.data, 'request')} waiting for your decision`
          : 'No requests waiting for a decision.'}
      </Text>
      <Button asChild size="sm" variant={count.data > 0 ? 'solid' : 'ghost'}>
        <RouterLink to={paths.orders.getHref('status=requested')}>
          {count.data > 0 ? 'Review in Orders' : 'Orders'} <ChevronRightIcon />
        </RouterLink>
      </Button>
    </Flex>
  );
}

/** Today's confirmed events with their briefings; then the coming week's. */
function Services({ today }: { today: string }) {
  const events = useConfirmedEvents({ from: today, to: addIsoDays(today, UPCOMING_DAYS) });
  const todays = events.data?.filter((e) => e.eventDate === today) ?? [];
  const later = events.data?.filter((e) => e.eventDate > today) ?? [];
  const upcoming = later.slice(0, UPCOMING_SHOWN);
  return (
    <PrepSection id="today-services" title="Services today">
      {events.isPending ? (
        <PrepSkeleton label="Loading today’s events…" rows={2} />
      ) : events.isError ? (
        <LoadError
          title="The events could not be loaded"
          error={events.error}
          onRetry={() => void events.refetch()}
          retrying={events.isFetching}
        />
      ) : (
        <Stack gap="4">
          {todays.length > 0 ? (
            <EventList events={todays} label="Events today" />
          ) : (
            <Text color="fg.muted">No services today.</Text>
          )}
          {upcoming.length > 0 && (
            <Stack gap="2" as="section" aria-labelledby="today-upcoming">
              <Heading as="h3" size="sm" id="today-upcoming" color="fg.muted">
                Coming up
              </Heading>
              <EventList events={upcoming} showDate label="Events coming up" />
              {later.length > upcoming.length && (
                <Text textStyle="sm" color="fg.muted">
                  and {plural(later.length - upcoming.length, 'more event')} in the next{' '}
                  {UPCOMING_DAYS} days:{' '}
                  <Link asChild>
                    <RouterLink
                      to={paths.prepPlan.getHref({
                        from: today,
                        to: addIsoDays(today, UPCOMING_DAYS),
                      })}
                    >
                      see the Plan
                    </RouterLink>
                  </Link>
                </Text>
              )}
            </Stack>
          )}
        </Stack>
      )}
    </PrepSection>
  );
}

/** No task today: say so, and show what the next prep day holds. */
function NothingToday({
  today,
  nextDay,
  planLoading,
}: {
  today: string;
  nextDay: PrepDay | undefined;
  planLoading: boolean;
}) {
  return (
    <Stack gap="4">
      <Text fontWeight="medium">Nothing to prep today.</Text>
      {planLoading ? (
        <PrepSkeleton label="Looking for the next prep day…" rows={2} />
      ) : nextDay ? (
        <Stack gap="3" as="section" aria-labelledby="today-next-prep">
          <Heading as="h3" size="md" id="today-next-prep">
            Next prep day: {longDate(nextDay.date)}
          </Heading>
          <Text color="fg.muted">
            {plural(nextDay.tasks.length, 'task')} · {duration(nextDay.activeMinutes)} hands-on.
            Tick them on the day in the schedule.
          </Text>
          <Stack as="ol" gap="3" ps="0" m="0" aria-label={`Tasks for ${longDate(nextDay.date)}`}>
            {nextDay.tasks.slice(0, PREVIEW_TASKS).map((task) => (
              <TaskPreview key={task.taskId} task={task} day={nextDay.date} />
            ))}
          </Stack>
          <Button asChild variant="outline" alignSelf="start">
            <RouterLink to={paths.prepSchedule.getHref(nextDay.date)}>
              {nextDay.tasks.length > PREVIEW_TASKS
                ? `All ${nextDay.tasks.length} tasks for ${shortDate(nextDay.date)}`
                : `Schedule for ${shortDate(nextDay.date)}`}
              <ChevronRightIcon />
            </RouterLink>
          </Button>
          <SafetyFootnote />
        </Stack>
      ) : (
        <Text color="fg.muted">
          No confirmed event needs prep in the next {PREP_HORIZON_DAYS} days from {shortDate(today)}
          .
        </Text>
      )}
    </Stack>
  );
}

/** The recipes worked today (or on the next prep day), at their batches, with their cautions. */
function TodayRecipes({
  today,
  taskRunIds,
  nextDay,
  plan,
}: {
  today: string;
  taskRunIds: string[] | undefined;
  nextDay: PrepDay | undefined;
  plan: ReturnType<typeof usePrepPlan>;
}) {
  const runIds = new Set(
    taskRunIds && taskRunIds.length > 0 ? taskRunIds : (nextDay?.tasks.map((t) => t.runId) ?? []),
  );
  const day = taskRunIds && taskRunIds.length > 0 ? today : (nextDay?.date ?? today);
  const data: PrepPlanView | undefined = plan.data;
  const rows = data?.days.flatMap((d) => d.recipes).filter((r) => runIds.has(r.runId)) ?? [];
  return (
    <PrepSection
      id="today-recipes"
      title={day === today ? 'Recipes for today’s batches' : `Recipes for ${shortDate(day)}`}
    >
      {plan.isPending || taskRunIds === undefined ? (
        <PrepSkeleton label="Loading the recipes…" rows={2} />
      ) : plan.isError ? (
        <LoadError
          title="The recipes could not be loaded"
          error={plan.error}
          onRetry={() => void plan.refetch()}
          retrying={plan.isFetching}
        />
      ) : rows.length === 0 ? (
        <Text color="fg.muted">No recipe is worked today.</Text>
      ) : (
        <DayRecipes rows={rows} runs={data?.schedule.runs ?? []} day={day} />
      )}
    </PrepSection>
  );
}
