import { randomUUID } from 'node:crypto';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import {
  costDessertPlate,
  dessertIngredientLabel,
  rollUpDessert,
  usContainsStatement,
  type AllergenReport,
  type Dessert,
  type IngredientLabel,
  type Page,
  type PlateCost,
} from '@nappe/shared';
import { EntityManager, In } from 'typeorm';
import { PhotoStorage } from '../../files/photo-storage.service.js';
import {
  assertWriteKeepsCatalogue,
  inUseConflict,
  usersOf,
  type KitchenSubject,
} from '../catalogue/catalogue-checks.js';
import { dessertToRows } from '../catalogue/catalogue-rows.js';
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
import type { DessertBody } from '../dto/kitchen-bodies.js';
import type { KitchenListQuery } from '../dto/kitchen-queries.js';
import { DessertComponentEntity } from '../entities/dessert-component.entity.js';
import { DessertEntity } from '../entities/dessert.entity.js';
import { RecipeEntity } from '../entities/recipe.entity.js';
import type { RecipeAllergenView } from '../recipes/recipes.service.js';
import { MAX_PHOTOS, toDessertResponse, type DessertResponse } from './dessert.mapper.js';

export type DessertAllergenView = RecipeAllergenView;

/** What one plate costs and carries (chef only: it holds the cost). */
export type DessertSummary = PlateCost & {
  plateGrams: number;
  allergens: Pick<AllergenReport, 'eu' | 'us' | 'advisories' | 'sulphites'>;
  dietary: AllergenReport['dietary'];
  label: IngredientLabel;
  usContainsStatement: string | null;
};

@Injectable()
export class DessertsService {
  constructor(
    private readonly kitchen: KitchenCatalogueService,
    private readonly photos: PhotoStorage,
  ) {}

  // ---------------------------------------------------------------- reading

  private async responses(
    manager: EntityManager,
    rows: readonly DessertEntity[],
  ): Promise<DessertResponse[]> {
    if (rows.length === 0) return [];
    const components = await manager.find(DessertComponentEntity, {
      where: { dessertId: In(rows.map((r) => r.id)) },
    });
    const names = await namesOf(
      manager,
      RecipeEntity,
      components.map((c) => c.recipeId),
    );
    return rows.map((row) =>
      toDessertResponse(
        row,
        components.filter((c) => c.dessertId === row.id),
        names,
      ),
    );
  }

  private async one(manager: EntityManager, id: string): Promise<DessertResponse> {
    const row = await manager.findOneBy(DessertEntity, { id });
    if (!row) throw notFound('dessert');
    const [response] = await this.responses(manager, [row]);
    return response!;
  }

  list(query: KitchenListQuery): Promise<Page<DessertResponse>> {
    return this.kitchen.transaction(async (manager) => {
      const { rows, total } = await pageByName(
        manager.createQueryBuilder(DessertEntity, 'd'),
        query,
      );
      return {
        items: await this.responses(manager, rows),
        total,
        page: query.page,
        pageSize: query.pageSize,
      };
    });
  }

  get(id: string): Promise<DessertResponse> {
    return this.kitchen.transaction((manager) => this.one(manager, id));
  }

  // ---------------------------------------------------------------- writing

  create(body: DessertBody): Promise<DessertResponse> {
    return this.save(randomUUID(), body, 'create');
  }

  replace(id: string, body: DessertBody): Promise<DessertResponse> {
    return this.save(id, body, 'replace');
  }

  private save(
    id: string,
    body: DessertBody,
    mode: 'create' | 'replace',
  ): Promise<DessertResponse> {
    return this.kitchen
      .transaction(async (manager) => {
        const { catalogue, rows } = await this.kitchen.load(manager);
        const existing = rows.desserts.get(id);
        if (mode === 'replace' && !existing) throw notFound('dessert');
        const photos = existing?.photos ?? [];
        const dessert: Dessert = { ...body, id, photos: photos.map((p) => p.id) };
        const others = catalogue.desserts.filter((d) => d.id !== id);
        assertWriteKeepsCatalogue(
          catalogue,
          { ...catalogue, desserts: [...others, dessert] },
          { kind: 'dessert', id, name: dessert.name },
        );
        const written = dessertToRows(dessert, photos);
        if (mode === 'create') {
          await manager.insert(DessertEntity, written.dessert);
        } else {
          await manager.update(DessertEntity, { id }, written.dessert);
          await manager.delete(DessertComponentEntity, { dessertId: id });
        }
        await manager.insert(DessertComponentEntity, written.components);
        return this.one(manager, id);
      })
      .catch((e: unknown) => rethrowForeignKey(e, danglingReference(body.name)));
  }

  async remove(id: string): Promise<void> {
    const photos = await this.kitchen.transaction(async (manager) => {
      const { catalogue, rows } = await this.kitchen.load(manager);
      const row = rows.desserts.get(id);
      if (!row) throw notFound('dessert');
      const subject: KitchenSubject = { kind: 'dessert', id, name: row.name };
      const users = usersOf(catalogue, subject);
      if (users.length > 0) throw inUseConflict(subject, users);
      await manager
        .delete(DessertEntity, { id })
        .catch((e: unknown) => rethrowForeignKey(e, stillUsed(row.name)));
      return row.photos;
    });
    await this.photos.removeAll(photos); // after the commit: the rows no longer point at them
  }

  // ---------------------------------------------------------------- photos

  /** Checks and stores the upload first (slow), then records it in one short transaction. */
  async addPhoto(id: string, file: Express.Multer.File | undefined): Promise<DessertResponse> {
    const before = await this.kitchen.transaction((m) => m.findOneBy(DessertEntity, { id }));
    if (!before) throw notFound('dessert');
    if (before.photos.length >= MAX_PHOTOS) throw tooManyPhotos(before.name);
    const photo = await this.photos.storeUpload(file);
    try {
      return await this.kitchen.transaction(async (manager) => {
        const row = await manager.findOneBy(DessertEntity, { id });
        if (!row) throw notFound('dessert');
        if (row.photos.length >= MAX_PHOTOS) throw tooManyPhotos(row.name);
        await manager.update(DessertEntity, { id }, { photos: [...row.photos, photo] });
        return this.one(manager, id);
      });
    } catch (error) {
      await this.photos.removeAll([photo]);
      throw error;
    }
  }

  async removePhoto(id: string, photoId: string): Promise<void> {
    const removed = await this.kitchen.transaction(async (manager) => {
      const row = await manager.findOneBy(DessertEntity, { id });
      if (!row) throw notFound('dessert');
      const photo = row.photos.find((p) => p.id === photoId);
      if (!photo) throw new NotFoundException('This dessert has no photo with that id.');
      await manager.update(
        DessertEntity,
        { id },
        { photos: row.photos.filter((p) => p !== photo) },
      );
      return photo;
    });
    await this.photos.removeAll([removed]);
  }

  // ---------------------------------------------------------------- computed views

  private async loadWith(id: string): Promise<LoadedCatalogue> {
    const loaded = await this.kitchen.load();
    if (!loaded.rows.desserts.has(id)) throw notFound('dessert');
    return loaded;
  }

  /** Allergens of one plate, through every component and sub-recipe, EU and US, with the label. */
  async allergens(id: string): Promise<DessertAllergenView> {
    const { index } = await this.loadWith(id);
    return computeView(() => {
      const report = rollUpDessert(index, id);
      const { occurrences: _occurrences, ...view } = report;
      return {
        ...view,
        label: dessertIngredientLabel(index, id),
        usContainsStatement: usContainsStatement(report),
      };
    });
  }

  /** Plate cost, allergens and dietary flags of one plate. */
  async summary(id: string): Promise<DessertSummary> {
    const { index } = await this.loadWith(id);
    return computeView(() => {
      const report = rollUpDessert(index, id);
      return {
        ...costDessertPlate(index, id),
        plateGrams: report.grams,
        allergens: {
          eu: report.eu,
          us: report.us,
          advisories: report.advisories,
          sulphites: report.sulphites,
        },
        dietary: report.dietary,
        label: dessertIngredientLabel(index, id),
        usContainsStatement: usContainsStatement(report),
      };
    });
  }
}

export function tooManyPhotos(name: string): ConflictException {
  return new ConflictException({
    statusCode: 409,
    message: `“${name}” has ${MAX_PHOTOS} photos already; remove one before adding another.`,
    error: 'Conflict',
  });
}
