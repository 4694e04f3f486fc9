import { screen, waitFor } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

// The page's states (cut link, refused link, form, saved) and its no-Referer rule are tested once,
// in web-kit (src/auth/reset-password-flow.test.tsx); here, what the kitchen app gives them: its
// words, titles and paths. A whole token is 43 base64url characters (RFC 4648 §5), as mailed.
const TOKEN = 'Qm9uYm9uLWF1LWNhcmFtZWwtZXQtZmxldXItZGUtc2V';

describe('Choose a new password (/reset-password, kitchen app)', () => {
  it('a cut link: the kitchen’s titles, and a new link from its Forgot your password?', async () => {
    const { user, router } = renderApp('/reset-password?token=cut-in-half');
    expect(
      await screen.findByRole('heading', { level: 1, name: 'This link cannot be used' }),
    ).toBeInTheDocument();
    expect(document.title).toBe('Reset link cannot be used · Nappe kitchen');
    expect(screen.getByRole('link', { name: 'Sign in' })).toHaveAttribute('href', '/sign-in');
    await user.click(screen.getByRole('link', { name: 'Ask for a new link' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/forgot-password'));
  });

  it('a whole link: the form, in the kitchen’s words', async () => {
    renderApp(`/reset-password?token=${TOKEN}`);
    await screen.findByLabelText('New password');
    expect(document.title).toBe('Choose a new password · Nappe kitchen');
    expect(screen.getByText(/sign in to the kitchen with from now on/)).toBeVisible();
  });

  it('saved: signed out everywhere (the tablet too), then Go to Sign in', async () => {
    server.use(
      http.post('/api/auth/password-reset/confirm', () => new HttpResponse(null, { status: 204 })),
    );
    const { user, router } = renderApp(`/reset-password?token=${TOKEN}`);
    await user.type(await screen.findByLabelText('New password'), 'quince rye and smoked honey');
    await user.click(screen.getByRole('button', { name: 'Save the new password' }));
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Password changed' }),
    ).toBeInTheDocument();
    expect(document.title).toBe('Password changed · Nappe kitchen');
    expect(
      screen.getByText(/signed out on every device, the kitchen tablet included/),
    ).toBeVisible();
    expect(screen.getByText('Sign in to the kitchen with your new password.')).toBeVisible();
    await user.click(screen.getByRole('link', { name: 'Go to Sign in' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/sign-in'));
  });
});
