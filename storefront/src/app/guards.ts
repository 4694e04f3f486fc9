import type { QueryClient } from '@tanstack/react-query';
import { redirect, type LoaderFunctionArgs } from 'react-router';
import { paths, safeRedirect } from '../config/paths';
import { meQueryOptions } from '../features/auth/api/get-me';

/** Loader for screens that need a signed-in person: others go to Sign in, then come back. */
export const requireUserLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const user = await queryClient.ensureQueryData(meQueryOptions());
    if (user === null) {
      const url = new URL(request.url);
      throw redirect(paths.signIn.getHref(url.pathname + url.search));
    }
    return null;
  };

/** Loader for Sign in and Create account: someone already signed in goes where they meant to. */
export const guestOnlyLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    // If the server cannot say who this is, show the form anyway: signing in will say why.
    const user = await queryClient.ensureQueryData(meQueryOptions()).catch(() => null);
    if (user !== null) {
      const target = safeRedirect(new URL(request.url).searchParams.get('redirectTo'));
      throw redirect(target ?? paths.myEvents.getHref());
    }
    return null;
  };
