import { Button, Stack, Text } from '@chakra-ui/react';
import { useState } from 'react';
import type { AccountFrameProps } from './account-frame.js';
import { ForgotPasswordForm } from './forgot-password-form.js';

/** What each app says in its own words on "Forgot your password?". */
export interface ForgotPasswordWords {
  /** Under the title: which address to give. */
  intro: string;
  /** Once sent: what to do when no e-mail arrives. */
  sentHelp: string;
}

export interface ForgotPasswordFlowProps extends Omit<AccountFrameProps, 'Link'> {
  words: ForgotPasswordWords;
}

/**
 * "Forgot your password?": the form, then "Check your e-mail", which can go back to the form with
 * the address filled in. The confirmation says the same words whether or not an account uses the
 * address: the API does not tell, and neither does this page.
 */
export function ForgotPasswordFlow({
  words,
  Card,
  PageTitle,
  signInLink,
}: ForgotPasswordFlowProps) {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [lastEmail, setLastEmail] = useState('');
  const footer = <>Remembered it? {signInLink}</>;

  if (sentTo !== null) {
    return (
      <>
        <PageTitle>Check your e-mail</PageTitle>
        <Card
          title="Check your e-mail"
          intro={
            <>
              If an account uses <strong>{sentTo}</strong>, we have sent it a link to choose a new
              password. The link works once, for 30 minutes.
            </>
          }
          footer={footer}
        >
          <Stack gap="4" role="status">
            <Text>{words.sentHelp}</Text>
            <Button
              variant="outline"
              alignSelf="start"
              onClick={() => {
                setLastEmail(sentTo);
                setSentTo(null);
              }}
            >
              Ask for another link
            </Button>
          </Stack>
        </Card>
      </>
    );
  }

  return (
    <>
      <PageTitle>Forgot your password?</PageTitle>
      <Card title="Forgot your password?" intro={words.intro} footer={footer}>
        <ForgotPasswordForm defaultEmail={lastEmail} onSent={setSentTo} />
      </Card>
    </>
  );
}
