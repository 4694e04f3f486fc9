import { Role, type AuthSession, type AuthUser } from '@nappe/shared';
import { QueryClientProvider } from '@tanstack/react-query';
import { act, renderHook, waitFor } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import type { ReactNode } from 'react';
import { describe, expect, it } from 'vitest';
import { makeTestClients } from '../testing/render.js';
import { networkError, recordPosts, server } from '../testing/server.js';
import { ApiClientProvider } from './api-client-provider.js';
import { authKeys } from './auth-keys.js';
import { useConfirmPasswordReset } from './confirm-password-reset.js';
import { useLogout } from './logout.js';
import { fetchSignedInUser, meQueryOptionsFor } from './me-query.js';
import { useApiClient } from './use-api-client.js';

// A session as the API answers sign-in and refresh (api/src/auth/dto/auth-session.dto.ts).
const chef: AuthUser = {
  id: 'user-chef',
  email: 'chef@example.test',
  name: 'Odile',
  role: Role.Chef,
};
const session = (accessToken: string): AuthSession => ({
  accessToken,
  tokenType: 'Bearer',
  expiresIn: 900,
  user: chef,
});

/** A cache with the signed-in person and one of their lists, as a screen leaves it. */
function signedIn() {
  const clients = makeTestClients();
  clients.client.setSession(session('token-1'));
  clients.queryClient.setQueryData(authKeys.me(), chef);
  clients.queryClient.setQueryData(['orders', 'list'], ['an order of theirs']);
  return clients;
}

/** Runs a hook inside the providers both apps set up (AppProvider). */
function hookIn<T>(useHook: () => T, clients: ReturnType<typeof makeTestClients>) {
  const { result } = renderHook(useHook, {
    wrapper: ({ children }: { children: ReactNode }) => (
      <QueryClientProvider client={clients.queryClient}>
        <ApiClientProvider client={clients.client}>{children}</ApiClientProvider>
      </QueryClientProvider>
    ),
  });
  return { current: () => result.current };
}

describe('ApiClientProvider', () => {
  it('gives the hooks the app’s client', () => {
    const clients = makeTestClients();
    const { current } = hookIn(useApiClient, clients);
    expect(current()).toBe(clients.client);
  });

  it('says plainly when an app forgot to give one', () => {
    expect(() => renderHook(() => useApiClient())).toThrow(
      'No ApiClientProvider above this component.',
    );
  });

  it('tells every screen at once when the session ends mid-way', () => {
    const clients = signedIn();
    hookIn(() => null, clients);
    act(() => clients.client.clearSession());
    expect(clients.queryClient.getQueryData(authKeys.me())).toBeNull();
  });
});

describe('useLogout', () => {
  it('ends the session on the server, then forgets the person and their data here', async () => {
    const clients = signedIn();
    const seen: (string | null)[] = [];
    server.use(
      http.post('/api/auth/logout', ({ request }) => {
        seen.push(request.headers.get('Authorization'));
        return new HttpResponse(null, { status: 204 });
      }),
    );
    const { current } = hookIn(useLogout, clients);
    await act(() => current().mutateAsync());
    expect(seen).toEqual(['Bearer token-1']);
    expect(clients.client.getAccessToken()).toBeNull();
    expect(clients.queryClient.getQueryData(authKeys.me())).toBeNull();
    expect(clients.queryClient.getQueryData(['orders', 'list'])).toBeUndefined();
  });

  it('forgets the person here even when the server cannot be reached', async () => {
    const clients = signedIn();
    server.use(http.post('/api/auth/logout', networkError()));
    const { current } = hookIn(useLogout, clients);
    await act(() =>
      current()
        .mutateAsync()
        .catch(() => undefined),
    );
    await waitFor(() => expect(clients.queryClient.getQueryData(authKeys.me())).toBeNull());
    expect(clients.client.getAccessToken()).toBeNull();
    expect(clients.queryClient.getQueryData(['orders', 'list'])).toBeUndefined();
  });

  it('asks nothing of the server when no session is held', async () => {
    // Any request would be unhandled here, which fails the test (onUnhandledRequest: 'error').
    const clients = makeTestClients();
    const { current } = hookIn(useLogout, clients);
    await act(() => current().mutateAsync());
    expect(clients.queryClient.getQueryData(authKeys.me())).toBeNull();
  });
});

describe('useConfirmPasswordReset', () => {
  it('a new password ends every session of the account: this browser forgets its own too', async () => {
    const clients = signedIn();
    const sent = recordPosts(
      '/auth/password-reset/confirm',
      () => new HttpResponse(null, { status: 204 }),
    );
    const { current } = hookIn(useConfirmPasswordReset, clients);
    const input = {
      token: 'Qm9uYm9uLWF1LWNhcmFtZWwtZXQtZmxldXItZGUtc2V',
      password: 'quince rye and smoked honey',
    };
    await act(() => current().mutateAsync(input));
    expect(sent).toEqual([input]);
    expect(clients.client.getAccessToken()).toBeNull();
    expect(clients.queryClient.getQueryData(authKeys.me())).toBeNull();
    expect(clients.queryClient.getQueryData(['orders', 'list'])).toBeUndefined();
  });
});

describe('fetchSignedInUser', () => {
  it('on a fresh page load: the refresh cookie, or nobody', async () => {
    const { client } = makeTestClients();
    expect(await fetchSignedInUser(client)).toBeNull();
    server.use(http.post('/api/auth/refresh', () => HttpResponse.json(session('token-2'))));
    expect(await fetchSignedInUser(client)).toEqual(chef);
    expect(client.getAccessToken()).toBe('token-2');
  });

  it('with a token: asks /auth/me; a refused session is nobody, any other failure is an error', async () => {
    const { client } = makeTestClients();
    client.setSession(session('token-1'));
    server.use(http.get('/api/auth/me', () => HttpResponse.json(chef)));
    expect(await fetchSignedInUser(client)).toEqual(chef);
    server.use(
      http.get('/api/auth/me', () =>
        HttpResponse.json({ statusCode: 401, message: 'Unauthorized' }, { status: 401 }),
      ),
    );
    expect(await fetchSignedInUser(client)).toBeNull();
    client.setSession(session('token-1'));
    server.use(
      http.get('/api/auth/me', () =>
        HttpResponse.json({ statusCode: 503, message: 'Service Unavailable' }, { status: 503 }),
      ),
    );
    await expect(fetchSignedInUser(client)).rejects.toMatchObject({ status: 503 });
  });

  it('is cached under the one key both apps read', () => {
    const getMe = () => Promise.resolve(null);
    const options = meQueryOptionsFor(getMe);
    expect(options.queryKey).toEqual(['auth', 'me']);
    expect(options.queryFn).toBe(getMe);
  });
});
