import { Role, type AuthSession, type AuthUser } from '@nappe/shared';

// Invented people for tests.
export const clientUser: AuthUser = {
  id: 'u-client-1',
  email: 'margaux@example.test',
  name: 'Margaux Feld',
  role: Role.Client,
};

export function sessionFor(user: AuthUser, accessToken = `token-for-${user.id}`): AuthSession {
  return { accessToken, tokenType: 'Bearer', expiresIn: 900, user };
}

export const studioCard = {
  name: 'Atelier Verjus',
  tagline: 'Plated desserts, finished at your table.',
  city: 'Lyon',
  currency: 'EUR',
  timeZone: 'Europe/Paris',
};
