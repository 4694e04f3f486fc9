import { Role, type AuthSession, type AuthUser } from '@nappe/shared';
import type { UserListItem, UserPage } from '../features/users/api/get-users';

// Invented people for tests.
export const chefUser: AuthUser = {
  id: 'u-chef-1',
  email: 'ines.carreau@example.test',
  name: 'Inès Carreau',
  role: Role.Chef,
};

export const staffUser: AuthUser = {
  id: 'u-staff-1',
  email: 'tomas.reyes@example.test',
  name: 'Tomás Reyes',
  role: Role.Staff,
};

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

/** `count` invented accounts, numbered so each page's rows are recognisable. */
export function makeAccounts(count: number): UserListItem[] {
  const roles = [Role.Client, Role.Client, Role.Staff];
  return Array.from({ length: count }, (_, i) => ({
    id: `u-${i + 1}`,
    email: `account${i + 1}@example.test`,
    name: `Account ${i + 1}`,
    role: i === 0 ? Role.Chef : roles[i % roles.length]!,
    createdAt: new Date(Date.UTC(2025, 0, 1 + i, 9)).toISOString(),
  }));
}

export function pageOf(all: UserListItem[], page: number, pageSize: number): UserPage {
  return {
    items: all.slice((page - 1) * pageSize, page * pageSize),
    total: all.length,
    page,
    pageSize,
  };
}
