import { Alert, Box, Button, Card, Container, Flex, Heading, Stack, Text } from '@chakra-ui/react';
import { useState } from 'react';
import { Link as RouterLink, useNavigate, useSearchParams } from 'react-router';
import { PageTitle } from '../../components/ui/page-title';
import { Wordmark } from '../../components/ui/wordmark';
import { paths } from '../../config/paths';
import { INVITATION_TOKEN } from '../../features/auth/api/accept-invitation';
import {
  AcceptInvitationForm,
  type LinkProblem,
} from '../../features/auth/components/accept-invitation-form';

const MALFORMED: LinkProblem = {
  message:
    'This invitation link is not valid: it may have been cut when it was copied. Open the link from the e-mail again, or ask the chef for a new one.',
  signIn: false,
};

/**
 * `/accept-invitation?token=…`, the link in the invitation e-mail: the invited person chooses a
 * name and password, joins the team and is signed in. Public, outside the signed-in shell.
 */
export function AcceptInvitationRoute() {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const token = searchParams.get('token') ?? '';
  const [problem, setProblem] = useState<LinkProblem | null>(
    INVITATION_TOKEN.test(token) ? null : MALFORMED,
  );

  return (
    <Flex as="main" id="main-content" minH="100dvh" align="center" justify="center" bg="bg.muted">
      <PageTitle>Join the team</PageTitle>
      <Container maxW="md" py={{ base: '8', md: '16' }} px={{ base: '4', md: '6' }}>
        <Stack gap="6">
          <Box alignSelf="center">
            <Wordmark size="lg" />
          </Box>
          <Card.Root variant="outline" bg="bg.panel" borderColor="border" boxShadow="card">
            <Card.Body gap="6" p={{ base: '6', md: '8' }}>
              {problem ? (
                <Stack gap="5">
                  <Heading as="h1" fontSize="3xl" fontWeight="normal">
                    This invitation cannot be used
                  </Heading>
                  <Alert.Root status="error" role="alert" borderRadius="l2">
                    <Alert.Indicator />
                    <Alert.Content>
                      <Alert.Description>{problem.message}</Alert.Description>
                    </Alert.Content>
                  </Alert.Root>
                  <Text color="fg.muted">
                    {problem.signIn
                      ? 'If you chose your password already, sign in with it.'
                      : 'Invitation links work once, for 7 days. The chef can send a new one from Studio → Team.'}
                  </Text>
                  <Button asChild variant={problem.signIn ? 'solid' : 'outline'} alignSelf="start">
                    <RouterLink to={paths.signIn.getHref()}>Go to Sign in</RouterLink>
                  </Button>
                </Stack>
              ) : (
                <>
                  <Stack gap="2">
                    <Heading as="h1" fontSize="3xl" fontWeight="normal">
                      Join the team
                    </Heading>
                    <Text color="fg.muted">
                      You were invited to the studio’s kitchen app. Choose your name and a password
                      to start; you will be signed in straight away.
                    </Text>
                  </Stack>
                  <AcceptInvitationForm
                    token={token}
                    onAccepted={() => navigate(paths.today.getHref(), { replace: true })}
                    onLinkProblem={setProblem}
                  />
                </>
              )}
            </Card.Body>
          </Card.Root>
        </Stack>
      </Container>
    </Flex>
  );
}
