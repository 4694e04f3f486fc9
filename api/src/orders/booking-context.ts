import { Injectable } from '@nestjs/common';
import { dateInTimeZone, type IsoDate, type Menu } from '@nappe/shared';
import type { EntityManager } from 'typeorm';
import { Clock } from '../common/clock.js';
import { Env } from '../config/env.js';
import { menuFromRows } from '../kitchen/catalogue/catalogue-rows.js';
import { MenuDessertEntity } from '../kitchen/entities/menu-dessert.entity.js';
import { MenuEntity } from '../kitchen/entities/menu.entity.js';
import { loadStudio, type LoadedStudio } from '../studio/booking-settings.js';

/** What every booking rule needs from outside: the clock, the studio's settings, a menu, links. */
@Injectable()
export class BookingContext {
  constructor(
    private readonly clock: Clock,
    private readonly env: Env,
  ) {}

  now(): Date {
    return this.clock.now();
  }

  /** Today on the studio's wall clock. */
  today(timeZone: string): IsoDate {
    return dateInTimeZone(this.clock.now(), timeZone);
  }

  studio(manager: EntityManager): Promise<LoadedStudio> {
    return loadStudio(manager);
  }

  /** A menu in the shared shape (its desserts in order), or null. */
  async menu(manager: EntityManager, id: string): Promise<Menu | null> {
    const row = await manager.findOneBy(MenuEntity, { id });
    if (!row) return null;
    const desserts = await manager.find(MenuDessertEntity, {
      where: { menuId: id },
      order: { position: 'ASC' },
    });
    return menuFromRows(row, desserts);
  }

  storefrontUrl(): string {
    return (this.env.PUBLIC_STOREFRONT_URL ?? 'http://localhost:5173').replace(/\/$/, '');
  }

  eventUrl(orderId: string): string {
    return `${this.storefrontUrl()}/my-events/${encodeURIComponent(orderId)}`;
  }
}
