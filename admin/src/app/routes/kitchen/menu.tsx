import { paths } from '../../../config/paths';
import { useDeleteMenuPhoto } from '../../../features/kitchen/api/delete-menu-photo';
import { dessertsQueryOptions } from '../../../features/kitchen/api/get-desserts';
import { menuQueryOptions, useMenu } from '../../../features/kitchen/api/get-menu-detail';
import type { MenuResponse } from '../../../features/kitchen/api/types';
import { useUploadMenuPhoto } from '../../../features/kitchen/api/upload-menu-photo';
import { MenuDetail } from '../../../features/kitchen/components/menu-detail';
import { MenuEditor } from '../../../features/kitchen/components/menu-editor';
import { PhotoManager } from '../../../features/kitchen/components/photo-manager';
import { DessertsGate } from './catalogue-gate';
import {
  CatalogueItemScreen,
  catalogueItemLoader,
  type CatalogueItemKind,
} from './catalogue-item-screen';

export const menuLoader = catalogueItemLoader(menuQueryOptions, () => [dessertsQueryOptions()]);

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

const menu: CatalogueItemKind<MenuResponse> = {
  noun: 'menu',
  plural: 'menus',
  listHref: paths.menus.getHref(),
  itemHref: (id) => paths.menu.getHref(id),
  useItem: useMenu,
  editor: ({ item, viewer, ...props }) => (
    <DessertsGate>
      {(desserts) => (
        <MenuEditor
          menu={item}
          desserts={desserts}
          currency={viewer.currency}
          photos={item && <MenuPhotos menu={item} />}
          {...props}
        />
      )}
    </DessertsGate>
  ),
  detail: (item, viewer) => <MenuDetail menu={item} currency={viewer.currency} />,
};

/** `/kitchen/menus/new` (chef) and `/kitchen/menus/:id` (chef edits, staff read). */
export function MenuRoute() {
  return <CatalogueItemScreen kind={menu} />;
}
