import { randomUUID } from 'node:crypto';
import {
  ConflictException,
  ForbiddenException,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import { dateInTimeZone, formatIsoDate, OrderStatus } from '@nappe/shared';
import { DataSource, In, MoreThanOrEqual } from 'typeorm';
import { AuthService } from '../auth/auth.service.js';
import { PasswordResetTokenEntity } from '../auth/entities/password-reset-token.entity.js';
import { PasswordService } from '../auth/password.service.js';
import type { Principal } from '../auth/principal.js';
import { Clock } from '../common/clock.js';
import { OutboxMessageEntity } from '../mail/entities/outbox-message.entity.js';
import { OrderEventEntity } from '../orders/entities/order-event.entity.js';
import { OrderEntity } from '../orders/entities/order.entity.js';
import { actorOf, recordEvent } from '../orders/order-records.js';
import { PaymentEntity } from '../payments/entities/payment.entity.js';
import { StudioSettings } from '../studio/entities/studio-settings.entity.js';
import { User } from '../users/entities/user.entity.js';
import { PrivacyAuditEntity } from './entities/privacy-audit.entity.js';
import { purgeGuestDetails } from './guest-purge.js';
import type { AccountDeletionResult } from './privacy.types.js';
import { DAY_BOOK, lockFor } from '../database/serialized-writes.js';

/** What an erased client becomes: an anonymous reference the studio's records still point at. */
export const ERASED_NAME = 'Deleted client';
export const erasedEmail = (userId: string) => `erased-${userId}@erased.invalid`;

/** Placeholders for an anonymised order's personal fields (the columns are required). */
export const ERASED_VENUE = ['Removed at the client’s request'];
export const ERASED_OCCASION = 'Private event';
export const ERASED_PHONE = '';

/** Bookings that still hold a date: requested or confirmed, or a checkout still open. */
const UPCOMING: OrderStatus[] = [
  OrderStatus.PendingPayment,
  OrderStatus.Requested,
  OrderStatus.Confirmed,
];

/** Why the studio keeps the payment records, in the words the client sees. */
export const KEPT_RECORDS = [
  'Your payments and refunds (amounts, dates, booking references), kept with an anonymous reference instead of your name: the studio must keep its accounting records for the period the law sets for bookkeeping and tax (GDPR Art. 17(3)(b)).',
  'Each booking’s date, menu, number of guests and status, without your name or contact details, so those payments still add up.',
  'Anonymous counts of guests per allergen and diet, with no guest named, for the studio’s planning history.',
];

export const ERASED_DATA = [
  'Your name, e-mail address and password',
  'Your sign-in sessions on every device, and any password-reset link',
  'Your guests’ names, tables, allergies, diets and notes, and the chef’s per-guest changes',
  'The venue address, contact phone and occasion of each booking',
  'Reasons you wrote when changing or cancelling a booking',
  'The e-mails addressed to you',
];

/**
 * Deletes a client's account (GDPR Art. 17). The password is checked first (slow work, outside
 * the transaction); then, in ONE transaction: refuse while a booking is upcoming, remove every
 * order's guest details (keeping anonymous counts), anonymise the orders' personal fields and
 * the client's own written reasons, drop the e-mails addressed to them, end every session, turn
 * the user row into an anonymous reference that cannot sign in, and write the audit rows.
 * Payments and refunds are not touched: the ledger and its reconciliation stay exactly as they were.
 */
@Injectable()
export class AccountDeletionService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly clock: Clock,
    private readonly passwords: PasswordService,
    private readonly auth: AuthService,
  ) {}

  async delete(principal: Principal, password: string): Promise<AccountDeletionResult> {
    const stored = await this.dataSource.transaction((m) =>
      m.findOneBy(User, { id: principal.id }),
    );
    if (!stored || stored.removedAt) throw new NotFoundException('There is no such account.');
    if (!(await this.passwords.verify(stored.passwordHash, password))) {
      // 403, not 401: the session is fine, the confirmation is not (a 401 would sign the app out).
      throw new ForbiddenException(
        'That is not your current password. Your account was not deleted.',
      );
    }

    return this.dataSource.transaction(async (m) => {
      // PostgreSQL: the client's orders (each as `orderFor` locks it, in id order), then the day
      // book, so no change to those orders and no new booking of theirs runs alongside.
      const own = await m.find(OrderEntity, {
        select: { id: true },
        where: { clientId: principal.id },
      });
      const ids = own.map((o) => o.id).sort();
      await lockFor(m, ...ids.map((id) => ({ row: OrderEntity, id })), DAY_BOOK);
      const user = await m.findOneByOrFail(User, { id: principal.id });
      const studio = await m.findOneByOrFail(StudioSettings, { id: 1 });
      const now = this.clock.now();
      const today = dateInTimeZone(now, studio.timeZone);

      const upcoming = await m.find(OrderEntity, {
        where: { clientId: user.id, status: In(UPCOMING), eventDate: MoreThanOrEqual(today) },
        order: { eventDate: 'ASC' },
      });
      const blocking = upcoming.filter(
        (o) =>
          o.status !== OrderStatus.PendingPayment ||
          (o.holdExpiresAt !== null && o.holdExpiresAt > now),
      );
      if (blocking.length > 0) {
        const list = blocking
          .map((o) => `${o.reference} on ${formatIsoDate(o.eventDate)}`)
          .join(', ');
        throw new ConflictException({
          statusCode: 409,
          error: 'Conflict',
          message: `Your account cannot be deleted while you have ${blocking.length === 1 ? 'an upcoming booking' : 'upcoming bookings'}: ${list}. Cancel ${blocking.length === 1 ? 'it' : 'them'} first in My events (any refund follows the cancellation policy), then delete your account.`,
          upcoming: blocking.map((o) => ({
            id: o.id,
            reference: o.reference,
            eventDate: o.eventDate,
            status: o.status,
          })),
        });
      }

      const orders = await m.find(OrderEntity, { where: { clientId: user.id } });
      let guestEntriesRemoved = 0;
      const actor = actorOf(principal);
      for (const order of orders) {
        const purge = await purgeGuestDetails(m, order, 'account_deleted', null, now);
        guestEntriesRemoved += purge?.guestsRemoved ?? 0;
        await m.update(
          OrderEntity,
          { id: order.id },
          {
            venueAddressLines: ERASED_VENUE,
            occasion: ERASED_OCCASION,
            contactPhone: ERASED_PHONE,
            updatedAt: now,
          },
        );
        // Free text the client wrote (a cancellation reason) may hold personal data.
        await m.update(
          OrderEventEntity,
          { orderId: order.id, actorUserId: user.id },
          { reason: null },
        );
        await recordEvent(m, now, order.id, actor, {
          summary:
            'Client account deleted at the client’s request: name, contact details, venue and guest details erased; payments kept for the studio’s books',
        });
      }
      const paymentRecordsKept =
        orders.length === 0
          ? 0
          : await m.count(PaymentEntity, { where: { orderId: In(orders.map((o) => o.id)) } });

      await m.delete(OutboxMessageEntity, { toAddress: user.email });
      await this.auth.revokeAllSessions(m, user.id, 'account_deleted', now);
      // Reset links hold only hashes and die with the password, but nothing of the account stays.
      await m.delete(PasswordResetTokenEntity, { userId: user.id });
      await m.update(
        User,
        { id: user.id },
        { name: ERASED_NAME, email: erasedEmail(user.id), passwordHash: '', removedAt: now },
      );
      await m.insert(PrivacyAuditEntity, {
        id: randomUUID(),
        action: 'account_deleted',
        userId: user.id,
        detail: {
          ordersAnonymised: orders.length,
          orderReferences: orders.map((o) => o.reference),
          guestEntriesRemoved,
          paymentRecordsKept,
        },
        at: now,
      });
      return {
        deleted: true as const,
        erased: ERASED_DATA,
        kept: KEPT_RECORDS,
        ordersAnonymised: orders.length,
        guestEntriesRemoved,
        paymentRecordsKept,
      };
    });
  }
}
