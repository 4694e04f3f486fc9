import type { Dessert, Ingredient, Menu, Recipe, RecipeLine } from '@nappe/shared';
import type { StoredPhoto } from '../../files/stored-photo.js';
import type { DessertComponentEntity } from '../entities/dessert-component.entity.js';
import type { DessertEntity } from '../entities/dessert.entity.js';
import type { IngredientEntity } from '../entities/ingredient.entity.js';
import type { MenuDessertEntity } from '../entities/menu-dessert.entity.js';
import type { MenuEntity } from '../entities/menu.entity.js';
import type { RecipeLineEntity } from '../entities/recipe-line.entity.js';
import type { RecipeEntity } from '../entities/recipe.entity.js';

/**
 * Rows ↔ the domain shapes of `@nappe/shared`. Absent optional values are NULL in the database
 * and absent (undefined) in the domain, so a response can be edited and sent back as a body.
 */

const opt = <T>(value: T | null): T | undefined => (value === null ? undefined : value);

// ---------------------------------------------------------------- ingredients

export type IngredientRow = Omit<IngredientEntity, 'createdAt' | 'updatedAt'>;

export function ingredientToRow(i: Ingredient): IngredientRow {
  return {
    id: i.id,
    name: i.name,
    labelName: i.labelName ?? null,
    packSize: i.purchase.packSize,
    packUnit: i.purchase.packUnit,
    packPriceMinor: i.purchase.packPriceMinor,
    densityGPerMl: i.densityGPerMl ?? null,
    unitWeightG: i.unitWeightG ?? null,
    countUnit: i.countUnit ?? null,
    allergens: i.allergens,
    dietary: i.dietary,
    composition: i.composition ?? null,
    notes: i.notes ?? null,
  };
}

export function ingredientFromRow(row: IngredientRow): Ingredient {
  return {
    id: row.id,
    name: row.name,
    labelName: opt(row.labelName),
    purchase: {
      packSize: row.packSize,
      packUnit: row.packUnit,
      packPriceMinor: row.packPriceMinor,
    },
    densityGPerMl: opt(row.densityGPerMl),
    unitWeightG: opt(row.unitWeightG),
    countUnit: opt(row.countUnit),
    allergens: row.allergens,
    dietary: row.dietary,
    composition: opt(row.composition),
    notes: opt(row.notes),
  };
}

// ---------------------------------------------------------------- recipes

export type RecipeRow = Omit<RecipeEntity, 'createdAt' | 'updatedAt'>;

export function recipeToRows(r: Recipe): { recipe: RecipeRow; lines: RecipeLineEntity[] } {
  return {
    recipe: {
      id: r.id,
      name: r.name,
      yieldG: r.yieldG,
      storage: r.storage,
      shelfLifeHours: r.shelfLifeHours,
      steps: r.steps,
      equipment: r.equipment ?? null,
      densityGPerMl: r.densityGPerMl ?? null,
      unitWeightG: r.unitWeightG ?? null,
      notes: r.notes ?? null,
    },
    lines: r.lines.map((line, position) => ({
      recipeId: r.id,
      position,
      ingredientId: line.kind === 'ingredient' ? line.ingredientId : null,
      subRecipeId: line.kind === 'recipe' ? line.recipeId : null,
      quantity: line.quantity,
      unit: line.unit,
      note: line.note ?? null,
    })),
  };
}

export function recipeLineFromRow(row: RecipeLineEntity): RecipeLine {
  const common = { quantity: row.quantity, unit: row.unit, note: opt(row.note) };
  return row.subRecipeId !== null
    ? { kind: 'recipe', recipeId: row.subRecipeId, ...common }
    : { kind: 'ingredient', ingredientId: row.ingredientId ?? '', ...common };
}

export function recipeFromRows(row: RecipeRow, lines: readonly RecipeLineEntity[]): Recipe {
  return {
    id: row.id,
    name: row.name,
    lines: [...lines].sort((a, b) => a.position - b.position).map(recipeLineFromRow),
    yieldG: row.yieldG,
    steps: row.steps,
    storage: row.storage,
    shelfLifeHours: row.shelfLifeHours,
    equipment: opt(row.equipment),
    densityGPerMl: opt(row.densityGPerMl),
    unitWeightG: opt(row.unitWeightG),
    notes: opt(row.notes),
  };
}

// ---------------------------------------------------------------- desserts

export type DessertRow = Omit<DessertEntity, 'createdAt' | 'updatedAt'>;

export function dessertToRows(
  d: Dessert,
  photos: StoredPhoto[],
): { dessert: DessertRow; components: DessertComponentEntity[] } {
  return {
    dessert: {
      id: d.id,
      name: d.name,
      description: d.description ?? null,
      platingNotes: d.platingNotes ?? null,
      photos,
    },
    components: d.components.map((c, position) => ({
      dessertId: d.id,
      position,
      recipeId: c.recipeId,
      quantity: c.quantity,
      unit: c.unit,
      pieceWeightG: c.pieceWeightG ?? null,
      note: c.note ?? null,
    })),
  };
}

/** The domain dessert. Its `photos` are the stored photo ids (the domain only carries references). */
export function dessertFromRows(
  row: DessertRow,
  components: readonly DessertComponentEntity[],
): Dessert {
  return {
    id: row.id,
    name: row.name,
    description: opt(row.description),
    components: [...components]
      .sort((a, b) => a.position - b.position)
      .map((c) => ({
        recipeId: c.recipeId,
        quantity: c.quantity,
        unit: c.unit,
        pieceWeightG: opt(c.pieceWeightG),
        note: opt(c.note),
      })),
    platingNotes: opt(row.platingNotes),
    photos: row.photos.map((p) => p.id),
  };
}

// ---------------------------------------------------------------- menus

export type MenuRow = Omit<MenuEntity, 'createdAt' | 'updatedAt'>;

export function menuToRows(
  m: Menu,
  photos: StoredPhoto[],
): { menu: MenuRow; desserts: MenuDessertEntity[] } {
  return {
    menu: {
      id: m.id,
      name: m.name,
      description: m.description ?? null,
      pricePerGuestMinor: m.pricePerGuestMinor,
      minGuests: m.minGuests,
      maxGuests: m.maxGuests,
      leadDays: m.leadDays,
      active: m.active,
      photos,
    },
    desserts: m.dessertIds.map((dessertId, position) => ({ menuId: m.id, position, dessertId })),
  };
}

export function menuFromRows(row: MenuRow, desserts: readonly MenuDessertEntity[]): Menu {
  return {
    id: row.id,
    name: row.name,
    description: opt(row.description),
    dessertIds: [...desserts].sort((a, b) => a.position - b.position).map((d) => d.dessertId),
    pricePerGuestMinor: row.pricePerGuestMinor,
    minGuests: row.minGuests,
    maxGuests: row.maxGuests,
    leadDays: row.leadDays,
    active: Boolean(row.active),
  };
}
