import { Box, Button, Card, Heading, HStack, Link, Stack, Text } from '@chakra-ui/react';
import { Link as RouterLink } from 'react-router';
import { Photo } from '../../../components/ui/photo';
import { paths } from '../../../config/paths';
import type { PublicMenu } from '../api/types';
import { cardPhoto } from './card-photo';
import { AllergenSummaryLine } from './allergen-declaration';
import { DietaryFlags } from './dietary-flags';
import { MenuFacts } from './menu-facts';

/** A menu in the list: its photo first, then what it is, what it costs and what it contains. */
export function MenuCard({ menu, priority = false }: { menu: PublicMenu; priority?: boolean }) {
  const photo = cardPhoto(menu);
  const headingId = `menu-${menu.id}-name`;
  return (
    <Card.Root
      as="article"
      aria-labelledby={headingId}
      variant="outline"
      bg="bg.panel"
      borderColor="border"
      overflow="hidden"
      boxShadow="card"
    >
      <Photo photo={photo} alt="" priority={priority} />
      <Card.Body gap="4" p={{ base: '5', md: '6' }}>
        <Stack gap="1.5">
          <Heading as="h2" id={headingId} fontSize="2xl" fontWeight="normal">
            <Link asChild color="fg" _hover={{ textDecoration: 'underline' }}>
              <RouterLink to={paths.menu.getHref(menu.id)}>{menu.name}</RouterLink>
            </Link>
          </Heading>
          <Text color="fg.muted" textStyle="sm">
            {menu.desserts.map((d) => d.name).join(' · ')}
          </Text>
        </Stack>
        {menu.description && <Text lineClamp={3}>{menu.description}</Text>}
        <MenuFacts menu={menu} size="sm" />
        <AllergenSummaryLine allergens={menu.allergens} />
        <DietaryFlags dietary={menu.dietary} label={`Dietary facts of ${menu.name}`} />
      </Card.Body>
      <Card.Footer gap="3" px={{ base: '5', md: '6' }} pb={{ base: '5', md: '6' }} pt="0">
        <HStack gap="3" wrap="wrap">
          <Button asChild colorPalette="accent">
            <RouterLink to={paths.book.getHref(menu.id)}>
              Book this menu
              <Box as="span" srOnly>
                : {menu.name}
              </Box>
            </RouterLink>
          </Button>
          <Button asChild variant="outline">
            <RouterLink to={paths.dates.getHref({ menuId: menu.id })}>
              See dates{' '}
              <Box as="span" srOnly>
                for {menu.name}
              </Box>
            </RouterLink>
          </Button>
        </HStack>
      </Card.Footer>
    </Card.Root>
  );
}
