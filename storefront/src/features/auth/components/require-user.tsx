import type { AuthUser } from '@nappe/shared';
import { PageLoader } from '@nappe/web-kit/react';
import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router';
import { paths } from '../../../config/paths';
import { useMe } from '../api/get-me';

/**
 * Renders its children for a signed-in person only. The route loader already redirects on
 * arrival; this also catches a session that ends while the page is open (sign-out, expiry).
 */
export function RequireUser({ children }: { children: (user: AuthUser) => ReactNode }) {
  const me = useMe();
  const location = useLocation();
  if (me.isPending) return <PageLoader />;
  if (me.isError) throw me.error;
  if (me.data === null) {
    return <Navigate to={paths.signIn.getHref(location.pathname + location.search)} replace />;
  }
  return children(me.data);
}
