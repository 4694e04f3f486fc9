import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

// The form itself (length check, strength verdict on the field, 429, network errors) is tested
// once, in web-kit (src/auth/reset-password-form.test.tsx); here, the storefront's page around it.
// A token is 32 random bytes in base64url, 43 characters (RFC 4648 §5), as the API mails it.
const TOKEN = 'Qm9uYm9uLWF1LWNhcmFtZWwtZXQtZmxldXItZGUtc2V';

describe('Choose a new password (/reset-password, storefront)', () => {
  it('a link with no usable token: the problem page, no form, nothing sent', async () => {
    // Any request would be unhandled here, which fails the test (onUnhandledRequest: 'error').
    renderApp('/reset-password?token=cut-in-half');
    expect(
      await screen.findByRole('heading', { level: 1, name: 'This link cannot be used' }),
    ).toBeInTheDocument();
    expect(document.title).toBe('Reset link cannot be used · Nappe');
    expect(screen.getByRole('alert')).toHaveTextContent(/may have been cut when it was copied/);
    expect(screen.getByRole('link', { name: 'Ask for a new link' })).toHaveAttribute(
      'href',
      '/forgot-password',
    );
    expect(screen.queryByLabelText('New password')).not.toBeInTheDocument();
  });

  it('asks the browser to send no Referer, so the token stays on this page', async () => {
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

  it('a link the server refuses replaces the form with its words', async () => {
    // The API's one answer for an unknown, expired, used or replaced link (password-reset.dto.ts).
    const unusable = 'This reset link has expired or was already used. Ask for a new one.';
    server.use(
      http.post('/api/auth/password-reset/confirm', () =>
        HttpResponse.json({ statusCode: 400, message: [unusable] }, { status: 400 }),
      ),
    );
    const { user } = renderApp(`/reset-password?token=${TOKEN}`);
    await user.type(await screen.findByLabelText('New password'), 'quince rye and smoked honey');
    await user.click(screen.getByRole('button', { name: 'Save the new password' }));
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText(unusable)).toBeInTheDocument();
    expect(
      screen.getByRole('heading', { level: 1, name: 'This link cannot be used' }),
    ).toBeVisible();
    expect(screen.queryByLabelText('New password')).not.toBeInTheDocument();
  });

  it('saved: Password changed, then Sign in to follow the events', async () => {
    server.use(
      http.post('/api/auth/password-reset/confirm', () => new HttpResponse(null, { status: 204 })),
    );
    const { user, router } = renderApp(`/reset-password?token=${TOKEN}`);
    await user.type(await screen.findByLabelText('New password'), 'quince rye and smoked honey');
    await user.click(screen.getByRole('button', { name: 'Save the new password' }));
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Password changed' }),
    ).toBeInTheDocument();
    expect(document.title).toBe('Password changed · Nappe');
    expect(screen.getByText('Sign in with your new password to follow your events.')).toBeVisible();
    await user.click(within(screen.getByRole('main')).getByRole('link', { name: 'Sign in' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/sign-in'));
  });
});
