import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { chefUser, clientUser, sessionFor, staffUser } from '../../testing/fixtures';
import { createPrepApi } from '../../testing/prep-api';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

async function signIn(user: ReturnType<typeof renderApp>['user'], email: string) {
  await user.type(await screen.findByLabelText('E-mail'), email);
  await user.type(screen.getByLabelText('Password'), 'plated-demo-passphrase');
  await user.click(screen.getByRole('button', { name: 'Sign in' }));
}

describe('Sign in (kitchen)', () => {
  it('a signed-out visit goes to Sign in', async () => {
    const { router } = renderApp('/');
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Sign in to the kitchen' }),
    ).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(screen.getByText(/Team accounts are created by the chef/)).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: /create/i })).not.toBeInTheDocument();
  });

  it('shows the shared validation messages', async () => {
    const { user } = renderApp('/sign-in');
    await user.click(await screen.findByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter your e-mail address.')).toBeInTheDocument();
    expect(screen.getByText('Enter your password.')).toBeInTheDocument();
  });

  it('the chef lands on Today, greeted by name with the role', async () => {
    server.use(
      http.post('/api/auth/login', () => HttpResponse.json(sessionFor(chefUser))),
      ...createPrepApi({ user: chefUser, events: [], waitingRequests: 1 }).handlers,
    );
    const { user, router } = renderApp('/sign-in');
    await signIn(user, chefUser.email);

    expect(await screen.findByRole('heading', { level: 1, name: /, Inès$/ })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/');
    expect(await screen.findByRole('complementary', { name: 'Requests' })).toHaveTextContent(
      '1 request waiting for your decision',
    );
    expect(document.title).toBe('Today · Nappe kitchen');
  });

  it('staff land on Today too, without the chef’s requests panel', async () => {
    server.use(
      http.post('/api/auth/login', () => HttpResponse.json(sessionFor(staffUser))),
      ...createPrepApi({ user: staffUser, events: [] }).handlers,
    );
    const { user } = renderApp('/sign-in');
    await signIn(user, staffUser.email);

    expect(await screen.findByRole('heading', { level: 1, name: /, Tomás$/ })).toBeInTheDocument();
    expect(await screen.findByText('Nothing to prep today.')).toBeInTheDocument();
    expect(screen.queryByRole('complementary', { name: 'Requests' })).not.toBeInTheDocument();
  });

  it('turns a client away with a clear message, a link to the storefront, and signs them out', async () => {
    let loggedOutWith: string | null = null;
    server.use(
      http.post('/api/auth/login', () => HttpResponse.json(sessionFor(clientUser))),
      http.post('/api/auth/logout', ({ request }) => {
        loggedOutWith = request.headers.get('Authorization');
        return new HttpResponse(null, { status: 204 });
      }),
    );
    const { user, router } = renderApp('/sign-in');
    await signIn(user, clientUser.email);

    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('This is the studio’s kitchen app')).toBeInTheDocument();
    expect(within(alert).getByText(/your account is a client account/)).toBeInTheDocument();
    expect(within(alert).getByRole('link', { name: 'Go to the storefront' })).toHaveAttribute(
      'href',
      'http://localhost:5173',
    );
    await waitFor(() => expect(loggedOutWith).toBe(`Bearer token-for-${clientUser.id}`));
    expect(router.state.location.pathname).toBe('/sign-in');
  });

  it('does not adopt a client session found in the shared cookie, and does not revoke it', async () => {
    let logouts = 0;
    server.use(
      http.post('/api/auth/refresh', () => HttpResponse.json(sessionFor(clientUser))),
      http.post('/api/auth/logout', () => {
        logouts += 1;
        return new HttpResponse(null, { status: 204 });
      }),
    );
    const { router } = renderApp('/');
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Sign in to the kitchen' }),
    ).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(logouts).toBe(0);
  });

  it('shows a 401 from the server', async () => {
    server.use(
      http.post('/api/auth/login', () =>
        HttpResponse.json(
          { statusCode: 401, message: 'Wrong e-mail or password.', error: 'Unauthorized' },
          { status: 401 },
        ),
      ),
    );
    const { user } = renderApp('/sign-in');
    await signIn(user, chefUser.email);
    expect(await screen.findByRole('alert')).toHaveTextContent('Wrong e-mail or password.');
  });

  it('returns to the page asked for after signing in', async () => {
    server.use(
      http.post('/api/auth/login', () => HttpResponse.json(sessionFor(chefUser))),
      http.get('/api/users', () =>
        HttpResponse.json({ items: [], total: 0, page: 1, pageSize: 20 }),
      ),
    );
    const { user, router } = renderApp('/studio/team');
    expect(await screen.findByLabelText('E-mail')).toBeInTheDocument();
    expect(router.state.location.search).toBe('?redirectTo=%2Fstudio%2Fteam');
    await signIn(user, chefUser.email);

    expect(
      await screen.findByRole('heading', { level: 1, name: 'Team and client accounts' }),
    ).toBeInTheDocument();
  });
});
