import { screen, within } from '@testing-library/react';
import { HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { renderWithClient } from '../testing/render.js';
import { badRequest, recordPosts } from '../testing/server.js';
import { ResetPasswordFlow, type ResetPasswordWords } from './reset-password-flow.js';
import { testFrame } from './test-frame.js';

// The form itself (length check, strength verdict, 429, network errors) is tested in
// reset-password-form.test.tsx; here, the page's states around it. The link the API mails carries
// 32 random bytes in base64url: 43 characters, no padding (RFC 4648 §5); the refusal is the API's
// own words (api/src/auth/dto/password-reset.dto.ts).
const TOKEN = 'Qm9uYm9uLWF1LWNhcmFtZWwtZXQtZmxldXItZGUtc2V';
const LINK_UNUSABLE = 'This reset link has expired or was already used. Ask for a new one.';
const SAVED = () => new HttpResponse(null, { status: 204 });

const DONE_FOOTER = 'We never ask for your password.';
const words: ResetPasswordWords = {
  intro: 'The password for your tasting account from now on.',
  doneIntro: 'Saved, and every other session is closed.',
  doneText: 'Sign in again to see your tastings.',
  doneSignIn: 'Back to Sign in',
  doneFooter: DONE_FOOTER,
};

function renderFlow(token: string | null, flowWords: ResetPasswordWords = words) {
  const view = renderWithClient(
    <ResetPasswordFlow
      token={token}
      words={flowWords}
      signInHref="/sign-in"
      forgotPasswordHref="/forgot-password"
      {...testFrame}
    />,
  );
  const choose = async (password: string) => {
    await view.user.type(screen.getByLabelText('New password'), password);
    await view.user.click(screen.getByRole('button', { name: 'Save the new password' }));
  };
  return { ...view, choose };
}

/** "This link cannot be used", its reason in the alert, and the ways on: a new link, Sign in. */
function expectLinkProblem(reason: string | RegExp) {
  expect(screen.getByRole('heading', { level: 1, name: 'This link cannot be used' })).toBeVisible();
  expect(document.title).toBe('Reset link cannot be used');
  expect(
    screen.getByText(
      'Reset links work once, for 30 minutes, and only the newest one you asked for.',
    ),
  ).toBeVisible();
  expect(within(screen.getByRole('alert')).getByText(reason)).toBeVisible();
  expect(screen.getByRole('link', { name: 'Ask for a new link' })).toHaveAttribute(
    'href',
    '/forgot-password',
  );
  expect(screen.getByText(/Remembered it after all\?/)).toHaveTextContent(
    'Remembered it after all? Sign in',
  );
  expect(screen.getByRole('link', { name: 'Sign in' })).toHaveAttribute('href', '/sign-in');
  expect(screen.queryByLabelText('New password')).not.toBeInTheDocument();
}

describe('ResetPasswordFlow', () => {
  it('a missing or cut token: says so at once, without the form', () => {
    // 42 characters, or a "=" of padding: not what the API mails (RFC 4648 §5, no padding).
    for (const token of [null, '', 'cut-in-half', TOKEN.slice(0, 42), `${TOKEN.slice(0, 42)}=`]) {
      const { unmount } = renderFlow(token);
      expectLinkProblem(/may have been cut when it was copied/);
      expect(document.querySelector('meta[name="referrer"]')).toHaveAttribute(
        'content',
        'no-referrer',
      );
      unmount();
    }
  });

  it('a whole token: the form in the app’s words, and no Referer to other sites', () => {
    renderFlow(TOKEN);
    expect(screen.getByRole('heading', { level: 1, name: 'Choose a new password' })).toBeVisible();
    expect(document.title).toBe('Choose a new password');
    expect(screen.getByText(words.intro)).toBeVisible();
    expect(screen.getByLabelText('New password')).toBeVisible();
    expect(screen.getByRole('link', { name: 'Sign in' })).toHaveAttribute('href', '/sign-in');
    // OWASP Forgot Password Cheat Sheet: the token must not leak through the Referer header.
    expect(document.querySelector('meta[name="referrer"]')).toHaveAttribute(
      'content',
      'no-referrer',
    );
  });

  it('a link the server refuses: its words replace the form', async () => {
    const sent = recordPosts('/auth/password-reset/confirm', badRequest(LINK_UNUSABLE));
    const { choose } = renderFlow(TOKEN);
    await choose('quince rye and smoked honey');
    expect(
      await screen.findByRole('heading', { level: 1, name: 'This link cannot be used' }),
    ).toBeVisible();
    expectLinkProblem(LINK_UNUSABLE);
    expect(sent).toEqual([{ token: TOKEN, password: 'quince rye and smoked honey' }]);
  });

  it('saved: Password changed in the app’s words, and a button to Sign in', async () => {
    recordPosts('/auth/password-reset/confirm', SAVED);
    const { choose } = renderFlow(TOKEN);
    await choose('quince rye and smoked honey');
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Password changed' }),
    ).toBeVisible();
    expect(document.title).toBe('Password changed');
    expect(screen.getByText(words.doneIntro)).toBeVisible();
    expect(screen.getByRole('status')).toHaveTextContent(words.doneText);
    expect(screen.getByRole('link', { name: words.doneSignIn })).toHaveAttribute(
      'href',
      '/sign-in',
    );
    expect(screen.getByText(DONE_FOOTER)).toBeVisible();
    expect(screen.queryByText(/Remembered it after all\?/)).not.toBeInTheDocument();
    expect(screen.queryByLabelText('New password')).not.toBeInTheDocument();
  });

  it('saved, for an app with nothing to say under the card: no footer', async () => {
    recordPosts('/auth/password-reset/confirm', SAVED);
    const { choose, container } = renderFlow(TOKEN, { ...words, doneFooter: undefined });
    await choose('quince rye and smoked honey');
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Password changed' }),
    ).toBeVisible();
    expect(container.querySelector('footer')).toBeNull();
  });
});
