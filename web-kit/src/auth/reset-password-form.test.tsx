import { screen, waitFor, within } from '@testing-library/react';
import { HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { ApiError, NETWORK_ERROR_MESSAGE } from '../api-client.js';
import { renderWithClient } from '../testing/render.js';
import { badRequest, networkError, recordPosts, tooManyRequests } from '../testing/server.js';
import { RESET_TOKEN } from './confirm-password-reset.js';
import { ResetPasswordForm, sortResetErrors } from './reset-password-form.js';

// The link the API mails (api/src/auth/password-reset.service.ts): 32 random bytes in base64url,
// no padding, 43 characters (RFC 4648 §5). The messages are the API's own
// (api/src/auth/dto/password-reset.dto.ts, api/src/auth/password-strength.ts).
const TOKEN = 'Qm9uYm9uLWF1LWNhcmFtZWwtZXQtZmxldXItZGUtc2V';
const LINK_UNUSABLE = 'This reset link has expired or was already used. Ask for a new one.';
const WEAK =
  'This password is too easy to guess: it is a common password or a simple pattern. A few unrelated words make a strong one.';
const SAVED = () => new HttpResponse(null, { status: 204 });

function renderForm() {
  const onDone = vi.fn();
  const onLinkProblem = vi.fn();
  const view = renderWithClient(
    <ResetPasswordForm token={TOKEN} onDone={onDone} onLinkProblem={onLinkProblem} />,
  );
  const field = screen.getByLabelText('New password');
  const choose = async (password: string) => {
    await view.user.type(field, password);
    await view.user.click(screen.getByRole('button', { name: 'Save the new password' }));
  };
  return { ...view, onDone, onLinkProblem, field, choose };
}

describe('RESET_TOKEN', () => {
  it('takes exactly 43 base64url characters (RFC 4648 §5 alphabet, no padding)', () => {
    expect(TOKEN).toHaveLength(43);
    expect(RESET_TOKEN.test(TOKEN)).toBe(true);
    expect(RESET_TOKEN.test(TOKEN.slice(0, 42))).toBe(false);
    expect(RESET_TOKEN.test(`${TOKEN}A`)).toBe(false);
    // "+" and "/" are the base64 alphabet's, not base64url's; "=" is padding.
    expect(RESET_TOKEN.test(`${TOKEN.slice(0, 42)}+`)).toBe(false);
    expect(RESET_TOKEN.test(`${TOKEN.slice(0, 42)}=`)).toBe(false);
    expect(RESET_TOKEN.test(`${TOKEN.slice(0, 41)}-_`)).toBe(true);
  });
});

describe('sortResetErrors', () => {
  it('a link problem ends the form; every other message is about the new password', () => {
    expect(sortResetErrors(new ApiError(400, [LINK_UNUSABLE]))).toEqual({
      link: LINK_UNUSABLE,
      password: [],
    });
    expect(sortResetErrors(new ApiError(400, [WEAK]))).toEqual({ link: null, password: [WEAK] });
    // A cut token and a short password in one answer: the link comes first, nothing to fix here.
    const length = 'Use at least 12 characters (at most 256) — a few words make a good passphrase.';
    expect(sortResetErrors(new ApiError(400, [length, LINK_UNUSABLE])).link).toBe(LINK_UNUSABLE);
  });
});

describe('ResetPasswordForm', () => {
  it('checks the length before sending, with show/hide on the field', async () => {
    const sent = recordPosts('/auth/password-reset/confirm', SAVED);
    const { user, field, choose, onDone } = renderForm();
    // OWASP ASVS 5.0 V6.2.1: at least 12 characters (PASSWORD_MIN_LENGTH in shared/src/auth).
    expect(screen.getByText(/At least 12 characters/)).toBeInTheDocument();
    await choose('short');
    expect(
      await screen.findByText('Use at least 12 characters — a few words make a good passphrase.'),
    ).toBeInTheDocument();
    expect(field).toHaveAttribute('aria-invalid', 'true');
    expect(field).toHaveFocus();
    const toggle = screen.getByRole('button', { name: 'Show password' });
    expect(field).toHaveAttribute('type', 'password');
    expect(toggle).toHaveAttribute('aria-pressed', 'false');
    await user.click(toggle);
    expect(field).toHaveAttribute('type', 'text');
    expect(toggle).toHaveAttribute('aria-pressed', 'true');
    expect(sent).toEqual([]);
    expect(onDone).not.toHaveBeenCalled();
  });

  it('counts characters as a person does: 12 emoji are 12, not 24 UTF-16 units', async () => {
    // U+1F36E CUSTARD lies outside the Basic Multilingual Plane: one code point, two UTF-16 code
    // units (The Unicode Standard, §3.9). The API counts code points too (register.dto.ts).
    const sent = recordPosts('/auth/password-reset/confirm', SAVED);
    const { choose, onDone } = renderForm();
    await choose('🍮'.repeat(11));
    expect(
      await screen.findByText('Use at least 12 characters — a few words make a good passphrase.'),
    ).toBeInTheDocument();
    await choose('🍮');
    await waitFor(() => expect(onDone).toHaveBeenCalledOnce());
    expect(sent).toEqual([{ token: TOKEN, password: '🍮'.repeat(12) }]);
  });

  it('sends the token with the password, and says when it is saved', async () => {
    const sent = recordPosts('/auth/password-reset/confirm', SAVED);
    const { choose, onDone, onLinkProblem } = renderForm();
    await choose('quince rye and smoked honey');
    await waitFor(() => expect(onDone).toHaveBeenCalledOnce());
    expect(sent).toEqual([{ token: TOKEN, password: 'quince rye and smoked honey' }]);
    expect(onLinkProblem).not.toHaveBeenCalled();
  });

  it('puts a 400 about the password on the field, focused, and keeps the form', async () => {
    recordPosts('/auth/password-reset/confirm', badRequest(WEAK));
    const { field, choose, onDone, onLinkProblem } = renderForm();
    await choose('password1234');
    expect(await screen.findByText(WEAK)).toBeInTheDocument();
    expect(field).toHaveAttribute('aria-invalid', 'true');
    await waitFor(() => expect(field).toHaveFocus());
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
    expect(onLinkProblem).not.toHaveBeenCalled();
    expect(onDone).not.toHaveBeenCalled();
  });

  it('hands a 400 about the link to the page, in the server’s words, and not to the field', async () => {
    recordPosts('/auth/password-reset/confirm', badRequest(LINK_UNUSABLE));
    const { field, choose, onDone, onLinkProblem } = renderForm();
    await choose('quince rye and smoked honey');
    await waitFor(() => expect(onLinkProblem).toHaveBeenCalledWith(LINK_UNUSABLE));
    expect(field).not.toHaveAttribute('aria-invalid');
    expect(screen.queryByText(LINK_UNUSABLE)).not.toBeInTheDocument();
    expect(onDone).not.toHaveBeenCalled();
  });

  it('on a 429 tells how long to wait and holds the button', async () => {
    recordPosts('/auth/password-reset/confirm', tooManyRequests(45));
    const { choose, onLinkProblem } = renderForm();
    await choose('quince rye and smoked honey');
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('Too many attempts')).toBeInTheDocument();
    expect(alert).toHaveTextContent(
      /choosing a new password is paused for a moment\. Please try again in (45|44) seconds\./,
    );
    expect(screen.getByRole('button', { name: 'Save the new password' })).toBeDisabled();
    expect(onLinkProblem).not.toHaveBeenCalled();
  });

  it('says when the server cannot be reached, above the form', async () => {
    recordPosts('/auth/password-reset/confirm', networkError());
    const { field, choose, onDone } = renderForm();
    await choose('quince rye and smoked honey');
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('No connection')).toBeInTheDocument();
    expect(within(alert).getByText(NETWORK_ERROR_MESSAGE)).toBeInTheDocument();
    expect(field).toHaveValue('quince rye and smoked honey');
    expect(field).not.toHaveAttribute('aria-invalid');
    expect(onDone).not.toHaveBeenCalled();
  });
});
