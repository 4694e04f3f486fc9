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

/**
 * Asks for the file the browser will pick for `photo` drawn at `sizes`, ahead of the <img> that
 * shows it (the same srcset and sizes, so the same choice): a page's largest image then arrives
 * while its script is still running instead of after.
 */
export function preloadPhoto(photo: PhotoSource, sizes: string): void {
  const link = document.createElement('link');
  link.setAttribute('rel', 'preload');
  link.setAttribute('as', 'image');
  link.setAttribute('imagesrcset', photoSrcSet(photo));
  link.setAttribute('imagesizes', sizes);
  link.setAttribute('fetchpriority', 'high');
  document.head.append(link);
}
