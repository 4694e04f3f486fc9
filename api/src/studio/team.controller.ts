import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  ParseUUIDPipe,
  Patch,
  Post,
  Req,
  Res,
} from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Throttle } from '@nestjs/throttler';
import { Role, type AuthSession as AuthSessionBody } from '@nappe/shared';
import type { Request, Response } from 'express';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Public } from '../auth/decorators/public.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ADMIN_REFRESH_COOKIE, REFRESH_COOKIE, REFRESH_COOKIE_PATH } from '../auth/principal.js';
import type { Principal } from '../auth/principal.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import { adminOrigins, Env } from '../config/env.js';
import {
  acceptInvitationBodySchema,
  invitationBodySchema,
  roleChangeBodySchema,
  type AcceptInvitationBody,
  type InvitationBody,
  type InvitationView,
  type RoleChangeBody,
  type TeamMemberView,
} from './team.bodies.js';
import { TeamService } from './team.service.js';

const uuid = new ParseUUIDPipe({ version: '4' });

@ApiTags('team')
@ApiBearerAuth()
@Controller('studio/invitations')
export class InvitationsController {
  constructor(private readonly team: TeamService) {}

  @Roles(Role.Chef)
  @Post()
  invite(
    @CurrentUser() user: Principal,
    @Body(new ZodValidationPipe(invitationBodySchema)) body: InvitationBody,
  ): Promise<InvitationView> {
    return this.team.invite(user.id, body);
  }

  @Roles(Role.Chef)
  @Get()
  pending(): Promise<InvitationView[]> {
    return this.team.pending();
  }

  @Roles(Role.Chef)
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  revoke(@Param('id', uuid) id: string): Promise<void> {
    return this.team.revoke(id);
  }
}

@ApiTags('team')
@ApiBearerAuth()
@Controller('users')
export class TeamMembersController {
  constructor(private readonly team: TeamService) {}

  @Roles(Role.Chef)
  @Patch(':id/role')
  changeRole(
    @Param('id', uuid) id: string,
    @Body(new ZodValidationPipe(roleChangeBodySchema)) body: RoleChangeBody,
  ): Promise<TeamMemberView> {
    return this.team.changeRole(id, body);
  }

  @Roles(Role.Chef)
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@CurrentUser() user: Principal, @Param('id', uuid) id: string): Promise<void> {
    return this.team.remove(id, user.id);
  }
}

/** Attempts per minute per address, like sign-in (OWASP ASVS 5.0 V6.3.1). */
const acceptLimit = {
  default: { limit: () => Number(process.env.AUTH_THROTTLE_LIMIT ?? 10), ttl: 60_000 },
};

@ApiTags('auth')
@Controller('auth')
export class AcceptInvitationController {
  private readonly adminOrigins: Set<string>;

  constructor(
    private readonly team: TeamService,
    private readonly env: Env,
  ) {
    this.adminOrigins = adminOrigins(env);
  }

  /** Creates the invited account and signs it in, with the same refresh cookie as sign-in. */
  @Public()
  @Throttle(acceptLimit)
  @Post('accept-invitation')
  @HttpCode(HttpStatus.OK)
  async accept(
    @Body(new ZodValidationPipe(acceptInvitationBodySchema)) body: AcceptInvitationBody,
    @Req() req: Request,
    @Res({ passthrough: true }) res: Response,
  ): Promise<AuthSessionBody> {
    const issued = await this.team.accept(body);
    const origin = req.headers.origin;
    const name = origin && this.adminOrigins.has(origin) ? ADMIN_REFRESH_COOKIE : REFRESH_COOKIE;
    res.cookie(name, issued.refreshToken, {
      httpOnly: true,
      secure: this.env.COOKIE_SECURE,
      sameSite: 'strict',
      path: REFRESH_COOKIE_PATH,
      expires: issued.refreshExpiresAt,
    });
    res.setHeader('Cache-Control', 'no-store');
    return issued.body;
  }
}
