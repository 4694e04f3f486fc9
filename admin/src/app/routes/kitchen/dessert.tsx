import { paths } from '../../../config/paths';
import { useDeleteDessertPhoto } from '../../../features/kitchen/api/delete-dessert-photo';
import { dessertQueryOptions, useDessert } from '../../../features/kitchen/api/get-dessert-detail';
import { dessertsQueryOptions } from '../../../features/kitchen/api/get-desserts';
import { ingredientsQueryOptions } from '../../../features/kitchen/api/get-ingredients';
import { recipesQueryOptions } from '../../../features/kitchen/api/get-recipes';
import type { DessertResponse } from '../../../features/kitchen/api/types';
import { useUploadDessertPhoto } from '../../../features/kitchen/api/upload-dessert-photo';
import { DessertDetail } from '../../../features/kitchen/components/dessert-detail';
import { DessertEditor } from '../../../features/kitchen/components/dessert-editor';
import { PhotoManager } from '../../../features/kitchen/components/photo-manager';
import { CatalogueGate } from './catalogue-gate';
import {
  CatalogueItemScreen,
  catalogueItemLoader,
  type CatalogueItemKind,
} from './catalogue-item-screen';

export const dessertLoader = catalogueItemLoader(dessertQueryOptions, () => [
  ingredientsQueryOptions(),
  recipesQueryOptions(),
  dessertsQueryOptions(),
]);

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

const dessert: CatalogueItemKind<DessertResponse> = {
  noun: 'dessert',
  plural: 'desserts',
  listHref: paths.desserts.getHref(),
  itemHref: (id) => paths.dessert.getHref(id),
  useItem: useDessert,
  editor: ({ item, viewer, ...props }) => (
    <CatalogueGate currency={viewer.currency}>
      {(catalogue) => (
        <DessertEditor
          dessert={item}
          catalogue={catalogue}
          seesCosts={viewer.seesCosts}
          photos={item && <DessertPhotos dessert={item} />}
          {...props}
        />
      )}
    </CatalogueGate>
  ),
  detail: (item, viewer) => (
    <CatalogueGate currency={viewer.currency}>
      {(catalogue) => <DessertDetail dessert={item} catalogue={catalogue} />}
    </CatalogueGate>
  ),
};

/** `/kitchen/desserts/new` (chef) and `/kitchen/desserts/:id` (chef edits, staff read). */
export function DessertRoute() {
  return <CatalogueItemScreen kind={dessert} />;
}
