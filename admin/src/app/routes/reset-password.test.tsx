import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

// The form itself (length check, strength verdict on the field, 429, network errors) is tested
// once, in web-kit (src/auth/reset-password-form.test.tsx); here, the kitchen app's page around it.
// The link the API mails carries 32 random bytes in base64url: 43 characters (RFC 4648 §5); the
// refusal is the API's own words (api/src/auth/dto/password-reset.dto.ts).
const TOKEN = 'Qm9uYm9uLWF1LWNhcmFtZWwtZXQtZmxldXItZGUtc2V';
const LINK_UNUSABLE = 'This reset link has expired or was already used. Ask for a new one.';

function answerConfirm(answer: () => Response) {
  server.use(http.post('/api/auth/password-reset/confirm', answer));
}

async function choose(user: ReturnType<typeof renderApp>['user']) {
  await user.type(await screen.findByLabelText('New password'), 'quince rye and smoked honey');
  await user.click(screen.getByRole('button', { name: 'Save the new password' }));
}

describe('Choose a new password (/reset-password, kitchen app)', () => {
  it('a cut link: says so at once, without the form, and offers a new one', async () => {
    for (const url of ['/reset-password', '/reset-password?token=cut-in-half']) {
      const { unmount } = renderApp(url);
      expect(
        await screen.findByRole('heading', { level: 1, name: 'This link cannot be used' }),
      ).toBeInTheDocument();
      expect(document.title).toBe('Reset link cannot be used · Nappe kitchen');
      expect(screen.getByRole('alert')).toHaveTextContent(/may have been cut when it was copied/);
      expect(screen.getByRole('link', { name: 'Ask for a new link' })).toHaveAttribute(
        'href',
        '/forgot-password',
      );
      expect(screen.queryByLabelText('New password')).not.toBeInTheDocument();
      unmount();
    }
  });

  it('keeps the token from other sites (no Referer) and names the page', async () => {
    renderApp(`/reset-password?token=${TOKEN}`);
    await screen.findByLabelText('New password');
    await waitFor(() =>
      expect(document.querySelector('meta[name="referrer"]')).toHaveAttribute(
        'content',
        'no-referrer',
      ),
    );
    expect(document.title).toBe('Choose a new password · Nappe kitchen');
    expect(screen.getByText(/sign in to the kitchen with from now on/)).toBeInTheDocument();
  });

  it('an expired or used link: the server’s words in place of the form', async () => {
    answerConfirm(() =>
      HttpResponse.json({ statusCode: 400, message: [LINK_UNUSABLE] }, { status: 400 }),
    );
    const { user, router } = renderApp(`/reset-password?token=${TOKEN}`);
    await choose(user);
    expect(
      await screen.findByRole('heading', { level: 1, name: 'This link cannot be used' }),
    ).toBeInTheDocument();
    expect(within(screen.getByRole('alert')).getByText(LINK_UNUSABLE)).toBeInTheDocument();
    expect(screen.queryByLabelText('New password')).not.toBeInTheDocument();
    await user.click(screen.getByRole('link', { name: 'Ask for a new link' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/forgot-password'));
  });

  it('saved: Password changed, signed out everywhere (the tablet too), then Sign in', async () => {
    answerConfirm(() => new HttpResponse(null, { status: 204 }));
    const { user, router } = renderApp(`/reset-password?token=${TOKEN}`);
    await choose(user);
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Password changed' }),
    ).toBeInTheDocument();
    expect(
      screen.getByText(/signed out on every device, the kitchen tablet included/),
    ).toBeInTheDocument();
    await user.click(screen.getByRole('link', { name: 'Go to Sign in' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/sign-in'));
  });
});
