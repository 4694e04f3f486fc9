import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

// The page's states (cut link, refused link, form, saved) and its no-Referer rule are tested once,
// in web-kit (src/auth/reset-password-flow.test.tsx); here, what the storefront gives them: its
// words, titles and paths. A whole token is 43 base64url characters (RFC 4648 §5), as mailed.
const TOKEN = 'Qm9uYm9uLWF1LWNhcmFtZWwtZXQtZmxldXItZGUtc2V';

describe('Choose a new password (/reset-password, storefront)', () => {
  it('a cut link: the storefront’s titles, and a new link from its Forgot your password?', async () => {
    const { user, router } = renderApp('/reset-password?token=cut-in-half');
    expect(
      await screen.findByRole('heading', { level: 1, name: 'This link cannot be used' }),
    ).toBeInTheDocument();
    expect(document.title).toBe('Reset link cannot be used · Nappe');
    expect(within(screen.getByRole('main')).getByRole('link', { name: 'Sign in' })).toHaveAttribute(
      'href',
      '/sign-in',
    );
    await user.click(screen.getByRole('link', { name: 'Ask for a new link' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/forgot-password'));
  });

  it('a whole link: the form, in the storefront’s words', async () => {
    renderApp(`/reset-password?token=${TOKEN}`);
    await screen.findByLabelText('New password');
    expect(document.title).toBe('Choose a new password · Nappe');
    expect(screen.getByText(/the password you will sign in with from now on/)).toBeVisible();
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
    expect(
      screen.getByText('Keep your password to yourself: the studio will never ask for it.'),
    ).toBeVisible();
    await user.click(within(screen.getByRole('main')).getByRole('link', { name: 'Sign in' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/sign-in'));
  });
});
