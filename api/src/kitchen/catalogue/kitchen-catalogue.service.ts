import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import {
  createKitchenIndex,
  isKitchenError,
  type KitchenCatalogue,
  type KitchenEntityKind,
  type KitchenIndex,
} from '@nappe/shared';
import {
  DataSource,
  EntityManager,
  QueryFailedError,
  type ObjectLiteral,
  type SelectQueryBuilder,
} from 'typeorm';
import { StudioSettings } from '../../studio/entities/studio-settings.entity.js';
import { DessertComponentEntity } from '../entities/dessert-component.entity.js';
import { DessertEntity } from '../entities/dessert.entity.js';
import { IngredientEntity } from '../entities/ingredient.entity.js';
import { MenuDessertEntity } from '../entities/menu-dessert.entity.js';
import { MenuEntity } from '../entities/menu.entity.js';
import { RecipeLineEntity } from '../entities/recipe-line.entity.js';
import { RecipeEntity } from '../entities/recipe.entity.js';
import type { KitchenListQuery } from '../dto/kitchen-queries.js';
import {
  dessertFromRows,
  ingredientFromRow,
  menuFromRows,
  recipeFromRows,
} from './catalogue-rows.js';
import { KITCHEN_CATALOGUE, lockFor } from '../../database/serialized-writes.js';

/** The whole catalogue as the computation wants it, with the rows it came from. */
export interface LoadedCatalogue {
  catalogue: KitchenCatalogue;
  index: KitchenIndex;
  rows: {
    ingredients: Map<string, IngredientEntity>;
    recipes: Map<string, RecipeEntity>;
    desserts: Map<string, DessertEntity>;
    menus: Map<string, MenuEntity>;
  };
}

function groupBy<T, K>(items: readonly T[], key: (item: T) => K): Map<K, T[]> {
  const map = new Map<K, T[]>();
  for (const item of items) {
    const k = key(item);
    const list = map.get(k);
    if (list) list.push(item);
    else map.set(k, [item]);
  }
  return map;
}

const KIND_LABEL: Record<KitchenEntityKind, string> = {
  ingredient: 'ingredient',
  recipe: 'recipe',
  dessert: 'dessert',
  menu: 'menu',
};

export function notFound(kind: KitchenEntityKind): NotFoundException {
  return new NotFoundException(`There is no ${KIND_LABEL[kind]} with that id.`);
}

/** `%` and `_` typed by the chef are matched literally. */
export function likePattern(q: string): string {
  return `%${q
    .trim()
    .toLowerCase()
    .replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/** One page of rows ordered by name, optionally filtered by part of the name. */
export async function pageByName<E extends ObjectLiteral>(
  qb: SelectQueryBuilder<E>,
  query: KitchenListQuery,
): Promise<{ rows: E[]; total: number }> {
  const alias = qb.alias;
  if (query.q !== undefined && query.q.trim() !== '') {
    qb.where(`LOWER(${alias}.name) LIKE :pattern ESCAPE '\\'`, { pattern: likePattern(query.q) });
  }
  const [rows, total] = await qb
    .orderBy(`${alias}.name`, 'ASC')
    .addOrderBy(`${alias}.id`, 'ASC')
    .skip((query.page - 1) * query.pageSize)
    .take(query.pageSize)
    .getManyAndCount();
  return { rows, total };
}

/**
 * A write the database refused because a row is still referenced (a foreign key with ON DELETE
 * RESTRICT, including those later features add, such as orders on a menu): a 409, not a 500.
 */
export function rethrowForeignKey(error: unknown, message: string): never {
  const code = (error as QueryFailedError & { driverError?: { code?: string } }).driverError?.code;
  // SQLite's codes (ON DELETE RESTRICT is enforced as a trigger and reports
  // SQLITE_CONSTRAINT_TRIGGER with "FOREIGN KEY constraint failed"), and PostgreSQL's
  // foreign_key_violation (23503).
  const sqliteRestrict =
    code === 'SQLITE_CONSTRAINT_TRIGGER' && /FOREIGN KEY/i.test((error as Error).message);
  if (
    error instanceof QueryFailedError &&
    (code === 'SQLITE_CONSTRAINT_FOREIGNKEY' || sqliteRestrict || code === '23503')
  ) {
    throw new ConflictException({ statusCode: 409, message, error: 'Conflict' });
  }
  throw error;
}

export const stillUsed = (name: string) =>
  `“${name}” is still used elsewhere, so it was not deleted.`;
export const danglingReference = (name: string) =>
  `“${name}” refers to something that no longer exists; reload and try again.`;

/**
 * Turns a kitchen error raised while computing a view of stored data into a 409 with the chef's
 * message (the catalogue needs fixing, e.g. an ingredient without its composition). Any other
 * error goes on.
 */
export function computeView<T>(work: () => T): T {
  try {
    return work();
  } catch (error) {
    if (isKitchenError(error)) {
      throw new ConflictException({ statusCode: 409, message: error.message, error: 'Conflict' });
    }
    throw error;
  }
}

@Injectable()
export class KitchenCatalogueService {
  /**
   * Goes up after every write through `transaction()`, so readers can cache what they derive
   * from the catalogue (the public menu cards) and know when to throw it away. One process
   * owns the SQLite file and sees every write.
   */
  private generation = 0;

  constructor(private readonly dataSource: DataSource) {}

  /**
   * The catalogue's revision: read it BEFORE loading, tag what you derive with it. On PostgreSQL
   * another API process may change the catalogue without this one knowing, so there the revision
   * also moves on every second: what is derived is at most a second behind another process's
   * write, and at once up to date with this process's own.
   */
  get revision(): number {
    if (this.dataSource.options.type !== 'postgres') return this.generation;
    return Math.floor(Date.now() / 1000) * 1000 + (this.generation % 1000);
  }

  /** For writers outside this service whose changes show in the catalogue (studio currency). */
  invalidate(): void {
    this.generation += 1;
  }

  /**
   * Runs `work` in one transaction (every multi-row write goes through here). Writes are checked
   * against the whole catalogue (no recipe loops, nothing in use deleted), so on PostgreSQL these
   * transactions take the catalogue's lock and run one at a time, as on SQLite.
   */
  async transaction<T>(work: (manager: EntityManager) => Promise<T>): Promise<T> {
    try {
      return await this.dataSource.transaction(async (manager) => {
        await lockFor(manager, KITCHEN_CATALOGUE);
        return work(manager);
      });
    } finally {
      this.generation += 1;
    }
  }

  /**
   * Every row of the catalogue. Pass the transaction's manager when writing; without one the
   * reads run in a transaction of their own so the rows agree with each other.
   */
  async load(manager?: EntityManager): Promise<LoadedCatalogue> {
    if (!manager) return this.dataSource.transaction((m) => this.load(m));
    const settings = await manager.findOneBy(StudioSettings, { id: 1 });
    const ingredients = await manager.find(IngredientEntity);
    const recipes = await manager.find(RecipeEntity);
    const lines = groupBy(await manager.find(RecipeLineEntity), (l) => l.recipeId);
    const desserts = await manager.find(DessertEntity);
    const components = groupBy(await manager.find(DessertComponentEntity), (c) => c.dessertId);
    const menus = await manager.find(MenuEntity);
    const menuDesserts = groupBy(await manager.find(MenuDessertEntity), (d) => d.menuId);
    const catalogue: KitchenCatalogue = {
      currency: settings?.currency ?? 'EUR',
      ingredients: ingredients.map(ingredientFromRow),
      recipes: recipes.map((r) => recipeFromRows(r, lines.get(r.id) ?? [])),
      desserts: desserts.map((d) => dessertFromRows(d, components.get(d.id) ?? [])),
      menus: menus.map((m) => menuFromRows(m, menuDesserts.get(m.id) ?? [])),
    };
    return {
      catalogue,
      index: createKitchenIndex(catalogue),
      rows: {
        ingredients: new Map(ingredients.map((r) => [r.id, r])),
        recipes: new Map(recipes.map((r) => [r.id, r])),
        desserts: new Map(desserts.map((r) => [r.id, r])),
        menus: new Map(menus.map((r) => [r.id, r])),
      },
    };
  }
}

/** `id → name` for rows of a table with both columns. */
export async function namesOf(
  manager: EntityManager,
  entity: typeof IngredientEntity | typeof RecipeEntity | typeof DessertEntity,
  ids: readonly string[],
): Promise<Map<string, string>> {
  const unique = [...new Set(ids)];
  if (unique.length === 0) return new Map();
  const rows = await manager
    .getRepository<{ id: string; name: string }>(entity)
    .createQueryBuilder('t')
    .select(['t.id', 't.name'])
    .where('t.id IN (:...ids)', { ids: unique })
    .getMany();
  return new Map(rows.map((r) => [r.id, r.name]));
}
