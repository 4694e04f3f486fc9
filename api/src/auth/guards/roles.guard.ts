import {
  type CanActivate,
  type ExecutionContext,
  ForbiddenException,
  Injectable,
  Logger,
} from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Role } from '@nappe/shared';
import type { Request } from 'express';
import { IS_PUBLIC_KEY } from '../decorators/public.decorator.js';
import { ROLES_KEY } from '../decorators/roles.decorator.js';
import type { Principal } from '../principal.js';

/** Global guard: a signed-in user must hold one of the route's roles. No roles declared = refused. */
@Injectable()
export class RolesGuard implements CanActivate {
  private readonly logger = new Logger(RolesGuard.name);

  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const targets = [context.getHandler(), context.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC_KEY, targets)) return true;
    const roles = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, targets);
    if (!roles || roles.length === 0) {
      const request = context.switchToHttp().getRequest<Request>();
      this.logger.error(
        `Route ${request.method} ${request.route?.path} declares no roles; refused`,
      );
      throw new ForbiddenException('This route is not open to anyone.');
    }
    const user = context.switchToHttp().getRequest<Request>().user as Principal | undefined;
    if (!user || !roles.includes(user.role)) {
      throw new ForbiddenException('Your role does not allow this.');
    }
    return true;
  }
}
