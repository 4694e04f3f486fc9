import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { ConsentRecordEntity, type ConsentKind } from './entities/consent-record.entity.js';

/** The statements the booking forms ask the client to confirm, as the form words them. */
export const CONSENT_STATEMENTS: Record<ConsentKind, string> = {
  booking_terms: 'I accept the booking terms and the cancellation policy.',
  guest_data: 'My guests agreed to share their allergies and diets with the studio.',
};

/**
 * Records the confirmations given with a booking or a new guest list, in the caller's
 * transaction: the booking terms (a booking cannot be made without them) and, when guests'
 * requirements were sent, that the guests agreed to share them (the schema refuses a list
 * without that confirmation).
 */
export async function recordConsents(
  m: EntityManager,
  now: Date,
  userId: string | null,
  orderId: string,
  kinds: readonly ConsentKind[],
): Promise<void> {
  if (kinds.length === 0) return;
  await m.insert(
    ConsentRecordEntity,
    kinds.map((kind) => ({
      id: randomUUID(),
      userId,
      orderId,
      kind,
      statement: CONSENT_STATEMENTS[kind],
      at: now,
    })),
  );
}
