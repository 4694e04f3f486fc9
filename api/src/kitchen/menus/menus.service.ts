import { randomUUID } from 'node:crypto';
import { Injectable, Logger, NotFoundException } from '@nestjs/common';
import {
  costMenu,
  isKitchenError,
  suggestMenuPrice,
  type Menu,
  type MenuCost,
  type Page,
} from '@nappe/shared';
import { EntityManager, In } from 'typeorm';
import { PhotoStorage } from '../../files/photo-storage.service.js';
import {
  assertWriteKeepsCatalogue,
  inUseConflict,
  usersOf,
  type KitchenSubject,
} from '../catalogue/catalogue-checks.js';
import { menuToRows } from '../catalogue/catalogue-rows.js';
import {
  computeView,
  KitchenCatalogueService,
  namesOf,
  notFound,
  pageByName,
  rethrowForeignKey,
  stillUsed,
  danglingReference,
  type LoadedCatalogue,
} from '../catalogue/kitchen-catalogue.service.js';
import { MAX_PHOTOS } from '../desserts/dessert.mapper.js';
import { tooManyPhotos } from '../desserts/desserts.service.js';
import type { MenuBody } from '../dto/kitchen-bodies.js';
import type { KitchenListQuery, MenuCostingQuery } from '../dto/kitchen-queries.js';
import { DessertEntity } from '../entities/dessert.entity.js';
import { MenuDessertEntity } from '../entities/menu-dessert.entity.js';
import { MenuEntity } from '../entities/menu.entity.js';
import { toMenuResponse, type MenuResponse } from './menu.mapper.js';
import { toPublicMenu, type PublicMenu } from './public-menu.mapper.js';

export type MenuCosting = MenuCost & {
  /** The price per guest that meets `targetPercent` food cost, rounded up to `stepMinor`. */
  suggestion: { targetPercent: number; stepMinor: number; pricePerGuestMinor: number } | null;
};

@Injectable()
export class MenusService {
  private readonly logger = new Logger(MenusService.name);
  /** The public cards of every active menu, sorted, for the catalogue revision they came from. */
  private publicCache: { revision: number; cards: PublicMenu[] } | null = null;

  constructor(
    private readonly kitchen: KitchenCatalogueService,
    private readonly photos: PhotoStorage,
  ) {}

  // ---------------------------------------------------------------- public

  private publicCards(loaded: LoadedCatalogue, menus: readonly Menu[]): PublicMenu[] {
    const dessertPhotos = new Map(
      [...loaded.rows.desserts.values()].map((row) => [row.id, row.photos]),
    );
    return menus.flatMap((menu) => {
      try {
        return [
          toPublicMenu(
            loaded.index,
            menu,
            { menu: loaded.rows.menus.get(menu.id)?.photos ?? [], desserts: dessertPhotos },
            loaded.catalogue.currency,
          ),
        ];
      } catch (error) {
        if (!isKitchenError(error)) throw error;
        // Never publish a menu whose allergens cannot be worked out.
        this.logger.error(`Menu ${menu.id} is hidden from the public: ${error.message}`);
        return [];
      }
    });
  }

  /**
   * Every active menu's public card. Rolling allergens up through every recipe is the costly
   * part of the public read, so the cards are kept until the catalogue changes.
   */
  private async activeCards(): Promise<PublicMenu[]> {
    const revision = this.kitchen.revision;
    if (this.publicCache?.revision === revision) return this.publicCache.cards;
    const loaded = await this.kitchen.load();
    const active = loaded.catalogue.menus
      .filter((m) => m.active)
      .sort((a, b) => a.name.localeCompare(b.name) || a.id.localeCompare(b.id));
    const cards = this.publicCards(loaded, active);
    this.publicCache = { revision, cards };
    return cards;
  }

  /** Active menus only, by name, with what a guest needs to choose and nothing the kitchen keeps. */
  async listPublic(query: KitchenListQuery): Promise<Page<PublicMenu>> {
    const q = query.q?.trim().toLowerCase();
    const cards = (await this.activeCards()).filter((c) => !q || c.name.toLowerCase().includes(q));
    const start = (query.page - 1) * query.pageSize;
    return {
      items: cards.slice(start, start + query.pageSize),
      total: cards.length,
      page: query.page,
      pageSize: query.pageSize,
    };
  }

  async getPublic(id: string): Promise<PublicMenu> {
    const card = (await this.activeCards()).find((c) => c.id === id);
    if (!card) throw notFound('menu');
    return card;
  }

  // ---------------------------------------------------------------- chef and staff

  private async responses(
    manager: EntityManager,
    rows: readonly MenuEntity[],
  ): Promise<MenuResponse[]> {
    if (rows.length === 0) return [];
    const desserts = await manager.find(MenuDessertEntity, {
      where: { menuId: In(rows.map((r) => r.id)) },
    });
    const names = await namesOf(
      manager,
      DessertEntity,
      desserts.map((d) => d.dessertId),
    );
    return rows.map((row) =>
      toMenuResponse(
        row,
        desserts.filter((d) => d.menuId === row.id),
        names,
      ),
    );
  }

  private async one(manager: EntityManager, id: string): Promise<MenuResponse> {
    const row = await manager.findOneBy(MenuEntity, { id });
    if (!row) throw notFound('menu');
    const [response] = await this.responses(manager, [row]);
    return response!;
  }

  /** Every menu, active or not. */
  list(query: KitchenListQuery): Promise<Page<MenuResponse>> {
    return this.kitchen.transaction(async (manager) => {
      const { rows, total } = await pageByName(manager.createQueryBuilder(MenuEntity, 'm'), query);
      return {
        items: await this.responses(manager, rows),
        total,
        page: query.page,
        pageSize: query.pageSize,
      };
    });
  }

  get(id: string): Promise<MenuResponse> {
    return this.kitchen.transaction((manager) => this.one(manager, id));
  }

  create(body: MenuBody): Promise<MenuResponse> {
    return this.save(randomUUID(), body, 'create');
  }

  replace(id: string, body: MenuBody): Promise<MenuResponse> {
    return this.save(id, body, 'replace');
  }

  private save(id: string, body: MenuBody, mode: 'create' | 'replace'): Promise<MenuResponse> {
    return this.kitchen
      .transaction(async (manager) => {
        const { catalogue, rows } = await this.kitchen.load(manager);
        const existing = rows.menus.get(id);
        if (mode === 'replace' && !existing) throw notFound('menu');
        const menu: Menu = { ...body, id };
        const others = catalogue.menus.filter((m) => m.id !== id);
        assertWriteKeepsCatalogue(
          catalogue,
          { ...catalogue, menus: [...others, menu] },
          { kind: 'menu', id, name: menu.name },
        );
        const written = menuToRows(menu, existing?.photos ?? []);
        if (mode === 'create') {
          await manager.insert(MenuEntity, written.menu);
        } else {
          await manager.update(MenuEntity, { id }, written.menu);
          await manager.delete(MenuDessertEntity, { menuId: id });
        }
        await manager.insert(MenuDessertEntity, written.desserts);
        return this.one(manager, id);
      })
      .catch((e: unknown) => rethrowForeignKey(e, danglingReference(body.name)));
  }

  async remove(id: string): Promise<void> {
    const photos = await this.kitchen.transaction(async (manager) => {
      const { catalogue, rows } = await this.kitchen.load(manager);
      const row = rows.menus.get(id);
      if (!row) throw notFound('menu');
      const subject: KitchenSubject = { kind: 'menu', id, name: row.name };
      const users = usersOf(catalogue, subject);
      if (users.length > 0) throw inUseConflict(subject, users);
      await manager
        .delete(MenuEntity, { id })
        .catch((e: unknown) => rethrowForeignKey(e, stillUsed(row.name)));
      return row.photos;
    });
    await this.photos.removeAll(photos);
  }

  /** Cost per guest, food-cost percent, and the price that meets a target (chef only). */
  async costing(id: string, query: MenuCostingQuery): Promise<MenuCosting> {
    const { index, rows } = await this.kitchen.load();
    if (!rows.menus.has(id)) throw notFound('menu');
    return computeView(() => ({
      ...costMenu(index, id),
      suggestion:
        query.targetPercent === undefined
          ? null
          : {
              targetPercent: query.targetPercent,
              stepMinor: query.stepMinor,
              pricePerGuestMinor: suggestMenuPrice(index, id, query.targetPercent, query.stepMinor),
            },
    }));
  }

  // ---------------------------------------------------------------- photos

  async addPhoto(id: string, file: Express.Multer.File | undefined): Promise<MenuResponse> {
    const before = await this.kitchen.transaction((m) => m.findOneBy(MenuEntity, { id }));
    if (!before) throw notFound('menu');
    if (before.photos.length >= MAX_PHOTOS) throw tooManyPhotos(before.name);
    const photo = await this.photos.storeUpload(file); // slow: outside any transaction
    try {
      return await this.kitchen.transaction(async (manager) => {
        const row = await manager.findOneBy(MenuEntity, { id });
        if (!row) throw notFound('menu');
        if (row.photos.length >= MAX_PHOTOS) throw tooManyPhotos(row.name);
        await manager.update(MenuEntity, { id }, { photos: [...row.photos, photo] });
        return this.one(manager, id);
      });
    } catch (error) {
      await this.photos.removeAll([photo]);
      throw error;
    }
  }

  async removePhoto(id: string, photoId: string): Promise<void> {
    const removed = await this.kitchen.transaction(async (manager) => {
      const row = await manager.findOneBy(MenuEntity, { id });
      if (!row) throw notFound('menu');
      const photo = row.photos.find((p) => p.id === photoId);
      if (!photo) throw new NotFoundException('This menu has no photo with that id.');
      await manager.update(MenuEntity, { id }, { photos: row.photos.filter((p) => p !== photo) });
      return photo;
    });
    await this.photos.removeAll([removed]);
  }
}
