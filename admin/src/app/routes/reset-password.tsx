import { Link } from '@chakra-ui/react';
import { ResetPasswordFlow } from '@nappe/web-kit/auth';
import { Link as RouterLink, useSearchParams } from 'react-router';
import { PageTitle } from '../../components/ui/page-title';
import { paths } from '../../config/paths';
import { AccountCard } from './account-card';

/** `/reset-password?token=…`, the link in the reset e-mail sent to the chef or a staff member. */
export function ResetPasswordRoute() {
  const [searchParams] = useSearchParams();
  return (
    <ResetPasswordFlow
      token={searchParams.get('token')}
      words={{
        intro:
          'Choose the password you will sign in to the kitchen with from now on. Saving it signs you out on every device.',
        doneIntro:
          'Your new password is saved. For your safety, you are now signed out on every device, the kitchen tablet included.',
        doneText: 'Sign in to the kitchen with your new password.',
        doneSignIn: 'Go to Sign in',
      }}
      signInHref={paths.signIn.getHref()}
      forgotPasswordHref={paths.forgotPassword.getHref()}
      Card={AccountCard}
      PageTitle={PageTitle}
      Link={RouterLink}
      signInLink={
        <Link asChild color="fg" textDecoration="underline" textUnderlineOffset="3px">
          <RouterLink to={paths.signIn.getHref()}>Sign in</RouterLink>
        </Link>
      }
    />
  );
}
