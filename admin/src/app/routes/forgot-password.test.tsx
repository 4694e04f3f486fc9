import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { chefUser, sessionFor, staffUser } from '../../testing/fixtures';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

// The form itself (validation, 429, network errors) is tested once, in web-kit
// (src/auth/forgot-password-form.test.tsx); here, what the kitchen app's page adds around it.
// The API answers 202 with one body whatever the address (api/src/auth/password-reset.service.ts).
function acceptRequests() {
  server.use(
    http.post('/api/auth/password-reset', () =>
      HttpResponse.json({ message: 'If an account uses that address, …' }, { status: 202 }),
    ),
  );
}

describe('Forgot your password? (kitchen app)', () => {
  it('is linked from the kitchen’s Sign in', async () => {
    const { user, router } = renderApp('/sign-in');
    await user.click(await screen.findByRole('link', { name: 'Forgot your password?' }));
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Forgot your password?' }),
    ).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/forgot-password');
    expect(document.title).toBe('Forgot your password? · Nappe kitchen');
  });

  it('then says the same words for any address, mentions the Team screen, and asks again', async () => {
    acceptRequests();
    const texts: string[] = [];
    for (const email of [staffUser.email, 'nobody-here@example.test']) {
      const { user, unmount } = renderApp('/forgot-password');
      await user.type(await screen.findByLabelText('E-mail'), email);
      await user.click(screen.getByRole('button', { name: 'Send me a link' }));
      const heading = await screen.findByRole('heading', { level: 1, name: 'Check your e-mail' });
      expect(document.title).toBe('Check your e-mail · Nappe kitchen');
      const card = heading.closest('.chakra-card__body') ?? document.body;
      expect(card).toHaveTextContent(`If an account uses ${email}, we have sent it a link`);
      expect(card).toHaveTextContent('The chef can also check the address on the Team screen.');
      texts.push(card.textContent!.replace(email, '<address>'));
      expect(
        within(screen.getByRole('main')).getByRole('link', { name: 'Sign in' }),
      ).toHaveAttribute('href', '/sign-in');
      await user.click(screen.getByRole('button', { name: 'Ask for another link' }));
      expect(await screen.findByLabelText('E-mail')).toHaveValue(email);
      unmount();
    }
    expect(texts[0]).toBe(texts[1]);
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
