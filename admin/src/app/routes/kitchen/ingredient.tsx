import { Badge } from '@chakra-ui/react';
import { Role } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { paths } from '../../../config/paths';
import { RequireRole } from '../../../features/auth/components/require-role';
import {
  ingredientQueryOptions,
  useIngredient,
} from '../../../features/kitchen/api/get-ingredient-detail';
import { IngredientDetail } from '../../../features/kitchen/components/ingredient-detail';
import { IngredientEditor } from '../../../features/kitchen/components/ingredient-editor';
import { KitchenPageHeader } from '../../../features/kitchen/components/kitchen-page-header';
import { BlockSkeleton, LoadError } from '../../../features/kitchen/components/load-states';
import { BackLink, warm, WithKitchenViewer, type KitchenViewer } from './kitchen-shell';

export const ingredientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    if (params.id) warm(queryClient, ingredientQueryOptions(params.id));
    else warm(queryClient);
    return null;
  };

const back = <BackLink to={paths.ingredients.getHref()}>All ingredients</BackLink>;

/** `/kitchen/ingredients/new` (chef) and `/kitchen/ingredients/:id` (chef edits, staff read). */
export function IngredientRoute() {
  const { id } = useParams();
  return (
    <WithKitchenViewer title={id ? 'Ingredient' : 'New ingredient'}>
      {(viewer) =>
        id ? (
          <ExistingIngredient id={id} viewer={viewer} />
        ) : (
          <RequireRole user={viewer.user} roles={[Role.Chef]}>
            <NewIngredient currency={viewer.currency} />
          </RequireRole>
        )
      }
    </WithKitchenViewer>
  );
}

function NewIngredient({ currency }: { currency: string }) {
  const navigate = useNavigate();
  return (
    <>
      <KitchenPageHeader eyebrow="Kitchen · Ingredients" title="New ingredient" />
      <IngredientEditor
        currency={currency}
        backLink={back}
        onSaved={(saved) => navigate(paths.ingredient.getHref(saved.id), { replace: true })}
        onDeleted={() => navigate(paths.ingredients.getHref())}
      />
    </>
  );
}

function ExistingIngredient({ id, viewer }: { id: string; viewer: KitchenViewer }) {
  const navigate = useNavigate();
  const ingredient = useIngredient(id);
  if (ingredient.isPending) return <BlockSkeleton label="Loading the ingredient…" />;
  if (ingredient.isError) {
    return (
      <>
        <KitchenPageHeader eyebrow="Kitchen · Ingredients" title="Ingredient" actions={back} />
        <LoadError
          title="This ingredient could not be loaded"
          error={ingredient.error}
          onRetry={() => void ingredient.refetch()}
          retrying={ingredient.isFetching}
        />
      </>
    );
  }
  const data = ingredient.data;
  return (
    <>
      <KitchenPageHeader
        eyebrow="Kitchen · Ingredients"
        title={data.name}
        actions={
          viewer.canEdit ? undefined : (
            <>
              <Badge variant="outline" size="lg">
                Read-only
              </Badge>
              {back}
            </>
          )
        }
      />
      {viewer.canEdit ? (
        <IngredientEditor
          key={data.id}
          ingredient={data}
          currency={viewer.currency}
          backLink={back}
          onSaved={() => undefined}
          onDeleted={() => navigate(paths.ingredients.getHref(), { replace: true })}
        />
      ) : (
        <IngredientDetail ingredient={data} />
      )}
    </>
  );
}
