import { Alert, Button, CloseButton, Dialog, Portal, Stack } from '@chakra-ui/react';
import type { ReactNode } from 'react';

/**
 * The frame of every dialog that asks before acting (order actions, deletions, team changes):
 * what will happen is said first, then the button. The dialog stays open when the server
 * refuses, with its reason in words, so nothing typed is lost.
 */
export function ActionDialog({
  open,
  onOpenChange,
  trigger,
  title,
  children,
  error,
  errorTitle,
  confirmLabel,
  confirmPalette = 'brand',
  pending,
  pendingLabel,
  onConfirm,
  keepLabel = 'Go back',
  confirmDisabled,
  footerExtra,
}: {
  open: boolean;
  onOpenChange: (open: boolean) => void;
  trigger: ReactNode;
  title: string;
  children: ReactNode;
  error: string | null;
  errorTitle: string;
  confirmLabel: string;
  confirmPalette?: string;
  pending: boolean;
  pendingLabel: string;
  onConfirm: () => void;
  keepLabel?: string;
  confirmDisabled?: boolean;
  /** Replaces the confirm button (the gate's "Confirm anyway"). */
  footerExtra?: ReactNode;
}) {
  return (
    <Dialog.Root
      role="alertdialog"
      open={open}
      onOpenChange={(e) => onOpenChange(e.open)}
      placement="center"
      scrollBehavior="inside"
    >
      <Dialog.Trigger asChild>{trigger}</Dialog.Trigger>
      <Portal>
        <Dialog.Backdrop />
        <Dialog.Positioner px="4">
          <Dialog.Content bg="bg.panel" maxW="lg">
            <Dialog.Header>
              <Dialog.Title fontFamily="heading" fontWeight="normal" textStyle="2xl">
                {title}
              </Dialog.Title>
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
            <Dialog.Footer flexWrap="wrap">
              <Dialog.ActionTrigger asChild>
                <Button variant="outline">{keepLabel}</Button>
              </Dialog.ActionTrigger>
              {footerExtra ?? (
                <Button
                  colorPalette={confirmPalette}
                  loading={pending}
                  loadingText={pendingLabel}
                  disabled={confirmDisabled}
                  onClick={onConfirm}
                >
                  {confirmLabel}
                </Button>
              )}
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
