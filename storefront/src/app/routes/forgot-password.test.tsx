import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { clientUser, sessionFor } from '../../testing/fixtures';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

// The API answers 202 with this one body whether or not an account uses the address
// (api/src/auth/password-reset.service.ts, RESET_REQUESTED_MESSAGE).
const REQUESTED = {
  message:
    'If an account uses that address, we have sent a link to choose a new password. It works for 30 minutes.',
};

/** Records what the page sends to the API and answers as the API does. */
function resetApi() {
  const sent: unknown[] = [];
  server.use(
    http.post('/api/auth/password-reset', async ({ request }) => {
      sent.push(await request.json());
      return HttpResponse.json(REQUESTED, { status: 202 });
    }),
  );
  return sent;
}

async function ask(user: ReturnType<typeof renderApp>['user'], email: string) {
  await user.type(await screen.findByLabelText('E-mail'), email);
  await user.click(screen.getByRole('button', { name: 'Send me a link' }));
}

describe('Forgot your password?', () => {
  it('is linked from Sign in', async () => {
    const { user, router } = renderApp('/sign-in');
    await user.click(await screen.findByRole('link', { name: 'Forgot your password?' }));
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Forgot your password?' }),
    ).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/forgot-password');
    expect(document.title).toBe('Forgot your password? · Nappe');
  });

  it('checks the address with the shared rule before sending anything', async () => {
    const sent = resetApi();
    const { user } = renderApp('/forgot-password');
    await user.click(await screen.findByRole('button', { name: 'Send me a link' }));
    expect(await screen.findByText('Enter your e-mail address.')).toBeInTheDocument();
    await user.type(screen.getByLabelText('E-mail'), 'not-an-address');
    await user.click(screen.getByRole('button', { name: 'Send me a link' }));
    expect(
      await screen.findByText('Enter an e-mail address like name@example.com.'),
    ).toBeInTheDocument();
    expect(screen.getByLabelText('E-mail')).toHaveAttribute('aria-invalid', 'true');
    expect(sent).toEqual([]);
  });

  it('sends the address and answers with the same neutral words for any address', async () => {
    const sent = resetApi();
    const texts: string[] = [];
    for (const email of [clientUser.email, 'nobody-here@example.test']) {
      const { user, unmount } = renderApp('/forgot-password');
      await ask(user, email);
      const heading = await screen.findByRole('heading', { level: 1, name: 'Check your e-mail' });
      const card = heading.closest('.chakra-card__body') ?? document.body;
      expect(card).toHaveTextContent(
        `If an account uses ${email}, we have sent it a link to choose a new password. The link works once, for 30 minutes.`,
      );
      texts.push(card.textContent!.replace(email, '<address>'));
      unmount();
    }
    expect(sent).toEqual([{ email: clientUser.email }, { email: 'nobody-here@example.test' }]);
    expect(texts[0]).toBe(texts[1]);
  });

  it('lets the person ask again, keeping the address they typed', async () => {
    resetApi();
    const { user } = renderApp('/forgot-password');
    await ask(user, clientUser.email);
    await user.click(await screen.findByRole('button', { name: 'Ask for another link' }));
    expect(await screen.findByLabelText('E-mail')).toHaveValue(clientUser.email);
    expect(within(screen.getByRole('main')).getByRole('link', { name: 'Sign in' })).toHaveAttribute(
      'href',
      '/sign-in',
    );
  });

  it('tells how long to wait on a 429 and holds the button until then', async () => {
    server.use(
      http.post('/api/auth/password-reset', () =>
        HttpResponse.json(
          { statusCode: 429, message: 'ThrottlerException: Too Many Requests' },
          { status: 429, headers: { 'Retry-After': '600' } },
        ),
      ),
    );
    const { user } = renderApp('/forgot-password');
    await ask(user, clientUser.email);
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('Too many attempts')).toBeInTheDocument();
    expect(
      within(alert).getByText(/sending reset links is paused for a moment.*10 minutes/),
    ).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Send me a link' })).toBeDisabled();
    expect(screen.queryByRole('heading', { name: 'Check your e-mail' })).not.toBeInTheDocument();
  });

  it('sends someone already signed in to My events', async () => {
    server.use(http.post('/api/auth/refresh', () => HttpResponse.json(sessionFor(clientUser))));
    const { router } = renderApp('/forgot-password');
    await waitFor(() => expect(router.state.location.pathname).toBe('/my-events'));
  });
});
