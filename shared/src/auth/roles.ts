/** The three kinds of user. The string values are stored in the database and sent in tokens. */
export enum Role {
  Client = 'client',
  Chef = 'chef',
  Staff = 'staff',
}

export const ROLES: readonly Role[] = [Role.Client, Role.Chef, Role.Staff];

/** Roles admitted to the admin app (chef and kitchen/service staff). */
export const ADMIN_ROLES: readonly Role[] = [Role.Chef, Role.Staff];

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
