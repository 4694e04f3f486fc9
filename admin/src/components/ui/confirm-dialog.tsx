import { useState, type ReactNode } from 'react';
import { errorMessage } from '../../lib/error-message';
import { ActionDialog } from './action-dialog';

/**
 * Asks before a change that cannot be taken back, in the one dialog frame (ActionDialog), keeping
 * its own open, pending and error state. The trigger opens it; confirming runs
 * `onConfirm`; a refusal from the server (something still uses the item, the last chef…) stays in
 * the dialog in the server's words, under `errorTitle`, until it is closed or tried again.
 */
export function ConfirmDialog({
  trigger,
  title,
  children,
  confirmLabel,
  pendingLabel,
  cancelLabel = 'Cancel',
  errorTitle = 'Not done',
  danger,
  onConfirm,
  onDone,
}: {
  trigger: ReactNode;
  title: string;
  children: ReactNode;
  confirmLabel: string;
  pendingLabel: string;
  cancelLabel?: string;
  errorTitle?: string;
  danger?: boolean;
  onConfirm: () => Promise<unknown>;
  onDone?: () => void;
}) {
  const [open, setOpen] = useState(false);
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);

  const confirm = async () => {
    setPending(true);
    setError(null);
    try {
      await onConfirm();
      setOpen(false);
      onDone?.();
    } catch (e) {
      setError(errorMessage(e));
    } finally {
      setPending(false);
    }
  };

  return (
    <ActionDialog
      open={open}
      onOpenChange={(next) => {
        setOpen(next);
        if (!next) setError(null);
      }}
      trigger={trigger}
      title={title}
      error={error}
      errorTitle={errorTitle}
      confirmLabel={confirmLabel}
      confirmPalette={danger ? 'danger' : undefined}
      pending={pending}
      pendingLabel={pendingLabel}
      onConfirm={() => void confirm()}
      keepLabel={cancelLabel}
    >
      {children}
    </ActionDialog>
  );
}
