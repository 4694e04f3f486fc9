import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { browser } from '../../../lib/browser';

export interface OrderDocument {
  /** Path under /api, e.g. `/orders/:id/event.ics`. */
  path: string;
  /** The name to save under when the server suggests none. */
  fileName: string;
}

export const receiptDocument = (
  orderId: string,
  paymentId: string,
  reference: string,
): OrderDocument => ({
  path: `/orders/${encodeURIComponent(orderId)}/receipts/${encodeURIComponent(paymentId)}.pdf`,
  fileName: `receipt-${reference}.pdf`,
});

export const eventFileDocument = (orderId: string, reference: string): OrderDocument => ({
  path: `/orders/${encodeURIComponent(orderId)}/event.ics`,
  fileName: `event-${reference}.ics`,
});

/**
 * Receipts and calendar files sit behind the session, so a plain link (which cannot carry the
 * Bearer token) would be refused: fetch with the token, then offer the copy as a download.
 */
export async function downloadDocument(document: OrderDocument): Promise<void> {
  const file = await api.download(document.path);
  browser.save(file, document.fileName);
}

export const useDownloadDocument = () => useMutation({ mutationFn: downloadDocument });
