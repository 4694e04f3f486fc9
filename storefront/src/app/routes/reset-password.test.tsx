import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

// The link is the one the API mails (api/src/auth/password-reset.service.ts):
// /reset-password?token= with 32 random bytes in base64url (43 characters, RFC 4648 §5).
// The messages are the API's own (api/src/auth/dto/password-reset.dto.ts, password-strength.ts).
const TOKEN = 'Qm9uYm9uLWF1LWNhcmFtZWwtZXQtZmxldXItZGUtc2V';
const LINK_UNUSABLE = 'This reset link has expired or was already used. Ask for a new one.';
const WEAK =
  'This password is too easy to guess: it is a common password or a simple pattern. A few unrelated words make a strong one.';

function confirmApi(answer: () => Response = () => new HttpResponse(null, { status: 204 })) {
  const sent: unknown[] = [];
  server.use(
    http.post('/api/auth/password-reset/confirm', async ({ request }) => {
      sent.push(await request.json());
      return answer();
    }),
  );
  return sent;
}

const badRequest = (message: string) => () =>
  HttpResponse.json({ statusCode: 400, message: [message], error: 'Bad Request' }, { status: 400 });

async function choose(user: ReturnType<typeof renderApp>['user'], password: string) {
  await user.type(await screen.findByLabelText('New password'), password);
  await user.click(screen.getByRole('button', { name: 'Save the new password' }));
}

describe('Choose a new password (/reset-password)', () => {
  it('says at once when the link has no usable token, without asking the server', async () => {
    expect(TOKEN).toHaveLength(43);
    const sent = confirmApi();
    for (const url of ['/reset-password', '/reset-password?token=cut-in-half']) {
      const { unmount } = renderApp(url);
      expect(
        await screen.findByRole('heading', { level: 1, name: 'This link cannot be used' }),
      ).toBeInTheDocument();
      expect(screen.getByRole('alert')).toHaveTextContent(/may have been cut when it was copied/);
      expect(screen.getByRole('link', { name: 'Ask for a new link' })).toHaveAttribute(
        'href',
        '/forgot-password',
      );
      expect(screen.queryByLabelText('New password')).not.toBeInTheDocument();
      unmount();
    }
    expect(sent).toEqual([]);
  });

  it('asks the browser not to send the address (and its token) to any other site', async () => {
    renderApp(`/reset-password?token=${TOKEN}`);
    await screen.findByLabelText('New password');
    await waitFor(() =>
      expect(document.querySelector('meta[name="referrer"]')).toHaveAttribute(
        'content',
        'no-referrer',
      ),
    );
    expect(document.title).toBe('Choose a new password · Nappe');
  });

  it('checks the length before sending, with show/hide on the field', async () => {
    const sent = confirmApi();
    const { user } = renderApp(`/reset-password?token=${TOKEN}`);
    await choose(user, 'short');
    // OWASP ASVS 5.0 V6.2.1: at least 12 characters (PASSWORD_MIN_LENGTH in shared/src/auth).
    expect(
      await screen.findByText('Use at least 12 characters — a few words make a good passphrase.'),
    ).toBeInTheDocument();
    const field = screen.getByLabelText('New password');
    expect(field).toHaveAttribute('aria-invalid', 'true');
    expect(field).toHaveAttribute('type', 'password');
    await user.click(screen.getByRole('button', { name: 'Show password' }));
    expect(field).toHaveAttribute('type', 'text');
    expect(sent).toEqual([]);
  });

  it('puts the server’s strength verdict on the field and keeps the form', async () => {
    const sent = confirmApi(badRequest(WEAK));
    const { user } = renderApp(`/reset-password?token=${TOKEN}`);
    await choose(user, 'password1234');
    expect(await screen.findByText(WEAK)).toBeInTheDocument();
    const field = screen.getByLabelText('New password');
    expect(field).toHaveAttribute('aria-invalid', 'true');
    await waitFor(() => expect(field).toHaveFocus());
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
    expect(sent).toEqual([{ token: TOKEN, password: 'password1234' }]);
  });

  it('an expired or used link: the server’s words and a way to ask again', async () => {
    confirmApi(badRequest(LINK_UNUSABLE));
    const { user, router } = renderApp(`/reset-password?token=${TOKEN}`);
    await choose(user, 'quince rye and smoked honey');
    expect(
      await screen.findByRole('heading', { level: 1, name: 'This link cannot be used' }),
    ).toBeInTheDocument();
    expect(within(screen.getByRole('alert')).getByText(LINK_UNUSABLE)).toBeInTheDocument();
    expect(screen.queryByLabelText('New password')).not.toBeInTheDocument();
    await user.click(screen.getByRole('link', { name: 'Ask for a new link' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/forgot-password'));
  });

  it('saves the new password, then offers Sign in', async () => {
    const sent = confirmApi();
    const { user, router } = renderApp(`/reset-password?token=${TOKEN}`);
    await choose(user, 'quince rye and smoked honey');
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Password changed' }),
    ).toBeInTheDocument();
    expect(screen.getByText(/signed out on every device/)).toBeInTheDocument();
    expect(sent).toEqual([{ token: TOKEN, password: 'quince rye and smoked honey' }]);
    await user.click(within(screen.getByRole('main')).getByRole('link', { name: 'Sign in' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/sign-in'));
  });

  it('tells how long to wait on a 429', async () => {
    confirmApi(() =>
      HttpResponse.json(
        { statusCode: 429, message: 'ThrottlerException: Too Many Requests' },
        { status: 429, headers: { 'Retry-After': '45' } },
      ),
    );
    const { user } = renderApp(`/reset-password?token=${TOKEN}`);
    await choose(user, 'quince rye and smoked honey');
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText(/choosing a new password is paused/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Save the new password' })).toBeDisabled();
  });
});
