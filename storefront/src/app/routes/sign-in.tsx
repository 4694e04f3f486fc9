import { Text } from '@chakra-ui/react';
import { useNavigate, useSearchParams } from 'react-router';
import { PageTitle } from '../../components/ui/page-title';
import { TextLink } from '../../components/ui/text-link';
import { paths, safeRedirect } from '../../config/paths';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { AuthCard } from './auth-card';

export function SignInRoute() {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const redirectTo = safeRedirect(searchParams.get('redirectTo'));

  return (
    <>
      <PageTitle>Sign in</PageTitle>
      <AuthCard
        title="Sign in"
        intro={
          redirectTo
            ? 'Please sign in to continue. We will take you straight back.'
            : 'Welcome back. Sign in to follow your events.'
        }
        footer={
          <>
            New here?{' '}
            <TextLink to={paths.createAccount.getHref(redirectTo)}>Create an account</TextLink>
          </>
        }
      >
        <SignInForm
          onSignedIn={() => navigate(redirectTo ?? paths.myEvents.getHref(), { replace: true })}
        />
        <Text textStyle="sm" mt="-2">
          <TextLink to={paths.forgotPassword.getHref()}>Forgot your password?</TextLink>
        </Text>
      </AuthCard>
    </>
  );
}
