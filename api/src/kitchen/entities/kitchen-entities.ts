import { DessertComponentEntity } from './dessert-component.entity.js';
import { DessertEntity } from './dessert.entity.js';
import { IngredientEntity } from './ingredient.entity.js';
import { MenuDessertEntity } from './menu-dessert.entity.js';
import { MenuEntity } from './menu.entity.js';
import { RecipeLineEntity } from './recipe-line.entity.js';
import { RecipeEntity } from './recipe.entity.js';

/** The kitchen catalogue's tables, for `database/entities.ts` and `forFeature`. */
export const kitchenEntities = [
  IngredientEntity,
  RecipeEntity,
  RecipeLineEntity,
  DessertEntity,
  DessertComponentEntity,
  MenuEntity,
  MenuDessertEntity,
];
