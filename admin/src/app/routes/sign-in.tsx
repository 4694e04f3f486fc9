import { Box, Card, Container, Flex, Heading, Link, Stack, Text } from '@chakra-ui/react';
import { Link as RouterLink, useNavigate, useSearchParams } from 'react-router';
import { PageTitle } from '../../components/ui/page-title';
import { Wordmark } from '../../components/ui/wordmark';
import { paths, safeRedirect } from '../../config/paths';
import { SignInForm } from '../../features/auth/components/sign-in-form';

export function SignInRoute() {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const redirectTo = safeRedirect(searchParams.get('redirectTo'));

  return (
    <Flex as="main" id="main-content" minH="100dvh" align="center" justify="center" bg="bg.muted">
      <PageTitle>Sign in</PageTitle>
      <Container maxW="md" py={{ base: '8', md: '16' }} px={{ base: '4', md: '6' }}>
        <Stack gap="6">
          <Box alignSelf="center">
            <Wordmark size="lg" />
          </Box>
          <Card.Root variant="outline" bg="bg.panel" borderColor="border" boxShadow="card">
            <Card.Body gap="6" p={{ base: '6', md: '8' }}>
              <Stack gap="2">
                <Heading as="h1" fontSize="3xl" fontWeight="normal">
                  Sign in to the kitchen
                </Heading>
                <Text color="fg.muted">
                  For the chef and the studio team: today’s services, prep and allergy notes.
                </Text>
              </Stack>
              <SignInForm
                onSignedIn={() => navigate(redirectTo ?? paths.today.getHref(), { replace: true })}
              />
              <Text textStyle="sm" mt="-2">
                <Link asChild color="fg" textDecoration="underline" textUnderlineOffset="3px">
                  <RouterLink to={paths.forgotPassword.getHref()}>Forgot your password?</RouterLink>
                </Link>
              </Text>
              <Text textStyle="sm" color="fg.muted">
                No account yet? Team accounts are created by the chef — ask them for an invitation.
                Clients book on the storefront.
              </Text>
            </Card.Body>
          </Card.Root>
        </Stack>
      </Container>
    </Flex>
  );
}
