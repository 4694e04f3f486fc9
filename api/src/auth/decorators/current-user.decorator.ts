import { createParamDecorator, type ExecutionContext } from '@nestjs/common';
import type { Request } from 'express';
import type { Principal } from '../principal.js';

/** The signed-in user of this request, as the JWT strategy loaded it from the database. */
export const CurrentUser = createParamDecorator(
  (_data: unknown, ctx: ExecutionContext): Principal => {
    const request = ctx.switchToHttp().getRequest<Request>();
    return request.user as Principal;
  },
);
