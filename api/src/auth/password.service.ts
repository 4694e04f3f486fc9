import { Injectable } from '@nestjs/common';
import * as argon2 from 'argon2';
import { Env } from '../config/env.js';

/**
 * Password hashing with argon2id at OWASP's recommended minimum (m = 19 MiB, t = 2, p = 1;
 * OWASP Password Storage Cheat Sheet). argon2 runs on libuv's thread pool, so hashing does
 * not stall the event loop. The whole password is hashed: nothing is truncated.
 */
@Injectable()
export class PasswordService {
  private readonly options: argon2.HashOptions & { raw?: false };
  /** A hash of a random value, verified when the account does not exist so timing tells nothing. */
  private dummyHash: Promise<string> | undefined;

  constructor(env: Env) {
    this.options = {
      type: argon2.argon2id,
      memoryCost: env.ARGON2_MEMORY_KIB,
      timeCost: 2,
      parallelism: 1,
    };
  }

  hash(password: string): Promise<string> {
    return argon2.hash(password, this.options);
  }

  async verify(hash: string | undefined, password: string): Promise<boolean> {
    if (!hash) {
      this.dummyHash ??= this.hash(`no-such-account-${Math.random()}`);
      await argon2.verify(await this.dummyHash, password).catch(() => false);
      return false;
    }
    try {
      return await argon2.verify(hash, password);
    } catch {
      return false;
    }
  }
}
