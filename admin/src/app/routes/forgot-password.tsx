import { Button, Link, Stack, Text } from '@chakra-ui/react';
import { ForgotPasswordForm } from '@nappe/web-kit/auth';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router';
import { PageTitle } from '../../components/ui/page-title';
import { paths } from '../../config/paths';
import { AccountCard } from './account-card';

/**
 * "Forgot your password?" for the chef and staff: asks for a reset link by e-mail. The
 * confirmation says the same words whether or not an account uses the address.
 */
export function ForgotPasswordRoute() {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [lastEmail, setLastEmail] = useState('');

  const footer = (
    <>
      Remembered it?{' '}
      <Link asChild color="fg" textDecoration="underline" textUnderlineOffset="3px">
        <RouterLink to={paths.signIn.getHref()}>Sign in</RouterLink>
      </Link>
    </>
  );

  if (sentTo !== null) {
    return (
      <>
        <PageTitle>Check your e-mail</PageTitle>
        <AccountCard
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
              for another link. The chef can also check the address on the Team screen.
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
        </AccountCard>
      </>
    );
  }

  return (
    <>
      <PageTitle>Forgot your password?</PageTitle>
      <AccountCard
        title="Forgot your password?"
        intro="Tell us the e-mail address you sign in to the kitchen with, and we will send you a link to choose a new password."
        footer={footer}
      >
        <ForgotPasswordForm defaultEmail={lastEmail} onSent={setSentTo} />
      </AccountCard>
    </>
  );
}
