import { screen, waitFor, within } from '@testing-library/react';
import { HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { NETWORK_ERROR_MESSAGE } from '../api-client.js';
import { renderWithClient } from '../testing/render.js';
import { networkError, recordPosts, tooManyRequests } from '../testing/server.js';
import { ForgotPasswordForm } from './forgot-password-form.js';

// The API answers 202 with this one body whether or not an account uses the address
// (api/src/auth/password-reset.service.ts, RESET_REQUESTED_MESSAGE).
const REQUESTED = () =>
  HttpResponse.json(
    {
      message:
        'If an account uses that address, we have sent a link to choose a new password. It works for 30 minutes.',
    },
    { status: 202 },
  );

function renderForm(defaultEmail?: string) {
  const onSent = vi.fn();
  const view = renderWithClient(<ForgotPasswordForm defaultEmail={defaultEmail} onSent={onSent} />);
  const send = () => view.user.click(screen.getByRole('button', { name: 'Send me a link' }));
  return { ...view, onSent, send, field: screen.getByLabelText('E-mail') };
}

describe('ForgotPasswordForm', () => {
  it('checks the address with the shared rule before sending anything, and focuses the field', async () => {
    const sent = recordPosts('/auth/password-reset', REQUESTED);
    const { user, send, field, onSent } = renderForm();
    expect(screen.getByText('The address you sign in with.')).toBeInTheDocument();
    await send();
    // The messages of emailSchema (shared/src/auth/credentials.ts).
    expect(await screen.findByText('Enter your e-mail address.')).toBeInTheDocument();
    expect(field).toHaveAttribute('aria-invalid', 'true');
    expect(field).toHaveFocus();
    expect(screen.queryByText('The address you sign in with.')).not.toBeInTheDocument();
    // No "@": not an addr-spec (RFC 5322 §3.4.1).
    await user.type(field, 'not-an-address');
    await send();
    expect(
      await screen.findByText('Enter an e-mail address like name@example.com.'),
    ).toBeInTheDocument();
    expect(sent).toEqual([]);
    expect(onSent).not.toHaveBeenCalled();
  });

  it('sends the address on a 202 and hands it on, saying nothing of whether it has an account', async () => {
    const sent = recordPosts('/auth/password-reset', REQUESTED);
    const { user, send, field, onSent } = renderForm();
    await user.type(field, 'imogen@example.com');
    await send();
    await waitFor(() => expect(onSent).toHaveBeenCalledWith('imogen@example.com'));
    expect(sent).toEqual([{ email: 'imogen@example.com' }]);
    // The page that replaces the form says what happens next; the form itself shows no answer.
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });

  it('starts from the address typed before (Ask for another link)', () => {
    const { field } = renderForm('imogen@example.com');
    expect(field).toHaveValue('imogen@example.com');
  });

  it('on a 429 tells how long to wait and holds the button until then', async () => {
    // Retry-After in delay-seconds (RFC 9110 §10.2.3): 600 s is 10 minutes.
    recordPosts('/auth/password-reset', tooManyRequests(600));
    const { user, send, field, onSent } = renderForm();
    await user.type(field, 'imogen@example.com');
    await send();
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('Too many attempts')).toBeInTheDocument();
    expect(
      within(alert).getByText(
        'To protect accounts, sending reset links is paused for a moment. Please try again in 10 minutes.',
      ),
    ).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Send me a link' })).toBeDisabled();
    expect(onSent).not.toHaveBeenCalled();
  });

  it('lets the person send again once the wait is over', async () => {
    recordPosts('/auth/password-reset', tooManyRequests(1));
    const { user, send, field } = renderForm();
    await user.type(field, 'imogen@example.com');
    await send();
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Please try again in 1 second.');
    expect(screen.getByRole('button', { name: 'Send me a link' })).toBeDisabled();
    await waitFor(() => expect(alert).toHaveTextContent('You can try again now.'), {
      timeout: 3000,
    });
    expect(screen.getByRole('button', { name: 'Send me a link' })).toBeEnabled();
  });

  it('says when the server cannot be reached, and keeps what was typed', async () => {
    recordPosts('/auth/password-reset', networkError());
    const { user, send, field, onSent } = renderForm();
    await user.type(field, 'imogen@example.com');
    await send();
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('No connection')).toBeInTheDocument();
    expect(within(alert).getByText(NETWORK_ERROR_MESSAGE)).toBeInTheDocument();
    expect(field).toHaveValue('imogen@example.com');
    expect(screen.getByRole('button', { name: 'Send me a link' })).toBeEnabled();
    expect(onSent).not.toHaveBeenCalled();
  });
});
