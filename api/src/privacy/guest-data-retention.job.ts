import {
  Injectable,
  Logger,
  type OnApplicationBootstrap,
  type OnApplicationShutdown,
} from '@nestjs/common';
import { addIsoDays, dateInTimeZone, type IsoDate } from '@nappe/shared';
import { DataSource } from 'typeorm';
import { Clock } from '../common/clock.js';
import { Env } from '../config/env.js';
import { OrderEntity } from '../orders/entities/order.entity.js';
import { recordEvent, SYSTEM } from '../orders/order-records.js';
import { StudioSettings } from '../studio/entities/studio-settings.entity.js';
import { holdsGuestDetailsSql, purgeGuestDetails, type OrderGuestPurge } from './guest-purge.js';
import { guestDetailsExpired } from './guest-retention.js';
import { lockFor } from '../database/serialized-writes.js';

/** What one run removed: counts and order ids, never guest data. */
export interface RetentionReport {
  today: IsoDate;
  retentionDays: number;
  /** Events on or before this date had their guest details removed. */
  eventsUpTo: IsoDate;
  ordersPurged: number;
  guestsRemoved: number;
  substitutionsRemoved: number;
  auditLinesRedacted: number;
  orders: OrderGuestPurge[];
}

/**
 * The retention purge (DESIGN.md, "Guest data is health data"): once an event is more than the
 * studio's `guestDataRetentionDays` in the past, its guests' names, tables, allergens, diets,
 * notes and per-guest substitutions are removed and only anonymous counts are kept
 * (`order_guest_summaries`). One transaction per order, each with its audit line; running it
 * again removes nothing and says 0. Runs at start and then on a timer (`@nestjs/schedule` is not
 * installed); tests call `purgeExpired()` with a controlled clock.
 */
@Injectable()
export class GuestDataRetentionJob implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger('GuestDataRetention');
  private timer: NodeJS.Timeout | undefined;
  private running: Promise<unknown> = Promise.resolve();

  constructor(
    private readonly dataSource: DataSource,
    private readonly clock: Clock,
    private readonly env: Env,
  ) {}

  onApplicationBootstrap(): void {
    if (!this.env.GUEST_DATA_PURGE_ENABLED) return;
    this.tick();
    this.timer = setInterval(() => this.tick(), this.env.GUEST_DATA_PURGE_INTERVAL_MS);
    this.timer.unref();
  }

  async onApplicationShutdown(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    this.timer = undefined;
    await this.running.catch(() => undefined);
  }

  private tick(): void {
    this.running = this.running
      .then(() => this.purgeExpired())
      .catch((error: unknown) =>
        this.logger.error(
          `Guest data retention run failed: ${error instanceof Error ? error.message : String(error)}`,
        ),
      );
  }

  /** Removes the guest details of every event past the retention date; returns what it did. */
  async purgeExpired(): Promise<RetentionReport> {
    const plan = await this.dataSource.transaction(async (m) => {
      const studio = await m.findOneByOrFail(StudioSettings, { id: 1 });
      const today = dateInTimeZone(this.clock.now(), studio.timeZone);
      const days = studio.guestDataRetentionDays;
      const eventsUpTo = addIsoDays(today, -days - 1);
      const rows = await m
        .createQueryBuilder(OrderEntity, 'o')
        .select('o.id', 'id')
        .where('o.eventDate <= :upTo', { upTo: eventsUpTo })
        .andWhere(holdsGuestDetailsSql('o'))
        .orderBy('o.eventDate', 'ASC')
        .addOrderBy('o.id', 'ASC')
        .getRawMany<{ id: string }>();
      return { today, days, eventsUpTo, ids: rows.map((r) => r.id) };
    });

    const report: RetentionReport = {
      today: plan.today,
      retentionDays: plan.days,
      eventsUpTo: plan.eventsUpTo,
      ordersPurged: 0,
      guestsRemoved: 0,
      substitutionsRemoved: 0,
      auditLinesRedacted: 0,
      orders: [],
    };
    for (const id of plan.ids) {
      const done = await this.dataSource.transaction(async (m) => {
        await lockFor(m, { row: OrderEntity, id }); // as every change to an order (orderFor)
        const order = await m.findOneBy(OrderEntity, { id });
        if (!order || !guestDetailsExpired(order.eventDate, plan.days, plan.today)) return null;
        const now = this.clock.now();
        const purge = await purgeGuestDetails(m, order, 'retention', plan.days, now);
        if (!purge) return null; // a concurrent run got there first
        await recordEvent(m, now, order.id, SYSTEM, {
          summary: `Guest details removed ${plan.days} days after the event (retention setting): ${entries(purge.guestsRemoved)} and ${subs(purge.substitutionsRemoved)}; anonymous counts kept`,
        });
        return purge;
      });
      if (!done) continue;
      report.orders.push(done);
      report.ordersPurged += 1;
      report.guestsRemoved += done.guestsRemoved;
      report.substitutionsRemoved += done.substitutionsRemoved;
      report.auditLinesRedacted += done.auditLinesRedacted;
    }
    this.logger.log(describeReport(report));
    return report;
  }
}

const count = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;
const entries = (n: number) => count(n, 'guest entry', 'guest entries');
const subs = (n: number) => count(n, 'substitution', 'substitutions');

/** The log line of a run: counts and order ids only. */
export function describeReport(r: RetentionReport): string {
  const head = `Guest data retention (${r.retentionDays} days; events up to ${r.eventsUpTo})`;
  if (r.ordersPurged === 0) return `${head}: removed 0 guest entries from 0 orders.`;
  return `${head}: removed ${entries(r.guestsRemoved)} and ${subs(r.substitutionsRemoved)}, redacted ${count(r.auditLinesRedacted, 'audit line', 'audit lines')}, from ${count(r.ordersPurged, 'order', 'orders')}: ${r.orders.map((o) => `${o.orderId} (${o.reference})`).join(', ')}.`;
}
