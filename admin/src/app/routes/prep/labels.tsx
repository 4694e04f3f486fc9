import { Alert, Flex, SimpleGrid, Stack, Text } from '@chakra-ui/react';
import { addIsoDays, plural } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import { redirect, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { LoadError } from '../../../components/ui/load-error';
import { paths } from '../../../config/paths';
import { useRecipeLabels } from '../../../features/prep/api/get-label-texts';
import { prepPlanQueryOptions, usePrepPlan } from '../../../features/prep/api/get-prep-plan';
import type { DateRange } from '../../../features/prep/api/types';
import { DayPicker } from '../../../features/prep/components/day-picker';
import { DownloadButton } from '../../../components/ui/download-button';
import { LabelPreview } from '../../../features/prep/components/label-preview';
import { TagIcon } from '../../../features/prep/components/prep-icons';
import {
  PrepEmpty,
  PrepPageHeader,
  PrepSkeleton,
} from '../../../features/prep/components/prep-states';
import { dayFromParams } from '../../../features/prep/lib/dates';
import { longDate } from '../../../features/prep/lib/format';
import { warm } from '../kitchen/kitchen-shell';
import { loaderToday, WithPrepViewer, type PrepViewer } from './prep-shell';

/**
 * The components made on a day are the runs the planner starts that day, for events up to three
 * weeks ahead — the same window the labels PDF uses (api/src/prep/prep.service.ts).
 */
export const LABEL_HORIZON_DAYS = 21;
export const labelRange = (date: string): DateRange => ({
  from: date,
  to: addIsoDays(date, LABEL_HORIZON_DAYS),
});

export const prepLabelsLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const inUrl = dayFromParams(new URL(request.url).searchParams);
    if (inUrl.kind === 'missing') {
      return redirect(paths.prepLabels.getHref(await loaderToday(queryClient)));
    }
    if (inUrl.kind === 'ok') warm(queryClient, prepPlanQueryOptions(labelRange(inUrl.date)));
    return null;
  };

export function PrepLabelsRoute() {
  return (
    <WithPrepViewer title="Component labels">
      {(viewer) => <Labels viewer={viewer} />}
    </WithPrepViewer>
  );
}

function Labels({ viewer }: { viewer: PrepViewer }) {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const inUrl = dayFromParams(params);
  const date = inUrl.kind === 'ok' ? inUrl.date : inUrl.kind === 'missing' ? viewer.today : null;
  const plan = usePrepPlan(date ? labelRange(date) : null);
  const rows = (date && plan.data?.days.find((d) => d.date === date)?.recipes) || [];
  const texts = useRecipeLabels([...new Set(rows.map((r) => r.recipeId))]);

  return (
    <>
      <PrepPageHeader
        eyebrow="Prep · Labels"
        title="Component labels"
        description="One label for each component made on the day: recipe, made on, use by (from its shelf life), storage, and its ingredients with allergens in bold."
        actions={
          date &&
          rows.length > 0 && (
            <DownloadButton
              path={`/prep/labels.pdf?${new URLSearchParams({ date })}`}
              fallbackName={`component-labels-${date}.pdf`}
            >
              Component labels (PDF)
            </DownloadButton>
          )
        }
      />
      <Flex mb="6" gap="4" wrap="wrap" justify="space-between" align="end">
        <DayPicker
          label="Made on"
          date={date ?? viewer.today}
          today={viewer.today}
          onChange={(next) => navigate(paths.prepLabels.getHref(next))}
        />
        {rows.length > 0 && (
          <Text aria-live="polite" color="fg.muted" fontWeight="medium">
            {plural(rows.length, 'label')} to print
          </Text>
        )}
      </Flex>
      {date === null ? (
        <Alert.Root status="error" role="alert" borderRadius="l2">
          <Alert.Indicator />
          <Alert.Content>
            <Alert.Title>That is not a date</Alert.Title>
            <Alert.Description>Pick the day again above.</Alert.Description>
          </Alert.Content>
        </Alert.Root>
      ) : plan.isPending ? (
        <PrepSkeleton label="Finding what is made on this day…" />
      ) : plan.isError ? (
        <LoadError
          title="The components made on this day could not be found"
          error={plan.error}
          onRetry={() => void plan.refetch()}
          retrying={plan.isFetching}
        />
      ) : rows.length === 0 ? (
        <PrepEmpty icon={<TagIcon />} title="Nothing is made on this day">
          No component of a confirmed event is made on {longDate(date)}, so there are no labels to
          print.
        </PrepEmpty>
      ) : (
        <Stack gap="3">
          <Text textStyle="sm" color="fg.muted">
            As the PDF prints them. Times are the studio’s ({viewer.timeZone}).
          </Text>
          <SimpleGrid columns={{ base: 1, md: 2 }} gap="4">
            {rows.map((row) => {
              const text = texts.get(row.recipeId);
              return (
                <LabelPreview
                  key={row.runId}
                  row={row}
                  segments={text?.data?.label.segments}
                  state={text?.status ?? 'pending'}
                />
              );
            })}
          </SimpleGrid>
        </Stack>
      )}
    </>
  );
}
