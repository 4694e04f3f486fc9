import { createHash } from 'node:crypto';
import { performance } from 'node:perf_hooks';
import type { LoggerService } from '@nestjs/common';
import { Role } from '@nappe/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { AuthSession } from '../src/auth/entities/auth-session.entity.js';
import { PasswordResetTokenEntity } from '../src/auth/entities/password-reset-token.entity.js';
import { RESET_LINK_UNUSABLE_MESSAGE } from '../src/auth/dto/password-reset.dto.js';
import {
  RESET_EMAILS_PER_HOUR,
  RESET_REQUESTED_MESSAGE,
  RESET_RESPONSE_FLOOR_MS,
} from '../src/auth/password-reset.service.js';
import { WEAK_PASSWORD_MESSAGE } from '../src/auth/password-strength.js';
import { Clock } from '../src/common/clock.js';
import { OutboxMessageEntity } from '../src/mail/entities/outbox-message.entity.js';
import { MAIL_TRANSPORT } from '../src/mail/mail-transport.js';
import { OutboxWorker } from '../src/mail/outbox.worker.js';
import { User } from '../src/users/entities/user.entity.js';
import {
  ControlledClock,
  RecordingTransport,
  TEST_NOW,
  type BookingApp,
} from './factories/booking.js';
import {
  createTestApp,
  makeUser,
  signIn,
  TEST_ORIGIN,
  uniqueEmail,
  type TestApp,
} from './factories/test-app.js';

/**
 * "Forgot your password?" end to end against the real AppModule. The bars come from OWASP ASVS
 * 4.0.3 V2.5 (credential recovery: no account enumeration, secure recovery token) and 5.0 V6.4
 * (one-time secrets: random, single use, short-lived), the OWASP Forgot Password Cheat Sheet
 * (same response and time for every address, token only in the link, sessions ended after the
 * change, rate limits) and QUALITY.md (reset throttled with 429 + Retry-After; e-mail caps).
 */

let b: BookingApp;
const requestLog: string[] = [];
const appLog: string[] = [];
const record = (m: unknown, ...rest: unknown[]) =>
  void appLog.push(
    [m, ...rest].map((x) => (typeof x === 'string' ? x : JSON.stringify(x))).join(' '),
  );
const capture: LoggerService = {
  log: record,
  error: record,
  warn: record,
  debug: record,
  verbose: record,
};

const NEW_PASSWORD = 'copper kettle at the harbour';
const MINUTE = 60_000;

/** Boots the app with a controlled clock, the recording mail transport and the logs captured. */
async function bootResetApp(logs: boolean): Promise<BookingApp> {
  const clock = new ControlledClock(TEST_NOW);
  const mail = new RecordingTransport();
  const t = await createTestApp(
    { THROTTLE_LIMIT: '10000', ...(logs ? { LOG_LEVEL: 'trace' } : {}) },
    {
      configure: (builder) =>
        builder
          .overrideProvider(Clock)
          .useValue(clock)
          .overrideProvider(MAIL_TRANSPORT)
          .useValue(mail),
      ...(logs ? { logStream: { write: (line: string) => void requestLog.push(line) } } : {}),
    },
  );
  if (logs) t.app.useLogger(capture);
  const worker = t.app.get(OutboxWorker);
  return { t, clock, mail, drainOutbox: () => worker.drainOutbox() };
}

/** The address throttles have their own tests below, on an app of their own; here they stay out of the way. */
function raiseThrottles(): void {
  process.env.PASSWORD_RESET_THROTTLE_LIMIT = '10000';
  process.env.AUTH_THROTTLE_LIMIT = '10000';
}
function defaultThrottles(): void {
  delete process.env.PASSWORD_RESET_THROTTLE_LIMIT;
  delete process.env.AUTH_THROTTLE_LIMIT;
}

beforeAll(async () => {
  raiseThrottles();
  b = await bootResetApp(true);
});
afterAll(async () => {
  defaultThrottles();
  await b.t.close();
});
beforeEach(() => b.clock.set(TEST_NOW));

const sha256 = (value: string) => createHash('sha256').update(value).digest('hex');
const outbox = () => b.t.dataSource.getRepository(OutboxMessageEntity);
const resetRows = (userId: string) =>
  b.t.dataSource.getRepository(PasswordResetTokenEntity).find({ where: { userId } });

const ask = (t: TestApp, email: string) => t.http.post('/api/auth/password-reset').send({ email });
const confirm = (token: string, password = NEW_PASSWORD) =>
  b.t.http.post('/api/auth/password-reset/confirm').send({ token, password });

async function resetMailIds(email: string): Promise<Set<string>> {
  const rows = await outbox().find({ where: { toAddress: email, kind: 'password_reset' } });
  return new Set(rows.map((r) => r.id));
}

/** Asks for a link and reads it from the one e-mail the request queued. */
async function requestLink(
  email: string,
): Promise<{ link: string; token: string; message: OutboxMessageEntity }> {
  const before = await resetMailIds(email);
  await ask(b.t, email).expect(202);
  const rows = await outbox().find({ where: { toAddress: email, kind: 'password_reset' } });
  const added = rows.filter((r) => !before.has(r.id));
  expect(added, 'one e-mail queued by the request').toHaveLength(1);
  const message = added[0]!;
  const match = /(\S+\/reset-password\?token=([A-Za-z0-9_-]+))/.exec(message.textBody);
  if (!match) throw new Error(`no link in the reset e-mail: ${message.textBody}`);
  return { link: match[1]!, token: match[2]!, message };
}

/** A quoted-printable body decoded (RFC 2045 §6.7: soft line breaks, then =XX octets). */
function decodeQuotedPrintable(body: string): string {
  const bytes = body
    .replace(/=\r?\n/g, '')
    .replace(/=([0-9A-F]{2})/g, (_m, hex: string) => String.fromCharCode(parseInt(hex, 16)));
  return Buffer.from(bytes, 'latin1').toString('utf8');
}

function median(values: number[]): number {
  const sorted = [...values].sort((x, y) => x - y);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

describe('asking for a link (ASVS V2.5: no account enumeration)', () => {
  it('answers an unknown and a known address with the same status, the same body and about the same time', async () => {
    const known = await Promise.all(Array.from({ length: 5 }, () => makeUser(b.t)));
    await ask(b.t, uniqueEmail('warm-up')).expect(202);
    const timings = { known: [] as number[], unknown: [] as number[] };
    const bodies: unknown[] = [];
    for (const { user } of known) {
      for (const [kind, email] of [
        ['unknown', uniqueEmail('nobody')],
        ['known', user.email],
      ] as const) {
        const started = performance.now();
        const res = await ask(b.t, email);
        timings[kind].push(performance.now() - started);
        expect(res.status).toBe(202);
        bodies.push(res.body);
      }
    }
    for (const body of bodies) expect(body).toEqual({ message: RESET_REQUESTED_MESSAGE });
    // Both paths wait for the same floor, so neither answers faster than it.
    for (const ms of [...timings.known, ...timings.unknown]) {
      expect(ms).toBeGreaterThanOrEqual(RESET_RESPONSE_FLOOR_MS - 1);
    }
    // What is left is the test machine's noise (2 shared cores), not a tell: the medians stay
    // within 100 ms of each other — less than half the floor.
    expect(Math.abs(median(timings.known) - median(timings.unknown))).toBeLessThan(100);
    // Only the real accounts got an e-mail.
    for (const { user } of known) expect((await resetMailIds(user.email)).size).toBe(1);
  });

  it('queues nothing for an unknown address, nor for a removed account', async () => {
    const count = () => outbox().countBy({ kind: 'password_reset' });
    const before = await count();
    await ask(b.t, uniqueEmail('nobody')).expect(202);
    const removed = await makeUser(b.t, { role: Role.Staff });
    await b.t.dataSource
      .getRepository(User)
      .update({ id: removed.user.id }, { removedAt: new Date(TEST_NOW) });
    const res = await ask(b.t, removed.user.email).expect(202);
    expect(res.body).toEqual({ message: RESET_REQUESTED_MESSAGE });
    expect(await count()).toBe(before);
  });

  it('finds the account whatever the case and spaces of the address', async () => {
    const { user } = await makeUser(b.t);
    await ask(b.t, `  ${user.email.toUpperCase()} `).expect(202);
    expect((await resetMailIds(user.email)).size).toBe(1);
  });

  it('refuses a body that is not just an e-mail address (400)', async () => {
    await b.t.http.post('/api/auth/password-reset').send({ email: 'not-an-address' }).expect(400);
    await b.t.http.post('/api/auth/password-reset').send({}).expect(400);
    const extra = await b.t.http
      .post('/api/auth/password-reset')
      .send({ email: uniqueEmail(), userId: 'someone-else' })
      .expect(400);
    expect(JSON.stringify(extra.body)).toMatch(/userId should not exist/);
  });
});

describe('the e-mail and its link', () => {
  it('sends clients to the storefront and the chef and staff to the kitchen app, with a working link', async () => {
    const cases = [
      [Role.Client, b.t.env.PUBLIC_STOREFRONT_URL],
      [Role.Chef, b.t.env.PUBLIC_ADMIN_URL],
      [Role.Staff, b.t.env.PUBLIC_ADMIN_URL],
    ] as const;
    for (const [role, app] of cases) {
      const { user } = await makeUser(b.t, { role });
      const { link, token, message } = await requestLink(user.email);
      expect(link).toBe(`${app}/reset-password?token=${token}`);
      // 32 random bytes → 43 base64url characters (RFC 4648 §5, no padding).
      expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
      expect(message.subject).toMatch(/choose a new password/);
      expect(message.textBody).toContain('30 minutes');
      expect(message.htmlBody).toContain(`href="${link}"`);
      // Only the SHA-256 of the token is stored, and the link works 30 minutes.
      const [row] = await resetRows(user.id);
      expect(row!.tokenHash).toBe(sha256(token));
      expect(row!.tokenHash).not.toContain(token);
      expect(row!.expiresAt.getTime() - row!.createdAt.getTime()).toBe(30 * MINUTE);

      // The worker sends it; the message that leaves carries the same link.
      b.mail.sent.length = 0;
      await b.drainOutbox();
      const sent = b.mail.sent.find((m) => m.to === user.email);
      expect(sent, `e-mail to the ${role}`).toBeDefined();
      expect(decodeQuotedPrintable(sent!.raw)).toContain(link);

      await confirm(token).expect(204);
      await b.t.http
        .post('/api/auth/login')
        .send({ email: user.email, password: NEW_PASSWORD })
        .expect(200);
    }
  });

  it('keeps the token out of every log line (request log at trace level and the app log)', async () => {
    const { user } = await makeUser(b.t);
    requestLog.length = 0;
    appLog.length = 0;
    const { token } = await requestLink(user.email);
    await b.drainOutbox();
    await confirm(token, 'too short').expect(400);
    await confirm(token).expect(204);
    await confirm(token).expect(400);
    const lines = [...requestLog, ...appLog];
    // The capture works: the request log saw the three confirm requests and the request.
    expect(requestLog.filter((l) => l.includes('/api/auth/password-reset')).length).toBe(4);
    for (const secret of [token, sha256(token), NEW_PASSWORD]) {
      expect(lines.filter((l) => l.includes(secret))).toEqual([]);
    }
  });
});

describe('using the link (ASVS 5.0 V6.4: single use, short-lived)', () => {
  it('works once; the same link again → 400 with a clear message', async () => {
    const { user } = await makeUser(b.t);
    const { token } = await requestLink(user.email);
    await confirm(token).expect(204);
    const again = await confirm(token, 'another quiet passphrase here').expect(400);
    expect(again.body.message).toEqual([RESET_LINK_UNUSABLE_MESSAGE]);
    // The second attempt changed nothing: the first new password still signs in.
    await b.t.http
      .post('/api/auth/login')
      .send({ email: user.email, password: NEW_PASSWORD })
      .expect(200);
  });

  it('works until 30 minutes after it was sent, not at 30 minutes (controlled clock)', async () => {
    const early = await makeUser(b.t);
    const late = await makeUser(b.t);
    const { token: earlyToken } = await requestLink(early.user.email);
    const { token: lateToken } = await requestLink(late.user.email);
    b.clock.advance(30 * MINUTE - 1000);
    await confirm(earlyToken).expect(204);
    b.clock.advance(1000);
    const res = await confirm(lateToken).expect(400);
    expect(res.body.message).toEqual([RESET_LINK_UNUSABLE_MESSAGE]);
    // The old password still works for the account whose link expired.
    await b.t.http
      .post('/api/auth/login')
      .send({ email: late.user.email, password: late.password })
      .expect(200);
  });

  it('a newer request replaces the older link', async () => {
    const { user } = await makeUser(b.t);
    const first = await requestLink(user.email);
    b.clock.advance(MINUTE);
    const second = await requestLink(user.email);
    expect((await confirm(first.token).expect(400)).body.message).toEqual([
      RESET_LINK_UNUSABLE_MESSAGE,
    ]);
    await confirm(second.token).expect(204);
  });

  it('refuses a made-up, a cut or a missing token with the same message, and extra fields', async () => {
    for (const token of ['A'.repeat(43), 'cut-in-half', '', 42]) {
      const res = await b.t.http
        .post('/api/auth/password-reset/confirm')
        .send({ token, password: NEW_PASSWORD })
        .expect(400);
      expect(res.body.message).toContain(RESET_LINK_UNUSABLE_MESSAGE);
    }
    await b.t.http
      .post('/api/auth/password-reset/confirm')
      .send({ password: NEW_PASSWORD })
      .expect(400);
    const { user } = await makeUser(b.t);
    const { token } = await requestLink(user.email);
    await b.t.http
      .post('/api/auth/password-reset/confirm')
      .send({ token, password: NEW_PASSWORD, userId: 'someone-else' })
      .expect(400);
    // Refused bodies did not use the link.
    await confirm(token).expect(204);
  });

  it('refuses a weak or short password with the registration messages, and keeps the link usable', async () => {
    const { user } = await makeUser(b.t);
    const { token } = await requestLink(user.email);
    // The oracle is registration itself: the same password must get the same words there.
    for (const password of ['password1234', 'short']) {
      const registration = await b.t.http
        .post('/api/auth/register')
        .send({ name: 'Someone Else', email: uniqueEmail('weak'), password })
        .expect(400);
      const reset = await confirm(token, password).expect(400);
      expect(reset.body.message).toEqual(registration.body.message);
    }
    // zxcvbn's verdict for a top common password (NIST SP 800-63B §3.1.1.2 blocklist).
    expect((await confirm(token, 'password1234').expect(400)).body.message).toEqual([
      WEAK_PASSWORD_MESSAGE,
    ]);
    // The person's own details count as guessable, as at registration: their e-mail address is
    // refused for them (it would pass for someone else).
    expect((await confirm(token, user.email).expect(400)).body.message).toEqual([
      WEAK_PASSWORD_MESSAGE,
    ]);
    await confirm(token).expect(204);
  });
});

describe('after the new password (OWASP Forgot Password Cheat Sheet: end every session)', () => {
  it('the old password, the old refresh cookie and the old access token fail; the new password signs in; nothing else is written', async () => {
    const { user, password } = await makeUser(b.t);
    const phone = await signIn(b.t, user.email, password);
    const laptop = await signIn(b.t, user.email, password);
    await b.t.http.get('/api/auth/me').set('Authorization', `Bearer ${phone.token}`).expect(200);
    const { token } = await requestLink(user.email);

    const snapshot = async () => ({
      users: await b.t.dataSource.getRepository(User).find({ order: { id: 'ASC' } }),
      sessions: await b.t.dataSource.getRepository(AuthSession).find({ order: { id: 'ASC' } }),
      resets: await b.t.dataSource
        .getRepository(PasswordResetTokenEntity)
        .find({ order: { id: 'ASC' } }),
      outbox: await outbox().count(),
    });
    const before = await snapshot();
    await confirm(token).expect(204);
    const after = await snapshot();

    // Exactly: this user's hash, this link's used time, this user's live sessions revoked.
    const strip = <T extends object>(rows: T[], id: (row: T) => boolean, keys: Array<keyof T>) =>
      rows.map((row) =>
        id(row)
          ? Object.fromEntries(Object.entries(row).filter(([k]) => !keys.includes(k as keyof T)))
          : row,
      );
    expect(strip(after.users, (u) => u.id === user.id, ['passwordHash', 'updatedAt'])).toEqual(
      strip(before.users, (u) => u.id === user.id, ['passwordHash', 'updatedAt']),
    );
    expect(after.users.find((u) => u.id === user.id)!.passwordHash).not.toBe(
      before.users.find((u) => u.id === user.id)!.passwordHash,
    );
    const mine = (s: AuthSession) => s.userId === user.id;
    expect(strip(after.sessions, mine, ['revokedAt', 'revokedReason'])).toEqual(
      strip(before.sessions, mine, ['revokedAt', 'revokedReason']),
    );
    const ended = after.sessions.filter(mine);
    expect(ended).toHaveLength(2);
    for (const s of ended) {
      expect(s.revokedReason).toBe('password_reset');
      expect(s.revokedAt?.toISOString()).toBe(TEST_NOW);
    }
    const used = (r: PasswordResetTokenEntity) => r.tokenHash === sha256(token);
    expect(strip(after.resets, used, ['usedAt'])).toEqual(strip(before.resets, used, ['usedAt']));
    expect(after.resets.find(used)!.usedAt?.toISOString()).toBe(TEST_NOW);
    expect(after.outbox).toBe(before.outbox);

    // The old password, the old refresh cookies and the old access tokens.
    await b.t.http.post('/api/auth/login').send({ email: user.email, password }).expect(401);
    for (const device of [phone, laptop]) {
      await b.t.http
        .post('/api/auth/refresh')
        .set('Origin', TEST_ORIGIN)
        .set('Cookie', device.cookie)
        .expect(401);
      await b.t.http.get('/api/auth/me').set('Authorization', `Bearer ${device.token}`).expect(401);
    }
    // The new password.
    const fresh = await signIn(b.t, user.email, NEW_PASSWORD);
    await b.t.http.get('/api/auth/me').set('Authorization', `Bearer ${fresh.token}`).expect(200);
  });
});

describe('abuse limits (QUALITY.md Abuse)', () => {
  it(`caps e-mails at ${RESET_EMAILS_PER_HOUR} an hour per account; the next request looks the same and sends nothing`, async () => {
    const { user } = await makeUser(b.t);
    let last = '';
    for (let i = 0; i < RESET_EMAILS_PER_HOUR; i += 1) {
      last = (await requestLink(user.email)).token;
      b.clock.advance(10 * MINUTE);
    }
    // The 4th, 30 minutes after the first: same answer, no e-mail, and the last link still works.
    const fourth = await ask(b.t, user.email).expect(202);
    expect(fourth.body).toEqual({ message: RESET_REQUESTED_MESSAGE });
    expect((await resetMailIds(user.email)).size).toBe(RESET_EMAILS_PER_HOUR);
    expect(await resetRows(user.id)).toHaveLength(RESET_EMAILS_PER_HOUR);
    // An hour after the first e-mail, one more may go.
    b.clock.set(new Date(new Date(TEST_NOW).getTime() + 60 * MINUTE + 1000));
    await requestLink(user.email);
    expect((await resetMailIds(user.email)).size).toBe(RESET_EMAILS_PER_HOUR + 1);
    // That newer link replaced the third one.
    await confirm(last).expect(400);
  });

  it('throttles requests per client address: 429 with Retry-After, whichever addresses are asked for', async () => {
    defaultThrottles();
    const own = await bootResetApp(false);
    try {
      const statuses: number[] = [];
      let retryAfter: string | undefined;
      for (let i = 0; i < 6; i += 1) {
        const res = await ask(own.t, uniqueEmail(`spray-${i}`));
        statuses.push(res.status);
        if (res.status === 429) retryAfter = res.headers['retry-after'] as string | undefined;
      }
      // 5 requests per 15 minutes per address (password-reset.controller.ts).
      expect(statuses).toEqual([202, 202, 202, 202, 202, 429]);
      expect(Number(retryAfter)).toBeGreaterThan(0);
      expect(Number(retryAfter)).toBeLessThanOrEqual(15 * 60);

      // New-password attempts: 10 a minute per address, as sign-in (AUTH_THROTTLE_LIMIT).
      const confirms: number[] = [];
      let confirmRetryAfter: string | undefined;
      for (let i = 0; i < 12; i += 1) {
        const res = await own.t.http
          .post('/api/auth/password-reset/confirm')
          .send({ token: 'B'.repeat(43), password: NEW_PASSWORD });
        confirms.push(res.status);
        if (res.status === 429)
          confirmRetryAfter = res.headers['retry-after'] as string | undefined;
      }
      expect(confirms).toEqual([...Array<number>(10).fill(400), 429, 429]);
      expect(Number(confirmRetryAfter)).toBeGreaterThan(0);
    } finally {
      raiseThrottles();
      await own.t.close();
    }
  });
});
