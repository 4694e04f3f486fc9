import { Button, Stack, Table, Text } from '@chakra-ui/react';
import type { PaymentKind, PaymentRecord, PaymentRecordStatus } from '@nappe/shared';
import { DownloadIcon } from '../../../components/ui/booking-icons';
import { dateTime } from '../../../lib/dates';
import { money } from '../../../lib/format';
import type { OrderDocument } from '../api/download-document';

export const PAYMENT_KIND_LABELS: Record<PaymentKind, string> = {
  deposit: 'Deposit',
  full: 'Full payment',
  balance: 'Balance',
  top_up: 'Extra guests',
  refund: 'Refund',
};

const STATUS_LABELS: Record<PaymentRecordStatus, string> = {
  pending: 'Waiting',
  succeeded: 'Done',
  failed: 'Failed',
  expired: 'Not completed',
};

/**
 * Every payment and refund of the order, as the server's ledger has them: money in, and
 * refunds as money out (shown with a minus sign and the word "Refund").
 */
export function PaymentsLedger({
  payments,
  receipt,
  onDownload,
  downloading,
}: {
  payments: readonly PaymentRecord[];
  receipt: (payment: PaymentRecord) => OrderDocument;
  onDownload: (document: OrderDocument) => void;
  downloading: string | null;
}) {
  if (payments.length === 0) {
    return <Text color="fg.muted">No payments yet.</Text>;
  }
  const sorted = [...payments].sort((a, b) => Date.parse(a.createdAt) - Date.parse(b.createdAt));
  return (
    <Table.ScrollArea borderWidth="1px" borderColor="border" borderRadius="l2">
      <Table.Root size="sm" bg="bg.panel">
        <Table.Caption srOnly>Payments and refunds</Table.Caption>
        <Table.Header>
          <Table.Row bg="bg.muted">
            <Table.ColumnHeader>Payment</Table.ColumnHeader>
            <Table.ColumnHeader>Status</Table.ColumnHeader>
            <Table.ColumnHeader textAlign="end">Amount</Table.ColumnHeader>
            <Table.ColumnHeader>Receipt</Table.ColumnHeader>
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {sorted.map((p) => {
            const doc = receipt(p);
            return (
              <Table.Row key={p.id} bg="bg.panel">
                <Table.Cell>
                  <Text fontWeight="medium">{PAYMENT_KIND_LABELS[p.kind]}</Text>
                  <Text textStyle="xs" color="fg.muted">
                    {dateTime(p.settledAt ?? p.createdAt)}
                  </Text>
                </Table.Cell>
                <Table.Cell>{STATUS_LABELS[p.status]}</Table.Cell>
                <Table.Cell textAlign="end" whiteSpace="nowrap" fontVariantNumeric="tabular-nums">
                  {p.kind === 'refund' ? '−' : ''}
                  {money(p.amountMinor, p.currency)}
                </Table.Cell>
                <Table.Cell>
                  {p.receiptAvailable ? (
                    <Button
                      size="xs"
                      variant="outline"
                      onClick={() => onDownload(doc)}
                      loading={downloading === doc.path}
                    >
                      <DownloadIcon />
                      PDF{' '}
                      <Text as="span" srOnly>
                        receipt for the {PAYMENT_KIND_LABELS[p.kind].toLowerCase()} of{' '}
                        {money(p.amountMinor, p.currency)}
                      </Text>
                    </Button>
                  ) : (
                    <Stack as="span" color="fg.muted">
                      —
                    </Stack>
                  )}
                </Table.Cell>
              </Table.Row>
            );
          })}
        </Table.Body>
      </Table.Root>
    </Table.ScrollArea>
  );
}
