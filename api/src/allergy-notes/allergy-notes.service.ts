import { randomUUID } from 'node:crypto';
import {
  BadRequestException,
  ConflictException,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import {
  checkGuestAgainstDessert,
  checkOrderLeadTime,
  dateInTimeZone,
  isKitchenError,
  OrderStatus,
  Role,
  type AccessLogEntry,
  type AllergyCounts,
  type AllergyNotes,
  type Briefing,
  type GuestDataView,
  type GuestNote,
  type PrepConflict,
  type Substitution,
  type UnresolvedConflict,
} from '@nappe/shared';
import { DataSource, In, type EntityManager } from 'typeorm';
import type { Principal } from '../auth/principal.js';
import { Clock } from '../common/clock.js';
import {
  computeView,
  KitchenCatalogueService,
} from '../kitchen/catalogue/kitchen-catalogue.service.js';
import { OrderGuestEntity } from '../orders/entities/order-guest.entity.js';
import { OrderEntity } from '../orders/entities/order.entity.js';
import { actorOf, orderFor, recordEvent } from '../orders/order-records.js';
import { assertGuestDetailsHeld } from '../privacy/guest-retention.js';
import { loadStudio } from '../studio/booking-settings.js';
import { StudioSettings } from '../studio/entities/studio-settings.entity.js';
import { User } from '../users/entities/user.entity.js';
import type { SubstitutionBody } from './allergy-notes.dto.js';
import { renderBriefingPdf } from './briefing-pdf.js';
import { GuestDataAccessEntity } from './entities/guest-data-access.entity.js';
import { OrderSubstitutionEntity } from './entities/order-substitution.entity.js';
import {
  allergyNotesOf,
  briefingOf,
  describeChanges,
  prepOrderOf,
  requirementOf,
} from './order-allergy-notes.js';

/** Orders whose plates can still change. */
const OPEN = new Set<string>([
  OrderStatus.PendingPayment,
  OrderStatus.Requested,
  OrderStatus.Confirmed,
]);

function conflict(message: string, extra: Record<string, unknown> = {}): ConflictException {
  return new ConflictException({ statusCode: 409, message, error: 'Conflict', ...extra });
}

export interface ConfirmationCheck {
  unresolved: UnresolvedConflict[];
  leadTime: PrepConflict[];
}

/**
 * Allergy notes (shared conflict check per guest and dessert), the substitutions the chef
 * records, the staff briefing, and the log of every opening of a guest's health data by the
 * studio. A client sees only their own order's notes (another's → 404).
 */
@Injectable()
export class AllergyNotesService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly catalogue: KitchenCatalogueService,
    private readonly clock: Clock,
  ) {}

  private async notesIn(m: EntityManager, order: OrderEntity): Promise<AllergyNotes> {
    const { index } = await this.catalogue.load(m);
    const guests = await m.find(OrderGuestEntity, { where: { orderId: order.id } });
    const subs = await m.find(OrderSubstitutionEntity, { where: { orderId: order.id } });
    return computeView(() => allergyNotesOf(index, order, guests, subs));
  }

  /**
   * 410 Gone once the order's guest details are removed — past the studio's retention date, or
   * erased with the client's account — for the client, the chef and the staff alike.
   */
  private async assertGuestDetailsHeld(m: EntityManager, order: OrderEntity): Promise<void> {
    const studio = await m.findOneByOrFail(StudioSettings, { id: 1 });
    await assertGuestDetailsHeld(
      m,
      order,
      studio.guestDataRetentionDays,
      dateInTimeZone(this.clock.now(), studio.timeZone),
      studio.timeZone,
    );
  }

  /** Records an opening by the chef or staff (a client reading their own data is not logged). */
  async logAccess(
    m: EntityManager,
    principal: Principal,
    orderId: string,
    what: GuestDataView,
  ): Promise<void> {
    if (principal.role !== Role.Chef && principal.role !== Role.Staff) return;
    await m.insert(GuestDataAccessEntity, {
      id: randomUUID(),
      orderId,
      userId: principal.id,
      role: principal.role,
      what,
      at: this.clock.now(),
    });
  }

  notes(principal: Principal, id: string): Promise<AllergyNotes> {
    return this.dataSource.transaction(async (m) => {
      const order = await orderFor(m, principal, id);
      await this.assertGuestDetailsHeld(m, order);
      const notes = await this.notesIn(m, order);
      await this.logAccess(m, principal, order.id, 'allergy_notes');
      return notes;
    });
  }

  briefing(principal: Principal, id: string, what: GuestDataView = 'briefing'): Promise<Briefing> {
    return this.dataSource.transaction(async (m) => {
      const order = await orderFor(m, principal, id);
      await this.assertGuestDetailsHeld(m, order);
      const briefing = briefingOf(await this.notesIn(m, order), order);
      await this.logAccess(m, principal, order.id, what);
      return briefing;
    });
  }

  /** The briefing as a PDF: data read in a transaction, rendered after it (slow work). */
  async briefingPdf(
    principal: Principal,
    id: string,
  ): Promise<{ filename: string; content: Buffer }> {
    const briefing = await this.briefing(principal, id, 'briefing_pdf');
    const studio = await this.dataSource.transaction((m) => loadStudio(m));
    const content = await renderBriefingPdf(briefing, studio.row.name);
    return { filename: `allergy-briefing-${briefing.reference}.pdf`, content };
  }

  /**
   * Anonymous counts per order for the studio's list of events, in the order asked; unknown ids
   * are left out. Only numbers leave the server (no guest's name, allergens or notes), so this
   * is not logged as an opening of guest data. A menu whose recipes cannot be checked gives
   * that order a `problem` rather than failing the whole list.
   */
  counts(orderIds: readonly string[]): Promise<AllergyCounts[]> {
    return this.dataSource.transaction(async (m) => {
      const orders = await m.find(OrderEntity, { where: { id: In([...orderIds]) } });
      if (orders.length === 0) return [];
      const ids = orders.map((o) => o.id);
      const guests = await m.find(OrderGuestEntity, { where: { orderId: In(ids) } });
      const subs = await m.find(OrderSubstitutionEntity, { where: { orderId: In(ids) } });
      const { index } = await this.catalogue.load(m);
      const byId = new Map(orders.map((o) => [o.id, o]));
      return orderIds.flatMap((id): AllergyCounts[] => {
        const order = byId.get(id);
        if (!order) return [];
        const own = guests.filter((g) => g.orderId === id);
        const ownSubs = subs.filter((s) => s.orderId === id);
        const counts: AllergyCounts = {
          orderId: id,
          guestsWithRequirements: own.filter(
            (g) => g.allergens.length > 0 || g.diets.length > 0 || !!g.notes?.trim(),
          ).length,
          unresolvedPlates: 0,
          unresolvedGuests: 0,
          substitutions: 0,
          advisoryCount: 0,
          problem: null,
        };
        try {
          const notes = allergyNotesOf(index, order, own, ownSubs);
          counts.unresolvedPlates = notes.unresolved.length;
          counts.unresolvedGuests = new Set(notes.unresolved.map((u) => u.guestId)).size;
          counts.substitutions = notes.guests.reduce(
            (n, g) => n + g.plates.filter((p) => p.substitution !== null).length,
            0,
          );
          counts.advisoryCount = notes.advisoryCount;
        } catch (error) {
          if (!isKitchenError(error)) throw error;
          counts.problem = error.message;
        }
        return [counts];
      });
    });
  }

  accessLog(principal: Principal, id: string): Promise<AccessLogEntry[]> {
    return this.dataSource.transaction(async (m) => {
      const order = await orderFor(m, principal, id);
      const rows = await m.find(GuestDataAccessEntity, {
        where: { orderId: order.id },
        order: { at: 'DESC' },
      });
      const ids = [...new Set(rows.flatMap((r) => (r.userId ? [r.userId] : [])))];
      const users = ids.length ? await m.find(User, { where: { id: In(ids) } }) : [];
      const names = new Map(users.map((u) => [u.id, u.name]));
      return rows.map((r) => ({
        at: new Date(r.at).toISOString(),
        userId: r.userId,
        name: r.userId ? (names.get(r.userId) ?? null) : null,
        role: r.role,
        what: r.what,
      }));
    });
  }

  /**
   * Records (or replaces) what changes on one guest's plate of one dessert, checks the changed
   * plate against that guest again, and writes the audit line — one transaction.
   */
  putSubstitution(
    principal: Principal,
    id: string,
    guestId: number,
    dessertId: string,
    body: SubstitutionBody,
  ): Promise<GuestNote> {
    return this.dataSource.transaction(async (m) => {
      const order = await orderFor(m, principal, id);
      if (!OPEN.has(order.status)) {
        throw conflict('This booking is closed; its plates can no longer change.');
      }
      await this.assertGuestDetailsHeld(m, order);
      const guest = await m.findOneBy(OrderGuestEntity, { orderId: order.id, position: guestId });
      if (!guest) throw new NotFoundException('This booking has no guest with that id.');
      const { index } = await this.catalogue.load(m);
      const menu = index.menu(order.menuId);
      if (!menu.dessertIds.includes(dessertId)) {
        throw new NotFoundException('That dessert is not on this booking’s menu.');
      }
      const changes: Substitution[] = [
        ...body.leaveOut.map((componentRecipeId) => ({ componentRecipeId })),
        ...body.replace,
      ];
      const componentIds = changes.map((c) => c.componentRecipeId);
      if (new Set(componentIds).size !== componentIds.length) {
        throw new BadRequestException('Change each component once: leave it out or replace it.');
      }
      let recheck;
      try {
        recheck = checkGuestAgainstDessert(index, dessertId, requirementOf(guest), changes);
      } catch (error) {
        if (isKitchenError(error)) throw new BadRequestException(error.message);
        throw error;
      }
      const now = this.clock.now();
      await m.delete(OrderSubstitutionEntity, {
        orderId: order.id,
        guestPosition: guest.position,
        dessertId,
      });
      await m.insert(OrderSubstitutionEntity, {
        id: randomUUID(),
        orderId: order.id,
        guestPosition: guest.position,
        guestLabel: guest.label,
        dessertId,
        changes,
        note: body.note?.trim() ? body.note.trim() : null,
        recordedBy: principal.id,
        recordedAt: now,
      });
      const what = [...describeChanges(index, changes), ...(body.note ? ['note'] : [])].join('; ');
      await recordEvent(m, now, order.id, actorOf(principal), {
        summary: `Substitution for ${guest.label}, ${index.dessert(dessertId).name}: ${what} — ${
          recheck.clear ? 'checked again: no conflict left' : 'checked again: still conflicts'
        }`,
        reason: body.note ?? null,
      });
      const notes = await this.notesIn(m, order);
      return notes.guests.find((g) => g.guestId === guest.position)!;
    });
  }

  deleteSubstitution(
    principal: Principal,
    id: string,
    guestId: number,
    dessertId: string,
  ): Promise<GuestNote> {
    return this.dataSource.transaction(async (m) => {
      const order = await orderFor(m, principal, id);
      if (!OPEN.has(order.status)) {
        throw conflict('This booking is closed; its plates can no longer change.');
      }
      await this.assertGuestDetailsHeld(m, order);
      const guest = await m.findOneBy(OrderGuestEntity, { orderId: order.id, position: guestId });
      if (!guest) throw new NotFoundException('This booking has no guest with that id.');
      const result = await m.delete(OrderSubstitutionEntity, {
        orderId: order.id,
        guestPosition: guest.position,
        dessertId,
      });
      if (!result.affected) {
        throw new NotFoundException('No substitution is recorded for that guest and dessert.');
      }
      const { index } = await this.catalogue.load(m);
      const dessertName = index.menu(order.menuId).dessertIds.includes(dessertId)
        ? index.dessert(dessertId).name
        : dessertId;
      await recordEvent(m, this.clock.now(), order.id, actorOf(principal), {
        summary: `Substitution removed for ${guest.label}, ${dessertName}: the standard plate again`,
      });
      const notes = await this.notesIn(m, order);
      return notes.guests.find((g) => g.guestId === guest.position)!;
    });
  }

  /**
   * What stands in the way of confirming `order`, in the caller's transaction: guests whose
   * plate still conflicts, and a lead time too short for the recipes (shared
   * `checkOrderLeadTime` against the clock, studio hours).
   */
  async confirmationCheck(m: EntityManager, order: OrderEntity): Promise<ConfirmationCheck> {
    const notes = await this.notesIn(m, order);
    const { index } = await this.catalogue.load(m);
    const studio = await loadStudio(m);
    const guests = await m.find(OrderGuestEntity, { where: { orderId: order.id } });
    const subs = await m.find(OrderSubstitutionEntity, { where: { orderId: order.id } });
    const leadTime = computeView(() =>
      checkOrderLeadTime(
        index,
        prepOrderOf(order, studio.settings.timeZone, guests, subs),
        { studioTimeZone: studio.settings.timeZone },
        this.clock.now().toISOString(),
      ),
    );
    return { unresolved: notes.unresolved, leadTime };
  }

  /**
   * Refuses to confirm (409 listing what is wrong) unless the chef gives an override reason;
   * returns the audit summary of what was overridden, or null when nothing was.
   */
  async assertConfirmable(
    m: EntityManager,
    order: OrderEntity,
    overrideReason: string | undefined,
  ): Promise<string | null> {
    const check = await this.confirmationCheck(m, order);
    if (check.unresolved.length === 0 && check.leadTime.length === 0) return null;
    const parts = [
      ...(check.unresolved.length > 0
        ? [
            `${check.unresolved.length} guest plate${check.unresolved.length === 1 ? '' : 's'} still conflict${check.unresolved.length === 1 ? 's' : ''} with a guest’s requirement`,
          ]
        : []),
      ...check.leadTime.map((c) => c.message),
    ];
    if (!overrideReason) {
      throw conflict(
        `This booking cannot be confirmed yet: ${parts.join('; ')}. Record a substitution, or confirm anyway with a reason.`,
        { conflicts: check.unresolved, leadTime: check.leadTime },
      );
    }
    return `Confirmed despite: ${parts.join('; ')}`;
  }
}
