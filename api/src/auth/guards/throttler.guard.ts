import { Injectable } from '@nestjs/common';
import { ThrottlerGuard } from '@nestjs/throttler';
import type { Request } from 'express';

/**
 * Rate limits per client address; on routes whose body names an account (sign-in, sign-up)
 * the account is part of the key too, so one address cannot grind through a single account
 * and many people behind one address are not locked out together.
 */
@Injectable()
export class AppThrottlerGuard extends ThrottlerGuard {
  protected override getTracker(req: Record<string, unknown>): Promise<string> {
    const request = req as unknown as Request;
    const body = request.body as { email?: unknown } | undefined;
    const ip = request.ip ?? 'unknown';
    const email = typeof body?.email === 'string' ? body.email.trim().toLowerCase() : '';
    return Promise.resolve(email ? `${ip}|${email}` : ip);
  }
}
