import { Button, Dialog, Portal, Text } from '@chakra-ui/react';
import { useCallback, useEffect, useRef } from 'react';
import { useBlocker, type BlockerFunction } from 'react-router';

/**
 * Asks before leaving an editor with unsaved changes: in the app (a dialog) and when closing or
 * reloading the tab (the browser's own prompt). Call `allowNextNavigation()` just before
 * navigating away on purpose (after saving or deleting).
 */
export function useUnsavedChangesGuard(dirty: boolean) {
  const allowed = useRef(false);
  const shouldBlock = useCallback<BlockerFunction>(
    ({ currentLocation, nextLocation }) =>
      dirty && !allowed.current && currentLocation.pathname !== nextLocation.pathname,
    [dirty],
  );
  const blocker = useBlocker(shouldBlock);

  useEffect(() => {
    if (!dirty) return;
    const warn = (event: BeforeUnloadEvent) => {
      if (allowed.current) return;
      event.preventDefault();
    };
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  const allowNextNavigation = useCallback(() => {
    allowed.current = true;
  }, []);

  const dialog = (
    <Dialog.Root
      role="alertdialog"
      open={blocker.state === 'blocked'}
      onOpenChange={(e) => {
        if (!e.open && blocker.state === 'blocked') blocker.reset();
      }}
      placement="center"
    >
      <Portal>
        <Dialog.Backdrop />
        <Dialog.Positioner px="4">
          <Dialog.Content bg="bg.panel">
            <Dialog.Header>
              <Dialog.Title>Leave without saving?</Dialog.Title>
            </Dialog.Header>
            <Dialog.Body>
              <Text>The changes on this page have not been saved and will be lost.</Text>
            </Dialog.Body>
            <Dialog.Footer>
              <Button
                variant="outline"
                onClick={() => (blocker.state === 'blocked' ? blocker.reset() : undefined)}
              >
                Stay and keep editing
              </Button>
              <Button
                colorPalette="danger"
                onClick={() => (blocker.state === 'blocked' ? blocker.proceed() : undefined)}
              >
                Leave without saving
              </Button>
            </Dialog.Footer>
          </Dialog.Content>
        </Dialog.Positioner>
      </Portal>
    </Dialog.Root>
  );

  return { dialog, allowNextNavigation };
}
