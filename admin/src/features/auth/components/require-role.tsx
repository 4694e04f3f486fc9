import { Button, Container, Heading, Stack, Text } from '@chakra-ui/react';
import type { AuthUser, Role } from '@nappe/shared';
import type { ReactNode } from 'react';
import { Link as RouterLink } from 'react-router';
import { PageTitle } from '../../../components/ui/page-title';
import { paths } from '../../../config/paths';
import { roleLabel } from '../../../components/ui/role-badge';

/** Shows its children to the given roles; anyone else gets a plain explanation, not a crash. */
export function RequireRole({
  user,
  roles,
  children,
}: {
  user: AuthUser;
  roles: readonly Role[];
  children: ReactNode;
}) {
  if (roles.includes(user.role)) return children;
  return (
    <>
      <PageTitle>Not available for your role</PageTitle>
      <Container maxW="2xl" py={{ base: '10', md: '16' }}>
        <Stack gap="4" align="start">
          <Heading as="h1" fontSize={{ base: '3xl', md: '4xl' }} fontWeight="normal">
            Not available for your role
          </Heading>
          <Text color="fg.muted" textStyle="lg">
            This part of the kitchen app is for the chef. You are signed in as{' '}
            {roleLabel(user.role).toLowerCase()}; if you need it, ask the chef.
          </Text>
          <Button asChild>
            <RouterLink to={paths.today.getHref()}>Back to Today</RouterLink>
          </Button>
        </Stack>
      </Container>
    </>
  );
}
