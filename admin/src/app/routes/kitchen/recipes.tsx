import { Button } from '@chakra-ui/react';
import type { QueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { Link as RouterLink } from 'react-router';
import { BlockSkeleton } from '../../../components/ui/block-skeleton';
import { EmptyState } from '../../../components/ui/empty-state';
import { PlusIcon, WhiskIcon } from '../../../components/ui/icons';
import { LoadError } from '../../../components/ui/load-error';
import { paths } from '../../../config/paths';
import { recipesQueryOptions, useRecipes } from '../../../features/kitchen/api/get-recipes';
import { KitchenPageHeader } from '../../../features/kitchen/components/kitchen-page-header';
import { RecipesTable } from '../../../features/kitchen/components/recipes-table';
import { warm, WithKitchenViewer } from './kitchen-shell';

export const recipesLoader = (queryClient: QueryClient) => () => {
  warm(queryClient, recipesQueryOptions());
  return null;
};

export function RecipesRoute() {
  return (
    <WithKitchenViewer title="Recipes">
      {(viewer) => <Recipes canEdit={viewer.canEdit} />}
    </WithKitchenViewer>
  );
}

function Recipes({ canEdit }: { canEdit: boolean }) {
  const recipes = useRecipes();
  const hrefOf = useCallback((id: string) => paths.recipe.getHref(id), []);
  const newButton = canEdit && (
    <Button asChild>
      <RouterLink to={paths.newRecipe.getHref()}>
        <PlusIcon /> New recipe
      </RouterLink>
    </Button>
  );
  return (
    <>
      <KitchenPageHeader
        title="Recipes"
        description={
          canEdit
            ? 'Components and sub-preparations: lines, method, storage. Each shows its cost, allergens and, when frozen, its mix balance.'
            : 'Components and sub-preparations with their method and cautions. Read-only: the chef keeps these.'
        }
        actions={newButton}
      />
      {recipes.isPending ? (
        <BlockSkeleton label="Loading recipes…" />
      ) : recipes.isError ? (
        <LoadError
          title="The recipes could not be loaded"
          error={recipes.error}
          onRetry={() => void recipes.refetch()}
          retrying={recipes.isFetching}
        />
      ) : recipes.data.length === 0 ? (
        <EmptyState icon={<WhiskIcon />} title="No recipes yet" action={newButton || undefined}>
          {canEdit
            ? 'Write a component — a crumble, a custard base — from your ingredients, then use it in desserts.'
            : 'The chef has not written any recipes yet.'}
        </EmptyState>
      ) : (
        <RecipesTable recipes={recipes.data} hrefOf={hrefOf} />
      )}
    </>
  );
}
