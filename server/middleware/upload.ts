import type { RequestHandler } from 'express';
import multer from 'multer';
import { AppError } from '@/server/errors';
import { PHOTO_LIMITS } from '@/server/services/photo-processing';
import { ERROR_CODES } from '@/shared/schemas/common';

/** multer 2 leaves every limit at Infinity unless set (PLATFORM.md), so all of them are explicit. */
export const UPLOAD_LIMITS = {
  fileSize: PHOTO_LIMITS.maxBytes,
  files: PHOTO_LIMITS.maxFiles,
  fields: 10,
  fieldSize: 10 * 1024,
  parts: 20,
} as const;

const megabytes = (bytes: number) => `${bytes / 1024 / 1024} MB`;

function mapPhotoUploadError(err: unknown, fieldName: string): unknown {
  if (!(err instanceof multer.MulterError)) {
    // busboy reports a cut-off or malformed body as a plain Error; anything else is not the client's fault.
    const message = err instanceof Error ? err.message : '';
    if (/unexpected end of form|malformed|boundary|multipart/i.test(message)) {
      return new AppError(
        400,
        ERROR_CODES.validation,
        'The upload was incomplete. Try sending it again.',
        {
          [fieldName]: 'The upload was incomplete.',
        },
      );
    }
    return err;
  }
  const invalid = (field: string, text: string) =>
    new AppError(400, ERROR_CODES.validation, text, { [field]: text });
  switch (err.code) {
    case 'LIMIT_FILE_SIZE':
      return new AppError(
        413,
        ERROR_CODES.tooLarge,
        `Each photo may be at most ${megabytes(UPLOAD_LIMITS.fileSize)}.`,
        { [fieldName]: `At most ${megabytes(UPLOAD_LIMITS.fileSize)} per photo.` },
      );
    case 'LIMIT_FILE_COUNT':
      return invalid(fieldName, `Send at most ${UPLOAD_LIMITS.files} photos at a time.`);
    case 'LIMIT_UNEXPECTED_FILE':
      // Also raised by .array() for a file beyond its maxCount, so the message covers both causes.
      return invalid(
        fieldName,
        `Send photos in the "${fieldName}" field, at most ${UPLOAD_LIMITS.files} at a time.`,
      );
    case 'LIMIT_FIELD_VALUE':
      return invalid(err.field ?? 'form', `At most ${UPLOAD_LIMITS.fieldSize / 1024} kB of text.`);
    default:
      return new AppError(
        400,
        ERROR_CODES.validation,
        'The upload form has too many or malformed parts.',
        {
          form: err.message,
        },
      );
  }
}

type MemoryUploadOptions = {
  /** Every multer limit, none left at Infinity. */
  limits: NonNullable<multer.Options['limits']>;
  /** Which file field(s) multer accepts, e.g. `(m) => m.single('pdf')`. */
  accept: (upload: multer.Multer) => RequestHandler;
  /** The 415 message for a body that is not multipart. */
  notMultipart: string;
  /** Turns a parse error into the answer the client sees. */
  mapError: (err: unknown) => unknown;
  /** The error for a form that carried no file. */
  noFile: () => AppError;
};

/**
 * Parses a multipart upload into memory (`req.file` or `req.files`, `req.body` for text fields):
 * what is kept is re-encoded or only hashed, so nothing from the upload touches the disk.
 */
export function memoryUpload(opts: MemoryUploadOptions): RequestHandler {
  const parse = opts.accept(multer({ storage: multer.memoryStorage(), limits: opts.limits }));
  return (req, res, next) => {
    // multer silently skips bodies that are not multipart; an upload route must say why nothing arrived.
    if (!req.is('multipart/form-data')) {
      next(new AppError(415, ERROR_CODES.unsupportedMedia, opts.notMultipart));
      return;
    }
    parse(req, res, (err?: unknown) => {
      if (err) {
        next(opts.mapError(err));
        return;
      }
      if (!req.file && !(Array.isArray(req.files) && req.files.length > 0)) {
        next(opts.noFile());
        return;
      }
      next();
    });
  };
}

/** Up to UPLOAD_LIMITS.files photos in `fieldName` (`req.files`). */
export const photoUpload = (fieldName = 'photos'): RequestHandler =>
  memoryUpload({
    limits: UPLOAD_LIMITS,
    accept: (upload) => upload.array(fieldName, UPLOAD_LIMITS.files),
    notMultipart: 'Send photos as multipart/form-data.',
    mapError: (err) => mapPhotoUploadError(err, fieldName),
    noFile: () =>
      new AppError(400, ERROR_CODES.validation, 'Choose at least one photo.', {
        [fieldName]: 'Choose at least one photo.',
      }),
  });
