import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { clientUser, sessionFor } from '../../testing/fixtures';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

// The page's states (form, Check your e-mail, the same words for any address, Ask for another
// link) are tested once, in web-kit (src/auth/forgot-password-flow.test.tsx); here, what the
// storefront gives them: its words, titles and paths.
describe('Forgot your password? (storefront)', () => {
  it('is linked from Sign in, and asks for the account’s address', async () => {
    const { user, router } = renderApp('/sign-in');
    await user.click(await screen.findByRole('link', { name: 'Forgot your password?' }));
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Forgot your password?' }),
    ).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/forgot-password');
    expect(document.title).toBe('Forgot your password? · Nappe');
    expect(screen.getByText(/the e-mail address of your account/)).toBeVisible();
  });

  it('once sent: its own help, and back to Sign in', async () => {
    // The API's 202 (api/src/auth/password-reset.service.ts).
    server.use(
      http.post('/api/auth/password-reset', () =>
        HttpResponse.json({ message: 'If an account uses that address, …' }, { status: 202 }),
      ),
    );
    const { user, router } = renderApp('/forgot-password');
    await user.type(await screen.findByLabelText('E-mail'), clientUser.email);
    await user.click(screen.getByRole('button', { name: 'Send me a link' }));
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Check your e-mail' }),
    ).toBeInTheDocument();
    expect(document.title).toBe('Check your e-mail · Nappe');
    expect(
      screen.getByText(
        'Nothing after a few minutes? Look in your spam folder and check the address, then ask for another link.',
      ),
    ).toBeVisible();
    await user.click(within(screen.getByRole('main')).getByRole('link', { name: 'Sign in' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/sign-in'));
  });

  it('sends someone already signed in to My events', async () => {
    server.use(http.post('/api/auth/refresh', () => HttpResponse.json(sessionFor(clientUser))));
    const { router } = renderApp('/forgot-password');
    await waitFor(() => expect(router.state.location.pathname).toBe('/my-events'));
  });
});
