import {
  Box,
  Button,
  CloseButton,
  Drawer,
  Flex,
  HStack,
  IconButton,
  Link,
  Portal,
  SkipNavLink,
  Stack,
  Text,
} from '@chakra-ui/react';
import type { AuthUser } from '@nappe/shared';
import { NavigationProgress, PageLoader } from '@nappe/web-kit/react';
import { useState } from 'react';
import { Navigate, NavLink, Outlet, useLocation } from 'react-router';
import { MenuIcon } from '../../components/ui/icons';
import { RoleBadge } from '../../components/ui/role-badge';
import { Wordmark } from '../../components/ui/wordmark';
import { paths } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';
import { useLogout } from '@nappe/web-kit/auth';
import { sectionsFor } from './navigation';

export const MAIN_ID = 'main-content';

/** The signed-in shell: a sidebar on wide screens, a top bar and a drawer on phones. */
export function Layout() {
  const me = useMe();
  const location = useLocation();
  if (me.isPending) return <PageLoader />;
  if (me.isError) throw me.error;
  if (me.data === null) {
    return <Navigate to={paths.signIn.getHref(location.pathname + location.search)} replace />;
  }
  const user = me.data;

  return (
    <Flex minH="100dvh" direction={{ base: 'column', md: 'row' }}>
      <SkipNavLink id={MAIN_ID} zIndex="skipNav">
        Skip to content
      </SkipNavLink>
      <NavigationProgress />
      <Box
        as="aside"
        aria-label="Kitchen app"
        display={{ base: 'none', md: 'flex' }}
        flexDirection="column"
        w="64"
        flexShrink="0"
        position="sticky"
        top="0"
        h="100dvh"
        borderEndWidth="1px"
        borderColor="border"
        bg="bg.muted"
        px="4"
        py="6"
      >
        <Brand />
        <Box flex="1" mt="8" overflowY="auto">
          <SideNav user={user} />
        </Box>
        <Account user={user} />
      </Box>
      <MobileBar user={user} />
      <Box as="main" id={MAIN_ID} tabIndex={-1} flex="1" minW="0" outline="none">
        <Outlet />
      </Box>
    </Flex>
  );
}

function Brand() {
  return (
    <HStack gap="2" align="baseline">
      <Wordmark />
      <Text textStyle="xs" color="fg.muted" letterSpacing="0.12em" textTransform="uppercase">
        Kitchen
      </Text>
    </HStack>
  );
}

function NavItem({
  to,
  label,
  onNavigate,
}: {
  to: string;
  label: string;
  onNavigate?: () => void;
}) {
  return (
    <Link
      asChild
      display="block"
      px="3"
      py="2"
      borderRadius="l2"
      color="fg.muted"
      fontWeight="medium"
      _hover={{ color: 'fg', bg: 'bg.emphasized', textDecoration: 'none' }}
      _currentPage={{ color: 'fg', bg: 'accent.subtle' }}
    >
      <NavLink to={to} end={to === paths.today.getHref()} onClick={onNavigate}>
        {label}
      </NavLink>
    </Link>
  );
}

function SideNav({ user, onNavigate }: { user: AuthUser; onNavigate?: () => void }) {
  return (
    <Box as="nav" aria-label="Sections">
      <Stack as="ul" gap="1" listStyleType="none">
        {sectionsFor(user.role).map((section) =>
          section.to ? (
            <li key={section.label}>
              <NavItem to={section.to} label={section.label} onNavigate={onNavigate} />
            </li>
          ) : (
            <li key={section.label}>
              <Text
                px="3"
                pt="4"
                pb="1"
                textStyle="xs"
                fontWeight="semibold"
                letterSpacing="0.12em"
                textTransform="uppercase"
                color="fg.muted"
                id={`nav-${section.label}`}
              >
                {section.label}
              </Text>
              <Stack as="ul" gap="1" listStyleType="none" aria-labelledby={`nav-${section.label}`}>
                {section.children?.map((child) => (
                  <li key={child.to}>
                    <NavItem to={child.to} label={child.label} onNavigate={onNavigate} />
                  </li>
                ))}
              </Stack>
            </li>
          ),
        )}
      </Stack>
    </Box>
  );
}

function Account({ user }: { user: AuthUser }) {
  const logout = useLogout();
  return (
    <Stack gap="3" borderTopWidth="1px" borderColor="border" pt="4">
      <Stack gap="1">
        <Text fontWeight="medium" truncate>
          {user.name}
        </Text>
        <HStack gap="2">
          <RoleBadge role={user.role} />
          <Text textStyle="xs" color="fg.muted" truncate>
            {user.email}
          </Text>
        </HStack>
      </Stack>
      <Button
        variant="outline"
        size="sm"
        loading={logout.isPending}
        loadingText="Signing out…"
        // The shell sees nobody signed in and moves to Sign in by itself.
        onClick={() => logout.mutate()}
      >
        Sign out
      </Button>
    </Stack>
  );
}

function MobileBar({ user }: { user: AuthUser }) {
  const [open, setOpen] = useState(false);
  return (
    <Flex
      as="header"
      display={{ base: 'flex', md: 'none' }}
      align="center"
      justify="space-between"
      px="4"
      py="3"
      borderBottomWidth="1px"
      borderColor="border"
      bg="bg.muted"
      position="sticky"
      top="0"
      zIndex="sticky"
    >
      <Brand />
      <Drawer.Root open={open} onOpenChange={(e) => setOpen(e.open)} placement="start" size="xs">
        <Drawer.Trigger asChild>
          <IconButton aria-label="Open menu" variant="ghost">
            <MenuIcon />
          </IconButton>
        </Drawer.Trigger>
        <Portal>
          <Drawer.Backdrop />
          <Drawer.Positioner>
            <Drawer.Content bg="bg.muted">
              <Drawer.Header>
                <Drawer.Title asChild>
                  <Box>
                    <Brand />
                  </Box>
                </Drawer.Title>
              </Drawer.Header>
              <Drawer.Body>
                <SideNav user={user} onNavigate={() => setOpen(false)} />
              </Drawer.Body>
              <Drawer.Footer display="block">
                <Account user={user} />
              </Drawer.Footer>
              <Drawer.CloseTrigger asChild>
                <CloseButton aria-label="Close menu" size="sm" />
              </Drawer.CloseTrigger>
            </Drawer.Content>
          </Drawer.Positioner>
        </Portal>
      </Drawer.Root>
    </Flex>
  );
}
