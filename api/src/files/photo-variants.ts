import { randomUUID } from 'node:crypto';
import { mkdir, rename, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import sharp from 'sharp';
import { PHOTO_VARIANTS, photoFileName, type StoredPhoto } from './stored-photo.js';

/**
 * Largest picture we decode: 40 megapixels (a 7,300 × 5,500 photo; phone cameras of 2025 shoot
 * 12–50 MP). Anything larger is refused before its pixels are decoded, so a small file that
 * claims huge dimensions (a pixel bomb) cannot exhaust memory. sharp's own default is 268 MP.
 */
export const PHOTO_MAX_PIXELS = 40_000_000;

/** WebP quality of the stored variants. */
const WEBP_QUALITY = 82;

export class PixelLimitError extends Error {
  constructor(
    readonly width: number,
    readonly height: number,
  ) {
    super(
      `The photo is ${width} × ${height} pixels; the largest we accept is ${PHOTO_MAX_PIXELS / 1_000_000} megapixels. Send a smaller photo.`,
    );
    this.name = 'PixelLimitError';
  }
}

/** libvips could not decode the image (corrupt or truncated pixel data). */
export class ImageDecodeError extends Error {
  constructor(cause: unknown) {
    super('The photo could not be read: it may be damaged. Send a JPEG, PNG or WebP photo.', {
      cause,
    });
    this.name = 'ImageDecodeError';
  }
}

export interface DecodedHeader {
  format: string;
  width: number;
  height: number;
}

/** Reads only the header: what sharp thinks the image is, and its size. Refuses pixel bombs. */
export async function readImageHeader(input: Buffer): Promise<DecodedHeader> {
  const meta = await sharp(input, { limitInputPixels: PHOTO_MAX_PIXELS, failOn: 'warning' })
    .metadata()
    .catch((error: unknown) => {
      if (error instanceof Error && /pixel limit/i.test(error.message)) {
        throw new PixelLimitError(0, 0);
      }
      throw new ImageDecodeError(error);
    });
  const width = meta.width ?? 0;
  const height = meta.height ?? 0;
  if (width * height > PHOTO_MAX_PIXELS) throw new PixelLimitError(width, height);
  return { format: meta.format ?? 'unknown', width, height };
}

/**
 * Renders an image (an upload already checked, or an illustration made by the seed) to the stored
 * WebP variants under `dir`, with server-made names, and returns the photo record. Metadata is not
 * copied (sharp drops EXIF, XMP and ICC unless asked to keep them); EXIF orientation is applied
 * first. Files are written under a temporary name and renamed into place. Slow work: never call
 * this inside a database transaction.
 */
export async function renderPhotoVariants(input: Buffer, dir: string): Promise<StoredPhoto> {
  await mkdir(dir, { recursive: true });
  const id = randomUUID();
  const options = {
    limitInputPixels: PHOTO_MAX_PIXELS,
    failOn: 'warning',
    autoOrient: true,
  } as const;
  const written: string[] = [];
  try {
    let large: { width: number; height: number } | undefined;
    for (const variant of ['large', 'thumbnail'] as const) {
      const side = PHOTO_VARIANTS[variant];
      const { data, info } = await sharp(input, options)
        .resize({ width: side, height: side, fit: 'inside', withoutEnlargement: true })
        .webp({ quality: WEBP_QUALITY })
        .toBuffer({ resolveWithObject: true })
        .catch((error: unknown) => {
          throw new ImageDecodeError(error);
        });
      const target = join(dir, photoFileName(id, variant));
      const temporary = `${target}.${process.pid}.tmp`;
      await writeFile(temporary, data, { flag: 'wx' });
      written.push(temporary);
      await rename(temporary, target);
      written[written.length - 1] = target;
      if (variant === 'large') large = { width: info.width, height: info.height };
    }
    return { id, width: large!.width, height: large!.height };
  } catch (error) {
    await Promise.all(written.map((file) => rm(file, { force: true })));
    throw error;
  }
}

/** Removes a photo's stored files; missing files are not an error. */
export async function removePhotoVariants(photo: StoredPhoto, dir: string): Promise<void> {
  await Promise.all(
    (Object.keys(PHOTO_VARIANTS) as Array<keyof typeof PHOTO_VARIANTS>).map((variant) =>
      rm(join(dir, photoFileName(photo.id, variant)), { force: true }),
    ),
  );
}
