import { ResetPasswordFlow } from '@nappe/web-kit/auth';
import { Link as RouterLink, useSearchParams } from 'react-router';
import { PageTitle } from '../../components/ui/page-title';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { AuthCard } from './auth-card';

/** `/reset-password?token=…`, the link in the reset e-mail sent to a client. */
export function ResetPasswordRoute() {
  const [searchParams] = useSearchParams();
  return (
    <ResetPasswordFlow
      token={searchParams.get('token')}
      words={{
        intro:
          'Choose the password you will sign in with from now on. Saving it signs you out on every device.',
        doneIntro:
          'Your new password is saved. For your safety, you are now signed out on every device.',
        doneText: 'Sign in with your new password to follow your events.',
        doneSignIn: 'Sign in',
        doneFooter: 'Keep your password to yourself: the studio will never ask for it.',
      }}
      signInHref={paths.signIn.getHref()}
      forgotPasswordHref={paths.forgotPassword.getHref()}
      Card={AuthCard}
      PageTitle={PageTitle}
      Link={RouterLink}
      signInLink={<TextLink to={paths.signIn.getHref()}>Sign in</TextLink>}
    />
  );
}
