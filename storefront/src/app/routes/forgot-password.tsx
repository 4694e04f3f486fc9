import { ForgotPasswordFlow } from '@nappe/web-kit/auth';
import { PageTitle } from '../../components/ui/page-title';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { AuthCard } from './auth-card';

/** "Forgot your password?" for a client: asks for a reset link by e-mail. */
export function ForgotPasswordRoute() {
  return (
    <ForgotPasswordFlow
      words={{
        intro:
          'Tell us the e-mail address of your account and we will send you a link to choose a new password.',
        sentHelp:
          'Nothing after a few minutes? Look in your spam folder and check the address, then ask for another link.',
      }}
      Card={AuthCard}
      PageTitle={PageTitle}
      signInLink={<TextLink to={paths.signIn.getHref()}>Sign in</TextLink>}
    />
  );
}
