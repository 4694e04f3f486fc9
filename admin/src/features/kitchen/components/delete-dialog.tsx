import { Button, Text } from '@chakra-ui/react';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { TrashIcon } from '../../../components/ui/icons';

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
  return (
    <ConfirmDialog
      trigger={
        <Button variant="outline" colorPalette="danger">
          <TrashIcon /> Delete
        </Button>
      }
      title={`Delete the ${what} “${name}”?`}
      confirmLabel={`Delete ${what}`}
      pendingLabel="Deleting…"
      cancelLabel="Keep it"
      errorTitle="Not deleted"
      danger
      onConfirm={onDelete}
      onDone={onDeleted}
    >
      <Text>
        It is removed from the kitchen for good. Anything that uses it must be changed first; the
        server will say what, if so.
      </Text>
    </ConfirmDialog>
  );
}
