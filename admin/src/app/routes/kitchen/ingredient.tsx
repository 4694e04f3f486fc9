import { paths } from '../../../config/paths';
import {
  ingredientQueryOptions,
  useIngredient,
} from '../../../features/kitchen/api/get-ingredient-detail';
import type { IngredientResponse } from '../../../features/kitchen/api/types';
import { IngredientDetail } from '../../../features/kitchen/components/ingredient-detail';
import { IngredientEditor } from '../../../features/kitchen/components/ingredient-editor';
import {
  CatalogueItemScreen,
  catalogueItemLoader,
  type CatalogueItemKind,
} from './catalogue-item-screen';

export const ingredientLoader = catalogueItemLoader(ingredientQueryOptions);

const ingredient: CatalogueItemKind<IngredientResponse> = {
  noun: 'ingredient',
  plural: 'ingredients',
  listHref: paths.ingredients.getHref(),
  itemHref: (id) => paths.ingredient.getHref(id),
  useItem: useIngredient,
  editor: ({ item, viewer, ...props }) => (
    <IngredientEditor ingredient={item} currency={viewer.currency} {...props} />
  ),
  detail: (item) => <IngredientDetail ingredient={item} />,
};

/** `/kitchen/ingredients/new` (chef) and `/kitchen/ingredients/:id` (chef edits, staff read). */
export function IngredientRoute() {
  return <CatalogueItemScreen kind={ingredient} />;
}
