import { Alert, Box } from '@chakra-ui/react';
import type { QueryClient } from '@tanstack/react-query';
import { redirect, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { CalendarIcon } from '../../../components/ui/icons';
import { LoadError } from '../../../components/ui/load-error';
import { paths } from '../../../config/paths';
import {
  planQuery,
  prepPlanQueryOptions,
  usePrepPlan,
} from '../../../features/prep/api/get-prep-plan';
import type { DateRange } from '../../../features/prep/api/types';
import { DownloadButton } from '../../../components/ui/download-button';
import { PlanView } from '../../../features/prep/components/plan-view';
import {
  PrepEmpty,
  PrepPageHeader,
  PrepSkeleton,
} from '../../../features/prep/components/prep-states';
import { RangeForm } from '../../../features/prep/components/range-form';
import { defaultPlanRange, rangeFromParams } from '../../../features/prep/lib/dates';
import { longDate } from '../../../features/prep/lib/format';
import { warm } from '../kitchen/kitchen-shell';
import { loaderToday, WithPrepViewer, type PrepViewer } from './prep-shell';

/** Without dates in the URL, the plan opens on the next 7 days, written into the URL. */
export const prepPlanLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const inUrl = rangeFromParams(new URL(request.url).searchParams);
    if (inUrl.kind === 'missing') {
      return redirect(paths.prepPlan.getHref(defaultPlanRange(await loaderToday(queryClient))));
    }
    if (inUrl.kind === 'ok') warm(queryClient, prepPlanQueryOptions(inUrl.range));
    return null;
  };

export function PrepPlanRoute() {
  return <WithPrepViewer title="Prep plan">{(viewer) => <Plan viewer={viewer} />}</WithPrepViewer>;
}

function Plan({ viewer }: { viewer: PrepViewer }) {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const inUrl = rangeFromParams(params);
  const range: DateRange | null =
    inUrl.kind === 'ok'
      ? inUrl.range
      : inUrl.kind === 'missing'
        ? defaultPlanRange(viewer.today)
        : null;
  const plan = usePrepPlan(range);
  const shown = inUrl.kind === 'invalid' ? { from: inUrl.from, to: inUrl.to } : range!;
  const hasEvents = !!plan.data && plan.data.orders.length > 0;

  const downloads = range && hasEvents && (
    <>
      <DownloadButton
        path={`/prep/plan.pdf?${planQuery(range)}`}
        fallbackName={`prep-sheet-${range.from}-${range.to}.pdf`}
      >
        Prep sheet (PDF)
      </DownloadButton>
      <DownloadButton
        path={`/prep/plan.csv?${planQuery(range)}`}
        fallbackName={`prep-plan-${range.from}-${range.to}.csv`}
      >
        Purchase list (CSV)
      </DownloadButton>
    </>
  );

  return (
    <>
      <PrepPageHeader
        eyebrow="Prep · Plan"
        title="Plan"
        description={
          range
            ? `Confirmed events from ${longDate(range.from)} to ${longDate(range.to)}: plates, what to make each day, and what to buy.`
            : 'Confirmed events of a date range: plates, what to make each day, and what to buy.'
        }
        actions={downloads}
      />
      <RangeForm
        key={`${shown.from}|${shown.to}`}
        initial={shown}
        today={viewer.today}
        busy={plan.isFetching}
        onSubmit={(next) => navigate(paths.prepPlan.getHref(next))}
      />
      {inUrl.kind === 'invalid' ? (
        <Alert.Root status="error" role="alert" borderRadius="l2">
          <Alert.Indicator />
          <Alert.Content>
            <Alert.Title>These dates cannot be planned</Alert.Title>
            <Alert.Description>{inUrl.problem} Pick the dates again above.</Alert.Description>
          </Alert.Content>
        </Alert.Root>
      ) : plan.isPending ? (
        <PrepSkeleton label="Working out the plan…" />
      ) : plan.isError ? (
        <LoadError
          title="The plan could not be worked out"
          error={plan.error}
          onRetry={() => void plan.refetch()}
          retrying={plan.isFetching}
        />
      ) : !hasEvents ? (
        <PrepEmpty icon={<CalendarIcon />} title="No confirmed events in these dates">
          Only confirmed events are planned. Choose a wider range
          {viewer.chef ? ', or confirm the requests waiting in Orders.' : '.'}
        </PrepEmpty>
      ) : (
        <Box
          opacity={plan.isPlaceholderData ? 0.6 : 1}
          aria-busy={plan.isPlaceholderData || undefined}
          transition="opacity 0.2s"
        >
          <PlanView plan={plan.data} />
        </Box>
      )}
    </>
  );
}
