import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { setupServer } from 'msw/node';
import { Role, type AuthSession, type AuthUser } from '@nappe/shared';
import { afterAll, afterEach, beforeAll } from 'vitest';
import { ApiError, createApiClient, fileNameFrom, parseRetryAfter } from './api-client';

// Nobody signed in unless a test says otherwise: the refresh cookie is refused.
const server = setupServer(
  http.post('/api/auth/refresh', () =>
    HttpResponse.json({ statusCode: 401, message: 'Unauthorized' }, { status: 401 }),
  ),
);
beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterEach(() => server.resetHandlers());
afterAll(() => server.close());

const clientUser: AuthUser = {
  id: 'user-client',
  email: 'client@example.test',
  name: 'Client Person',
  role: Role.Client,
};
const sessionFor = (user: AuthUser, accessToken: string): AuthSession => ({
  accessToken,
  tokenType: 'Bearer',
  expiresIn: 900,
  user,
});

const OLD = 'expired-token';
const NEW = 'fresh-token';

/** A protected endpoint that accepts only the fresh token, and a counted refresh endpoint. */
function expiredTokenApi() {
  const seen: (string | null)[] = [];
  let refreshes = 0;
  server.use(
    http.get('/api/auth/me', ({ request }) => {
      const auth = request.headers.get('Authorization');
      seen.push(auth);
      return auth === `Bearer ${NEW}`
        ? HttpResponse.json(clientUser)
        : HttpResponse.json({ statusCode: 401, message: 'Unauthorized' }, { status: 401 });
    }),
    http.post('/api/auth/refresh', async ({ request }) => {
      refreshes += 1;
      expect(request.credentials).toBe('include');
      // Slow enough that every failed request is waiting on the same refresh.
      await new Promise((resolve) => setTimeout(resolve, 30));
      return HttpResponse.json(sessionFor(clientUser, NEW));
    }),
  );
  return { seen, refreshes: () => refreshes };
}

describe('api client', () => {
  it('attaches the Bearer token and keeps it in memory only', async () => {
    const client = createApiClient({ basePath: '/api' });
    const { seen } = expiredTokenApi();
    client.setSession(sessionFor(clientUser, NEW));

    await expect(client.get('/auth/me')).resolves.toEqual(clientUser);
    expect(seen).toEqual([`Bearer ${NEW}`]);
    expect(window.localStorage.length).toBe(0);
    expect(window.sessionStorage.length).toBe(0);
  });

  it('on a 401 refreshes once and retries the request', async () => {
    const client = createApiClient({ basePath: '/api' });
    const api = expiredTokenApi();
    client.setSession(sessionFor(clientUser, OLD));

    await expect(client.get('/auth/me')).resolves.toEqual(clientUser);
    expect(api.refreshes()).toBe(1);
    expect(api.seen).toEqual([`Bearer ${OLD}`, `Bearer ${NEW}`]);
    expect(client.getAccessToken()).toBe(NEW);
  });

  it('shares one refresh between concurrent 401s (single flight)', async () => {
    const client = createApiClient({ basePath: '/api' });
    const api = expiredTokenApi();
    client.setSession(sessionFor(clientUser, OLD));

    const results = await Promise.all([
      client.get('/auth/me'),
      client.get('/auth/me'),
      client.get('/auth/me'),
      client.get('/auth/me'),
    ]);

    expect(results).toEqual([clientUser, clientUser, clientUser, clientUser]);
    expect(api.refreshes()).toBe(1);
    expect(api.seen.filter((h) => h === `Bearer ${OLD}`)).toHaveLength(4);
    expect(api.seen.filter((h) => h === `Bearer ${NEW}`)).toHaveLength(4);
  });

  it('retries with the newer token, without a second refresh, when one landed meanwhile', async () => {
    const client = createApiClient({ basePath: '/api' });
    let refreshes = 0;
    const seen: (string | null)[] = [];
    server.use(
      http.get('/api/auth/me', async ({ request }) => {
        const auth = request.headers.get('Authorization');
        seen.push(auth);
        if (auth === `Bearer ${NEW}`) return HttpResponse.json(clientUser);
        // The old token's 401 arrives only after the other refresh has finished.
        await new Promise((resolve) => setTimeout(resolve, 60));
        return HttpResponse.json({ statusCode: 401, message: 'Unauthorized' }, { status: 401 });
      }),
      http.post('/api/auth/refresh', async () => {
        refreshes += 1;
        await new Promise((resolve) => setTimeout(resolve, 10));
        return HttpResponse.json(sessionFor(clientUser, NEW));
      }),
    );
    client.setSession(sessionFor(clientUser, OLD));

    const pending = client.get('/auth/me');
    await client.refreshSession();

    await expect(pending).resolves.toEqual(clientUser);
    expect(refreshes).toBe(1);
    expect(seen).toEqual([`Bearer ${OLD}`, `Bearer ${NEW}`]);
  });

  it('ends the session when the refresh is refused, and says so', async () => {
    const client = createApiClient({ basePath: '/api' });
    const listener = vi.fn();
    client.subscribe(listener);
    server.use(
      http.get('/api/auth/me', () =>
        HttpResponse.json({ statusCode: 401, message: 'Unauthorized' }, { status: 401 }),
      ),
    );
    client.setSession(sessionFor(clientUser, OLD));
    listener.mockClear();

    const error = await client.get('/auth/me').catch((e: unknown) => e);

    expect(error).toBeInstanceOf(ApiError);
    expect((error as ApiError).status).toBe(401);
    expect(client.getAccessToken()).toBeNull();
    expect(listener).toHaveBeenCalledWith(null);
  });

  it('never refreshes for the sign-in endpoints: their 401 is an answer', async () => {
    const client = createApiClient({ basePath: '/api' });
    let refreshes = 0;
    server.use(
      http.post('/api/auth/refresh', () => {
        refreshes += 1;
        return HttpResponse.json(sessionFor(clientUser, NEW));
      }),
      http.post('/api/auth/login', () =>
        HttpResponse.json(
          { statusCode: 401, message: 'Wrong e-mail or password.' },
          { status: 401 },
        ),
      ),
    );

    const error = (await client
      .post('/auth/login', { email: 'a@b.test', password: 'x' }, { auth: false })
      .catch((e: unknown) => e)) as ApiError;

    expect(error.messages).toEqual(['Wrong e-mail or password.']);
    expect(refreshes).toBe(0);
  });

  it('restores a session from the cookie on start, or reports nobody signed in', async () => {
    const client = createApiClient({ basePath: '/api' });
    expect(await client.restoreSession()).toBeNull(); // default handler: 401

    server.use(
      http.post('/api/auth/refresh', () => HttpResponse.json(sessionFor(clientUser, NEW))),
    );
    expect((await client.restoreSession())?.user).toEqual(clientUser);
    expect(client.getAccessToken()).toBe(NEW);
  });

  it('turns Nest error bodies into messages, lists included', async () => {
    const client = createApiClient({ basePath: '/api' });
    server.use(
      http.post('/api/auth/register', () =>
        HttpResponse.json(
          {
            statusCode: 400,
            message: ['email must be an email', 'property nickname should not exist'],
            error: 'Bad Request',
          },
          { status: 400 },
        ),
      ),
    );
    const error = (await client
      .post('/auth/register', {}, { auth: false })
      .catch((e: unknown) => e)) as ApiError;
    expect(error.status).toBe(400);
    expect(error.messages).toEqual([
      'email must be an email',
      'property nickname should not exist',
    ]);
  });

  it('answers a 204 with no body', async () => {
    const client = createApiClient({ basePath: '/api' });
    server.use(http.post('/api/auth/logout', () => new HttpResponse(null, { status: 204 })));
    client.setSession(sessionFor(clientUser, NEW));
    await expect(client.post('/auth/logout')).resolves.toBeUndefined();
  });

  it('reports an unreachable server as status 0 with a readable message', async () => {
    const client = createApiClient({ basePath: '/api' });
    server.use(http.get('/api/studio', () => HttpResponse.error()));
    const error = (await client.get('/studio').catch((e: unknown) => e)) as ApiError;
    expect(error.status).toBe(0);
    expect(error.message).toMatch(/could not reach Nappe/);
  });
});

describe('extra headers and files', () => {
  it('sends the headers it is given, such as an idempotency key', async () => {
    const client = createApiClient({ basePath: '/api' });
    let key: string | null = null;
    server.use(
      http.post('/api/orders', ({ request }) => {
        key = request.headers.get('Idempotency-Key');
        return HttpResponse.json({ id: 'order-1' }, { status: 201 });
      }),
    );
    client.setSession(sessionFor(clientUser, NEW));
    await client.post('/orders', {}, { headers: { 'Idempotency-Key': 'attempt-1' } });
    expect(key).toBe('attempt-1');
  });

  it('downloads a file with the Bearer token, refreshing it first when it has expired', async () => {
    const client = createApiClient({ basePath: '/api' });
    server.use(
      http.get('/api/orders/order-1/event.ics', ({ request }) =>
        request.headers.get('Authorization') === `Bearer ${NEW}`
          ? new HttpResponse('BEGIN:VCALENDAR', {
              headers: {
                'Content-Type': 'text/calendar',
                'Content-Disposition': 'attachment; filename="event.ics"',
              },
            })
          : HttpResponse.json({ statusCode: 401, message: 'Unauthorized' }, { status: 401 }),
      ),
      http.post('/api/auth/refresh', () => HttpResponse.json(sessionFor(clientUser, NEW))),
    );
    client.setSession(sessionFor(clientUser, OLD));
    const file = await client.download('/orders/order-1/event.ics');
    expect(file.fileName).toBe('event.ics');
    expect(file.blob.type).toBe('text/calendar');
    expect(await file.blob.text()).toBe('BEGIN:VCALENDAR');
  });
});

describe('uploads (XMLHttpRequest, for progress)', () => {
  it('sends the form with the Bearer token, refreshing it once on a 401', async () => {
    const seen: (string | null)[] = [];
    server.use(
      http.post('/api/desserts/d1/photo', async ({ request }) => {
        const auth = request.headers.get('Authorization');
        seen.push(auth);
        if (auth !== `Bearer ${NEW}`) {
          return HttpResponse.json({ statusCode: 401, message: 'Unauthorized' }, { status: 401 });
        }
        const form = await request.formData();
        return HttpResponse.json({ received: form.has('file') }, { status: 201 });
      }),
      http.post('/api/auth/refresh', () => HttpResponse.json(sessionFor(clientUser, NEW))),
    );
    const client = createApiClient({ basePath: '/api' });
    client.setSession(sessionFor(clientUser, OLD));
    const form = new FormData();
    form.append('file', new File([new Uint8Array(2048)], 'plate.webp', { type: 'image/webp' }));
    await expect(client.upload('/desserts/d1/photo', form)).resolves.toEqual({ received: true });
    expect(seen).toEqual([`Bearer ${OLD}`, `Bearer ${NEW}`]);
    expect(client.getAccessToken()).toBe(NEW);
  });

  it('turns a 413 without a JSON body into words a person can act on', async () => {
    server.use(
      http.post('/api/desserts/d1/photo', () => new HttpResponse('Too large', { status: 413 })),
    );
    const client = createApiClient({ basePath: '/api' });
    client.setSession(sessionFor(clientUser, NEW));
    const error = await client
      .upload('/desserts/d1/photo', new FormData())
      .catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect((error as ApiError).status).toBe(413);
    expect((error as ApiError).messages).toEqual([
      'The file is too large for the server. Send a smaller one.',
    ]);
  });
});

describe('fileNameFrom (Content-Disposition, RFC 6266)', () => {
  it('reads the examples of RFC 6266 §5', () => {
    expect(fileNameFrom('Attachment; filename=example.html')).toBe('example.html');
    // With both forms, the RFC 8187 `filename*` wins: "€ rates.txt".
    expect(
      fileNameFrom(`attachment; filename="EURO rates.txt"; filename*=utf-8''%e2%82%ac%20rates.txt`),
    ).toBe('€ rates.txt');
    expect(fileNameFrom(`attachment; filename*= UTF-8''%e2%82%ac%20rates.txt`)).toBe('€ rates.txt');
  });

  it('never lets a name point into a folder, and gives up on nothing usable', () => {
    expect(fileNameFrom('attachment; filename="../../etc/passwd"')).toBe('.._.._etc_passwd');
    expect(fileNameFrom('inline')).toBeNull();
    expect(fileNameFrom(null)).toBeNull();
  });
});

describe('parseRetryAfter', () => {
  // RFC 9110 §10.2.3: Retry-After = HTTP-date / delay-seconds.
  it('reads delay-seconds', () => {
    expect(parseRetryAfter('120')).toBe(120);
  });
  it('reads an HTTP-date relative to now', () => {
    // The example date of RFC 9110 §5.6.7 ("Sun, 06 Nov 1994 08:49:37 GMT").
    const now = Date.parse('Sun, 06 Nov 1994 08:48:37 GMT');
    expect(parseRetryAfter('Sun, 06 Nov 1994 08:49:37 GMT', now)).toBe(60);
  });
  it('ignores absent or unreadable values', () => {
    expect(parseRetryAfter(null)).toBeNull();
    expect(parseRetryAfter('soon')).toBeNull();
  });
});
