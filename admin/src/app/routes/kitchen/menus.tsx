import { Button } from '@chakra-ui/react';
import type { QueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { Link as RouterLink } from 'react-router';
import { BlockSkeleton } from '../../../components/ui/block-skeleton';
import { EmptyState } from '../../../components/ui/empty-state';
import { InboxIcon, PlusIcon } from '../../../components/ui/icons';
import { LoadError } from '../../../components/ui/load-error';
import { paths } from '../../../config/paths';
import { menusQueryOptions, useMenus } from '../../../features/kitchen/api/get-menus';
import { KitchenPageHeader } from '../../../features/kitchen/components/kitchen-page-header';
import { MenusTable } from '../../../features/kitchen/components/menus-table';
import { warm, WithKitchenViewer } from './kitchen-shell';

export const menusLoader = (queryClient: QueryClient) => () => {
  warm(queryClient, menusQueryOptions());
  return null;
};

export function MenusRoute() {
  return (
    <WithKitchenViewer title="Menus">
      {(viewer) => <Menus canEdit={viewer.canEdit} currency={viewer.currency} />}
    </WithKitchenViewer>
  );
}

function Menus({ canEdit, currency }: { canEdit: boolean; currency: string }) {
  const menus = useMenus();
  const hrefOf = useCallback((id: string) => paths.menu.getHref(id), []);
  const newButton = canEdit && (
    <Button asChild>
      <RouterLink to={paths.newMenu.getHref()}>
        <PlusIcon /> New menu
      </RouterLink>
    </Button>
  );
  return (
    <>
      <KitchenPageHeader
        title="Menus"
        description="What clients book: desserts for every guest, a price per guest, guest limits and the notice production needs."
        actions={newButton}
      />
      {menus.isPending ? (
        <BlockSkeleton label="Loading menus…" />
      ) : menus.isError ? (
        <LoadError
          title="The menus could not be loaded"
          error={menus.error}
          onRetry={() => void menus.refetch()}
          retrying={menus.isFetching}
        />
      ) : menus.data.length === 0 ? (
        <EmptyState icon={<InboxIcon />} title="No menus yet" action={newButton || undefined}>
          {canEdit
            ? 'Put desserts together and price them per guest; active menus appear on the storefront.'
            : 'The chef has not published any menus yet.'}
        </EmptyState>
      ) : (
        <MenusTable menus={menus.data} currency={currency} hrefOf={hrefOf} />
      )}
    </>
  );
}
