import { createHash } from 'node:crypto';
import {
  DEMO_CATALOGUE,
  findCatalogueProblems,
  type Dessert,
  type Ingredient,
  type KitchenCatalogue,
  type Menu,
  type Recipe,
} from '@nappe/shared';
import type { DataSource } from 'typeorm';
import { removePhotoVariants, renderPhotoVariants } from '../files/photo-variants.js';
import type { StoredPhoto } from '../files/stored-photo.js';
import { uploadsDirFor } from '../files/uploads-dir.js';
import { dataPathOf } from './data-source.js';
import {
  dessertToRows,
  ingredientToRow,
  menuToRows,
  recipeToRows,
} from '../kitchen/catalogue/catalogue-rows.js';
import { DessertComponentEntity } from '../kitchen/entities/dessert-component.entity.js';
import { DessertEntity } from '../kitchen/entities/dessert.entity.js';
import { IngredientEntity } from '../kitchen/entities/ingredient.entity.js';
import { MenuDessertEntity } from '../kitchen/entities/menu-dessert.entity.js';
import { MenuEntity } from '../kitchen/entities/menu.entity.js';
import { RecipeLineEntity } from '../kitchen/entities/recipe-line.entity.js';
import { RecipeEntity } from '../kitchen/entities/recipe.entity.js';
import { dessertIllustration, menuIllustration } from './plate-illustration.js';

/**
 * A stable UUID for a demo id (name-based with SHA-1, laid out as RFC 9562 version 5), so the
 * demo's rows keep their ids from one seed to the next.
 */
export function demoUuid(demoId: string): string {
  const bytes = createHash('sha1').update(`nappe-demo/${demoId}`).digest().subarray(0, 16);
  bytes[6] = (bytes[6]! & 0x0f) | 0x50;
  bytes[8] = (bytes[8]! & 0x3f) | 0x80;
  const hex = bytes.toString('hex');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}

/** The demo catalogue with every id (and every reference) turned into its UUID. */
export function withDemoUuids(catalogue: KitchenCatalogue): KitchenCatalogue {
  const ingredients = catalogue.ingredients.map((i): Ingredient => ({ ...i, id: demoUuid(i.id) }));
  const recipes = catalogue.recipes.map((r): Recipe => ({
    ...r,
    id: demoUuid(r.id),
    lines: r.lines.map((line) =>
      line.kind === 'ingredient'
        ? { ...line, ingredientId: demoUuid(line.ingredientId) }
        : { ...line, recipeId: demoUuid(line.recipeId) },
    ),
  }));
  const desserts = catalogue.desserts.map((d): Dessert => ({
    ...d,
    id: demoUuid(d.id),
    components: d.components.map((c) => ({ ...c, recipeId: demoUuid(c.recipeId) })),
    photos: [],
  }));
  const menus = catalogue.menus.map((m): Menu => ({
    ...m,
    id: demoUuid(m.id),
    dessertIds: m.dessertIds.map(demoUuid),
  }));
  return { currency: catalogue.currency, ingredients, recipes, desserts, menus };
}

export interface CatalogueSeedResult {
  seeded: boolean;
  ingredients: number;
  recipes: number;
  desserts: number;
  menus: number;
  photos: number;
}

/**
 * Loads the demo catalogue of `@nappe/shared` into empty kitchen tables, with an invented plate
 * illustration for every dessert and menu. The illustrations are rendered first (slow work), the
 * rows then written in one transaction; if that fails, the rendered files are removed. Does
 * nothing when any ingredient exists.
 */
export async function seedDemoCatalogue(
  dataSource: DataSource,
  source: KitchenCatalogue = DEMO_CATALOGUE,
): Promise<CatalogueSeedResult> {
  const empty = { seeded: false, ingredients: 0, recipes: 0, desserts: 0, menus: 0, photos: 0 };
  if ((await dataSource.getRepository(IngredientEntity).count()) > 0) return empty;
  const problems = findCatalogueProblems(source);
  if (problems.length > 0) {
    throw new Error(
      `The demo catalogue is inconsistent: ${problems.map((p) => `${p.kind} ${p.id}: ${p.message}`).join('; ')}`,
    );
  }
  const catalogue = withDemoUuids(source);
  const dir = uploadsDirFor(dataPathOf(dataSource));
  const dessertNames = new Map(catalogue.desserts.map((d) => [d.id, d.name]));

  const rendered: StoredPhoto[] = [];
  const render = async (svg: string): Promise<StoredPhoto> => {
    const photo = await renderPhotoVariants(Buffer.from(svg), dir);
    rendered.push(photo);
    return photo;
  };
  try {
    const dessertPhotos = new Map<string, StoredPhoto[]>();
    for (const d of catalogue.desserts) {
      dessertPhotos.set(d.id, [await render(dessertIllustration(d.name))]);
    }
    const menuPhotos = new Map<string, StoredPhoto[]>();
    for (const m of catalogue.menus) {
      const names = m.dessertIds.map((id) => dessertNames.get(id) ?? '');
      menuPhotos.set(m.id, [await render(menuIllustration(m.name, names))]);
    }

    await dataSource.transaction(async (manager) => {
      await manager.insert(IngredientEntity, catalogue.ingredients.map(ingredientToRow));
      const recipes = catalogue.recipes.map(recipeToRows);
      await manager.insert(
        RecipeEntity,
        recipes.map((r) => r.recipe),
      );
      await manager.insert(
        RecipeLineEntity,
        recipes.flatMap((r) => r.lines),
      );
      const desserts = catalogue.desserts.map((d) =>
        dessertToRows(d, dessertPhotos.get(d.id) ?? []),
      );
      await manager.insert(
        DessertEntity,
        desserts.map((d) => d.dessert),
      );
      await manager.insert(
        DessertComponentEntity,
        desserts.flatMap((d) => d.components),
      );
      const menus = catalogue.menus.map((m) => menuToRows(m, menuPhotos.get(m.id) ?? []));
      await manager.insert(
        MenuEntity,
        menus.map((m) => m.menu),
      );
      await manager.insert(
        MenuDessertEntity,
        menus.flatMap((m) => m.desserts),
      );
    });
  } catch (error) {
    await Promise.all(rendered.map((p) => removePhotoVariants(p, dir)));
    throw error;
  }
  return {
    seeded: true,
    ingredients: catalogue.ingredients.length,
    recipes: catalogue.recipes.length,
    desserts: catalogue.desserts.length,
    menus: catalogue.menus.length,
    photos: rendered.length,
  };
}
