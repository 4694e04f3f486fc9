import { Injectable } from '@nestjs/common';
import { isDeepStrictEqual } from 'node:util';
import { DataSource, type EntityManager } from 'typeorm';
import { Clock } from '../common/clock.js';
import { KitchenCatalogueService } from '../kitchen/catalogue/kitchen-catalogue.service.js';
import { User } from '../users/entities/user.entity.js';
import { SettingsChangeEntity } from './entities/settings-change.entity.js';
import { StudioSettings } from './entities/studio-settings.entity.js';
import type { StudioSettingsBody, StudioSettingsView } from './studio-settings.body.js';

function bodyOf(row: StudioSettings): StudioSettingsBody {
  return {
    name: row.name,
    tagline: row.tagline,
    city: row.city,
    currency: row.currency,
    timeZone: row.timeZone,
    taxRateBp: row.taxRateBp,
    pricesIncludeTax: row.pricesIncludeTax,
    depositPercent: row.depositPercent,
    balanceDueDaysBefore: row.balanceDueDaysBefore,
    cancellationTiers: row.cancellationTiers,
    dailyPlateCapacity: row.dailyPlateCapacity,
    blackoutDates: row.blackoutDates,
    finalGuestCountDaysBefore: row.finalGuestCountDaysBefore,
    sparePercent: row.sparePercent,
    guestDataRetentionDays: row.guestDataRetentionDays,
    workingHours: { start: row.workingHoursStart, end: row.workingHoursEnd },
    platingBufferMinutes: row.platingBufferMinutes,
  };
}

/**
 * The chef's studio settings. A change is saved in one transaction with its audit row. Orders
 * already booked keep their own pricing snapshot, so nothing here reprices them.
 */
@Injectable()
export class StudioSettingsService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly clock: Clock,
    private readonly catalogue: KitchenCatalogueService,
  ) {}

  get(): Promise<StudioSettingsView> {
    return this.dataSource.transaction((m) => this.view(m));
  }

  async update(chefId: string, body: StudioSettingsBody): Promise<StudioSettingsView> {
    let currencyChanged = false;
    const view = await this.dataSource.transaction(async (m) => {
      const row = await m.findOneByOrFail(StudioSettings, { id: 1 });
      const before = bodyOf(row);
      const changed = (Object.keys(body) as Array<keyof StudioSettingsBody>).filter(
        (k) => !isDeepStrictEqual(before[k], body[k]),
      );
      if (changed.length > 0) {
        currencyChanged = changed.includes('currency');
        const now = this.clock.now();
        await m.update(
          StudioSettings,
          { id: 1 },
          {
            name: body.name,
            tagline: body.tagline,
            city: body.city,
            currency: body.currency,
            timeZone: body.timeZone,
            taxRateBp: body.taxRateBp,
            pricesIncludeTax: body.pricesIncludeTax,
            depositPercent: body.depositPercent,
            balanceDueDaysBefore: body.balanceDueDaysBefore,
            cancellationTiers: body.cancellationTiers,
            dailyPlateCapacity: body.dailyPlateCapacity,
            blackoutDates: [...body.blackoutDates].sort(),
            finalGuestCountDaysBefore: body.finalGuestCountDaysBefore,
            sparePercent: body.sparePercent,
            guestDataRetentionDays: body.guestDataRetentionDays,
            workingHoursStart: body.workingHours.start,
            workingHoursEnd: body.workingHours.end,
            platingBufferMinutes: body.platingBufferMinutes,
            updatedAt: now,
          },
        );
        await m.insert(SettingsChangeEntity, {
          changedById: chefId,
          changedAt: now,
          fields: changed,
        });
      }
      return this.view(m);
    });
    // The public menu cards show prices in the studio currency and are cached.
    if (currencyChanged) this.catalogue.invalidate();
    return view;
  }

  private async view(m: EntityManager): Promise<StudioSettingsView> {
    const row = await m.findOneByOrFail(StudioSettings, { id: 1 });
    const last = await m.find(SettingsChangeEntity, {
      order: { id: 'DESC' },
      take: 1,
    });
    const change = last[0];
    const by = change ? await m.findOneBy(User, { id: change.changedById }) : null;
    return {
      ...bodyOf(row),
      updatedAt: row.updatedAt.toISOString(),
      lastChange: change
        ? {
            changedAt: change.changedAt.toISOString(),
            changedBy: by?.name ?? '',
            fields: change.fields,
          }
        : null,
    };
  }
}
