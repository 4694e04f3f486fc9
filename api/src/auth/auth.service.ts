import { createHash, randomBytes, randomUUID, timingSafeEqual } from 'node:crypto';
import {
  BadRequestException,
  ConflictException,
  Injectable,
  UnauthorizedException,
} from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { InjectRepository } from '@nestjs/typeorm';
import { Role, type AuthSession as AuthSessionBody } from '@nappe/shared';
import { DataSource, IsNull, Repository, type EntityManager } from 'typeorm';
import { Env } from '../config/env.js';
import { User } from '../users/entities/user.entity.js';
import { toAuthUser } from '../users/user.mapper.js';
import type { LoginDto } from './dto/login.dto.js';
import type { RegisterDto } from './dto/register.dto.js';
import { AuthSession } from './entities/auth-session.entity.js';
import { PasswordService } from './password.service.js';
import { isGuessablePassword, WEAK_PASSWORD_MESSAGE } from './password-strength.js';
import type { AccessTokenClaims, Principal } from './principal.js';
import { lockFor, lockKey } from '../database/serialized-writes.js';

/** What a sign-in produces: the body for the client and the refresh token for the cookie. */
export interface IssuedSession {
  body: AuthSessionBody;
  refreshToken: string;
  refreshExpiresAt: Date;
}

/** A second refresh with the just-replaced token inside this window is a race between tabs, not theft. */
const REUSE_GRACE_MS = 30_000;

const sha256 = (value: string): string => createHash('sha256').update(value).digest('hex');

function sameHash(a: string, b: string | null): boolean {
  if (b === null || a.length !== b.length) return false;
  return timingSafeEqual(Buffer.from(a), Buffer.from(b));
}

@Injectable()
export class AuthService {
  constructor(
    @InjectRepository(User) private readonly users: Repository<User>,
    @InjectRepository(AuthSession) private readonly sessions: Repository<AuthSession>,
    private readonly dataSource: DataSource,
    private readonly passwords: PasswordService,
    private readonly jwt: JwtService,
    private readonly env: Env,
  ) {}

  async register(input: RegisterDto): Promise<IssuedSession> {
    if (isGuessablePassword(input.password, { email: input.email, name: input.name })) {
      throw new BadRequestException([WEAK_PASSWORD_MESSAGE]);
    }
    // Hash before taking the connection: never hold the database during slow work.
    const passwordHash = await this.passwords.hash(input.password);
    const user = await this.dataSource.transaction(async (manager) => {
      // Two sign-ups with one address at once: the second waits, then finds it taken (409).
      await lockFor(manager, lockKey('account-email', input.email));
      const taken = await manager.exists(User, { where: { email: input.email } });
      if (taken)
        throw new ConflictException('An account with this e-mail already exists. Sign in instead.');
      return manager.save(
        manager.create(User, {
          email: input.email,
          name: input.name,
          passwordHash,
          role: Role.Client,
        }),
      );
    });
    return this.openSession(user);
  }

  async login(input: LoginDto): Promise<IssuedSession> {
    const user = await this.users.findOne({ where: { email: input.email } });
    const ok = await this.passwords.verify(user?.passwordHash, input.password);
    if (!user || !ok || user.removedAt)
      throw new UnauthorizedException('Wrong e-mail or password.');
    return this.openSession(user);
  }

  /** Rotates the refresh token and issues a new access token for the same session. */
  async refresh(refreshToken: string | undefined): Promise<IssuedSession> {
    const invalid = new UnauthorizedException('Your session has ended. Sign in again.');
    const [sessionId, secret] = (refreshToken ?? '').split('.');
    if (!sessionId || !secret) throw invalid;
    const presented = sha256(secret);
    const now = new Date();
    const newSecret = randomBytes(32).toString('base64url');

    const outcome = await this.dataSource.transaction(async (manager) => {
      // One rotation at a time per session: a second use of the same token then reads the rotated
      // hashes and is treated as reuse (PostgreSQL; SQLite runs transactions one at a time anyway).
      await lockFor(manager, { row: AuthSession, id: sessionId });
      const session = await manager.findOne(AuthSession, {
        where: { id: sessionId },
        relations: { user: true },
      });
      if (!session?.user || session.user.removedAt || session.revokedAt || session.expiresAt <= now)
        return null;
      if (!sameHash(presented, session.refreshHash)) {
        if (sameHash(presented, session.previousRefreshHash)) {
          const withinGrace = now.getTime() - session.lastUsedAt.getTime() < REUSE_GRACE_MS;
          if (!withinGrace) {
            // An old refresh token came back: assume it was stolen and end the session.
            await manager.update(AuthSession, session.id, {
              revokedAt: now,
              revokedReason: 'refresh_reuse',
            });
          }
        }
        return null;
      }
      await manager.update(AuthSession, session.id, {
        previousRefreshHash: session.refreshHash,
        refreshHash: sha256(newSecret),
        lastUsedAt: now,
      });
      return { user: session.user, session };
    });
    if (!outcome) throw invalid;
    return this.issue(outcome.user, outcome.session.id, newSecret, outcome.session.expiresAt);
  }

  async logout(principal: Principal): Promise<void> {
    await this.sessions.update(
      { id: principal.sessionId, userId: principal.id },
      { revokedAt: new Date(), revokedReason: 'logout' },
    );
  }

  /** Used by the JWT strategy on every request: the session must be live and the user must exist. */
  async principalFor(claims: AccessTokenClaims): Promise<Principal | null> {
    const session = await this.sessions.findOne({
      where: { id: claims.sid, userId: claims.sub },
      relations: { user: true },
    });
    if (
      !session?.user ||
      session.user.removedAt ||
      session.revokedAt ||
      session.expiresAt <= new Date()
    )
      return null;
    return { ...toAuthUser(session.user), sessionId: session.id };
  }

  /** Signs in an account another flow has just created or verified (an accepted invitation). */
  signInVerified(user: User): Promise<IssuedSession> {
    return this.openSession(user);
  }

  /** Ends every live session of an account: its access and refresh tokens stop working at once. */
  async revokeAllSessions(
    manager: EntityManager,
    userId: string,
    reason: string,
    at: Date,
  ): Promise<void> {
    await manager.update(
      AuthSession,
      { userId, revokedAt: IsNull() },
      { revokedAt: at, revokedReason: reason },
    );
  }

  private async openSession(user: User): Promise<IssuedSession> {
    const secret = randomBytes(32).toString('base64url');
    const now = new Date();
    const expiresAt = new Date(now.getTime() + this.env.REFRESH_TTL_DAYS * 86_400_000);
    const session = await this.sessions.save(
      this.sessions.create({
        id: randomUUID(),
        userId: user.id,
        refreshHash: sha256(secret),
        previousRefreshHash: null,
        expiresAt,
        revokedAt: null,
        revokedReason: null,
        lastUsedAt: now,
      }),
    );
    return this.issue(user, session.id, secret, expiresAt);
  }

  private async issue(
    user: User,
    sessionId: string,
    secret: string,
    expiresAt: Date,
  ): Promise<IssuedSession> {
    const claims: AccessTokenClaims = { sub: user.id, sid: sessionId, role: user.role };
    const accessToken = await this.jwt.signAsync(claims);
    return {
      body: {
        accessToken,
        tokenType: 'Bearer',
        expiresIn: this.env.JWT_ACCESS_TTL_SECONDS,
        user: toAuthUser(user),
      },
      refreshToken: `${sessionId}.${secret}`,
      refreshExpiresAt: expiresAt,
    };
  }
}
