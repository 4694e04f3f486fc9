import { configure, screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeAll, describe, expect, it } from 'vitest';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';
import { createStudioApi } from '../../testing/studio-api';
import { tokens } from '../../testing/studio-fixtures';

// The link is the one the API mails (api/src/studio/team.service.ts): /accept-invitation?token=
// with 32 random bytes in base64url (43 characters, RFC 4648 §5). The messages are the API's.

function open(token?: string) {
  const api = createStudioApi();
  server.use(...api.handlers);
  const view = renderApp(
    token === undefined ? '/accept-invitation' : `/accept-invitation?token=${token}`,
  );
  return { ...view, api };
}

async function fill(user: ReturnType<typeof renderApp>['user'], name: string, password: string) {
  await user.type(await screen.findByLabelText('Your name'), name);
  await user.type(screen.getByLabelText('Choose a password'), password);
  await user.click(screen.getByRole('button', { name: 'Join the team' }));
}

describe('Accept invitation', () => {
  beforeAll(async () => {
    configure({ asyncUtilTimeout: 15_000 });
    await import('./accept-invitation');
  }, 30_000);

  it('says at once when the link has no usable token, without asking the server', async () => {
    const { api } = open();
    expect(
      await screen.findByRole('heading', { level: 1, name: 'This invitation cannot be used' }),
    ).toBeInTheDocument();
    expect(screen.getByText(/may have been cut when it was copied/)).toBeInTheDocument();
    expect(screen.queryByLabelText('Choose a password')).not.toBeInTheDocument();
    expect(api.state.requests).toEqual([]);
  });

  it('an expired link: the server’s reason, and no form to fill again', async () => {
    const { user } = open(tokens.expired);
    await fill(user, 'Léa Marchand', 'quince rye and smoked honey');
    const alert = await screen.findByRole('alert');
    expect(
      within(alert).getByText(
        'This invitation has expired (links work for 7 days). Ask the chef for a new one.',
      ),
    ).toBeInTheDocument();
    expect(
      screen.getByRole('heading', { level: 1, name: 'This invitation cannot be used' }),
    ).toBeVisible();
    expect(screen.queryByLabelText('Choose a password')).not.toBeInTheDocument();
    expect(screen.getByText(/The chef can send a new one from Studio → Team/)).toBeInTheDocument();
  }, 60_000);

  it('a link already used: says so and sends to Sign in', async () => {
    const { user } = open(tokens.used);
    await fill(user, 'Léa Marchand', 'quince rye and smoked honey');
    expect(await screen.findByText(/This invitation has already been used/)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Go to Sign in' })).toHaveAttribute('href', '/sign-in');
  }, 60_000);

  it('checks the password length before sending, and shows the server’s strength verdict', async () => {
    const { user, api } = open(tokens.valid);
    // OWASP ASVS 5.0 V6.2.1: at least 12 characters (PASSWORD_MIN_LENGTH in shared/src/auth).
    await fill(user, 'Léa Marchand', 'short');
    expect(
      await screen.findByText('Use at least 12 characters — a few words make a good passphrase.'),
    ).toBeInTheDocument();
    expect(api.state.requests).toEqual([]);

    const password = screen.getByLabelText('Choose a password');
    await user.clear(password);
    await user.type(password, 'password1234');
    await user.click(screen.getByRole('button', { name: 'Join the team' }));
    expect(
      await screen.findByText(
        'This password is too easy to guess: it is a common password or a simple pattern. A few unrelated words make a strong one.',
      ),
    ).toBeInTheDocument();
    expect(password).toHaveAttribute('aria-invalid', 'true');
    await waitFor(() => expect(document.activeElement).toBe(password));
    // The name typed is kept.
    expect(screen.getByLabelText('Your name')).toHaveValue('Léa Marchand');
  }, 60_000);

  it('accepts, signs the new member in and opens Today', async () => {
    const { user, router, api } = open(tokens.valid);
    // Today's own panels are not this test's: their data is answered "not found" (they show their
    // error states), while the studio's card comes from the default handler.
    server.use(
      http.get('/api/*', ({ request }) =>
        new URL(request.url).pathname === '/api/studio'
          ? undefined
          : HttpResponse.json(
              { statusCode: 404, message: 'Not part of this test.' },
              { status: 404 },
            ),
      ),
    );
    await fill(user, 'Léa Marchand', 'quince rye and smoked honey');

    await waitFor(() => expect(router.state.location.pathname).toBe('/'));
    expect(api.state.requests).toEqual([
      {
        method: 'POST',
        path: '/api/auth/accept-invitation',
        body: {
          token: tokens.valid,
          name: 'Léa Marchand',
          password: 'quince rye and smoked honey',
        },
      },
    ]);
    const account = await screen.findByText('lea.marchand@example.test');
    expect(account).toBeInTheDocument();
    expect(screen.getAllByText('Staff').length).toBeGreaterThan(0);
  }, 60_000);
});
