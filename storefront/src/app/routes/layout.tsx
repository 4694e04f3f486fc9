import {
  Box,
  Button,
  Container,
  Flex,
  HStack,
  Link,
  SkipNavLink,
  Stack,
  Text,
} from '@chakra-ui/react';
import { lazy, Suspense, useEffect, type ReactNode } from 'react';
import { Link as RouterLink, NavLink, Outlet, useLocation, useNavigation } from 'react-router';
import { Wordmark } from '../../components/ui/wordmark';
import { paths } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';
import { useStudio } from '../../features/studio/api/get-studio';

export const MAIN_ID = 'main-content';

// The bar along the top while the next screen loads: not needed to show the first one, so its
// code is fetched once the page has started (Layout's effect), before any click.
const loadNavigationProgress = async () => ({
  default: (await import('@nappe/web-kit/react/navigation-progress')).NavigationProgress,
});
const NavigationProgress = lazy(loadNavigationProgress);

function NavigationIndicator() {
  const navigation = useNavigation();
  if (navigation.state === 'idle') return null;
  return (
    <Suspense fallback={null}>
      <NavigationProgress />
    </Suspense>
  );
}

// Only someone signed in sees these (and their sign-out mutation): their code loads when needed.
const SignedInActions = lazy(async () => ({
  default: (await import('./signed-in-actions')).SignedInActions,
}));

/** Where the account controls go while we do not know yet who is there: same size, no jump. */
function AccountPlaceholder() {
  return <Box w="40" h="9" aria-hidden />;
}

export function Layout() {
  useEffect(() => {
    void loadNavigationProgress();
  }, []);
  return (
    <Flex direction="column" minH="100dvh">
      <SkipNavLink id={MAIN_ID} zIndex="skipNav">
        Skip to content
      </SkipNavLink>
      <NavigationIndicator />
      <Header />
      <Box as="main" id={MAIN_ID} tabIndex={-1} flex="1" outline="none">
        <Outlet />
      </Box>
      <Footer />
    </Flex>
  );
}

function NavItem({ to, end, children }: { to: string; end?: boolean; children: ReactNode }) {
  return (
    <Link
      asChild
      px={{ base: '1.5', sm: '3' }}
      py="2"
      borderRadius="l2"
      whiteSpace="nowrap"
      color="fg.muted"
      fontWeight="medium"
      textStyle="sm"
      _hover={{ color: 'fg', bg: 'bg.muted', textDecoration: 'none' }}
      _currentPage={{ color: 'fg', bg: 'accent.subtle' }}
    >
      <NavLink to={to} end={end}>
        {children}
      </NavLink>
    </Link>
  );
}

function Header() {
  return (
    <Box as="header" borderBottomWidth="1px" borderColor="border" bg="bg">
      <Container maxW="6xl" py={{ base: '3', md: '4' }}>
        <Flex align="center" gap="4" wrap="wrap">
          <Link asChild aria-label="Nappe, home" _hover={{ textDecoration: 'none' }}>
            <RouterLink to={paths.home.getHref()}>
              <Wordmark />
            </RouterLink>
          </Link>
          <Box
            as="nav"
            aria-label="Main"
            order={{ base: 3, md: 2 }}
            // Edge to edge on a phone, the first link's text in line with the wordmark.
            w={{ base: 'calc(100% + {spacing.3})', md: 'auto' }}
            mx={{ base: '-1.5', md: '0' }}
          >
            {/* On a phone the wordmark is the way home, so the other four links fit one row from
                360 px; narrower, they wrap rather than hide. */}
            <HStack
              as="ul"
              gap={{ base: '0', sm: '1' }}
              rowGap="1"
              wrap="wrap"
              listStyleType="none"
            >
              <Box as="li" display={{ base: 'none', sm: 'list-item' }}>
                <NavItem to={paths.home.getHref()} end>
                  Home
                </NavItem>
              </Box>
              <li>
                <NavItem to={paths.menus.getHref()}>Menus</NavItem>
              </li>
              <li>
                <NavItem to={paths.dates.getHref()}>Dates</NavItem>
              </li>
              <li>
                <NavItem to={paths.howBookingWorks.getHref()}>How booking works</NavItem>
              </li>
              <li>
                <NavItem to={paths.myEvents.getHref()}>My events</NavItem>
              </li>
            </HStack>
          </Box>
          <Box order={{ base: 2, md: 3 }} ms="auto">
            <AccountActions />
          </Box>
        </Flex>
      </Container>
    </Box>
  );
}

function AccountActions() {
  const me = useMe();
  const location = useLocation();

  if (me.isPending) return <AccountPlaceholder />;

  if (me.data) {
    return (
      <Suspense fallback={<AccountPlaceholder />}>
        <SignedInActions name={me.data.name} />
      </Suspense>
    );
  }

  // Coming back after signing in: to this page, unless this page is itself a sign-in page.
  const here = location.pathname + location.search;
  const onAuthPage =
    location.pathname === paths.signIn.path || location.pathname === paths.createAccount.path;
  const redirectTo = onAuthPage || location.pathname === paths.home.path ? null : here;

  return (
    <HStack gap="2">
      <Button asChild size="sm" variant="ghost">
        <RouterLink to={paths.signIn.getHref(redirectTo)}>Sign in</RouterLink>
      </Button>
      <Button asChild size="sm">
        <RouterLink to={paths.createAccount.getHref(redirectTo)}>Create account</RouterLink>
      </Button>
    </HStack>
  );
}

function Footer() {
  const studio = useStudio();
  const year = new Date().getFullYear();
  return (
    <Box as="footer" borderTopWidth="1px" borderColor="border" bg="bg.muted" mt="16">
      <Container maxW="6xl" py="10">
        <Stack direction={{ base: 'column', md: 'row' }} justify="space-between" gap="6">
          <Stack gap="2" maxW="md">
            <Wordmark />
            {studio.data ? (
              <Stack gap="0.5" textStyle="sm">
                <Text color="fg" fontWeight="medium">
                  {studio.data.name}, {studio.data.city}
                </Text>
                <Text color="fg.muted">{studio.data.tagline}</Text>
              </Stack>
            ) : (
              <Text color="fg.muted" textStyle="sm">
                Plated desserts for dinner parties, weddings, company dinners and private tastings.
              </Text>
            )}
          </Stack>
          <Stack as="nav" aria-label="Footer" gap="2" textStyle="sm">
            <Link asChild color="fg.muted">
              <RouterLink to={paths.menus.getHref()}>Menus</RouterLink>
            </Link>
            <Link asChild color="fg.muted">
              <RouterLink to={paths.dates.getHref()}>Dates</RouterLink>
            </Link>
            <Link asChild color="fg.muted">
              <RouterLink to={paths.howBookingWorks.getHref()}>How booking works</RouterLink>
            </Link>
            <Link asChild color="fg.muted">
              <RouterLink to={paths.myEvents.getHref()}>My events</RouterLink>
            </Link>
          </Stack>
        </Stack>
        <Text color="fg.muted" textStyle="xs" mt="8" maxW="3xl">
          © {year} {studio.data?.name ?? 'Nappe'}. Our kitchen works with all the major allergens,
          so a trace can never be ruled out completely: tell us about any severe allergy before you
          book.
        </Text>
      </Container>
    </Box>
  );
}
