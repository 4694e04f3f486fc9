import { Alert, Button, CloseButton, Dialog, Portal, Text } from '@chakra-ui/react';
import { useState } from 'react';
import { TrashIcon } from '../../../components/ui/icons';
import { useRemoveSubstitution } from '../api/save-substitution';
import type { GuestNote, GuestPlateNote } from '../api/types';
import { describeError } from '../lib/describe-error';

/** Back to the standard plate, after asking: the conflicts it had come back. */
export function RemoveSubstitutionButton({
  orderId,
  guest,
  plate,
  onRemoved,
  finalFocus,
}: {
  orderId: string;
  guest: GuestNote;
  plate: GuestPlateNote;
  onRemoved: (guest: GuestNote) => void;
  /** Where the focus goes when the dialog closes (this button is gone once removed). */
  finalFocus?: () => HTMLElement | null;
}) {
  const [open, setOpen] = useState(false);
  const remove = useRemoveSubstitution();

  return (
    <Dialog.Root
      role="alertdialog"
      open={open}
      onOpenChange={(e) => {
        setOpen(e.open);
        if (!e.open) remove.reset();
      }}
      placement="center"
      finalFocusEl={remove.isSuccess ? finalFocus : undefined}
    >
      <Dialog.Trigger asChild>
        <Button variant="outline" colorPalette="danger" size="sm">
          <TrashIcon /> Remove the change
        </Button>
      </Dialog.Trigger>
      <Portal>
        <Dialog.Backdrop />
        <Dialog.Positioner px="4">
          <Dialog.Content bg="bg.panel">
            <Dialog.Header>
              <Dialog.Title>
                Remove the change to {guest.label}’s {plate.dessertName}?
              </Dialog.Title>
            </Dialog.Header>
            <Dialog.Body display="flex" flexDirection="column" gap="4">
              <Text>
                {guest.label} goes back to the standard plate
                {plate.clear
                  ? '.'
                  : ', and its conflicts come back: the plate must be changed again before service.'}
              </Text>
              {remove.isError && (
                <Alert.Root status="error" role="alert" borderRadius="l2">
                  <Alert.Indicator />
                  <Alert.Content>
                    <Alert.Title>Not removed</Alert.Title>
                    <Alert.Description>{describeError(remove.error)}</Alert.Description>
                  </Alert.Content>
                </Alert.Root>
              )}
            </Dialog.Body>
            <Dialog.Footer>
              <Dialog.ActionTrigger asChild>
                <Button variant="outline">Keep the change</Button>
              </Dialog.ActionTrigger>
              <Button
                colorPalette="danger"
                loading={remove.isPending}
                loadingText="Removing…"
                onClick={() =>
                  remove.mutate(
                    { orderId, guestId: guest.guestId, dessertId: plate.dessertId },
                    {
                      onSuccess: (saved) => {
                        setOpen(false);
                        onRemoved(saved);
                      },
                    },
                  )
                }
              >
                Remove the change
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
