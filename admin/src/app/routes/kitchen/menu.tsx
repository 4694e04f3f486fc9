import { Badge } from '@chakra-ui/react';
import { Role } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { paths } from '../../../config/paths';
import { RequireRole } from '../../../features/auth/components/require-role';
import { useDeleteMenuPhoto } from '../../../features/kitchen/api/delete-menu-photo';
import { dessertsQueryOptions, useDesserts } from '../../../features/kitchen/api/get-desserts';
import { menuQueryOptions, useMenu } from '../../../features/kitchen/api/get-menu-detail';
import type { MenuResponse } from '../../../features/kitchen/api/types';
import { useUploadMenuPhoto } from '../../../features/kitchen/api/upload-menu-photo';
import { KitchenPageHeader } from '../../../features/kitchen/components/kitchen-page-header';
import { BlockSkeleton, LoadError } from '../../../features/kitchen/components/load-states';
import { MenuDetail } from '../../../features/kitchen/components/menu-detail';
import { MenuEditor } from '../../../features/kitchen/components/menu-editor';
import { PhotoManager } from '../../../features/kitchen/components/photo-manager';
import { BackLink, warm, WithKitchenViewer, type KitchenViewer } from './kitchen-shell';

export const menuLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    warm(queryClient, dessertsQueryOptions(), ...(params.id ? [menuQueryOptions(params.id)] : []));
    return null;
  };

const back = <BackLink to={paths.menus.getHref()}>All menus</BackLink>;

/** `/kitchen/menus/new` (chef) and `/kitchen/menus/:id` (chef edits, staff read). */
export function MenuRoute() {
  const { id } = useParams();
  return (
    <WithKitchenViewer title={id ? 'Menu' : 'New menu'}>
      {(viewer) =>
        id ? (
          <ExistingMenu id={id} viewer={viewer} />
        ) : (
          <RequireRole user={viewer.user} roles={[Role.Chef]}>
            <NewMenu viewer={viewer} />
          </RequireRole>
        )
      }
    </WithKitchenViewer>
  );
}

function WithDesserts({
  children,
}: {
  children: (desserts: NonNullable<ReturnType<typeof useDesserts>['data']>) => React.ReactNode;
}) {
  const desserts = useDesserts();
  if (desserts.isError) {
    return (
      <LoadError
        title="The desserts could not be loaded"
        error={desserts.error}
        onRetry={() => void desserts.refetch()}
        retrying={desserts.isFetching}
      />
    );
  }
  if (desserts.isPending) return <BlockSkeleton label="Loading desserts…" />;
  return children(desserts.data);
}

function NewMenu({ viewer }: { viewer: KitchenViewer }) {
  const navigate = useNavigate();
  return (
    <>
      <KitchenPageHeader eyebrow="Kitchen · Menus" title="New menu" />
      <WithDesserts>
        {(desserts) => (
          <MenuEditor
            desserts={desserts}
            currency={viewer.currency}
            actions={back}
            onSaved={(saved) => navigate(paths.menu.getHref(saved.id), { replace: true })}
            onDeleted={() => navigate(paths.menus.getHref())}
          />
        )}
      </WithDesserts>
    </>
  );
}

function MenuPhotos({ menu }: { menu: MenuResponse }) {
  const upload = useUploadMenuPhoto();
  const remove = useDeleteMenuPhoto();
  return (
    <PhotoManager
      photos={menu.photos}
      subject={menu.name}
      onUpload={(file, onProgress) => upload.mutateAsync({ id: menu.id, file, onProgress })}
      onDelete={(photoId) => remove.mutateAsync({ id: menu.id, photoId })}
    />
  );
}

function ExistingMenu({ id, viewer }: { id: string; viewer: KitchenViewer }) {
  const navigate = useNavigate();
  const menu = useMenu(id);
  if (menu.isPending) return <BlockSkeleton label="Loading the menu…" />;
  if (menu.isError) {
    return (
      <>
        <KitchenPageHeader eyebrow="Kitchen · Menus" title="Menu" actions={back} />
        <LoadError
          title="This menu could not be loaded"
          error={menu.error}
          onRetry={() => void menu.refetch()}
          retrying={menu.isFetching}
        />
      </>
    );
  }
  const data = menu.data;
  return (
    <>
      <KitchenPageHeader
        eyebrow="Kitchen · Menus"
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
        <WithDesserts>
          {(desserts) => (
            <MenuEditor
              key={data.id}
              menu={data}
              desserts={desserts}
              currency={viewer.currency}
              actions={back}
              photos={<MenuPhotos menu={data} />}
              onSaved={() => undefined}
              onDeleted={() => navigate(paths.menus.getHref(), { replace: true })}
            />
          )}
        </WithDesserts>
      ) : (
        <MenuDetail menu={data} currency={viewer.currency} />
      )}
    </>
  );
}
