import { screen, within } from '@testing-library/react';
import { HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { renderWithClient } from '../testing/render.js';
import { networkError, recordPosts } from '../testing/server.js';
import { ForgotPasswordFlow, type ForgotPasswordWords } from './forgot-password-flow.js';
import { testFrame } from './test-frame.js';

// The form itself (validation, 429, network errors) is tested in forgot-password-form.test.tsx;
// here, the page's states around it. The API answers 202 with this one body whether or not an
// account uses the address (api/src/auth/password-reset.service.ts, RESET_REQUESTED_MESSAGE).
const REQUESTED = () =>
  HttpResponse.json(
    {
      message:
        'If an account uses that address, we have sent a link to choose a new password. It works for 30 minutes.',
    },
    { status: 202 },
  );

const words: ForgotPasswordWords = {
  intro: 'Give the address of your tasting account.',
  sentHelp: 'Still nothing? Wait a moment, then ask again.',
};

function renderFlow() {
  const view = renderWithClient(<ForgotPasswordFlow words={words} {...testFrame} />);
  const ask = async (email: string) => {
    await view.user.type(screen.getByLabelText('E-mail'), email);
    await view.user.click(screen.getByRole('button', { name: 'Send me a link' }));
  };
  return { ...view, ask };
}

describe('ForgotPasswordFlow', () => {
  it('opens on the form, in the app’s words, with the way back to Sign in', () => {
    renderFlow();
    expect(screen.getByRole('heading', { level: 1, name: 'Forgot your password?' })).toBeVisible();
    expect(document.title).toBe('Forgot your password?');
    expect(screen.getByText(words.intro)).toBeVisible();
    expect(screen.getByLabelText('E-mail')).toBeVisible();
    expect(screen.getByText(/Remembered it\?/)).toHaveTextContent('Remembered it? Sign in');
    expect(screen.getByRole('link', { name: 'Sign in' })).toHaveAttribute('href', '/sign-in');
  });

  it('once sent: Check your e-mail, in the same words whether or not the address has an account', async () => {
    const sent = recordPosts('/auth/password-reset', REQUESTED);
    const pages: string[] = [];
    for (const email of ['imogen@example.com', 'nobody-here@example.test']) {
      const { ask, unmount } = renderFlow();
      await ask(email);
      expect(
        await screen.findByRole('heading', { level: 1, name: 'Check your e-mail' }),
      ).toBeVisible();
      expect(document.title).toBe('Check your e-mail');
      const main = screen.getByRole('main');
      expect(main).toHaveTextContent(
        `If an account uses ${email}, we have sent it a link to choose a new password. The link works once, for 30 minutes.`,
      );
      expect(within(main).getByText(email).tagName).toBe('STRONG');
      expect(screen.getByRole('status')).toHaveTextContent(words.sentHelp);
      expect(screen.queryByLabelText('E-mail')).not.toBeInTheDocument();
      expect(screen.getByRole('link', { name: 'Sign in' })).toHaveAttribute('href', '/sign-in');
      pages.push(main.textContent!.replace(email, '<address>'));
      unmount();
    }
    expect(sent).toEqual([{ email: 'imogen@example.com' }, { email: 'nobody-here@example.test' }]);
    expect(pages[0]).toBe(pages[1]);
  });

  it('Ask for another link: back to the form, the address already filled in', async () => {
    const sent = recordPosts('/auth/password-reset', REQUESTED);
    const { user, ask } = renderFlow();
    await ask('imogen@example.com');
    await user.click(await screen.findByRole('button', { name: 'Ask for another link' }));
    expect(screen.getByRole('heading', { level: 1, name: 'Forgot your password?' })).toBeVisible();
    expect(document.title).toBe('Forgot your password?');
    expect(screen.getByLabelText('E-mail')).toHaveValue('imogen@example.com');
    await user.click(screen.getByRole('button', { name: 'Send me a link' }));
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Check your e-mail' }),
    ).toBeVisible();
    expect(sent).toHaveLength(2);
  });

  it('a request that fails stays on the form, where the error is shown', async () => {
    recordPosts('/auth/password-reset', networkError());
    const { ask } = renderFlow();
    await ask('imogen@example.com');
    expect(await screen.findByRole('alert')).toBeVisible();
    expect(screen.getByRole('heading', { level: 1, name: 'Forgot your password?' })).toBeVisible();
    expect(screen.queryByRole('status')).not.toBeInTheDocument();
  });
});
