import { useNavigate, useSearchParams } from 'react-router';
import { PageTitle } from '../../components/ui/page-title';
import { TextLink } from '../../components/ui/text-link';
import { paths, safeRedirect } from '../../config/paths';
import { CreateAccountForm } from '../../features/auth/components/create-account-form';
import { AuthCard } from './auth-card';

export function CreateAccountRoute() {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const redirectTo = safeRedirect(searchParams.get('redirectTo'));

  return (
    <>
      <PageTitle>Create account</PageTitle>
      <AuthCard
        title="Create account"
        intro="One account to book desserts, follow your events and keep your guests’ details in one place."
        footer={
          <>
            Already have an account?{' '}
            <TextLink to={paths.signIn.getHref(redirectTo)}>Sign in</TextLink>
          </>
        }
      >
        <CreateAccountForm
          onCreated={() => navigate(redirectTo ?? paths.myEvents.getHref(), { replace: true })}
        />
      </AuthCard>
    </>
  );
}
