import { stat } from 'node:fs/promises';
import { join } from 'node:path';
import {
  BadRequestException,
  Injectable,
  Logger,
  PayloadTooLargeException,
  UnsupportedMediaTypeException,
} from '@nestjs/common';
import { Env } from '../config/env.js';
import { checkUploadedImage, ImageRejectedError } from './image-check.js';
import {
  ImageDecodeError,
  PixelLimitError,
  readImageHeader,
  removePhotoVariants,
  renderPhotoVariants,
} from './photo-variants.js';
import { PHOTO_FILE_NAME, type StoredPhoto } from './stored-photo.js';
import { uploadsDirFor } from './uploads-dir.js';

/** Stores photos of desserts and menus under `<data folder>/uploads` and finds them again. */
@Injectable()
export class PhotoStorage {
  private readonly logger = new Logger(PhotoStorage.name);
  readonly dir: string;

  constructor(env: Env) {
    this.dir = uploadsDirFor(env.DATABASE_PATH);
  }

  /**
   * Checks an uploaded file (content, structure, name, pixel count) and stores it as WebP
   * variants. Throws 400 (no file), 413 (too many pixels) or 415 (not an accepted image).
   * Slow work: call it before opening a transaction.
   */
  async storeUpload(file: Express.Multer.File | undefined): Promise<StoredPhoto> {
    if (!file?.buffer) {
      throw new BadRequestException({
        statusCode: 400,
        message: ['Attach the photo as multipart/form-data in a field named “photo”.'],
        error: 'Bad Request',
      });
    }
    try {
      const format = checkUploadedImage(file.buffer, file.originalname);
      const header = await readImageHeader(file.buffer);
      if (header.format !== format) {
        throw new ImageRejectedError(
          415,
          'The photo could not be read as the image it claims to be.',
        );
      }
      return await renderPhotoVariants(file.buffer, this.dir);
    } catch (error) {
      if (error instanceof ImageRejectedError) {
        throw error.status === 413
          ? new PayloadTooLargeException(error.message)
          : new UnsupportedMediaTypeException(error.message);
      }
      if (error instanceof PixelLimitError) throw new PayloadTooLargeException(error.message);
      if (error instanceof ImageDecodeError) throw new UnsupportedMediaTypeException(error.message);
      throw error;
    }
  }

  /** Removes stored files, logging rather than failing: the rows are already gone. */
  async removeAll(photos: readonly StoredPhoto[]): Promise<void> {
    for (const photo of photos) {
      await removePhotoVariants(photo, this.dir).catch((error: unknown) =>
        this.logger.warn(`Could not remove photo ${photo.id}: ${String(error)}`),
      );
    }
  }

  /** The path and size of a stored file, or null when the name is not one of ours or is gone. */
  async find(name: string): Promise<{ path: string; size: number } | null> {
    if (!PHOTO_FILE_NAME.test(name)) return null;
    const path = join(this.dir, name);
    const info = await stat(path).catch(() => null);
    return info?.isFile() ? { path, size: info.size } : null;
  }
}
