/**
 * A photo as stored on a dessert or a menu: the server names the files after `id`, in two WebP
 * sizes. Never taken from a request body.
 */
export interface StoredPhoto {
  id: string;
  /** Pixel size of the large variant. */
  width: number;
  height: number;
}

/** What the API shows of a photo. */
export interface PhotoResponse {
  id: string;
  url: string;
  thumbnailUrl: string;
  width: number;
  height: number;
}

/** Longest side of each stored variant, pixels. */
export const PHOTO_VARIANTS = { large: 1200, thumbnail: 400 } as const;

export const FILES_ROUTE = '/api/files';

export function photoFileName(id: string, variant: keyof typeof PHOTO_VARIANTS): string {
  return `${id}-${PHOTO_VARIANTS[variant]}.webp`;
}

/** Only names the server itself made: a UUID, a variant size, `.webp`. */
export const PHOTO_FILE_NAME = new RegExp(
  `^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}-(${Object.values(PHOTO_VARIANTS).join('|')})\\.webp$`,
);

export function toPhotoResponse(photo: StoredPhoto): PhotoResponse {
  return {
    id: photo.id,
    url: `${FILES_ROUTE}/${photoFileName(photo.id, 'large')}`,
    thumbnailUrl: `${FILES_ROUTE}/${photoFileName(photo.id, 'thumbnail')}`,
    width: photo.width,
    height: photo.height,
  };
}
