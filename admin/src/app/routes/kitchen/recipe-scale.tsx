import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { BlockSkeleton } from '../../../components/ui/block-skeleton';
import { LoadError } from '../../../components/ui/load-error';
import { paths } from '../../../config/paths';
import { dessertsQueryOptions } from '../../../features/kitchen/api/get-desserts';
import { ingredientsQueryOptions } from '../../../features/kitchen/api/get-ingredients';
import { recipeQueryOptions, useRecipe } from '../../../features/kitchen/api/get-recipe-detail';
import { recipeScaledQueryOptions } from '../../../features/kitchen/api/get-recipe-scaled';
import { recipesQueryOptions } from '../../../features/kitchen/api/get-recipes';
import type { ScaleQuery } from '../../../features/kitchen/api/kitchen-keys';
import { useKitchenCatalogue } from '../../../features/kitchen/api/use-kitchen-catalogue';
import { KitchenPageHeader } from '../../../features/kitchen/components/kitchen-page-header';
import { RecipeScaleView } from '../../../features/kitchen/components/recipe-scale-view';
import { BackLink, warm, WithKitchenViewer, type KitchenViewer } from './kitchen-shell';

/** `?grams=N` or `?plates=N&dessertId=…`; anything else is no query yet. */
export function scaleQueryFrom(params: URLSearchParams): ScaleQuery | null {
  const grams = Number(params.get('grams'));
  if (params.has('grams') && Number.isFinite(grams) && grams > 0) return { grams };
  const plates = Number(params.get('plates'));
  const dessertId = params.get('dessertId');
  if (dessertId && Number.isInteger(plates) && plates > 0) return { plates, dessertId };
  return null;
}

export const recipeScaleLoader =
  (queryClient: QueryClient) =>
  ({ params, request }: LoaderFunctionArgs) => {
    const id = params.id!;
    const query = scaleQueryFrom(new URL(request.url).searchParams);
    warm(
      queryClient,
      recipeQueryOptions(id),
      ingredientsQueryOptions(),
      recipesQueryOptions(),
      dessertsQueryOptions(),
      ...(query ? [recipeScaledQueryOptions(id, query)] : []),
    );
    return null;
  };

export function RecipeScaleRoute() {
  const { id } = useParams();
  return (
    <WithKitchenViewer title="Scale a recipe">
      {(viewer) => <Scale id={id!} viewer={viewer} />}
    </WithKitchenViewer>
  );
}

function Scale({ id, viewer }: { id: string; viewer: KitchenViewer }) {
  const recipe = useRecipe(id);
  const catalogue = useKitchenCatalogue(viewer.currency);
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const query = scaleQueryFrom(searchParams);
  const back = <BackLink to={paths.recipe.getHref(id)}>Back to the recipe</BackLink>;

  if (recipe.isError || catalogue.error) {
    return (
      <>
        <KitchenPageHeader eyebrow="Kitchen · Recipes · Scale" title="Scale" actions={back} />
        <LoadError
          title="This recipe could not be loaded"
          error={recipe.error ?? catalogue.error}
          onRetry={() => {
            void recipe.refetch();
            void catalogue.refetch();
          }}
          retrying={recipe.isFetching || catalogue.isFetching}
        />
      </>
    );
  }
  if (recipe.isPending || !catalogue.data) return <BlockSkeleton label="Loading the recipe…" />;
  return (
    <>
      <KitchenPageHeader
        eyebrow="Kitchen · Recipes · Scale"
        title={`Scale: ${recipe.data.name}`}
        description="Every quantity in grams and in the unit it is bought in, sub-recipes expanded."
        actions={back}
      />
      <RecipeScaleView
        recipe={recipe.data}
        catalogue={catalogue.data}
        query={query}
        onQueryChange={(next) => navigate(paths.recipeScale.getHref(id, next), { replace: true })}
      />
    </>
  );
}
