import { Box, Button, Card, Container, Field, Grid, Heading, Stack, Text } from '@chakra-ui/react';
import type { QueryClient } from '@tanstack/react-query';
import { Link as RouterLink, useNavigate, useSearchParams } from 'react-router';
import { Select } from '../../components/ui/native-select';
import { PageTitle } from '../../components/ui/page-title';
import { LoadError } from '../../components/ui/query-state';
import { Skeleton } from '../../components/ui/skeleton';
import { paths } from '../../config/paths';
import { AvailabilityCalendar } from '../../features/booking/components/availability-calendar';
import { isIsoMonth, localToday, monthOf } from '../../features/booking/components/month';
import { menusQueryOptions, useMenus } from '../../features/menus/api/get-menus';
import { MenuFacts } from '../../features/menus/components/menu-facts';
import { warm } from '../loaders';
import { keepOnSearchChange } from '../screen-loader-parts';

/** Every menu fits one page here: a studio offers a handful. */
const MENUS_FOR_DATES = 100;

export const shouldRevalidate = keepOnSearchChange;

export const datesLoader = (queryClient: QueryClient) => async () => {
  await warm(queryClient, menusQueryOptions(1, MENUS_FOR_DATES));
  return null;
};

export function DatesRoute() {
  const [searchParams, setSearchParams] = useSearchParams();
  const navigate = useNavigate();
  const menus = useMenus(1, MENUS_FOR_DATES);
  const monthParam = searchParams.get('month');
  const month = isIsoMonth(monthParam) ? monthParam : monthOf(localToday());
  const items = menus.data?.items ?? [];
  const menu = items.find((m) => m.id === searchParams.get('menu')) ?? items[0];

  const update = (changes: Record<string, string>) =>
    setSearchParams(
      (current) => {
        const next = new URLSearchParams(current);
        for (const [key, value] of Object.entries(changes)) next.set(key, value);
        return next;
      },
      { replace: true, preventScrollReset: true },
    );

  return (
    <>
      <PageTitle>Dates</PageTitle>
      <Container maxW="6xl" py={{ base: '10', md: '16' }}>
        <Stack gap="3" maxW="3xl">
          <Heading as="h1" fontSize={{ base: '4xl', md: '5xl' }} fontWeight="normal">
            Dates
          </Heading>
          <Text textStyle={{ base: 'md', md: 'lg' }} color="fg.muted">
            The kitchen makes a set number of plates a day, and each menu needs some days’ notice.
            Pick a menu to see which dates are still open, then choose one to start booking.
          </Text>
        </Stack>

        {menus.isPending ? (
          <Stack mt="10" gap="4" role="status" aria-label="Loading the dates">
            <Skeleton h="10" maxW="sm" />
            <Skeleton h="80" />
          </Stack>
        ) : menus.isError ? (
          <Box mt="10">
            <LoadError
              title="The menus could not be loaded"
              error={menus.error}
              onRetry={() => void menus.refetch()}
              retrying={menus.isFetching}
            />
          </Box>
        ) : !menu ? (
          <Stack mt="10" gap="4" align="start">
            <Text>No menus are open for booking just now, so there are no dates to show.</Text>
            <Button asChild variant="outline">
              <RouterLink to={paths.howBookingWorks.getHref()}>How booking works</RouterLink>
            </Button>
          </Stack>
        ) : (
          <Grid
            mt="10"
            templateColumns={{ base: '1fr', lg: '4fr 7fr' }}
            gap={{ base: '8', lg: '12' }}
            alignItems="start"
          >
            <Stack gap="6">
              <Field.Root>
                <Field.Label>Menu</Field.Label>
                <Select value={menu.id} onChange={(e) => update({ menu: e.target.value })}>
                  {items.map((m) => (
                    <option key={m.id} value={m.id}>
                      {m.name}
                    </option>
                  ))}
                </Select>
                <Field.HelperText>Each menu has its own notice and party size.</Field.HelperText>
              </Field.Root>
              <Card.Root variant="outline" bg="bg.panel" borderColor="border">
                <Card.Body gap="4">
                  <Heading as="h2" fontSize="xl" fontWeight="normal">
                    {menu.name}
                  </Heading>
                  <MenuFacts menu={menu} size="sm" />
                  <Button asChild variant="outline" size="sm" alignSelf="start">
                    <RouterLink to={paths.menu.getHref(menu.id)}>See this menu</RouterLink>
                  </Button>
                </Card.Body>
              </Card.Root>
            </Stack>
            <Box
              as="section"
              aria-label={`Dates for ${menu.name}`}
              p={{ base: '3', md: '6' }}
              mx={{ base: '-3', md: '0' }}
              bg="bg.panel"
              borderWidth="1px"
              borderColor="border"
              borderRadius="l3"
            >
              <AvailabilityCalendar
                key={menu.id}
                menuId={menu.id}
                month={month}
                onMonthChange={(next) => update({ month: next, menu: menu.id })}
                selected={null}
                onSelect={(date) => void navigate(paths.book.getHref(menu.id, 'event', { date }))}
                openHint="Choose it to start booking"
              />
            </Box>
          </Grid>
        )}
      </Container>
    </>
  );
}
