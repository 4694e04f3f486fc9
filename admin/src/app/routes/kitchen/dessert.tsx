import { Badge } from '@chakra-ui/react';
import { Role } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { paths } from '../../../config/paths';
import { RequireRole } from '../../../features/auth/components/require-role';
import { useDeleteDessertPhoto } from '../../../features/kitchen/api/delete-dessert-photo';
import { dessertQueryOptions, useDessert } from '../../../features/kitchen/api/get-dessert-detail';
import { dessertsQueryOptions } from '../../../features/kitchen/api/get-desserts';
import { ingredientsQueryOptions } from '../../../features/kitchen/api/get-ingredients';
import { recipesQueryOptions } from '../../../features/kitchen/api/get-recipes';
import type { DessertResponse } from '../../../features/kitchen/api/types';
import { useUploadDessertPhoto } from '../../../features/kitchen/api/upload-dessert-photo';
import { DessertDetail } from '../../../features/kitchen/components/dessert-detail';
import { DessertEditor } from '../../../features/kitchen/components/dessert-editor';
import { KitchenPageHeader } from '../../../features/kitchen/components/kitchen-page-header';
import { BlockSkeleton, LoadError } from '../../../features/kitchen/components/load-states';
import { PhotoManager } from '../../../features/kitchen/components/photo-manager';
import { CatalogueGate } from './catalogue-gate';
import { BackLink, warm, WithKitchenViewer, type KitchenViewer } from './kitchen-shell';

export const dessertLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    warm(
      queryClient,
      ingredientsQueryOptions(),
      recipesQueryOptions(),
      dessertsQueryOptions(),
      ...(params.id ? [dessertQueryOptions(params.id)] : []),
    );
    return null;
  };

const back = <BackLink to={paths.desserts.getHref()}>All desserts</BackLink>;

/** `/kitchen/desserts/new` (chef) and `/kitchen/desserts/:id` (chef edits, staff read). */
export function DessertRoute() {
  const { id } = useParams();
  return (
    <WithKitchenViewer title={id ? 'Dessert' : 'New dessert'}>
      {(viewer) =>
        id ? (
          <ExistingDessert id={id} viewer={viewer} />
        ) : (
          <RequireRole user={viewer.user} roles={[Role.Chef]}>
            <NewDessert viewer={viewer} />
          </RequireRole>
        )
      }
    </WithKitchenViewer>
  );
}

function NewDessert({ viewer }: { viewer: KitchenViewer }) {
  const navigate = useNavigate();
  return (
    <>
      <KitchenPageHeader eyebrow="Kitchen · Desserts" title="New dessert" />
      <CatalogueGate currency={viewer.currency}>
        {(catalogue) => (
          <DessertEditor
            catalogue={catalogue}
            seesCosts={viewer.seesCosts}
            actions={back}
            onSaved={(saved) => navigate(paths.dessert.getHref(saved.id), { replace: true })}
            onDeleted={() => navigate(paths.desserts.getHref())}
          />
        )}
      </CatalogueGate>
    </>
  );
}

function DessertPhotos({ dessert }: { dessert: DessertResponse }) {
  const upload = useUploadDessertPhoto();
  const remove = useDeleteDessertPhoto();
  return (
    <PhotoManager
      photos={dessert.photos}
      subject={dessert.name}
      onUpload={(file, onProgress) => upload.mutateAsync({ id: dessert.id, file, onProgress })}
      onDelete={(photoId) => remove.mutateAsync({ id: dessert.id, photoId })}
    />
  );
}

function ExistingDessert({ id, viewer }: { id: string; viewer: KitchenViewer }) {
  const navigate = useNavigate();
  const dessert = useDessert(id);
  if (dessert.isPending) return <BlockSkeleton label="Loading the dessert…" />;
  if (dessert.isError) {
    return (
      <>
        <KitchenPageHeader eyebrow="Kitchen · Desserts" title="Dessert" actions={back} />
        <LoadError
          title="This dessert could not be loaded"
          error={dessert.error}
          onRetry={() => void dessert.refetch()}
          retrying={dessert.isFetching}
        />
      </>
    );
  }
  const data = dessert.data;
  return (
    <>
      <KitchenPageHeader
        eyebrow="Kitchen · Desserts"
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
      <CatalogueGate currency={viewer.currency}>
        {(catalogue) =>
          viewer.canEdit ? (
            <DessertEditor
              key={data.id}
              dessert={data}
              catalogue={catalogue}
              seesCosts={viewer.seesCosts}
              actions={back}
              photos={<DessertPhotos dessert={data} />}
              onSaved={() => undefined}
              onDeleted={() => navigate(paths.desserts.getHref(), { replace: true })}
            />
          ) : (
            <DessertDetail dessert={data} catalogue={catalogue} />
          )
        }
      </CatalogueGate>
    </>
  );
}
