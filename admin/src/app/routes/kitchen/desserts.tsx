import { Button } from '@chakra-ui/react';
import type { QueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { Link as RouterLink } from 'react-router';
import { BlockSkeleton } from '../../../components/ui/block-skeleton';
import { EmptyState } from '../../../components/ui/empty-state';
import { PlusIcon, SpoonIcon } from '../../../components/ui/icons';
import { LoadError } from '../../../components/ui/load-error';
import { paths } from '../../../config/paths';
import { dessertsQueryOptions, useDesserts } from '../../../features/kitchen/api/get-desserts';
import { DessertsTable } from '../../../features/kitchen/components/desserts-table';
import { KitchenPageHeader } from '../../../features/kitchen/components/kitchen-page-header';
import { warm, WithKitchenViewer } from './kitchen-shell';

export const dessertsLoader = (queryClient: QueryClient) => () => {
  warm(queryClient, dessertsQueryOptions());
  return null;
};

export function DessertsRoute() {
  return (
    <WithKitchenViewer title="Desserts">
      {(viewer) => <Desserts canEdit={viewer.canEdit} />}
    </WithKitchenViewer>
  );
}

function Desserts({ canEdit }: { canEdit: boolean }) {
  const desserts = useDesserts();
  const hrefOf = useCallback((id: string) => paths.dessert.getHref(id), []);
  const newButton = canEdit && (
    <Button asChild>
      <RouterLink to={paths.newDessert.getHref()}>
        <PlusIcon /> New dessert
      </RouterLink>
    </Button>
  );
  return (
    <>
      <KitchenPageHeader
        title="Desserts"
        description="Plated desserts: the components on each plate, plating notes and photos."
        actions={newButton}
      />
      {desserts.isPending ? (
        <BlockSkeleton label="Loading desserts…" />
      ) : desserts.isError ? (
        <LoadError
          title="The desserts could not be loaded"
          error={desserts.error}
          onRetry={() => void desserts.refetch()}
          retrying={desserts.isFetching}
        />
      ) : desserts.data.length === 0 ? (
        <EmptyState icon={<SpoonIcon />} title="No desserts yet" action={newButton || undefined}>
          {canEdit
            ? 'Put recipes on a plate — a portion of each — to cost it and declare its allergens.'
            : 'The chef has not composed any desserts yet.'}
        </EmptyState>
      ) : (
        <DessertsTable desserts={desserts.data} hrefOf={hrefOf} />
      )}
    </>
  );
}
