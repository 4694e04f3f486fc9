import { Button, Container, Heading, SimpleGrid, Stack, Text } from '@chakra-ui/react';
import { Role } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import { Link as RouterLink } from 'react-router';
import { BlockSkeleton } from '../../components/ui/block-skeleton';
import { EmptyState } from '../../components/ui/empty-state';
import { InboxIcon } from '../../components/ui/icons';
import { LoadError } from '../../components/ui/load-error';
import { PageTitle } from '../../components/ui/page-title';
import { paths } from '../../config/paths';
import { meQueryOptions, useMe } from '../../features/auth/api/get-me';
import { RequireRole } from '../../features/auth/components/require-role';
import { dashboardQueryOptions, useDashboard } from '../../features/insights/api/get-dashboard';
import {
  AlertsPanel,
  UpcomingEvents,
  WaitingRequests,
} from '../../features/insights/components/dashboard-panels';
import {
  FoodCostChart,
  PlatesChart,
  RevenueChart,
} from '../../features/insights/components/insights-charts';
import { formatDayLong } from '../../features/insights/lib/format';
import { isEmptyDashboard } from '../../features/insights/lib/summaries';

/** Starts the figures loading while the screen's code (and recharts) arrives — for the chef only. */
export const insightsLoader = (queryClient: QueryClient) => async () => {
  const user = await queryClient.ensureQueryData(meQueryOptions()).catch(() => null);
  if (user?.role === Role.Chef) {
    void queryClient.prefetchQuery(dashboardQueryOptions());
  }
  return null;
};

export function InsightsRoute() {
  const me = useMe();
  if (!me.data) return null; // The layout renders only for a signed-in team member.
  return (
    <RequireRole user={me.data} roles={[Role.Chef]}>
      <Insights />
    </RequireRole>
  );
}

function Insights() {
  const dashboard = useDashboard();
  const d = dashboard.data;
  return (
    <>
      <PageTitle>Insights</PageTitle>
      <Container maxW="7xl" py={{ base: '6', md: '10' }} px={{ base: '4', md: '8' }}>
        <Stack gap="2" mb={{ base: '6', md: '8' }}>
          <Text color="caramel.fg" fontWeight="semibold" textStyle="sm">
            Insights
          </Text>
          <Heading as="h1" fontSize={{ base: '3xl', md: '4xl' }} fontWeight="normal">
            The studio in figures
          </Heading>
          {d && (
            <Text color="fg.muted" maxW="2xl">
              {formatDayLong(d.today)}, studio time ({d.timeZone}). Money in {d.currency}.
            </Text>
          )}
        </Stack>

        {dashboard.isPending ? (
          <BlockSkeleton label="Loading the figures…" rows={8} />
        ) : dashboard.isError ? (
          <LoadError
            title="The figures could not be loaded"
            error={dashboard.error}
            onRetry={() => void dashboard.refetch()}
            retrying={dashboard.isFetching}
          />
        ) : isEmptyDashboard(dashboard.data) ? (
          <EmptyDashboard />
        ) : (
          <Stack gap={{ base: '5', md: '6' }}>
            <AlertsPanel alerts={dashboard.data.alerts} today={dashboard.data.today} />
            <SimpleGrid columns={{ base: 1, lg: 2 }} gap={{ base: '5', md: '6' }}>
              <UpcomingEvents events={dashboard.data.upcoming} today={dashboard.data.today} />
              <WaitingRequests
                requests={dashboard.data.requests}
                today={dashboard.data.today}
                timeZone={dashboard.data.timeZone}
              />
            </SimpleGrid>
            <SimpleGrid columns={{ base: 1, lg: 2 }} gap={{ base: '5', md: '6' }}>
              <RevenueChart
                months={dashboard.data.revenueByMonth}
                currency={dashboard.data.currency}
              />
              <PlatesChart weeks={dashboard.data.platesByWeek} today={dashboard.data.today} />
            </SimpleGrid>
            <FoodCostChart
              months={dashboard.data.foodCost.months}
              basis={dashboard.data.foodCost.basis}
              currency={dashboard.data.currency}
            />
          </Stack>
        )}
      </Container>
    </>
  );
}

function EmptyDashboard() {
  return (
    <EmptyState
      icon={<InboxIcon />}
      title="No bookings yet"
      titleAs="h2"
      descriptionMaxW="lg"
      action={
        <Button asChild variant="outline" size="sm">
          <RouterLink to={paths.menus.getHref()}>Check the menus clients can book</RouterLink>
        </Button>
      }
    >
      When clients book on the storefront, this page shows the next two weeks of events, the
      requests waiting for your decision, revenue by month, plates by week, food cost and anything
      that needs your attention.
    </EmptyState>
  );
}
