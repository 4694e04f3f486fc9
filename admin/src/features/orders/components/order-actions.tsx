import {
  Alert,
  Button,
  HStack,
  Link,
  List,
  RadioGroup,
  Skeleton,
  Stack,
  Text,
} from '@chakra-ui/react';
import {
  compareIsoDates,
  formatIsoDate,
  formatMoney,
  OrderStatus,
  plural,
  REASON_MAX,
  transitionsFor,
  type IsoDate,
  type OrderDetail,
} from '@nappe/shared';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router';
import { ApiError } from '../../../lib/api-client';
import { paymentErrorMessage } from '../../../lib/error-message';
import { useCancelOrder, type RefundChoice } from '../api/cancel-order';
import { useCompleteOrder } from '../api/complete-order';
import { useConfirmOrder } from '../api/confirm-order';
import { useDeclineOrder } from '../api/decline-order';
import { useCancellationPreview } from '../api/get-cancellation-preview';
import { orderKeys } from '../api/order-keys';
import type { AllergySummary } from '../api/types';
import { ActionDialog } from '../../../components/ui/action-dialog';
import { ReasonField } from './reason-field';

/**
 * The chef's reason for confirming despite the kitchen's checks: 5 to 480 characters, as the API
 * validates it (api/src/allergy-notes/allergy-notes.dto.ts `confirmBodySchema`).
 */
export const OVERRIDE_REASON_MIN = 5;
export const OVERRIDE_REASON_MAX = 480;

export interface OrderActionsProps {
  order: OrderDetail;
  /** The allergy notes' counts, when loaded. */
  allergy: AllergySummary | undefined;
  allergyNotesHref: string;
  /** Today on the studio's calendar. */
  today: IsoDate;
  /** Told the result in words after an action succeeded. */
  onDone: (message: string) => void;
}

/**
 * The buttons the status allows the chef, read from the shared transition table
 * (shared/src/orders/order-status.ts): To confirm → Confirm or Decline; Confirmed → Mark as
 * served or Cancel. Other statuses have nothing for the chef to do.
 */
export function OrderActions(props: OrderActionsProps) {
  const targets = transitionsFor(props.order.status, 'chef').map((t) => t.to);
  if (targets.length === 0) return null;
  return (
    <HStack gap="2" wrap="wrap">
      {targets.includes(OrderStatus.Confirmed) && <ConfirmAction {...props} />}
      {targets.includes(OrderStatus.Completed) && <CompleteAction {...props} />}
      {targets.includes(OrderStatus.Declined) && <DeclineAction {...props} />}
      {targets.includes(OrderStatus.Cancelled) && <CancelAction {...props} />}
    </HStack>
  );
}

// ---------------------------------------------------------------- confirm

function ConfirmAction({ order, allergy, allergyNotesHref, onDone }: OrderActionsProps) {
  const queryClient = useQueryClient();
  const confirm = useConfirmOrder();
  const [open, setOpen] = useState(false);
  const [note, setNote] = useState('');
  /** The server's reasons after it refused (409): the gate is shown. */
  const [gate, setGate] = useState<string[] | null>(null);
  const [override, setOverride] = useState('');
  const [overrideError, setOverrideError] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const unresolved = allergy?.unresolved ?? [];

  const reset = () => {
    setNote('');
    setGate(null);
    setOverride('');
    setOverrideError(null);
    setError(null);
  };

  const submit = async (anyway: boolean) => {
    setError(null);
    const overrideReason = override.trim();
    if (anyway) {
      if (overrideReason.length < OVERRIDE_REASON_MIN) {
        setOverrideError(
          'Give the reason for confirming anyway in a few words (5 characters or more).',
        );
        return;
      }
      setOverrideError(null);
    }
    try {
      const updated = await confirm.mutateAsync({
        id: order.id,
        reason: note.trim() || undefined,
        overrideReason: anyway ? overrideReason : undefined,
      });
      setOpen(false);
      reset();
      onDone(
        anyway
          ? `${updated.reference} is confirmed despite the kitchen’s checks, with your reason recorded. It is in the prep plan.`
          : `${updated.reference} is confirmed and added to the prep plan. The client is e-mailed.`,
      );
    } catch (e) {
      if (!anyway && e instanceof ApiError && e.status === 409) {
        // Unresolved guest conflicts or a too-short lead time: the server says which.
        // The order and its allergy check are read again: the gate's reasons may be news.
        await queryClient.invalidateQueries({ queryKey: orderKeys.detail(order.id) });
        const fresh = queryClient.getQueryData<OrderDetail>(orderKeys.detail(order.id));
        if (!fresh || fresh.status === OrderStatus.Requested) {
          setGate(e.messages);
          return;
        }
      }
      setError(paymentErrorMessage(e));
    }
  };

  return (
    <ActionDialog
      open={open}
      onOpenChange={(next) => {
        setOpen(next);
        if (!next) reset();
      }}
      trigger={<Button colorPalette="accent">Confirm…</Button>}
      title={`Confirm ${order.reference}?`}
      error={error}
      errorTitle="Not confirmed"
      confirmLabel="Confirm booking"
      pending={confirm.isPending}
      pendingLabel="Confirming…"
      onConfirm={() => void submit(false)}
      footerExtra={
        gate ? (
          <Button
            colorPalette="caramel"
            loading={confirm.isPending}
            loadingText="Confirming…"
            onClick={() => void submit(true)}
          >
            Confirm anyway
          </Button>
        ) : undefined
      }
    >
      <Text>
        It joins the prep plan and its {plural(order.guestCount, 'guest')} count against the day’s
        plates. The client receives an e-mail that the event is confirmed, with the event file.
      </Text>
      {!gate && unresolved.length > 0 && (
        <Text color="fg.warning">
          {plural(unresolved.length, 'guest plate')} still{' '}
          {unresolved.length === 1 ? 'conflicts' : 'conflict'} with a guest’s requirement. The
          kitchen will ask you to record substitutions first, or to confirm anyway with a reason.
        </Text>
      )}
      {!gate && (
        <ReasonField
          label="Note for the order’s history (optional)"
          value={note}
          onChange={setNote}
          max={REASON_MAX}
        />
      )}
      {gate && (
        <>
          <Alert.Root status="warning" borderRadius="l2" role="alert">
            <Alert.Indicator />
            <Alert.Content gap="2">
              <Alert.Title>Not confirmed yet: the kitchen’s checks found problems</Alert.Title>
              <Alert.Description>
                <Stack gap="2">
                  {gate.map((m) => (
                    <Text key={m}>{m}</Text>
                  ))}
                  {unresolved.length > 0 && (
                    <List.Root ps="5" gap="1">
                      {unresolved.slice(0, 5).map((u) => (
                        <List.Item key={`${u.guestId}-${u.dessertName}`}>
                          {u.guest}, {u.dessertName}: {u.messages.join(' ')}
                        </List.Item>
                      ))}
                      {unresolved.length > 5 && (
                        <List.Item>and {plural(unresolved.length - 5, 'more plate')}</List.Item>
                      )}
                    </List.Root>
                  )}
                  <Link asChild fontWeight="semibold" color="fg" textDecoration="underline">
                    <RouterLink to={allergyNotesHref}>
                      Open the allergy notes to record substitutions
                    </RouterLink>
                  </Link>
                </Stack>
              </Alert.Description>
            </Alert.Content>
          </Alert.Root>
          <ReasonField
            label="Why confirm anyway?"
            helper="Kept in the order’s history with what was overridden."
            required
            value={override}
            onChange={(v) => {
              setOverride(v);
              if (overrideError && v.trim().length >= OVERRIDE_REASON_MIN) setOverrideError(null);
            }}
            error={overrideError}
            max={OVERRIDE_REASON_MAX}
          />
        </>
      )}
    </ActionDialog>
  );
}

// ---------------------------------------------------------------- decline

function DeclineAction({ order, onDone }: OrderActionsProps) {
  const decline = useDeclineOrder();
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState('');
  const [reasonError, setReasonError] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const paid = formatMoney(order.paidMinor, order.currency);

  const submit = async () => {
    setError(null);
    if (!reason.trim()) {
      setReasonError('Say why you decline: it is kept in the order’s history.');
      return;
    }
    try {
      const updated = await decline.mutateAsync({ id: order.id, reason: reason.trim() });
      setOpen(false);
      setReason('');
      onDone(
        `${updated.reference} is declined. ${paid} is refunded to the client, who is e-mailed.`,
      );
    } catch (e) {
      setError(paymentErrorMessage(e));
    }
  };

  return (
    <ActionDialog
      open={open}
      onOpenChange={(next) => {
        setOpen(next);
        if (!next) {
          setReason('');
          setReasonError(null);
          setError(null);
        }
      }}
      trigger={
        <Button variant="outline" colorPalette="danger">
          Decline…
        </Button>
      }
      title={`Decline ${order.reference}?`}
      error={error}
      errorTitle="Not declined"
      confirmLabel={order.paidMinor > 0 ? `Decline and refund ${paid}` : 'Decline booking'}
      confirmPalette="danger"
      pending={decline.isPending}
      pendingLabel="Declining…"
      onConfirm={() => void submit()}
      keepLabel="Keep the request"
    >
      <Text>
        {order.paidMinor > 0
          ? `Everything the client paid, ${paid}, is refunded in full by Nappe, automatically.`
          : 'Nothing was paid, so there is nothing to refund.'}{' '}
        The client receives an e-mail that the studio cannot take the booking, and the plates on{' '}
        {formatIsoDate(order.eventDate)} are released. This cannot be undone.
      </Text>
      <ReasonField
        label="Reason"
        helper="Kept in the order’s history; the e-mail to the client does not include it."
        required
        value={reason}
        onChange={(v) => {
          setReason(v);
          if (v.trim()) setReasonError(null);
        }}
        error={reasonError}
        max={REASON_MAX}
      />
    </ActionDialog>
  );
}

// ---------------------------------------------------------------- cancel

function CancelAction({ order, onDone }: OrderActionsProps) {
  const cancel = useCancelOrder();
  const [open, setOpen] = useState(false);
  const [choice, setChoice] = useState<RefundChoice>('policy');
  const [reason, setReason] = useState('');
  const [error, setError] = useState<string | null>(null);
  const preview = useCancellationPreview(order.id, open);
  const money = (minor: number) => formatMoney(minor, order.currency);
  const policy = preview.data?.refund;
  // What "in full" returns: everything paid and not yet refunded (the server's figure).
  const fullMinor = policy?.paidMinor ?? order.paidMinor;
  const refundMinor = choice === 'full' ? fullMinor : (policy?.refundMinor ?? 0);

  const submit = async () => {
    setError(null);
    try {
      const updated = await cancel.mutateAsync({
        id: order.id,
        reason: reason.trim() || undefined,
        refund: choice,
      });
      setOpen(false);
      setReason('');
      setChoice('policy');
      onDone(
        `${updated.reference} is cancelled. ${refundMinor > 0 ? `${money(refundMinor)} is refunded` : 'Nothing is refunded'}; the client is e-mailed.`,
      );
    } catch (e) {
      setError(paymentErrorMessage(e));
    }
  };

  return (
    <ActionDialog
      open={open}
      onOpenChange={(next) => {
        setOpen(next);
        if (!next) {
          setReason('');
          setChoice('policy');
          setError(null);
        }
      }}
      trigger={
        <Button variant="outline" colorPalette="danger">
          Cancel booking…
        </Button>
      }
      title={`Cancel ${order.reference}?`}
      error={error}
      errorTitle="Not cancelled"
      confirmLabel={refundMinor > 0 ? `Cancel and refund ${money(refundMinor)}` : 'Cancel booking'}
      confirmPalette="danger"
      pending={cancel.isPending}
      pendingLabel="Cancelling…"
      onConfirm={() => void submit()}
      keepLabel="Keep the booking"
      confirmDisabled={choice === 'policy' && !policy}
    >
      <Text>
        The booking leaves the prep plan and its plates on {formatIsoDate(order.eventDate)} are
        released. The client receives an e-mail with the refund. This cannot be undone.
      </Text>
      {preview.isPending ? (
        <Stack gap="2" role="status">
          <Text srOnly>Working out the refund…</Text>
          <Skeleton height="5" />
          <Skeleton height="5" width="3/4" />
        </Stack>
      ) : preview.isError ? (
        <Alert.Root status="error" borderRadius="l2">
          <Alert.Indicator />
          <Alert.Content>
            <Alert.Title>The refund by the policy could not be worked out</Alert.Title>
            <Alert.Description>{paymentErrorMessage(preview.error)}</Alert.Description>
          </Alert.Content>
        </Alert.Root>
      ) : null}
      <RadioGroup.Root
        value={choice}
        onValueChange={(e) => setChoice(e.value === 'full' ? 'full' : 'policy')}
      >
        <RadioGroup.Label fontWeight="semibold">Refund</RadioGroup.Label>
        <Stack gap="3" mt="2">
          <RadioGroup.Item value="policy" disabled={!policy} alignItems="start">
            <RadioGroup.ItemHiddenInput />
            <RadioGroup.ItemIndicator mt="0.5" />
            <RadioGroup.ItemText fontWeight="normal">
              {policy ? (
                <>
                  By the cancellation policy: <strong>{money(policy.refundMinor)}</strong> (
                  {policy.refundPercent} %
                  {policy.daysBeforeEvent !== null &&
                    `, ${plural(policy.daysBeforeEvent, 'day')} before the event`}
                  ); the studio keeps {money(policy.keptMinor)}.
                </>
              ) : (
                'By the cancellation policy'
              )}
            </RadioGroup.ItemText>
          </RadioGroup.Item>
          <RadioGroup.Item value="full" alignItems="start">
            <RadioGroup.ItemHiddenInput />
            <RadioGroup.ItemIndicator mt="0.5" />
            <RadioGroup.ItemText fontWeight="normal">
              In full: <strong>{money(fullMinor)}</strong>, everything the client paid — your
              choice, whatever the policy says.
            </RadioGroup.ItemText>
          </RadioGroup.Item>
        </Stack>
      </RadioGroup.Root>
      <ReasonField
        label="Reason (optional)"
        helper="Kept in the order’s history; the e-mail to the client does not include it."
        value={reason}
        onChange={setReason}
        max={REASON_MAX}
      />
    </ActionDialog>
  );
}

// ---------------------------------------------------------------- complete

function CompleteAction({ order, today, onDone }: OrderActionsProps) {
  const complete = useCompleteOrder();
  const [open, setOpen] = useState(false);
  const [note, setNote] = useState('');
  const [error, setError] = useState<string | null>(null);
  const early = compareIsoDates(order.eventDate, today) > 0;

  const submit = async () => {
    setError(null);
    try {
      const updated = await complete.mutateAsync({
        id: order.id,
        reason: note.trim() || undefined,
      });
      setOpen(false);
      setNote('');
      onDone(`${updated.reference} is marked as served.`);
    } catch (e) {
      setError(paymentErrorMessage(e));
    }
  };

  return (
    <ActionDialog
      open={open}
      onOpenChange={(next) => {
        setOpen(next);
        if (!next) {
          setNote('');
          setError(null);
        }
      }}
      trigger={<Button variant="outline">Mark as served…</Button>}
      title={`Mark ${order.reference} as served?`}
      error={error}
      errorTitle="Not marked as served"
      confirmLabel="Mark as served"
      pending={complete.isPending}
      pendingLabel="Saving…"
      onConfirm={() => void submit()}
    >
      <Text>
        The order becomes “Served”: it leaves the coming prep plans and is kept for the figures and
        the payment records. No e-mail is sent. This cannot be undone.
      </Text>
      {early && (
        <Text color="fg.warning">
          The event is on {formatIsoDate(order.eventDate)}, after today. Mark it served only once
          the desserts have been served.
        </Text>
      )}
      {order.balanceMinor > 0 && (
        <Text color="fg.warning">
          {formatMoney(order.balanceMinor, order.currency)} of the total is still unpaid.
        </Text>
      )}
      <ReasonField
        label="Note for the order’s history (optional)"
        value={note}
        onChange={setNote}
        max={REASON_MAX}
      />
    </ActionDialog>
  );
}
