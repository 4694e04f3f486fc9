import { Badge, Button } from '@chakra-ui/react';
import { Role } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import { Link as RouterLink, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { ScaleIcon } from '../../../components/ui/icons';
import { paths } from '../../../config/paths';
import { RequireRole } from '../../../features/auth/components/require-role';
import { dessertsQueryOptions } from '../../../features/kitchen/api/get-desserts';
import { ingredientsQueryOptions } from '../../../features/kitchen/api/get-ingredients';
import { recipeQueryOptions, useRecipe } from '../../../features/kitchen/api/get-recipe-detail';
import { recipesQueryOptions } from '../../../features/kitchen/api/get-recipes';
import { KitchenPageHeader } from '../../../features/kitchen/components/kitchen-page-header';
import { BlockSkeleton, LoadError } from '../../../features/kitchen/components/load-states';
import { RecipeDetail } from '../../../features/kitchen/components/recipe-detail';
import { RecipeEditor } from '../../../features/kitchen/components/recipe-editor';
import { CatalogueGate } from './catalogue-gate';
import { BackLink, warm, WithKitchenViewer, type KitchenViewer } from './kitchen-shell';

export const recipeLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    warm(
      queryClient,
      ingredientsQueryOptions(),
      recipesQueryOptions(),
      dessertsQueryOptions(),
      ...(params.id ? [recipeQueryOptions(params.id)] : []),
    );
    return null;
  };

const back = <BackLink to={paths.recipes.getHref()}>All recipes</BackLink>;

/** `/kitchen/recipes/new` (chef) and `/kitchen/recipes/:id` (chef edits, staff read). */
export function RecipeRoute() {
  const { id } = useParams();
  return (
    <WithKitchenViewer title={id ? 'Recipe' : 'New recipe'}>
      {(viewer) =>
        id ? (
          <ExistingRecipe id={id} viewer={viewer} />
        ) : (
          <RequireRole user={viewer.user} roles={[Role.Chef]}>
            <NewRecipe viewer={viewer} />
          </RequireRole>
        )
      }
    </WithKitchenViewer>
  );
}

function NewRecipe({ viewer }: { viewer: KitchenViewer }) {
  const navigate = useNavigate();
  return (
    <>
      <KitchenPageHeader eyebrow="Kitchen · Recipes" title="New recipe" />
      <CatalogueGate currency={viewer.currency}>
        {(catalogue) => (
          <RecipeEditor
            catalogue={catalogue}
            seesCosts={viewer.seesCosts}
            actions={back}
            onSaved={(saved) => navigate(paths.recipe.getHref(saved.id), { replace: true })}
            onDeleted={() => navigate(paths.recipes.getHref())}
          />
        )}
      </CatalogueGate>
    </>
  );
}

function ExistingRecipe({ id, viewer }: { id: string; viewer: KitchenViewer }) {
  const navigate = useNavigate();
  const recipe = useRecipe(id);
  if (recipe.isPending) return <BlockSkeleton label="Loading the recipe…" />;
  if (recipe.isError) {
    return (
      <>
        <KitchenPageHeader eyebrow="Kitchen · Recipes" title="Recipe" actions={back} />
        <LoadError
          title="This recipe could not be loaded"
          error={recipe.error}
          onRetry={() => void recipe.refetch()}
          retrying={recipe.isFetching}
        />
      </>
    );
  }
  const data = recipe.data;
  const scale = (
    <Button asChild variant="outline">
      <RouterLink to={paths.recipeScale.getHref(data.id)}>
        <ScaleIcon /> Scale
      </RouterLink>
    </Button>
  );
  return (
    <>
      <KitchenPageHeader
        eyebrow="Kitchen · Recipes"
        title={data.name}
        actions={
          viewer.canEdit ? (
            scale
          ) : (
            <>
              <Badge variant="outline" size="lg">
                Read-only
              </Badge>
              {scale}
              {back}
            </>
          )
        }
      />
      <CatalogueGate currency={viewer.currency}>
        {(catalogue) =>
          viewer.canEdit ? (
            <RecipeEditor
              key={data.id}
              recipe={data}
              catalogue={catalogue}
              seesCosts={viewer.seesCosts}
              actions={back}
              onSaved={() => undefined}
              onDeleted={() => navigate(paths.recipes.getHref(), { replace: true })}
            />
          ) : (
            <RecipeDetail recipe={data} catalogue={catalogue} seesCosts={viewer.seesCosts} />
          )
        }
      </CatalogueGate>
    </>
  );
}
