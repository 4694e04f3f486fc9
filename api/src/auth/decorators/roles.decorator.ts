import { SetMetadata } from '@nestjs/common';
import { ROLES, type Role } from '@nappe/shared';

export const ROLES_KEY = 'nappe:roles';

/** The roles allowed on a route. A route with neither this nor `@Public()` is refused (deny by default). */
export const Roles = (...roles: Role[]): MethodDecorator & ClassDecorator =>
  SetMetadata(ROLES_KEY, roles);

/** Any signed-in user, whatever the role. */
export const AnyRole = (): MethodDecorator & ClassDecorator => Roles(...ROLES);
