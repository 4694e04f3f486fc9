import type { PhotoSource } from '../../../components/ui/photo-source';
import type { PublicMenu } from '../api/types';

/** The photo a menu's card shows: the menu's own first photo, else its first dessert's. */
export function cardPhoto(menu: PublicMenu): PhotoSource | undefined {
  return menu.photos[0] ?? menu.desserts.find((d) => d.photos.length > 0)?.photos[0];
}
