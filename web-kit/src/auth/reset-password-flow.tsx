import { Alert, Button, Stack, Text } from '@chakra-ui/react';
import { useState, type ReactNode } from 'react';
import type { AccountFrameProps } from './account-frame.js';
import { RESET_TOKEN } from './confirm-password-reset.js';
import { ResetPasswordForm } from './reset-password-form.js';

/** What each app says in its own words on "Choose a new password". */
export interface ResetPasswordWords {
  /** Under "Choose a new password". */
  intro: string;
  /** Under "Password changed": what saving did. */
  doneIntro: string;
  /** Once saved: what to do next, above the button to Sign in. */
  doneText: string;
  /** The label of that button. */
  doneSignIn: string;
  /** Under the card once saved, if the app says anything there. */
  doneFooter?: ReactNode;
}

export interface ResetPasswordFlowProps extends AccountFrameProps {
  /** The `token` of the link's query string, as the app's router read it (`null`: none). */
  token: string | null;
  words: ResetPasswordWords;
  signInHref: string;
  forgotPasswordHref: string;
}

/** A token that is not 43 base64url characters: the link lost its end on the way here. */
const CUT_LINK =
  'This reset link is not complete: it may have been cut when it was copied. Open the link from the e-mail again, or ask for a new one.';

type Step = { step: 'form' } | { step: 'done' } | { step: 'problem'; message: string };

/**
 * `/reset-password?token=…`, the link in the reset e-mail: choose a new password, then sign in
 * with it. A cut link, or one the API refuses, ends in "This link cannot be used" with a way to
 * ask for another. The token stays in this page: it is sent in the request body only, and the
 * page asks the browser to send no Referer (OWASP Forgot Password Cheat Sheet).
 */
export function ResetPasswordFlow({
  token,
  words,
  signInHref,
  forgotPasswordHref,
  Card,
  PageTitle,
  Link,
  signInLink,
}: ResetPasswordFlowProps) {
  const [state, setState] = useState<Step>(() =>
    token !== null && RESET_TOKEN.test(token)
      ? { step: 'form' }
      : { step: 'problem', message: CUT_LINK },
  );
  const signInFooter = <>Remembered it after all? {signInLink}</>;

  return (
    <>
      <meta name="referrer" content="no-referrer" />
      {state.step === 'problem' ? (
        <>
          <PageTitle>Reset link cannot be used</PageTitle>
          <Card
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
                <Link to={forgotPasswordHref}>Ask for a new link</Link>
              </Button>
            </Stack>
          </Card>
        </>
      ) : state.step === 'done' ? (
        <>
          <PageTitle>Password changed</PageTitle>
          <Card title="Password changed" intro={words.doneIntro} footer={words.doneFooter}>
            <Stack gap="4" role="status">
              <Text>{words.doneText}</Text>
              <Button asChild alignSelf="start">
                <Link to={signInHref}>{words.doneSignIn}</Link>
              </Button>
            </Stack>
          </Card>
        </>
      ) : (
        <>
          <PageTitle>Choose a new password</PageTitle>
          <Card title="Choose a new password" intro={words.intro} footer={signInFooter}>
            <ResetPasswordForm
              token={token ?? ''}
              onDone={() => setState({ step: 'done' })}
              onLinkProblem={(message) => setState({ step: 'problem', message })}
            />
          </Card>
        </>
      )}
    </>
  );
}
