import { Button, Stack, Text } from '@chakra-ui/react';
import { ForgotPasswordForm } from '@nappe/web-kit/auth';
import { useState } from 'react';
import { PageTitle } from '../../components/ui/page-title';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { AuthCard } from './auth-card';

/**
 * "Forgot your password?": asks for a reset link by e-mail. The confirmation says the same words
 * whether or not an account uses the address — the API does not tell, and neither does this page.
 */
export function ForgotPasswordRoute() {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [lastEmail, setLastEmail] = useState('');

  const footer = (
    <>
      Remembered it? <TextLink to={paths.signIn.getHref()}>Sign in</TextLink>
    </>
  );

  if (sentTo !== null) {
    return (
      <>
        <PageTitle>Check your e-mail</PageTitle>
        <AuthCard
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
            <Text>
              Nothing after a few minutes? Look in your spam folder and check the address, then ask
              for another link.
            </Text>
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
        </AuthCard>
      </>
    );
  }

  return (
    <>
      <PageTitle>Forgot your password?</PageTitle>
      <AuthCard
        title="Forgot your password?"
        intro="Tell us the e-mail address of your account and we will send you a link to choose a new password."
        footer={footer}
      >
        <ForgotPasswordForm defaultEmail={lastEmail} onSent={setSentTo} />
      </AuthCard>
    </>
  );
}
