import multer from 'multer';
import type { RequestHandler } from 'express';
import { AppError } from '../errors';

export const CSV_MAX_BYTES = 2 * 1024 * 1024;

/** One CSV file in the multipart field `file`, kept in memory, at most 2 MB. */
export function csvUpload(): RequestHandler {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: CSV_MAX_BYTES, files: 1 },
  }).single('file');
  return (req, res, next) => {
    upload(req, res, (err: unknown) => {
      if (err instanceof multer.MulterError) {
        const message =
          err.code === 'LIMIT_FILE_SIZE'
            ? `The file is larger than ${CSV_MAX_BYTES / 1024 / 1024} MB`
            : `Upload refused: ${err.message}`;
        return next(
          new AppError(err.code === 'LIMIT_FILE_SIZE' ? 413 : 400, 'invalid_upload', message, {
            file: message,
          }),
        );
      }
      if (err) return next(err);
      if (!req.file)
        return next(
          new AppError(400, 'invalid_upload', 'Choose a CSV file', { file: 'Choose a CSV file' }),
        );
      next();
    });
  };
}
