import {
  Alert,
  Button,
  CloseButton,
  Dialog,
  Field,
  Heading,
  List,
  Portal,
  Stack,
  Text,
} from '@chakra-ui/react';
import { useEffect, useRef, useState } from 'react';
import { PasswordInput } from '@nappe/web-kit/auth';
import { ApiError } from '../../../lib/api-client';
import { useDeleteAccount, type AccountDeletion } from '../api/delete-account';

export const ERASED = [
  'Your name, e-mail address and password, and your sign-in on every device.',
  'Your guests’ names, tables, allergies, diets and notes.',
  'The venue, phone number and occasion of each booking, and the reasons you wrote.',
  'The e-mails we sent you.',
];

export const KEPT = [
  'Your payments and refunds — amounts, dates and booking references — with an anonymous reference instead of your name. The studio must keep its bookkeeping records for as long as accounting and tax law requires, so these are not deleted; nothing left in them says who you are.',
  'Each booking’s date, menu and number of guests, so those payments still add up, and anonymous counts of guests per allergy and diet for the studio’s planning.',
];

/** The server's own words: "cancel it first…" (409) or "not your current password" (403). */
function failureText(error: Error): string {
  return error instanceof ApiError ? error.messages.join(' ') : 'Please try again.';
}

/**
 * Deleting an account, with what is erased and what the studio keeps (and why) said before
 * anything happens, confirmed with the current password. An upcoming booking blocks it: the
 * server's explanation (cancel first) is shown as it is.
 */
export function DeleteAccountDialog({
  open,
  onOpenChange,
  onDeleted,
}: {
  open: boolean;
  onOpenChange: (open: boolean) => void;
  onDeleted: (result: AccountDeletion) => void;
}) {
  const remove = useDeleteAccount();
  const [password, setPassword] = useState('');
  const [touched, setTouched] = useState(false);
  const missing = touched && password === '';
  const failure = useRef<HTMLDivElement>(null);

  // The body scrolls inside the dialog: bring the server's answer into view when it arrives.
  useEffect(() => {
    if (remove.error) failure.current?.scrollIntoView?.({ block: 'nearest', behavior: 'smooth' });
  }, [remove.error]);

  const close = (next: boolean) => {
    if (remove.isPending) return;
    onOpenChange(next);
    if (!next) {
      remove.reset();
      setPassword('');
      setTouched(false);
    }
  };

  const submit = () => {
    setTouched(true);
    if (password === '') return;
    remove.mutate(password, { onSuccess: (result) => onDeleted(result) });
  };

  return (
    <Dialog.Root
      role="alertdialog"
      open={open}
      onOpenChange={(e) => close(e.open)}
      placement="center"
      size="lg"
      scrollBehavior="inside"
    >
      <Portal>
        <Dialog.Backdrop />
        <Dialog.Positioner>
          <Dialog.Content bg="bg.panel">
            <Dialog.Header>
              <Dialog.Title fontFamily="heading" fontWeight="normal" fontSize="2xl">
                Delete your account?
              </Dialog.Title>
            </Dialog.Header>
            <Dialog.Body>
              <form
                id="delete-account-form"
                noValidate
                onSubmit={(e) => {
                  e.preventDefault();
                  submit();
                }}
              >
                <Stack gap="5">
                  <Text>
                    This cannot be undone. You will be signed out on every device, and you cannot
                    sign in to this account again.
                  </Text>
                  <Stack gap="2">
                    <Heading as="h3" textStyle="md" fontWeight="semibold">
                      What is erased
                    </Heading>
                    <List.Root ps="5" gap="1">
                      {ERASED.map((line) => (
                        <List.Item key={line}>{line}</List.Item>
                      ))}
                    </List.Root>
                  </Stack>
                  <Stack gap="2">
                    <Heading as="h3" textStyle="md" fontWeight="semibold">
                      What the studio keeps, and why
                    </Heading>
                    <List.Root ps="5" gap="1">
                      {KEPT.map((line) => (
                        <List.Item key={line}>{line}</List.Item>
                      ))}
                    </List.Root>
                  </Stack>
                  <Text textStyle="sm" color="fg.muted">
                    An account with an upcoming booking cannot be deleted: cancel the booking first.
                    Download your data before deleting if you want a copy.
                  </Text>
                  <Field.Root invalid={missing} required>
                    <Field.Label>Your current password</Field.Label>
                    <PasswordInput
                      autoComplete="current-password"
                      value={password}
                      onChange={(e) => setPassword(e.target.value)}
                      onBlur={() => setTouched(true)}
                    />
                    <Field.ErrorText>
                      Enter your current password to delete your account.
                    </Field.ErrorText>
                  </Field.Root>
                  {remove.error && (
                    <Alert.Root ref={failure} status="error" role="alert" borderRadius="l2">
                      <Alert.Indicator />
                      <Alert.Content>
                        <Alert.Title>Your account was not deleted</Alert.Title>
                        <Alert.Description>{failureText(remove.error)}</Alert.Description>
                      </Alert.Content>
                    </Alert.Root>
                  )}
                </Stack>
              </form>
            </Dialog.Body>
            <Dialog.Footer gap="3" flexWrap="wrap-reverse">
              <Dialog.ActionTrigger asChild>
                <Button variant="outline" disabled={remove.isPending}>
                  Keep my account
                </Button>
              </Dialog.ActionTrigger>
              <Button
                type="submit"
                form="delete-account-form"
                colorPalette="danger"
                loading={remove.isPending}
                loadingText="Deleting…"
              >
                Delete my account
              </Button>
            </Dialog.Footer>
            <Dialog.CloseTrigger asChild>
              <CloseButton size="sm" aria-label="Close" disabled={remove.isPending} />
            </Dialog.CloseTrigger>
          </Dialog.Content>
        </Dialog.Positioner>
      </Portal>
    </Dialog.Root>
  );
}
