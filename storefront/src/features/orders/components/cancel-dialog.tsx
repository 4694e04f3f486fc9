import { Alert, Button, CloseButton, Dialog, Field, Portal, Stack, Text } from '@chakra-ui/react';
import { plural, REASON_MAX, type OrderDetail } from '@nappe/shared';
import { useState } from 'react';
import { Facts } from '../../../components/ui/facts';
import { LoadError } from '../../../components/ui/query-state';
import { SkeletonLines } from '../../../components/ui/skeleton';
import { Textarea } from '../../../components/ui/textarea';
import { ApiError } from '../../../lib/api-client';
import { money } from '../../../lib/format';
import { useCancelOrder } from '../api/cancel-order';
import { useCancellationPreview } from '../api/get-cancellation-preview';

/**
 * Cancelling, with the refund the policy gives shown before anything happens: the dialog asks
 * the server what cancelling today would refund, and the confirm button states that amount.
 */
export function CancelDialog({
  order,
  open,
  onOpenChange,
  onCancelled,
}: {
  order: OrderDetail;
  open: boolean;
  onOpenChange: (open: boolean) => void;
  onCancelled: (refundMinor: number) => void;
}) {
  const preview = useCancellationPreview(order.id, open);
  const cancel = useCancelOrder(order.id);
  const [reason, setReason] = useState('');
  const m = (minor: number) => money(minor, order.currency);
  const refund = preview.data?.refund;

  return (
    <Dialog.Root
      role="alertdialog"
      open={open}
      onOpenChange={(e) => {
        if (!cancel.isPending) onOpenChange(e.open);
        if (!e.open) cancel.reset();
      }}
      placement="center"
      size="md"
    >
      <Portal>
        <Dialog.Backdrop />
        <Dialog.Positioner>
          <Dialog.Content bg="bg.panel">
            <Dialog.Header>
              <Dialog.Title fontFamily="heading" fontWeight="normal" fontSize="2xl">
                Cancel this booking?
              </Dialog.Title>
            </Dialog.Header>
            <Dialog.Body>
              <Stack gap="4">
                {preview.isPending ? (
                  <Stack gap="2" role="status" aria-label="Working out your refund">
                    <Text color="fg.muted">Working out your refund…</Text>
                    <SkeletonLines lines={3} />
                  </Stack>
                ) : preview.isError ? (
                  <LoadError
                    title="We could not work out your refund"
                    error={preview.error}
                    onRetry={() => void preview.refetch()}
                    retrying={preview.isFetching}
                  />
                ) : refund ? (
                  <>
                    <Text>
                      {refund.daysBeforeEvent !== null && refund.paidMinor > 0
                        ? `Cancelling today, ${refund.daysBeforeEvent === 0 ? 'on the day of the event' : `${plural(refund.daysBeforeEvent, 'day')} before it`}, refunds ${refund.refundPercent} % of what you paid under the cancellation policy.`
                        : refund.message}
                    </Text>
                    <Facts
                      labelWidth="9rem"
                      items={[
                        ['You paid', m(refund.paidMinor)],
                        [
                          'Refund',
                          <Text as="span" fontWeight="semibold">
                            {m(refund.refundMinor)}
                            {refund.paidMinor > 0 ? ` (${refund.refundPercent} %)` : ''}
                          </Text>,
                        ],
                        ['Kept by the studio', m(refund.keptMinor)],
                      ]}
                    />
                    <Text textStyle="sm" color="fg.muted">
                      The refund goes back to the card you paid with, usually within a few days.
                      Cancelling cannot be undone.
                    </Text>
                  </>
                ) : null}
                <Field.Root invalid={reason.length > REASON_MAX}>
                  <Field.Label>Reason (optional)</Field.Label>
                  <Textarea
                    rows={2}
                    maxLength={REASON_MAX}
                    value={reason}
                    onChange={(e) => setReason(e.target.value)}
                  />
                  <Field.HelperText>
                    Helps the chef; {reason.length} of {REASON_MAX} characters.
                  </Field.HelperText>
                </Field.Root>
                {cancel.error && (
                  <Alert.Root status="error" role="alert" borderRadius="l2">
                    <Alert.Indicator />
                    <Alert.Content>
                      <Alert.Title>The booking was not cancelled</Alert.Title>
                      <Alert.Description>
                        {cancel.error instanceof ApiError
                          ? cancel.error.messages.join(' ')
                          : 'Please try again.'}
                      </Alert.Description>
                    </Alert.Content>
                  </Alert.Root>
                )}
              </Stack>
            </Dialog.Body>
            <Dialog.Footer gap="3" flexWrap="wrap-reverse">
              <Dialog.ActionTrigger asChild>
                <Button variant="outline" disabled={cancel.isPending}>
                  Keep my booking
                </Button>
              </Dialog.ActionTrigger>
              <Button
                colorPalette="danger"
                disabled={!refund}
                loading={cancel.isPending}
                loadingText="Cancelling…"
                onClick={() =>
                  cancel.mutate(reason.trim() ? { reason: reason.trim() } : {}, {
                    onSuccess: () => {
                      onOpenChange(false);
                      onCancelled(refund?.refundMinor ?? 0);
                    },
                  })
                }
              >
                {refund && refund.refundMinor > 0
                  ? `Cancel and refund ${m(refund.refundMinor)}`
                  : 'Cancel the booking'}
              </Button>
            </Dialog.Footer>
            <Dialog.CloseTrigger asChild>
              <CloseButton size="sm" aria-label="Close" disabled={cancel.isPending} />
            </Dialog.CloseTrigger>
          </Dialog.Content>
        </Dialog.Positioner>
      </Portal>
    </Dialog.Root>
  );
}
