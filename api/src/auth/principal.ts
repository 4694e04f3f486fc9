import type { AuthUser } from '@nappe/shared';

/** Who is making the request: the user as stored now (role changes apply at once) and their session. */
export interface Principal extends AuthUser {
  sessionId: string;
}

/** Claims of our access tokens. */
export interface AccessTokenClaims {
  sub: string;
  sid: string;
  role: string;
}

export const JWT_ISSUER = 'nappe-api';
export const JWT_AUDIENCE = 'nappe-apps';
/** Refresh cookie of the storefront (and of API clients without an Origin). */
export const REFRESH_COOKIE = 'nappe_refresh';
/** Refresh cookie of the admin app. */
export const ADMIN_REFRESH_COOKIE = 'nappe_refresh_admin';
export const REFRESH_COOKIE_PATH = '/api/auth';
