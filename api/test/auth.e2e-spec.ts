import { createHmac } from 'node:crypto';
import { Role } from '@nappe/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { User } from '../src/users/entities/user.entity.js';
import {
  createTestApp,
  GOOD_PASSWORD,
  makeSignedInUser,
  makeUser,
  signIn,
  TEST_ORIGIN,
  uniqueEmail,
  type TestApp,
} from './factories/test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => t.close());

function cookiesOf(res: { headers: Record<string, unknown> }): string[] {
  return ([] as string[]).concat((res.headers['set-cookie'] as string[] | undefined) ?? []);
}

/** Signs a JWT by hand, to forge tokens the API must refuse (RFC 7519 / RFC 7515 compact form). */
function forge(header: object, payload: object, secret: string): string {
  const b64 = (o: object) => Buffer.from(JSON.stringify(o)).toString('base64url');
  const unsigned = `${b64(header)}.${b64(payload)}`;
  return `${unsigned}.${createHmac('sha256', secret).update(unsigned).digest('base64url')}`;
}

describe('POST /api/auth/register', () => {
  it('creates a client, returns a session and sets a locked-down refresh cookie', async () => {
    const email = uniqueEmail('new');
    const res = await t.http
      .post('/api/auth/register')
      .send({ name: 'Anouk Pereira', email: email.toUpperCase(), password: GOOD_PASSWORD })
      .expect(201);
    expect(res.body).toMatchObject({
      tokenType: 'Bearer',
      expiresIn: 900,
      user: { email, name: 'Anouk Pereira', role: 'client' },
    });
    expect(res.body.accessToken).toMatch(/^[\w-]+\.[\w-]+\.[\w-]+$/);
    expect(JSON.stringify(res.body)).not.toMatch(/argon2|password/i);
    const cookie = cookiesOf(res).find((c) => c.startsWith('nappe_refresh='));
    // QUALITY.md / OWASP ASVS 5.0 V3.3: HttpOnly; Secure; SameSite=Strict, scoped to the auth routes.
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/Secure/);
    expect(cookie).toMatch(/SameSite=Strict/);
    expect(cookie).toMatch(/Path=\/api\/auth/);
    const stored = await t.dataSource.getRepository(User).findOneByOrFail({ email });
    // PHC string format: $argon2id$v=19$<params>$salt$hash; OWASP minimum m=19 MiB, t=2, p=1.
    const [, algorithm, version, params] = stored.passwordHash.split('$');
    expect(algorithm).toBe('argon2id');
    expect(version).toBe('v=19');
    expect(Object.fromEntries(params!.split(',').map((kv) => kv.split('=')))).toEqual({
      m: '19456',
      t: '2',
      p: '1',
    });
  });

  it('refuses an e-mail that is already registered (409)', async () => {
    const email = uniqueEmail('dup');
    await t.http
      .post('/api/auth/register')
      .send({ name: 'A', email, password: GOOD_PASSWORD })
      .expect(201);
    const res = await t.http
      .post('/api/auth/register')
      .send({ name: 'B', email, password: GOOD_PASSWORD })
      .expect(409);
    expect(res.body.message).toMatch(/already exists/);
  });

  it('refuses a short password with a readable message (400)', async () => {
    const res = await t.http
      .post('/api/auth/register')
      .send({ name: 'A', email: uniqueEmail(), password: 'short' })
      .expect(400);
    expect(res.body.message.join(' ')).toMatch(/at least 12 characters/);
  });

  it('refuses a common or guessable password with a readable message (OWASP ASVS 5.0 V6.2.4)', async () => {
    for (const password of ['password1234', '123456789012']) {
      const res = await t.http
        .post('/api/auth/register')
        .send({ name: 'Common', email: uniqueEmail('common'), password })
        .expect(400);
      expect(res.body.message).toEqual([expect.stringMatching(/too easy to guess/)]);
    }
  });

  it('refuses unknown or server-owned fields such as role (mass assignment, 400)', async () => {
    const res = await t.http
      .post('/api/auth/register')
      .send({ name: 'Mallory', email: uniqueEmail(), password: GOOD_PASSWORD, role: 'chef' })
      .expect(400);
    expect(res.body.message.join(' ')).toMatch(/property role should not exist/);
  });

  it('refuses CR/LF in a name (no header injection into e-mails later)', async () => {
    await t.http
      .post('/api/auth/register')
      .send({ name: 'Eve\r\nBcc: x@example.test', email: uniqueEmail(), password: GOOD_PASSWORD })
      .expect(400);
  });

  it('never truncates a password: the 72-byte prefix of an 80-byte password fails (QUALITY.md)', async () => {
    const password =
      'a slow caramel, a quick quince, rye crumble & a spoon of burnt honey ice cream!!';
    expect(Buffer.byteLength(password)).toBe(80);
    const email = uniqueEmail('long');
    await t.http.post('/api/auth/register').send({ name: 'Long', email, password }).expect(201);
    await t.http
      .post('/api/auth/login')
      .send({ email, password: password.slice(0, 72) })
      .expect(401);
    await t.http.post('/api/auth/login').send({ email, password }).expect(200);
  });
});

describe('POST /api/auth/login and GET /api/auth/me', () => {
  it('signs in and reports who is signed in', async () => {
    const { user, password } = await makeUser(t, { role: Role.Chef, name: 'Odile Marchetti' });
    const { token } = await signIn(t, user.email, password);
    const me = await t.http.get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(200);
    expect(me.body).toEqual({
      id: user.id,
      email: user.email,
      name: 'Odile Marchetti',
      role: 'chef',
    });
  });

  it('answers 401 with the same message for a wrong password and an unknown account', async () => {
    const { user } = await makeUser(t);
    const wrong = await t.http
      .post('/api/auth/login')
      .send({ email: user.email, password: 'not the password' })
      .expect(401);
    const unknown = await t.http
      .post('/api/auth/login')
      .send({ email: uniqueEmail(), password: 'whatever it is' })
      .expect(401);
    expect(wrong.body.message).toBe('Wrong e-mail or password.');
    expect(unknown.body.message).toBe(wrong.body.message);
  });

  it('answers 401 without a token', async () => {
    await t.http.get('/api/auth/me').expect(401);
  });

  it('refuses forged, tampered, expired and foreign tokens (OWASP ASVS 5.0 V9.1)', async () => {
    const { user, token } = await makeSignedInUser(t, Role.Client);
    const [, payloadPart] = token.split('.');
    const claims = JSON.parse(Buffer.from(payloadPart!, 'base64url').toString()) as Record<
      string,
      unknown
    >;
    const now = Math.floor(Date.now() / 1000);
    const secret = t.env.JWT_SECRET;
    const hs256 = { alg: 'HS256', typ: 'JWT' };
    const cases: Record<string, string> = {
      'alg none': `${Buffer.from(JSON.stringify({ alg: 'none', typ: 'JWT' })).toString('base64url')}.${payloadPart}.`,
      'wrong secret': forge(hs256, claims, 'another-secret-that-is-long-enough-1234567890'),
      'tampered payload': `${token.split('.')[0]}.${Buffer.from(JSON.stringify({ ...claims, role: 'chef' })).toString('base64url')}.${token.split('.')[2]}`,
      expired: forge(hs256, { ...claims, iat: now - 2000, exp: now - 1000 }, secret),
      'wrong audience': forge(hs256, { ...claims, aud: 'someone-else' }, secret),
      'HS512 not allowed': forge({ alg: 'HS512', typ: 'JWT' }, claims, secret),
    };
    for (const [name, forged] of Object.entries(cases)) {
      const res = await t.http.get('/api/auth/me').set('Authorization', `Bearer ${forged}`);
      expect(res.status, name).toBe(401);
    }
    // and the untouched token still works
    await t.http.get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(200);
    expect(user.id).toBe(claims.sub);
  });

  it('never accepts the token in the URL', async () => {
    const { token } = await makeSignedInUser(t, Role.Client);
    await t.http.get(`/api/auth/me?access_token=${token}`).expect(401);
  });

  it('applies a role change on the very next request', async () => {
    const { user, token } = await makeSignedInUser(t, Role.Client);
    await t.http.get('/api/users').set('Authorization', `Bearer ${token}`).expect(403);
    await t.dataSource.getRepository(User).update(user.id, { role: Role.Chef });
    await t.http.get('/api/users').set('Authorization', `Bearer ${token}`).expect(200);
  });
});

describe('POST /api/auth/refresh', () => {
  it('rotates the refresh cookie and issues a new access token', async () => {
    const { user, password } = await makeUser(t);
    const { cookie } = await signIn(t, user.email, password);
    const res = await t.http
      .post('/api/auth/refresh')
      .set('Origin', TEST_ORIGIN)
      .set('Cookie', cookie)
      .expect(200);
    expect(res.body.user.id).toBe(user.id);
    const rotated = cookiesOf(res)
      .find((c) => c.startsWith('nappe_refresh='))!
      .split(';')[0]!;
    expect(rotated).not.toBe(cookie);
    await t.http
      .get('/api/auth/me')
      .set('Authorization', `Bearer ${res.body.accessToken}`)
      .expect(200);
    // The replaced token no longer refreshes; the new one does.
    await t.http
      .post('/api/auth/refresh')
      .set('Origin', TEST_ORIGIN)
      .set('Cookie', cookie)
      .expect(401);
    await t.http
      .post('/api/auth/refresh')
      .set('Origin', TEST_ORIGIN)
      .set('Cookie', rotated)
      .expect(200);
  });

  it('only answers our own apps: a missing or foreign Origin is 403', async () => {
    const { user, password } = await makeUser(t);
    const { cookie } = await signIn(t, user.email, password);
    await t.http.post('/api/auth/refresh').set('Cookie', cookie).expect(403);
    await t.http
      .post('/api/auth/refresh')
      .set('Origin', 'https://evil.example')
      .set('Cookie', cookie)
      .expect(403);
  });

  it('answers 401 without a cookie or with a made-up one', async () => {
    await t.http.post('/api/auth/refresh').set('Origin', TEST_ORIGIN).expect(401);
    await t.http
      .post('/api/auth/refresh')
      .set('Origin', TEST_ORIGIN)
      .set('Cookie', 'nappe_refresh=abc.def')
      .expect(401);
  });
});

describe('separate sessions for the two apps', () => {
  const ADMIN_ORIGIN = 'http://localhost:5174';

  it('gives the admin app its own refresh cookie, so a storefront sign-in never replaces it', async () => {
    const chef = await makeUser(t, { role: Role.Chef });
    const client = await makeUser(t);
    const admin = await t.http
      .post('/api/auth/login')
      .set('Origin', ADMIN_ORIGIN)
      .send({ email: chef.user.email, password: chef.password })
      .expect(200);
    const adminCookie = cookiesOf(admin)
      .find((c) => c.startsWith('nappe_refresh_admin='))!
      .split(';')[0]!;
    const shop = await t.http
      .post('/api/auth/login')
      .set('Origin', TEST_ORIGIN)
      .send({ email: client.user.email, password: client.password })
      .expect(200);
    const shopCookie = cookiesOf(shop)
      .find((c) => c.startsWith('nappe_refresh='))!
      .split(';')[0]!;
    const both = `${adminCookie}; ${shopCookie}`;
    const asAdmin = await t.http
      .post('/api/auth/refresh')
      .set('Origin', ADMIN_ORIGIN)
      .set('Cookie', both)
      .expect(200);
    expect(asAdmin.body.user.role).toBe('chef');
    const asShop = await t.http
      .post('/api/auth/refresh')
      .set('Origin', TEST_ORIGIN)
      .set('Cookie', both)
      .expect(200);
    expect(asShop.body.user.role).toBe('client');
  });
});

describe('POST /api/auth/logout', () => {
  it('ends the session: the access token and the refresh cookie stop working at once', async () => {
    const { user, password } = await makeUser(t);
    const { token, cookie } = await signIn(t, user.email, password);
    const res = await t.http
      .post('/api/auth/logout')
      .set('Authorization', `Bearer ${token}`)
      .expect(204);
    expect(cookiesOf(res).join(';')).toMatch(/nappe_refresh=;/);
    await t.http.get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(401);
    await t.http
      .post('/api/auth/refresh')
      .set('Origin', TEST_ORIGIN)
      .set('Cookie', cookie)
      .expect(401);
  });

  it('leaves the same user signed in on another device', async () => {
    const { user, password } = await makeUser(t);
    const phone = await signIn(t, user.email, password);
    const laptop = await signIn(t, user.email, password);
    await t.http.post('/api/auth/logout').set('Authorization', `Bearer ${phone.token}`).expect(204);
    await t.http.get('/api/auth/me').set('Authorization', `Bearer ${laptop.token}`).expect(200);
  });
});

describe('sign-in throttling (OWASP ASVS 5.0 V6.3.1)', () => {
  it('answers 429 with Retry-After after too many attempts on one account', async () => {
    const { user } = await makeUser(t);
    const statuses: number[] = [];
    let retryAfter: string | undefined;
    for (let i = 0; i < 12; i += 1) {
      const res = await t.http
        .post('/api/auth/login')
        .send({ email: user.email, password: `wrong guess ${i}` });
      statuses.push(res.status);
      if (res.status === 429) retryAfter = res.headers['retry-after'] as string | undefined;
    }
    expect(statuses.slice(0, 10).every((s) => s === 401)).toBe(true);
    expect(statuses.slice(10)).toEqual([429, 429]);
    expect(Number(retryAfter)).toBeGreaterThan(0);
    // Another account from the same address is not locked out by it.
    const other = await makeUser(t);
    await t.http
      .post('/api/auth/login')
      .send({ email: other.user.email, password: other.password })
      .expect(200);
  });
});
