/** A photo as the API serves it: a large and a thumbnail WebP, with the large one's pixel size. */
export interface PhotoSource {
  url: string;
  thumbnailUrl: string;
  width: number;
  height: number;
}

/** How wide a photo in the menus grid is drawn: a third, a half or all of the page. */
export const GRID_PHOTO_SIZES = '(min-width: 62em) 33vw, (min-width: 30em) 50vw, 100vw';

/** Both WebP files, for the browser to pick the one the drawn size and the screen need. */
export function photoSrcSet(photo: PhotoSource): string {
  return `${photo.thumbnailUrl} 400w, ${photo.url} ${photo.width}w`;
}
