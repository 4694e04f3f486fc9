import { Button, Text } from '@chakra-ui/react';
import { createQueryClient } from '@nappe/web-kit/react';
import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { AppProvider } from '../../app/provider';
import { ApiError } from '../../lib/api-client';
import { ConfirmDialog } from './confirm-dialog';

type Props = Partial<Parameters<typeof ConfirmDialog>[0]>;

function renderDialog(props: Props = {}) {
  const onConfirm = props.onConfirm ?? vi.fn(() => Promise.resolve());
  const onDone = props.onDone ?? vi.fn();
  const user = userEvent.setup();
  render(
    <AppProvider queryClient={createQueryClient()}>
      <ConfirmDialog
        trigger={<Button>Withdraw</Button>}
        title="Withdraw the invitation to Odile?"
        confirmLabel="Withdraw invitation"
        pendingLabel="Withdrawing…"
        danger
        {...props}
        onConfirm={onConfirm}
        onDone={onDone}
      >
        <Text>The link in their e-mail stops working.</Text>
      </ConfirmDialog>
    </AppProvider>,
  );
  return { user, onConfirm, onDone };
}

// The alertdialog role and its focus handling: WAI-ARIA 1.2 (alertdialog) and the ARIA Authoring
// Practices Guide's modal dialog pattern (focus moves into the dialog, and back to the control
// that opened it when it closes).
describe('ConfirmDialog', () => {
  it('asks first; cancelling sends nothing and gives focus back to the trigger', async () => {
    const { user, onConfirm, onDone } = renderDialog({ cancelLabel: 'Keep it' });
    const trigger = screen.getByRole('button', { name: 'Withdraw' });
    await user.click(trigger);

    const dialog = await screen.findByRole('alertdialog', {
      name: 'Withdraw the invitation to Odile?',
    });
    expect(within(dialog).getByText('The link in their e-mail stops working.')).toBeVisible();
    await waitFor(() => expect(dialog.contains(document.activeElement)).toBe(true));

    await user.click(within(dialog).getByRole('button', { name: 'Keep it' }));
    await waitFor(() => expect(screen.queryByRole('alertdialog')).not.toBeInTheDocument());
    expect(onConfirm).not.toHaveBeenCalled();
    expect(onDone).not.toHaveBeenCalled();
    await waitFor(() => expect(trigger).toHaveFocus());
  });

  it('cancels with “Cancel” unless told otherwise', async () => {
    const { user } = renderDialog();
    await user.click(screen.getByRole('button', { name: 'Withdraw' }));
    const dialog = await screen.findByRole('alertdialog');
    expect(within(dialog).getByRole('button', { name: 'Cancel' })).toBeInTheDocument();
  });

  it('shows the pending label while it works, then closes and reports done', async () => {
    let finish: () => void = () => {};
    const onConfirm = vi.fn(() => new Promise<void>((resolve) => (finish = resolve)));
    const { user, onDone } = renderDialog({ onConfirm });
    await user.click(screen.getByRole('button', { name: 'Withdraw' }));
    const dialog = await screen.findByRole('alertdialog');

    await user.click(within(dialog).getByRole('button', { name: 'Withdraw invitation' }));
    const busy = await within(dialog).findByRole('button', { name: /Withdrawing…/ });
    expect(busy).toBeDisabled();
    expect(onConfirm).toHaveBeenCalledTimes(1);

    finish();
    await waitFor(() => expect(screen.queryByRole('alertdialog')).not.toBeInTheDocument());
    expect(onDone).toHaveBeenCalledTimes(1);
  });

  it('keeps a refusal in the dialog, in the server’s words, until it is closed', async () => {
    const refusal = new ApiError(409, ['The studio needs at least one chef.']);
    const { user, onDone } = renderDialog({
      onConfirm: () => Promise.reject(refusal),
      errorTitle: 'Not withdrawn',
    });
    await user.click(screen.getByRole('button', { name: 'Withdraw' }));
    const dialog = await screen.findByRole('alertdialog');
    await user.click(within(dialog).getByRole('button', { name: 'Withdraw invitation' }));

    const alert = await within(dialog).findByRole('alert');
    expect(alert).toHaveTextContent('Not withdrawn');
    expect(alert).toHaveTextContent('The studio needs at least one chef.');
    expect(onDone).not.toHaveBeenCalled();
    // Still enabled: the chef can try again.
    expect(within(dialog).getByRole('button', { name: 'Withdraw invitation' })).toBeEnabled();

    await user.click(within(dialog).getByRole('button', { name: 'Close' }));
    await waitFor(() => expect(screen.queryByRole('alertdialog')).not.toBeInTheDocument());
    await user.click(screen.getByRole('button', { name: 'Withdraw' }));
    const reopened = await screen.findByRole('alertdialog');
    expect(within(reopened).queryByRole('alert')).not.toBeInTheDocument();
  });

  it('titles a refusal “Not done” unless told otherwise', async () => {
    const { user } = renderDialog({ onConfirm: () => Promise.reject(new Error('offline')) });
    await user.click(screen.getByRole('button', { name: 'Withdraw' }));
    const dialog = await screen.findByRole('alertdialog');
    await user.click(within(dialog).getByRole('button', { name: 'Withdraw invitation' }));
    expect(await within(dialog).findByRole('alert')).toHaveTextContent('Not done');
  });
});
