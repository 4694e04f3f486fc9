import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { performance } from 'node:perf_hooks';
import { setTimeout as sleep } from 'node:timers/promises';
import { BadRequestException, Injectable } from '@nestjs/common';
import { Role } from '@nappe/shared';
import { DataSource, IsNull, MoreThan, type EntityManager } from 'typeorm';
import { Clock } from '../common/clock.js';
import { Env } from '../config/env.js';
import { OutboxService } from '../mail/outbox.service.js';
import { StudioSettings } from '../studio/entities/studio-settings.entity.js';
import { User } from '../users/entities/user.entity.js';
import { AuthService } from './auth.service.js';
import { RESET_LINK_UNUSABLE_MESSAGE } from './dto/password-reset.dto.js';
import { PasswordResetTokenEntity } from './entities/password-reset-token.entity.js';
import { passwordResetMail } from './password-reset-mail.js';
import { PasswordService } from './password.service.js';
import { isGuessablePassword, WEAK_PASSWORD_MESSAGE } from './password-strength.js';

/** How long a reset link works (OWASP Forgot Password Cheat Sheet: tokens expire after a short period). */
export const RESET_TOKEN_TTL_MINUTES = 30;
/** E-mails one account receives per rolling hour, whoever asks. */
export const RESET_EMAILS_PER_HOUR = 3;
/**
 * Every request answers after at least this long, so an address with an account (a few writes and
 * an e-mail queued) and one without (a single read) take the same time to answer (OWASP Forgot
 * Password Cheat Sheet: "return in a consistent amount of time"; ASVS V2.5 no enumeration).
 */
export const RESET_RESPONSE_FLOOR_MS = 250;
/** The one answer to a request, whatever the address. */
export const RESET_REQUESTED_MESSAGE = `If an account uses that address, we have sent a link to choose a new password. It works for ${RESET_TOKEN_TTL_MINUTES} minutes.`;

const HOUR_MS = 3_600_000;

const sha256 = (value: string): string => createHash('sha256').update(value).digest('hex');

interface UsableToken {
  token: PasswordResetTokenEntity;
  user: User;
}

/**
 * "Forgot your password?" for every role: a one-time link by e-mail (only its SHA-256 stored),
 * then a new password that ends every session of the account.
 */
@Injectable()
export class PasswordResetService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly clock: Clock,
    private readonly env: Env,
    private readonly outbox: OutboxService,
    private readonly passwords: PasswordService,
    private readonly auth: AuthService,
  ) {}

  /** Sends a link if an active account uses `email`; answers in the same time either way. */
  async request(email: string): Promise<void> {
    const started = performance.now();
    try {
      await this.sendLinkIfAccount(email);
    } finally {
      const left = RESET_RESPONSE_FLOOR_MS - (performance.now() - started);
      if (left > 0) await sleep(left);
    }
  }

  /**
   * Sets the new password from a usable link, marks the link used and ends every session of the
   * account (refresh tokens revoked; access tokens refused on the next request, as the JWT
   * strategy loads the session each time). Nothing else is written.
   */
  async confirm(token: string, password: string): Promise<void> {
    const tokenHash = sha256(token);
    const found = await this.usable(this.dataSource.manager, tokenHash, this.clock.now());
    if (!found) throw new BadRequestException([RESET_LINK_UNUSABLE_MESSAGE]);
    // The registration rule: common passwords, patterns and the person's own details refused.
    if (isGuessablePassword(password, { email: found.user.email, name: found.user.name })) {
      throw new BadRequestException([WEAK_PASSWORD_MESSAGE]);
    }
    // Hash before taking the connection: never hold the database during slow work.
    const passwordHash = await this.passwords.hash(password);
    await this.dataSource.transaction(async (m) => {
      const now = this.clock.now();
      // Checked again inside the transaction: two tabs submitting the same link, one wins.
      const again = await this.usable(m, tokenHash, now);
      if (!again) throw new BadRequestException([RESET_LINK_UNUSABLE_MESSAGE]);
      await m.update(PasswordResetTokenEntity, { id: again.token.id }, { usedAt: now });
      await m.update(User, { id: again.user.id }, { passwordHash });
      await this.auth.revokeAllSessions(m, again.user.id, 'password_reset', now);
    });
  }

  private async sendLinkIfAccount(email: string): Promise<void> {
    const token = randomBytes(32).toString('base64url');
    await this.dataSource.transaction(async (m) => {
      const user = await m.findOneBy(User, { email });
      // A removed team member or an erased client cannot get back in this way.
      if (!user || user.removedAt) return;
      const now = this.clock.now();
      const sentLastHour = await m.countBy(PasswordResetTokenEntity, {
        userId: user.id,
        createdAt: MoreThan(new Date(now.getTime() - HOUR_MS)),
      });
      // The per-account cap (QUALITY.md Abuse: caps on e-mail resends). A 4th request within the
      // hour still answers 202 with the same body — the caller cannot tell — but sends nothing
      // and keeps the last link working.
      if (sentLastHour >= RESET_EMAILS_PER_HOUR) return;
      // A new request replaces older unused links: only the newest one works.
      await m.update(
        PasswordResetTokenEntity,
        { userId: user.id, usedAt: IsNull(), replacedAt: IsNull() },
        { replacedAt: now },
      );
      const expiresAt = new Date(now.getTime() + RESET_TOKEN_TTL_MINUTES * 60_000);
      await m.insert(PasswordResetTokenEntity, {
        id: randomUUID(),
        userId: user.id,
        tokenHash: sha256(token),
        createdAt: now,
        expiresAt,
        usedAt: null,
        replacedAt: null,
      });
      const studio = await m.findOneByOrFail(StudioSettings, { id: 1 });
      // Clients reset on the storefront; the chef and staff on the kitchen app.
      const app =
        user.role === Role.Client ? this.env.PUBLIC_STOREFRONT_URL : this.env.PUBLIC_ADMIN_URL;
      const link = `${app.replace(/\/+$/, '')}/reset-password?token=${token}`;
      await this.outbox.enqueue(m, {
        kind: 'password_reset',
        orderId: null,
        to: user.email,
        content: passwordResetMail({
          studioName: studio.name,
          timeZone: studio.timeZone,
          personName: user.name,
          email: user.email,
          link,
          expiresAt,
          validMinutes: RESET_TOKEN_TTL_MINUTES,
        }),
      });
    });
  }

  /** The link's row and its account, if the link is known, unused, not replaced and not expired. */
  private async usable(
    m: EntityManager,
    tokenHash: string,
    now: Date,
  ): Promise<UsableToken | null> {
    const token = await m.findOneBy(PasswordResetTokenEntity, { tokenHash });
    if (!token || token.usedAt || token.replacedAt || token.expiresAt <= now) return null;
    const user = await m.findOneBy(User, { id: token.userId });
    if (!user || user.removedAt) return null;
    return { token, user };
  }
}
