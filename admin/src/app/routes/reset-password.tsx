import { Alert, Button, Link, Stack, Text } from '@chakra-ui/react';
import { RESET_TOKEN, ResetPasswordForm } from '@nappe/web-kit/auth';
import { useState } from 'react';
import { Link as RouterLink, useSearchParams } from 'react-router';
import { PageTitle } from '../../components/ui/page-title';
import { paths } from '../../config/paths';
import { AccountCard } from './account-card';

const CUT_LINK =
  'This reset link is not complete: it may have been cut when it was copied. Open the link from the e-mail again, or ask for a new one.';

type State = { step: 'form' } | { step: 'done' } | { step: 'problem'; message: string };

/**
 * `/reset-password?token=…`, the link in the reset e-mail sent to the chef or a staff member:
 * choose a new password, then sign in with it. The token is sent in the request body only, and
 * the page asks the browser to send no Referer (OWASP Forgot Password Cheat Sheet).
 */
export function ResetPasswordRoute() {
  const [searchParams] = useSearchParams();
  const token = searchParams.get('token') ?? '';
  const [state, setState] = useState<State>(
    RESET_TOKEN.test(token) ? { step: 'form' } : { step: 'problem', message: CUT_LINK },
  );

  const signIn = (
    <Link asChild color="fg" textDecoration="underline" textUnderlineOffset="3px">
      <RouterLink to={paths.signIn.getHref()}>Sign in</RouterLink>
    </Link>
  );

  return (
    <>
      <meta name="referrer" content="no-referrer" />
      {state.step === 'problem' ? (
        <>
          <PageTitle>Reset link cannot be used</PageTitle>
          <AccountCard
            title="This link cannot be used"
            intro="Reset links work once, for 30 minutes, and only the newest one you asked for."
            footer={<>Remembered it after all? {signIn}</>}
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
          </AccountCard>
        </>
      ) : state.step === 'done' ? (
        <>
          <PageTitle>Password changed</PageTitle>
          <AccountCard
            title="Password changed"
            intro="Your new password is saved. For your safety, you are now signed out on every device, the kitchen tablet included."
          >
            <Stack gap="4" role="status">
              <Text>Sign in to the kitchen with your new password.</Text>
              <Button asChild alignSelf="start">
                <RouterLink to={paths.signIn.getHref()}>Go to Sign in</RouterLink>
              </Button>
            </Stack>
          </AccountCard>
        </>
      ) : (
        <>
          <PageTitle>Choose a new password</PageTitle>
          <AccountCard
            title="Choose a new password"
            intro="Choose the password you will sign in to the kitchen with from now on. Saving it signs you out on every device."
            footer={<>Remembered it after all? {signIn}</>}
          >
            <ResetPasswordForm
              token={token}
              onDone={() => setState({ step: 'done' })}
              onLinkProblem={(message) => setState({ step: 'problem', message })}
            />
          </AccountCard>
        </>
      )}
    </>
  );
}
