import { Alert, Button, CloseButton, Dialog, Portal, Text } from '@chakra-ui/react';
import { useState } from 'react';
import { TrashIcon } from '../../../components/ui/icons';
import { errorMessage } from '../../../lib/error-message';

/**
 * Delete, after asking. When the server refuses because something still uses the item (409),
 * its message — which names what uses it — stays in the dialog so the chef knows where to go.
 */
export function DeleteButton({
  what,
  name,
  onDelete,
  onDeleted,
}: {
  /** "ingredient", "recipe"… */
  what: string;
  name: string;
  onDelete: () => Promise<unknown>;
  onDeleted: () => void;
}) {
  const [open, setOpen] = useState(false);
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);

  const confirm = async () => {
    setPending(true);
    setError(null);
    try {
      await onDelete();
      setOpen(false);
      onDeleted();
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
      <Dialog.Trigger asChild>
        <Button variant="outline" colorPalette="danger">
          <TrashIcon /> Delete
        </Button>
      </Dialog.Trigger>
      <Portal>
        <Dialog.Backdrop />
        <Dialog.Positioner px="4">
          <Dialog.Content bg="bg.panel">
            <Dialog.Header>
              <Dialog.Title>
                Delete the {what} “{name}”?
              </Dialog.Title>
            </Dialog.Header>
            <Dialog.Body display="flex" flexDirection="column" gap="4">
              <Text>
                It is removed from the kitchen for good. Anything that uses it must be changed
                first; the server will say what, if so.
              </Text>
              {error && (
                <Alert.Root status="error" role="alert" borderRadius="l2">
                  <Alert.Indicator />
                  <Alert.Content>
                    <Alert.Title>Not deleted</Alert.Title>
                    <Alert.Description>{error}</Alert.Description>
                  </Alert.Content>
                </Alert.Root>
              )}
            </Dialog.Body>
            <Dialog.Footer>
              <Dialog.ActionTrigger asChild>
                <Button variant="outline">Keep it</Button>
              </Dialog.ActionTrigger>
              <Button
                colorPalette="danger"
                loading={pending}
                loadingText="Deleting…"
                onClick={() => void confirm()}
              >
                Delete {what}
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
