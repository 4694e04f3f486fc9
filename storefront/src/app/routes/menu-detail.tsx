import { Box, Button, Container, Grid, Heading, HStack, Stack, Text } from '@chakra-ui/react';
import { Link as RouterLink, useParams } from 'react-router';
import { ArrowLeftIcon } from '../../components/ui/booking-icons';
import { PageTitle } from '../../components/ui/page-title';
import { Photo } from '../../components/ui/photo';
import { LoadError } from '../../components/ui/query-state';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { useMenu } from '../../features/menus/api/get-menu';
import { AllergenDeclaration } from '../../features/menus/components/allergen-declaration';
import { DessertSection } from '../../features/menus/components/dessert-section';
import { DietaryFlags } from '../../features/menus/components/dietary-flags';
import { MenuFacts } from '../../features/menus/components/menu-facts';
import { MenuDetailSkeleton } from '../../features/menus/components/menu-skeletons';

export function MenuDetailRoute() {
  const { menuId = '' } = useParams();
  const menu = useMenu(menuId);

  return (
    <Container maxW="6xl" py={{ base: '6', md: '10' }}>
      <TextLink
        to={paths.menus.getHref()}
        textStyle="sm"
        display="inline-flex"
        alignItems="center"
        gap="1.5"
      >
        <ArrowLeftIcon boxSize="4" /> All menus
      </TextLink>
      {menu.isPending ? (
        <Box mt="6">
          <PageTitle>Menu</PageTitle>
          <MenuDetailSkeleton />
        </Box>
      ) : menu.isError ? (
        <Box mt="6">
          <PageTitle>Menu</PageTitle>
          <LoadError
            title="This menu could not be loaded"
            error={menu.error}
            onRetry={() => void menu.refetch()}
            retrying={menu.isFetching}
          />
        </Box>
      ) : (
        <>
          <PageTitle>{menu.data.name}</PageTitle>
          <Grid
            mt="6"
            templateColumns={{ base: '1fr', lg: '7fr 5fr' }}
            gap={{ base: '6', lg: '10' }}
            alignItems="start"
          >
            <Photo
              photo={menu.data.photos[0] ?? menu.data.desserts[0]?.photos[0]}
              alt={`${menu.data.name}, as plated`}
              priority
              borderRadius="l3"
              sizes="(min-width: 62em) 58vw, 100vw"
            />
            <Stack gap="5">
              <Heading
                as="h1"
                fontSize={{ base: '4xl', md: '5xl' }}
                fontWeight="normal"
                lineHeight="1.1"
              >
                {menu.data.name}
              </Heading>
              {menu.data.description && (
                <Text textStyle={{ base: 'md', md: 'lg' }} color="fg.muted">
                  {menu.data.description}
                </Text>
              )}
              <MenuFacts menu={menu.data} />
              <DietaryFlags
                dietary={menu.data.dietary}
                label={`Dietary facts of ${menu.data.name}`}
              />
              <HStack gap="3" wrap="wrap">
                <Button asChild size="lg" colorPalette="accent">
                  <RouterLink to={paths.book.getHref(menu.data.id)}>Book this menu</RouterLink>
                </Button>
                <Button asChild size="lg" variant="outline">
                  <RouterLink to={paths.dates.getHref({ menuId: menu.data.id })}>
                    See open dates
                  </RouterLink>
                </Button>
              </HStack>
            </Stack>
          </Grid>

          <Box
            as="section"
            aria-labelledby="menu-allergens"
            mt="12"
            p={{ base: '5', md: '6' }}
            bg="bg.panel"
            borderWidth="1px"
            borderColor="border"
            borderRadius="l3"
          >
            <Stack gap="4">
              <Stack gap="1">
                <Heading as="h2" id="menu-allergens" fontSize="2xl" fontWeight="normal">
                  Allergens in this menu
                </Heading>
                <Text color="fg.muted" textStyle="sm">
                  Everything any of its desserts contains or may contain. Tell us each guest’s
                  allergies when you book: the kitchen checks every component against them.
                </Text>
              </Stack>
              <AllergenDeclaration allergens={menu.data.allergens} idPrefix="menu" />
            </Stack>
          </Box>

          <Stack as="section" aria-labelledby="menu-desserts" mt="12" gap="8">
            <Heading
              as="h2"
              id="menu-desserts"
              fontSize={{ base: '3xl', md: '4xl' }}
              fontWeight="normal"
            >
              {menu.data.desserts.length === 1 ? 'The dessert' : 'The desserts'}
            </Heading>
            {menu.data.desserts.map((dessert, i) => (
              <DessertSection key={dessert.id} dessert={dessert} index={i} />
            ))}
          </Stack>

          <Stack
            mt="12"
            gap="3"
            align="start"
            p={{ base: '6', md: '8' }}
            bg="bg.inverted"
            color="fg.inverted"
            borderRadius="l3"
          >
            <Heading as="h2" fontSize="2xl" fontWeight="normal" color="fg.inverted">
              Book {menu.data.name}
            </Heading>
            <Text color="fg.inverted" opacity={0.85}>
              Choose a date, tell us about your guests, and see the full price before you pay.
            </Text>
            <Button asChild size="lg" colorPalette="accent">
              <RouterLink to={paths.book.getHref(menu.data.id)}>Book this menu</RouterLink>
            </Button>
          </Stack>
        </>
      )}
    </Container>
  );
}
