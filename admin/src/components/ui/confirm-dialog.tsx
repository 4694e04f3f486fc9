import { Alert, Button, CloseButton, Dialog, Portal, Stack } from '@chakra-ui/react';
import { useState, type ReactNode } from 'react';
import { errorMessage } from '../../lib/error-message';

/**
 * Asks before a change that cannot be taken back. The trigger opens it; confirming runs
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
    <Dialog.Root
      role="alertdialog"
      open={open}
      onOpenChange={(e) => {
        setOpen(e.open);
        if (!e.open) setError(null);
      }}
      placement="center"
    >
      <Dialog.Trigger asChild>{trigger}</Dialog.Trigger>
      <Portal>
        <Dialog.Backdrop />
        <Dialog.Positioner px="4">
          <Dialog.Content bg="bg.panel">
            <Dialog.Header>
              <Dialog.Title>{title}</Dialog.Title>
            </Dialog.Header>
            <Dialog.Body>
              <Stack gap="4">
                {children}
                {error && (
                  <Alert.Root status="error" role="alert" borderRadius="l2">
                    <Alert.Indicator />
                    <Alert.Content>
                      <Alert.Title>{errorTitle}</Alert.Title>
                      <Alert.Description>{error}</Alert.Description>
                    </Alert.Content>
                  </Alert.Root>
                )}
              </Stack>
            </Dialog.Body>
            <Dialog.Footer>
              <Dialog.ActionTrigger asChild>
                <Button variant="outline">{cancelLabel}</Button>
              </Dialog.ActionTrigger>
              <Button
                colorPalette={danger ? 'danger' : undefined}
                loading={pending}
                loadingText={pendingLabel}
                onClick={() => void confirm()}
              >
                {confirmLabel}
              </Button>
            </Dialog.Footer>
            <Dialog.CloseTrigger asChild>
              <CloseButton size="sm" aria-label="Close" />
            </Dialog.CloseTrigger>
          </Dialog.Content>
        </Dialog.Positioner>
      </Portal>
    </Dialog.Root>
  );
}
