import {
  Body,
  Controller,
  ForbiddenException,
  Get,
  HttpCode,
  HttpStatus,
  Post,
  Req,
  Res,
} from '@nestjs/common';
import { ApiBearerAuth, ApiCookieAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { Throttle } from '@nestjs/throttler';
import type { AuthUser } from '@nappe/shared';
import type { CookieOptions, Request, Response } from 'express';
import { adminOrigins, corsOrigins, Env } from '../config/env.js';
import { AuthService, type IssuedSession } from './auth.service.js';
import { CurrentUser } from './decorators/current-user.decorator.js';
import { Public } from './decorators/public.decorator.js';
import { AnyRole } from './decorators/roles.decorator.js';
import { AuthSessionDto, AuthUserDto } from './dto/auth-session.dto.js';
import { LoginDto } from './dto/login.dto.js';
import { RegisterDto } from './dto/register.dto.js';
import {
  ADMIN_REFRESH_COOKIE,
  REFRESH_COOKIE,
  REFRESH_COOKIE_PATH,
  type Principal,
} from './principal.js';

/** Sign-in attempts per minute for one address and account (OWASP ASVS 5.0 V6.3.1). */
const authLimit = {
  default: { limit: () => Number(process.env.AUTH_THROTTLE_LIMIT ?? 10), ttl: 60_000 },
};
/** Refreshes per minute for one address: generous, every page load of either app makes one. */
const refreshLimit = {
  default: { limit: () => Number(process.env.REFRESH_THROTTLE_LIMIT ?? 60), ttl: 60_000 },
};

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  private readonly allowedOrigins: Set<string>;
  private readonly adminOrigins: Set<string>;

  constructor(
    private readonly auth: AuthService,
    private readonly env: Env,
  ) {
    this.allowedOrigins = new Set(corsOrigins(env));
    this.adminOrigins = adminOrigins(env);
  }

  @Public()
  @Throttle(authLimit)
  @Post('register')
  @ApiOkResponse({ type: AuthSessionDto })
  async register(
    @Body() body: RegisterDto,
    @Req() req: Request,
    @Res({ passthrough: true }) res: Response,
  ): Promise<AuthSessionDto> {
    return this.withCookie(req, res, await this.auth.register(body));
  }

  @Public()
  @Throttle(authLimit)
  @Post('login')
  @HttpCode(HttpStatus.OK)
  @ApiOkResponse({ type: AuthSessionDto })
  async login(
    @Body() body: LoginDto,
    @Req() req: Request,
    @Res({ passthrough: true }) res: Response,
  ): Promise<AuthSessionDto> {
    return this.withCookie(req, res, await this.auth.login(body));
  }

  /** Uses the HttpOnly refresh cookie; only from our own apps' origins (cross-site request forgery). */
  @Public()
  @Throttle(refreshLimit)
  @Post('refresh')
  @HttpCode(HttpStatus.OK)
  @ApiCookieAuth(REFRESH_COOKIE)
  @ApiOkResponse({ type: AuthSessionDto })
  async refresh(
    @Req() req: Request,
    @Res({ passthrough: true }) res: Response,
  ): Promise<AuthSessionDto> {
    const origin = req.headers.origin;
    if (!origin || !this.allowedOrigins.has(origin)) {
      throw new ForbiddenException('Refresh is only accepted from the Nappe apps.');
    }
    const cookies = req.cookies as Record<string, string | undefined> | undefined;
    try {
      return this.withCookie(req, res, await this.auth.refresh(cookies?.[this.cookieName(req)]));
    } catch (error) {
      res.clearCookie(this.cookieName(req), this.cookieOptions());
      throw error;
    }
  }

  @AnyRole()
  @Post('logout')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiBearerAuth()
  async logout(
    @CurrentUser() user: Principal,
    @Req() req: Request,
    @Res({ passthrough: true }) res: Response,
  ): Promise<void> {
    await this.auth.logout(user);
    res.clearCookie(this.cookieName(req), this.cookieOptions());
  }

  @AnyRole()
  @Get('me')
  @ApiBearerAuth()
  @ApiOkResponse({ type: AuthUserDto })
  me(@CurrentUser() user: Principal): AuthUser {
    return { id: user.id, email: user.email, name: user.name, role: user.role };
  }

  private cookieOptions(): CookieOptions {
    return {
      httpOnly: true,
      secure: this.env.COOKIE_SECURE,
      sameSite: 'strict',
      path: REFRESH_COOKIE_PATH,
    };
  }

  /** The admin app keeps its own refresh cookie; everyone else uses the storefront's. */
  private cookieName(req: Request): string {
    const origin = req.headers.origin;
    return origin && this.adminOrigins.has(origin) ? ADMIN_REFRESH_COOKIE : REFRESH_COOKIE;
  }

  private withCookie(req: Request, res: Response, issued: IssuedSession): AuthSessionDto {
    res.cookie(this.cookieName(req), issued.refreshToken, {
      ...this.cookieOptions(),
      expires: issued.refreshExpiresAt,
    });
    res.setHeader('Cache-Control', 'no-store');
    return issued.body;
  }
}
