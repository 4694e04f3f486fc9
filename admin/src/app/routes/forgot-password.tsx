import { Link } from '@chakra-ui/react';
import { ForgotPasswordFlow } from '@nappe/web-kit/auth';
import { Link as RouterLink } from 'react-router';
import { PageTitle } from '../../components/ui/page-title';
import { paths } from '../../config/paths';
import { AccountCard } from './account-card';

/** "Forgot your password?" for the chef and staff: asks for a reset link by e-mail. */
export function ForgotPasswordRoute() {
  return (
    <ForgotPasswordFlow
      words={{
        intro:
          'Tell us the e-mail address you sign in to the kitchen with, and we will send you a link to choose a new password.',
        sentHelp:
          'Nothing after a few minutes? Look in your spam folder and check the address, then ask for another link. The chef can also check the address on the Team screen.',
      }}
      Card={AccountCard}
      PageTitle={PageTitle}
      signInLink={
        <Link asChild color="fg" textDecoration="underline" textUnderlineOffset="3px">
          <RouterLink to={paths.signIn.getHref()}>Sign in</RouterLink>
        </Link>
      }
    />
  );
}
