import {
  applyDecorators,
  BadRequestException,
  type CallHandler,
  type ExecutionContext,
  Injectable,
  type NestInterceptor,
  PayloadTooLargeException,
  UnsupportedMediaTypeException,
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBody, ApiConsumes } from '@nestjs/swagger';
import type { Request } from 'express';
import multer from 'multer';
import { catchError, type Observable, throwError } from 'rxjs';

/** Largest photo upload: 5 MB. Larger is refused with 413 while the upload streams in. */
export const PHOTO_MAX_BYTES = 5 * 1024 * 1024;

/** The multipart field that carries the photo. */
export const PHOTO_FIELD = 'photo';

/**
 * Runs around multer: refuses a body that is not multipart/form-data (415), and words multer's
 * refusals for the chef (413 too large; 400 for other fields, several files or the wrong field).
 */
@Injectable()
class PhotoUploadErrors implements NestInterceptor {
  intercept(context: ExecutionContext, next: CallHandler): Observable<unknown> {
    const req = context.switchToHttp().getRequest<Request>();
    const hasBody =
      Number(req.headers['content-length'] ?? 0) > 0 ||
      req.headers['transfer-encoding'] !== undefined;
    if (hasBody && !req.is('multipart/form-data')) {
      throw new UnsupportedMediaTypeException(
        `Send the photo as multipart/form-data, in a field named “${PHOTO_FIELD}”.`,
      );
    }
    return next.handle().pipe(
      catchError((error: unknown) => {
        const cause = (error as { cause?: unknown }).cause;
        if (!(cause instanceof multer.MulterError)) return throwError(() => error);
        if (error instanceof PayloadTooLargeException) {
          return throwError(
            () =>
              new PayloadTooLargeException(
                `The photo is larger than ${PHOTO_MAX_BYTES / 1024 / 1024} MB; send a smaller one.`,
              ),
          );
        }
        return throwError(
          () =>
            new BadRequestException({
              statusCode: 400,
              message: [`Send one photo, in a field named “${PHOTO_FIELD}”, and nothing else.`],
              error: 'Bad Request',
            }),
        );
      }),
    );
  }
}

/**
 * One photo in the `photo` field of a multipart/form-data body, kept in memory (multer's memory
 * storage) and cut off at 5 MB by busboy as it arrives (multer's LIMIT_FILE_SIZE → 413). No other
 * fields or files are accepted.
 */
export const PhotoUpload = (): MethodDecorator =>
  applyDecorators(
    UseInterceptors(
      PhotoUploadErrors,
      FileInterceptor(PHOTO_FIELD, {
        storage: multer.memoryStorage(),
        limits: { fileSize: PHOTO_MAX_BYTES, files: 1, fields: 0, parts: 1 },
      }),
    ),
    ApiConsumes('multipart/form-data'),
    ApiBody({
      schema: {
        type: 'object',
        required: [PHOTO_FIELD],
        properties: { [PHOTO_FIELD]: { type: 'string', format: 'binary' } },
      },
    }),
  );
