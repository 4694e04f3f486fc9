import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { clientUser, sessionFor } from '../../testing/fixtures';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

// The form itself (validation, 429, network errors) is tested once, in web-kit
// (src/auth/forgot-password-form.test.tsx); here, what the storefront's page adds around it.
describe('Forgot your password? (storefront)', () => {
  it('is linked from Sign in', async () => {
    const { user, router } = renderApp('/sign-in');
    await user.click(await screen.findByRole('link', { name: 'Forgot your password?' }));
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Forgot your password?' }),
    ).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/forgot-password');
    expect(document.title).toBe('Forgot your password? · Nappe');
  });

  it('answers "Check your e-mail" without saying whether the account exists', async () => {
    // The API's 202 is one body for any address (api/src/auth/password-reset.service.ts).
    const sent: unknown[] = [];
    server.use(
      http.post('/api/auth/password-reset', async ({ request }) => {
        sent.push(await request.json());
        return HttpResponse.json(
          { message: 'If an account uses that address, …' },
          { status: 202 },
        );
      }),
    );
    const { user } = renderApp('/forgot-password');
    await user.type(await screen.findByLabelText('E-mail'), clientUser.email);
    await user.click(screen.getByRole('button', { name: 'Send me a link' }));
    const heading = await screen.findByRole('heading', { level: 1, name: 'Check your e-mail' });
    expect(document.title).toBe('Check your e-mail · Nappe');
    expect(heading.closest('.chakra-card__body')).toHaveTextContent(
      `If an account uses ${clientUser.email}, we have sent it a link to choose a new password. The link works once, for 30 minutes.`,
    );
    expect(sent).toEqual([{ email: clientUser.email }]);
    expect(within(screen.getByRole('main')).getByRole('link', { name: 'Sign in' })).toHaveAttribute(
      'href',
      '/sign-in',
    );
    await user.click(screen.getByRole('button', { name: 'Ask for another link' }));
    expect(await screen.findByLabelText('E-mail')).toHaveValue(clientUser.email);
  });

  it('sends someone already signed in to My events', async () => {
    server.use(http.post('/api/auth/refresh', () => HttpResponse.json(sessionFor(clientUser))));
    const { router } = renderApp('/forgot-password');
    await waitFor(() => expect(router.state.location.pathname).toBe('/my-events'));
  });
});
