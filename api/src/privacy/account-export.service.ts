import { randomUUID } from 'node:crypto';
import { Injectable, NotFoundException } from '@nestjs/common';
import { dateInTimeZone } from '@nappe/shared';
import { DataSource, In, type EntityManager } from 'typeorm';
import { GuestDataAccessEntity } from '../allergy-notes/entities/guest-data-access.entity.js';
import { OrderSubstitutionEntity } from '../allergy-notes/entities/order-substitution.entity.js';
import { AuthSession } from '../auth/entities/auth-session.entity.js';
import type { Principal } from '../auth/principal.js';
import { Clock } from '../common/clock.js';
import { DessertEntity } from '../kitchen/entities/dessert.entity.js';
import { RecipeEntity } from '../kitchen/entities/recipe.entity.js';
import { OutboxMessageEntity } from '../mail/entities/outbox-message.entity.js';
import { OrderEventEntity } from '../orders/entities/order-event.entity.js';
import { OrderGuestEntity } from '../orders/entities/order-guest.entity.js';
import { OrderEntity } from '../orders/entities/order.entity.js';
import { PaymentEntity } from '../payments/entities/payment.entity.js';
import { StudioSettings } from '../studio/entities/studio-settings.entity.js';
import { User } from '../users/entities/user.entity.js';
import { ConsentRecordEntity } from './entities/consent-record.entity.js';
import { OrderGuestSummaryEntity } from './entities/order-guest-summary.entity.js';
import { PrivacyAuditEntity } from './entities/privacy-audit.entity.js';
import { guestDetailsState } from './guest-retention.js';
import type { ExportedOrder, PersonalDataExport } from './privacy.types.js';

const iso = (d: Date) => new Date(d).toISOString();
const isoOrNull = (d: Date | null) => (d ? iso(d) : null);

/**
 * A client's copy of everything held about them (GDPR Art. 15 and 20), read in one transaction
 * so it is consistent, and recorded in the privacy audit. Guest details are included while they
 * are held: read by the client who entered them, so not logged as a studio opening.
 */
@Injectable()
export class AccountExportService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly clock: Clock,
  ) {}

  export(principal: Principal): Promise<{ filename: string; data: PersonalDataExport }> {
    return this.dataSource.transaction(async (m) => {
      const user = await m.findOneBy(User, { id: principal.id });
      if (!user) throw new NotFoundException('There is no such account.');
      const studio = await m.findOneByOrFail(StudioSettings, { id: 1 });
      const now = this.clock.now();
      const today = dateInTimeZone(now, studio.timeZone);

      const sessions = await m.find(AuthSession, {
        where: { userId: user.id },
        order: { createdAt: 'ASC' },
      });
      const orders = await m.find(OrderEntity, {
        where: { clientId: user.id },
        order: { createdAt: 'ASC', id: 'ASC' },
      });
      const exported: ExportedOrder[] = [];
      for (const order of orders) exported.push(await this.orderOf(m, order, studio, today));

      const consents = await m.find(ConsentRecordEntity, {
        where: { userId: user.id },
        order: { at: 'ASC' },
      });
      const emails = await m.find(OutboxMessageEntity, {
        where: { toAddress: user.email },
        order: { createdAt: 'ASC' },
      });
      const requests = await m.find(PrivacyAuditEntity, {
        where: { userId: user.id },
        order: { at: 'ASC' },
      });

      const data: PersonalDataExport = {
        format: 'nappe-personal-data-export',
        version: 1,
        exportedAt: iso(now),
        studio: {
          name: studio.name,
          timeZone: studio.timeZone,
          guestDataRetentionDays: studio.guestDataRetentionDays,
        },
        account: {
          id: user.id,
          name: user.name,
          email: user.email,
          role: user.role,
          createdAt: iso(user.createdAt),
          updatedAt: iso(user.updatedAt),
        },
        sessions: sessions.map((s) => ({
          createdAt: iso(s.createdAt),
          lastUsedAt: iso(s.lastUsedAt),
          expiresAt: iso(s.expiresAt),
          revokedAt: isoOrNull(s.revokedAt),
          revokedReason: s.revokedReason,
        })),
        consents: consents.map((c) => ({
          orderId: c.orderId,
          kind: c.kind,
          statement: c.statement,
          at: iso(c.at),
        })),
        orders: exported,
        emails: emails.map((e) => ({
          kind: e.kind,
          orderId: e.orderId,
          to: e.toAddress,
          subject: e.subject,
          text: e.textBody,
          status: e.status,
          createdAt: iso(e.createdAt),
          sentAt: isoOrNull(e.sentAt),
        })),
        privacyRequests: requests.map((r) => ({
          action: r.action,
          at: iso(r.at),
          detail: r.detail,
        })),
      };

      await m.insert(PrivacyAuditEntity, {
        id: randomUUID(),
        action: 'data_exported',
        userId: user.id,
        detail: { orders: orders.length },
        at: now,
      });
      return { filename: `nappe-my-data-${today}.json`, data };
    });
  }

  private async orderOf(
    m: EntityManager,
    order: OrderEntity,
    studio: StudioSettings,
    today: string,
  ): Promise<ExportedOrder> {
    const guests = await m.find(OrderGuestEntity, {
      where: { orderId: order.id },
      order: { position: 'ASC' },
    });
    const subs = await m.find(OrderSubstitutionEntity, {
      where: { orderId: order.id },
      order: { guestPosition: 'ASC' },
    });
    const kept = await m.findOneBy(OrderGuestSummaryEntity, { orderId: order.id });
    const removed = await guestDetailsState(
      m,
      order,
      studio.guestDataRetentionDays,
      today,
      studio.timeZone,
    );
    const payments = await m.find(PaymentEntity, {
      where: { orderId: order.id },
      order: { createdAt: 'ASC', id: 'ASC' },
    });
    const events = await m.find(OrderEventEntity, {
      where: { orderId: order.id },
      order: { seq: 'ASC' },
    });
    const openings = await m.find(GuestDataAccessEntity, {
      where: { orderId: order.id },
      order: { at: 'ASC' },
    });
    const names = await this.kitchenNames(m, subs);

    return {
      id: order.id,
      reference: order.reference,
      status: order.status,
      menu: { id: order.menuId, name: order.pricing.menuName },
      eventDate: order.eventDate,
      serviceTime: order.serviceTime,
      venueAddressLines: order.venueAddressLines,
      occasion: order.occasion,
      contactPhone: order.contactPhone,
      guestCount: order.guestCount,
      plates: order.plates,
      currency: order.currency,
      totalMinor: order.totalMinor,
      retainedMinor: order.retainedMinor,
      quote: order.quote,
      createdAt: iso(order.createdAt),
      updatedAt: iso(order.updatedAt),
      // Everything still held is exported, even in the hour between the retention date and the
      // purge's next run: this is a copy of what is stored, not of what the screens show.
      guests: guests.map((g) => ({
        position: g.position,
        label: g.label,
        table: g.tableLabel,
        allergens: g.allergens,
        diets: g.diets,
        notes: g.notes,
      })),
      substitutions: subs.map((s) => ({
        guestPosition: s.guestPosition,
        guestLabel: s.guestLabel,
        dessert: names.get(s.dessertId) ?? s.dessertId,
        changes: s.changes.map((c) => ({
          component: names.get(c.componentRecipeId) ?? c.componentRecipeId,
          replacement:
            c.replacementRecipeId === undefined
              ? null
              : (names.get(c.replacementRecipeId) ?? c.replacementRecipeId),
        })),
        note: s.note,
        recordedAt: iso(s.recordedAt),
      })),
      guestDetailsRemoved: removed,
      keptGuestCounts: kept
        ? {
            guestsListed: kept.guestsListed,
            guestsWithNotes: kept.guestsWithNotes,
            allergenCounts: kept.allergenCounts,
            dietCounts: kept.dietCounts,
          }
        : null,
      payments: payments.map((p) => ({
        id: p.id,
        kind: p.kind,
        status: p.status,
        amountMinor: p.amountMinor,
        currency: p.currency,
        refundOfPaymentId: p.refundOfPaymentId,
        operation: p.operation,
        providerPaymentIntentId: p.providerPaymentIntentId,
        providerRefundId: p.providerRefundId,
        createdAt: iso(p.createdAt),
        settledAt: isoOrNull(p.settledAt),
      })),
      timeline: events.map((e) => ({
        at: iso(e.at),
        by: e.actorRole === 'client' ? 'you' : e.actorRole === 'system' ? 'Nappe' : e.actorRole,
        fromStatus: e.fromStatus,
        toStatus: e.toStatus,
        summary: e.summary,
        reason: e.reason,
      })),
      guestDataOpenings: openings.map((o) => ({ at: iso(o.at), role: o.role, what: o.what })),
    };
  }

  /** Names of the desserts and recipes the substitutions mention, by id. */
  private async kitchenNames(
    m: EntityManager,
    subs: readonly OrderSubstitutionEntity[],
  ): Promise<Map<string, string>> {
    const names = new Map<string, string>();
    if (subs.length === 0) return names;
    const dessertIds = [...new Set(subs.map((s) => s.dessertId))];
    const recipeIds = [
      ...new Set(
        subs.flatMap((s) =>
          s.changes.flatMap((c) => [c.componentRecipeId, c.replacementRecipeId ?? []].flat()),
        ),
      ),
    ];
    for (const d of await m.findBy(DessertEntity, { id: In(dessertIds) })) names.set(d.id, d.name);
    if (recipeIds.length > 0) {
      for (const r of await m.findBy(RecipeEntity, { id: In(recipeIds) })) names.set(r.id, r.name);
    }
    return names;
  }
}
