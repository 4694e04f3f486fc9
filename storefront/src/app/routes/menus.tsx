import {
  Button,
  Container,
  EmptyState,
  Heading,
  HStack,
  SimpleGrid,
  Stack,
  Text,
  VStack,
} from '@chakra-ui/react';
import { Link as RouterLink, useSearchParams } from 'react-router';
import { PlateIcon } from '../../components/ui/icons';
import { PageTitle } from '../../components/ui/page-title';
import { LoadError } from '../../components/ui/query-state';
import { paths } from '../../config/paths';
import { useMenus } from '../../features/menus/api/get-menus';
import { MenuCard } from '../../features/menus/components/menu-card';
import { MenuGridSkeleton } from '../../features/menus/components/menu-skeletons';
import { pageCount, pageFromSearch } from '../../lib/page';

export function MenusRoute() {
  const [searchParams] = useSearchParams();
  const page = pageFromSearch(searchParams.get('page'));
  const menus = useMenus(page);
  const pages = menus.data ? pageCount(menus.data) : 1;

  return (
    <>
      <PageTitle>Menus</PageTitle>
      <Container maxW="6xl" py={{ base: '10', md: '16' }}>
        <Stack gap="3" maxW="3xl">
          <Heading as="h1" fontSize={{ base: '4xl', md: '5xl' }} fontWeight="normal">
            Menus
          </Heading>
          <Text textStyle={{ base: 'md', md: 'lg' }} color="fg.muted">
            Every guest receives each dessert of the menu, plated. Prices are per guest; each menu
            says how many guests it serves and how far ahead it must be booked. Allergens are listed
            for every dessert, with what it contains kept apart from what it may contain.
          </Text>
        </Stack>

        <Stack mt="10" gap="8">
          {menus.isPending ? (
            <MenuGridSkeleton />
          ) : menus.isError ? (
            <LoadError
              title="The menus could not be loaded"
              error={menus.error}
              onRetry={() => void menus.refetch()}
              retrying={menus.isFetching}
            />
          ) : menus.data.items.length === 0 ? (
            <EmptyState.Root
              borderWidth="1px"
              borderStyle="dashed"
              borderColor="border.emphasized"
              borderRadius="l3"
              bg="bg.panel"
            >
              <EmptyState.Content>
                <EmptyState.Indicator color="caramel.fg">
                  <PlateIcon />
                </EmptyState.Indicator>
                <VStack textAlign="center" gap="2">
                  <EmptyState.Title fontFamily="heading" textStyle="2xl">
                    No menus to book just now
                  </EmptyState.Title>
                  <EmptyState.Description color="fg.muted" maxW="md">
                    The chef is preparing the next season’s menus. Come back soon, or read how
                    booking works in the meantime.
                  </EmptyState.Description>
                </VStack>
                <Button asChild variant="outline">
                  <RouterLink to={paths.howBookingWorks.getHref()}>How booking works</RouterLink>
                </Button>
              </EmptyState.Content>
            </EmptyState.Root>
          ) : (
            <>
              <SimpleGrid columns={{ base: 1, md: 2, lg: 3 }} gap="6">
                {menus.data.items.map((menu, i) => (
                  <MenuCard key={menu.id} menu={menu} priority={i === 0} />
                ))}
              </SimpleGrid>
              {pages > 1 && (
                <HStack as="nav" aria-label="Pages of menus" justify="space-between">
                  {page > 1 ? (
                    <Button asChild variant="outline">
                      <RouterLink to={paths.menus.getHref(page - 1)}>Previous page</RouterLink>
                    </Button>
                  ) : (
                    <span />
                  )}
                  <Text color="fg.muted" textStyle="sm">
                    Page {page} of {pages}
                  </Text>
                  {page < pages ? (
                    <Button asChild variant="outline">
                      <RouterLink to={paths.menus.getHref(page + 1)}>Next page</RouterLink>
                    </Button>
                  ) : (
                    <span />
                  )}
                </HStack>
              )}
            </>
          )}
        </Stack>
      </Container>
    </>
  );
}
