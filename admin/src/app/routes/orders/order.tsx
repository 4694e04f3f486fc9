import { Box, Button, Container, Flex, Grid, Heading, Stack, Text } from '@chakra-ui/react';
import { dateInTimeZone, ORDER_STATUS_LABELS_FOR_CHEF, Role } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import { useRef, useState } from 'react';
import { Link as RouterLink, useParams, type LoaderFunctionArgs } from 'react-router';
import { BlockSkeleton } from '../../../components/ui/block-skeleton';
import { EmptyState } from '../../../components/ui/empty-state';
import { ChevronLeftIcon } from '../../../components/ui/icons';
import { PageTitle } from '../../../components/ui/page-title';
import { paths } from '../../../config/paths';
import { meQueryOptions, useMe } from '../../../features/auth/api/get-me';
import { RequireRole } from '../../../features/auth/components/require-role';
import { orderQueryOptions, useOrder } from '../../../features/orders/api/get-order';
import type { OrderDetailView } from '../../../features/orders/api/types';
import { useOrderAccessLog } from '../../../features/orders/api/get-order-access-log';
import { useOrderAllergySummary } from '../../../features/orders/api/get-order-allergy-summary';
import { OrderActions } from '../../../features/orders/components/order-actions';
import {
  AccessLogSection,
  ClientSection,
  EventSection,
  GuestsSection,
  PaymentsSection,
  TimelineSection,
} from '../../../features/orders/components/order-detail-sections';
import { OrderStatusBadge } from '../../../features/orders/components/order-status-badge';
import { useStudio } from '../../../features/studio/api/get-studio';
import { ApiError } from '../../../lib/api-client';
import { deviceTimeZone } from '../../../lib/studio-time';
import { InboxIcon } from '../../../components/ui/icons';
import { LoadError } from '../../../components/ui/load-error';

/** Starts loading the order while the screen's code arrives — for the chef only. */
export const orderLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const user = await queryClient.ensureQueryData(meQueryOptions());
    if (user?.role === Role.Chef && params.id) {
      void queryClient.ensureQueryData(orderQueryOptions(params.id)).catch(() => undefined);
    }
    return null;
  };

export function OrderRoute() {
  const me = useMe();
  const { id = '' } = useParams();
  if (!me.data) return null; // The layout renders only for a signed-in team member.
  return (
    <RequireRole user={me.data} roles={[Role.Chef]}>
      {/* A new order, a new page: an old result is not read out again. */}
      <Order key={id} id={id} />
    </RequireRole>
  );
}

function BackToOrders() {
  return (
    <Button asChild variant="ghost" size="sm" ms="-3" mb="4">
      <RouterLink to={paths.orders.getHref()}>
        <ChevronLeftIcon /> All orders
      </RouterLink>
    </Button>
  );
}

function Order({ id }: { id: string }) {
  const order = useOrder(id);
  const studio = useStudio();
  const timeZone = studio.data?.timeZone ?? deviceTimeZone();
  const removed = (order.data as OrderDetailView | undefined)?.guestDetailsRemoved ?? null;
  // Once the guests' details are removed there is nothing to check (the API answers 410).
  const allergy = useOrderAllergySummary(id, order.isSuccess && !removed);
  const accessLog = useOrderAccessLog(id);
  const [announcement, setAnnouncement] = useState('');
  const statusRef = useRef<HTMLDivElement>(null);

  const allergyNotesHref = paths.orderAllergyNotes.getHref(id);

  if (order.isPending) {
    return (
      <Frame title="Order">
        <BackToOrders />
        <BlockSkeleton label="Loading the order…" />
      </Frame>
    );
  }
  if (order.isError) {
    const missing = order.error instanceof ApiError && order.error.status === 404;
    return (
      <Frame title={missing ? 'Order not found' : 'Order'}>
        <BackToOrders />
        {missing ? (
          <EmptyState icon={<InboxIcon />} title="There is no such order">
            The link may be mistyped, or the order belongs to another studio. Find it from the list
            of orders.
          </EmptyState>
        ) : (
          <LoadError
            title="The order could not be loaded"
            error={order.error}
            onRetry={() => void order.refetch()}
            retrying={order.isFetching}
          />
        )}
      </Frame>
    );
  }

  const o = order.data;
  const today = dateInTimeZone(new Date(), timeZone);
  return (
    <Frame title={`Order ${o.reference}`}>
      <BackToOrders />
      <Flex
        direction={{ base: 'column', lg: 'row' }}
        justify="space-between"
        align={{ base: 'start', lg: 'end' }}
        gap="4"
        mb="6"
      >
        <Stack gap="2">
          <Text color="caramel.fg" fontWeight="semibold" textStyle="sm">
            Order · {o.menuName}
          </Text>
          <Heading as="h1" fontSize={{ base: '3xl', md: '4xl' }} fontWeight="normal">
            {o.reference}
          </Heading>
          <Flex gap="3" align="center" wrap="wrap">
            <OrderStatusBadge status={o.status} size="lg" />
            <Text color="fg.muted" textStyle="sm" maxW="xl">
              {ORDER_STATUS_LABELS_FOR_CHEF[o.status].description}
            </Text>
          </Flex>
        </Stack>
        <OrderActions
          order={o}
          allergy={allergy.data}
          allergyNotesHref={allergyNotesHref}
          today={today}
          onDone={(message) => {
            setAnnouncement(message);
            // After the dialog has handed focus back, so the message is where the reader is.
            setTimeout(() => statusRef.current?.focus(), 0);
          }}
        />
      </Flex>

      <Box
        ref={statusRef}
        tabIndex={-1}
        role="status"
        aria-live="polite"
        outline="none"
        mb={announcement ? '6' : '0'}
      >
        {announcement && (
          <Box
            borderWidth="1px"
            borderColor="accent.border"
            bg="accent.subtle"
            borderRadius="l2"
            px="4"
            py="3"
            fontWeight="medium"
          >
            {announcement}
          </Box>
        )}
      </Box>

      <Grid templateColumns={{ base: '1fr', lg: 'minmax(0, 2fr) minmax(0, 1fr)' }} gap="6">
        <Stack gap="6">
          <EventSection order={o} timeZone={timeZone} />
          <GuestsSection
            order={o}
            removed={removed}
            allergy={{ data: allergy.data, isPending: allergy.isPending, error: allergy.error }}
            allergyNotesHref={allergyNotesHref}
          />
          <PaymentsSection order={o} timeZone={timeZone} />
          <TimelineSection order={o} timeZone={timeZone} />
        </Stack>
        <Stack gap="6">
          <ClientSection order={o} />
          <AccessLogSection
            entries={accessLog.data}
            isPending={accessLog.isPending}
            error={accessLog.error}
            timeZone={timeZone}
          />
        </Stack>
      </Grid>
    </Frame>
  );
}

function Frame({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <>
      <PageTitle>{title}</PageTitle>
      <Container maxW="7xl" py={{ base: '6', md: '10' }} px={{ base: '4', md: '8' }}>
        {children}
      </Container>
    </>
  );
}
