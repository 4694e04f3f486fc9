import { Alert, Button, CloseButton, Dialog, Portal, Stack } from '@chakra-ui/react';
import { useState, type ReactNode } from 'react';
import { errorMessage } from '../../../lib/error-message';

/**
 * Asks before a team change. The trigger opens it; confirming runs `onConfirm`; a refusal from the
 * server (the last chef, a member already removed) stays in the dialog in the server's words.
 */
export function ConfirmDialog({
  trigger,
  title,
  children,
  confirmLabel,
  pendingLabel,
  danger,
  onConfirm,
  onDone,
}: {
  trigger: ReactNode;
  title: string;
  children: ReactNode;
  confirmLabel: string;
  pendingLabel: string;
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
                      <Alert.Title>Not done</Alert.Title>
                      <Alert.Description>{error}</Alert.Description>
                    </Alert.Content>
                  </Alert.Root>
                )}
              </Stack>
            </Dialog.Body>
            <Dialog.Footer>
              <Dialog.ActionTrigger asChild>
                <Button variant="outline">Cancel</Button>
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
