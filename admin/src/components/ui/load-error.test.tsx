import { createQueryClient } from '@nappe/web-kit/react';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ReactElement } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { AppProvider } from '../../app/provider';
import { ApiError } from '../../lib/api-client';
import { LoadError } from './load-error';

function renderIn(ui: ReactElement) {
  const user = userEvent.setup();
  render(<AppProvider queryClient={createQueryClient()}>{ui}</AppProvider>);
  return { user };
}

// role="alert" is announced as it appears (WAI-ARIA 1.2, the alert role).
describe('LoadError', () => {
  it('says what could not be loaded and why, and its retry asks again', async () => {
    const onRetry = vi.fn();
    const { user } = renderIn(
      <LoadError
        title="The list of accounts could not be loaded"
        error={new ApiError(503, ['Service Unavailable'])}
        onRetry={onRetry}
      />,
    );
    const alert = screen.getByRole('alert');
    expect(alert).toHaveTextContent('The list of accounts could not be loaded');
    // A 5xx is described in words a chef can act on, not the server's (lib/error-message.ts).
    expect(alert).toHaveTextContent('The server ran into a problem. Please try again in a moment.');

    await user.click(within(alert).getByRole('button', { name: 'Try again' }));
    expect(onRetry).toHaveBeenCalledTimes(1);
  });

  it('without an error, shows the title alone', () => {
    renderIn(<LoadError title="The pending invitations could not be loaded" onRetry={() => {}} />);
    const alert = screen.getByRole('alert');
    expect(alert.textContent).toBe('The pending invitations could not be loadedTry again');
  });

  it('while retrying, its button is busy and cannot be pressed again', () => {
    renderIn(
      <LoadError title="The orders could not be loaded" error={null} onRetry={() => {}} retrying />,
    );
    const button = within(screen.getByRole('alert')).getByRole('button');
    expect(button).toBeDisabled();
  });

  it('words the error the caller’s way when it passes its own wording', () => {
    renderIn(
      <LoadError
        title="The briefing could not be loaded"
        error={new ApiError(403, ['Forbidden resource'])}
        describe={(error) =>
          error instanceof ApiError && error.status === 403
            ? 'Your role is not allowed to do this. Ask the chef.'
            : 'Please try again in a moment.'
        }
        onRetry={() => {}}
      />,
    );
    const alert = screen.getByRole('alert');
    expect(alert).toHaveTextContent('Your role is not allowed to do this. Ask the chef.');
    expect(alert).not.toHaveTextContent('Forbidden resource');
  });
});
