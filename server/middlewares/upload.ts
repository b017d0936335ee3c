import multer from 'multer';
import type { RequestHandler } from 'express';
import { AppError } from '../errors';

export const CSV_MAX_BYTES = 2 * 1024 * 1024;

const mb = (bytes: number) => `${Math.round((bytes / 1024 / 1024) * 10) / 10} MB`;

/** One file in the multipart field `field`, kept in memory, refused above maxBytes (413, naming the field). */
export function fileUpload(field: string, maxBytes: number, what = 'a file'): RequestHandler {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: maxBytes, files: 1 },
  }).single(field);
  return (req, res, next) => {
    upload(req, res, (err: unknown) => {
      if (err instanceof multer.MulterError) {
        const tooLarge = err.code === 'LIMIT_FILE_SIZE';
        const message = tooLarge
          ? `The file is larger than ${mb(maxBytes)}`
          : `Upload refused: ${err.message}`;
        return next(
          new AppError(tooLarge ? 413 : 400, 'invalid_upload', message, { [field]: message }),
        );
      }
      if (err) return next(err);
      if (!req.file) {
        const message = `Choose ${what}`;
        return next(new AppError(400, 'invalid_upload', message, { [field]: message }));
      }
      next();
    });
  };
}

/** One CSV file in the field `file`, at most 2 MB. */
export const csvUpload = () => fileUpload('file', CSV_MAX_BYTES, 'a CSV file');
