import { Alert, Button, Stack, Text } from '@chakra-ui/react';
import { RESET_TOKEN, ResetPasswordForm } from '@nappe/web-kit/auth';
import { useState } from 'react';
import { Link as RouterLink, useSearchParams } from 'react-router';
import { PageTitle } from '../../components/ui/page-title';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { AuthCard } from './auth-card';

const CUT_LINK =
  'This reset link is not complete: it may have been cut when it was copied. Open the link from the e-mail again, or ask for a new one.';

type State = { step: 'form' } | { step: 'done' } | { step: 'problem'; message: string };

/**
 * `/reset-password?token=…`, the link in the reset e-mail: choose a new password, then sign in
 * with it. The token stays in this page: it is sent in the request body only, and the page asks
 * the browser to send no Referer (OWASP Forgot Password Cheat Sheet).
 */
export function ResetPasswordRoute() {
  const [searchParams] = useSearchParams();
  const token = searchParams.get('token') ?? '';
  const [state, setState] = useState<State>(
    RESET_TOKEN.test(token) ? { step: 'form' } : { step: 'problem', message: CUT_LINK },
  );

  const signInFooter = (
    <>
      Remembered it after all? <TextLink to={paths.signIn.getHref()}>Sign in</TextLink>
    </>
  );

  return (
    <>
      <meta name="referrer" content="no-referrer" />
      {state.step === 'problem' ? (
        <>
          <PageTitle>Reset link cannot be used</PageTitle>
          <AuthCard
            title="This link cannot be used"
            intro="Reset links work once, for 30 minutes, and only the newest one you asked for."
            footer={signInFooter}
          >
            <Stack gap="5">
              <Alert.Root status="error" role="alert" borderRadius="l2">
                <Alert.Indicator />
                <Alert.Content>
                  <Alert.Description>{state.message}</Alert.Description>
                </Alert.Content>
              </Alert.Root>
              <Button asChild alignSelf="start">
                <RouterLink to={paths.forgotPassword.getHref()}>Ask for a new link</RouterLink>
              </Button>
            </Stack>
          </AuthCard>
        </>
      ) : state.step === 'done' ? (
        <>
          <PageTitle>Password changed</PageTitle>
          <AuthCard
            title="Password changed"
            intro="Your new password is saved. For your safety, you are now signed out on every device."
            footer={<>Keep your password to yourself: the studio will never ask for it.</>}
          >
            <Stack gap="4" role="status">
              <Text>Sign in with your new password to follow your events.</Text>
              <Button asChild alignSelf="start">
                <RouterLink to={paths.signIn.getHref()}>Sign in</RouterLink>
              </Button>
            </Stack>
          </AuthCard>
        </>
      ) : (
        <>
          <PageTitle>Choose a new password</PageTitle>
          <AuthCard
            title="Choose a new password"
            intro="Choose the password you will sign in with from now on. Saving it signs you out on every device."
            footer={signInFooter}
          >
            <ResetPasswordForm
              token={token}
              onDone={() => setState({ step: 'done' })}
              onLinkProblem={(message) => setState({ step: 'problem', message })}
            />
          </AuthCard>
        </>
      )}
    </>
  );
}
