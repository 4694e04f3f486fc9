import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { chefUser, sessionFor, staffUser } from '../../testing/fixtures';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

// The page's states (form, Check your e-mail, the same words for any address, Ask for another
// link) are tested once, in web-kit (src/auth/forgot-password-flow.test.tsx); here, what the
// kitchen app gives them: its words, titles and paths.
describe('Forgot your password? (kitchen app)', () => {
  it('is linked from the kitchen’s Sign in, and speaks of the kitchen', async () => {
    const { user, router } = renderApp('/sign-in');
    await user.click(await screen.findByRole('link', { name: 'Forgot your password?' }));
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Forgot your password?' }),
    ).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/forgot-password');
    expect(document.title).toBe('Forgot your password? · Nappe kitchen');
    expect(screen.getByText(/the e-mail address you sign in to the kitchen with/)).toBeVisible();
  });

  it('once sent: points to the Team screen, and back to the kitchen’s Sign in', async () => {
    // The API's 202 (api/src/auth/password-reset.service.ts).
    server.use(
      http.post('/api/auth/password-reset', () =>
        HttpResponse.json({ message: 'If an account uses that address, …' }, { status: 202 }),
      ),
    );
    const { user, router } = renderApp('/forgot-password');
    await user.type(await screen.findByLabelText('E-mail'), staffUser.email);
    await user.click(screen.getByRole('button', { name: 'Send me a link' }));
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Check your e-mail' }),
    ).toBeInTheDocument();
    expect(document.title).toBe('Check your e-mail · Nappe kitchen');
    expect(screen.getByRole('status')).toHaveTextContent(
      'The chef can also check the address on the Team screen.',
    );
    await user.click(within(screen.getByRole('main')).getByRole('link', { name: 'Sign in' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/sign-in'));
  });

  it('sends someone already signed in to Today', async () => {
    server.use(
      http.post('/api/auth/refresh', () => HttpResponse.json(sessionFor(chefUser))),
      // Today's own panels are not this test's: their data is answered "not found".
      http.get('/api/*', ({ request }) =>
        new URL(request.url).pathname === '/api/studio'
          ? undefined
          : HttpResponse.json(
              { statusCode: 404, message: 'Not part of this test.' },
              { status: 404 },
            ),
      ),
    );
    const { router } = renderApp('/forgot-password');
    await waitFor(() => expect(router.state.location.pathname).toBe('/'));
  });
});
