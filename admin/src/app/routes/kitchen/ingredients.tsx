import { Button } from '@chakra-ui/react';
import type { QueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { Link as RouterLink } from 'react-router';
import { BlockSkeleton } from '../../../components/ui/block-skeleton';
import { EmptyState } from '../../../components/ui/empty-state';
import { PlusIcon, WhiskIcon } from '../../../components/ui/icons';
import { LoadError } from '../../../components/ui/load-error';
import { paths } from '../../../config/paths';
import {
  ingredientsQueryOptions,
  useIngredients,
} from '../../../features/kitchen/api/get-ingredients';
import { IngredientsTable } from '../../../features/kitchen/components/ingredients-table';
import { KitchenPageHeader } from '../../../features/kitchen/components/kitchen-page-header';
import { warm, WithKitchenViewer } from './kitchen-shell';

export const ingredientsLoader = (queryClient: QueryClient) => () => {
  warm(queryClient, ingredientsQueryOptions());
  return null;
};

export function IngredientsRoute() {
  return (
    <WithKitchenViewer title="Ingredients">
      {(viewer) => <Ingredients canEdit={viewer.canEdit} currency={viewer.currency} />}
    </WithKitchenViewer>
  );
}

function Ingredients({ canEdit, currency }: { canEdit: boolean; currency: string }) {
  const ingredients = useIngredients();
  const hrefOf = useCallback((id: string) => paths.ingredient.getHref(id), []);
  const newButton = canEdit && (
    <Button asChild>
      <RouterLink to={paths.newIngredient.getHref()}>
        <PlusIcon /> New ingredient
      </RouterLink>
    </Button>
  );
  return (
    <>
      <KitchenPageHeader
        title="Ingredients"
        description={
          canEdit
            ? 'What the kitchen buys: packs and prices, allergens, diet and composition. Recipes cost and declare from these.'
            : 'What the kitchen buys, with its allergens and diet. Read-only: the chef keeps this list.'
        }
        actions={newButton}
      />
      {ingredients.isPending ? (
        <BlockSkeleton label="Loading ingredients…" />
      ) : ingredients.isError ? (
        <LoadError
          title="The ingredients could not be loaded"
          error={ingredients.error}
          onRetry={() => void ingredients.refetch()}
          retrying={ingredients.isFetching}
        />
      ) : ingredients.data.length === 0 ? (
        <EmptyState icon={<WhiskIcon />} title="No ingredients yet" action={newButton || undefined}>
          {canEdit
            ? 'Add what you buy — butter, cream, sugar — with its pack, price and allergens. Recipes are built from these.'
            : 'The chef has not added any ingredients yet.'}
        </EmptyState>
      ) : (
        <IngredientsTable
          ingredients={ingredients.data}
          currency={currency}
          withPrices={canEdit}
          hrefOf={hrefOf}
        />
      )}
    </>
  );
}
