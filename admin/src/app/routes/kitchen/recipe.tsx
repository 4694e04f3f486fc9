import { Button } from '@chakra-ui/react';
import { Link as RouterLink } from 'react-router';
import { ScaleIcon } from '../../../components/ui/icons';
import { paths } from '../../../config/paths';
import { dessertsQueryOptions } from '../../../features/kitchen/api/get-desserts';
import { ingredientsQueryOptions } from '../../../features/kitchen/api/get-ingredients';
import { recipeQueryOptions, useRecipe } from '../../../features/kitchen/api/get-recipe-detail';
import { recipesQueryOptions } from '../../../features/kitchen/api/get-recipes';
import type { RecipeResponse } from '../../../features/kitchen/api/types';
import { RecipeDetail } from '../../../features/kitchen/components/recipe-detail';
import { RecipeEditor } from '../../../features/kitchen/components/recipe-editor';
import { CatalogueGate } from './catalogue-gate';
import {
  CatalogueItemScreen,
  catalogueItemLoader,
  type CatalogueItemKind,
} from './catalogue-item-screen';

export const recipeLoader = catalogueItemLoader(recipeQueryOptions, () => [
  ingredientsQueryOptions(),
  recipesQueryOptions(),
  dessertsQueryOptions(),
]);

const recipe: CatalogueItemKind<RecipeResponse> = {
  noun: 'recipe',
  plural: 'recipes',
  listHref: paths.recipes.getHref(),
  itemHref: (id) => paths.recipe.getHref(id),
  useItem: useRecipe,
  headerActions: (item) => (
    <Button asChild variant="outline">
      <RouterLink to={paths.recipeScale.getHref(item.id)}>
        <ScaleIcon /> Scale
      </RouterLink>
    </Button>
  ),
  editor: ({ item, viewer, ...props }) => (
    <CatalogueGate currency={viewer.currency}>
      {(catalogue) => (
        <RecipeEditor recipe={item} catalogue={catalogue} seesCosts={viewer.seesCosts} {...props} />
      )}
    </CatalogueGate>
  ),
  detail: (item, viewer) => (
    <CatalogueGate currency={viewer.currency}>
      {(catalogue) => (
        <RecipeDetail recipe={item} catalogue={catalogue} seesCosts={viewer.seesCosts} />
      )}
    </CatalogueGate>
  ),
};

/** `/kitchen/recipes/new` (chef) and `/kitchen/recipes/:id` (chef edits, staff read). */
export function RecipeRoute() {
  return <CatalogueItemScreen kind={recipe} />;
}
