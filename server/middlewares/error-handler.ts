import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { UniqueConstraintError, ValidationError } from 'sequelize';
import { AppError } from '../errors';
import { logger } from '../logger';
import { fieldErrors } from './validate';
import { INPUT_RANGE_MESSAGE, isInputRangeError } from './input-range-error';
import { DATABASE_RETRY_AFTER_SECONDS, isDatabaseUnavailable } from './database-unavailable';

export const notFoundHandler: RequestHandler = (_req, _res, next) => {
  next(new AppError(404, 'not_found', 'No such route'));
};

// The one place errors become JSON: { error: { code, message, fields? } }.
export const errorHandler: ErrorRequestHandler = (err, req, res, next) => {
  // A stream (a download) failed after its headers went out: no JSON can follow. Express's own
  // handler then cuts the connection, so the client sees an incomplete file, not a complete one.
  if (res.headersSent) {
    logger.warn({ err, url: req.originalUrl }, 'response failed after its headers were sent');
    return next(err);
  }
  let status = 500;
  let body: { code: string; message: string; fields?: Record<string, string> } = {
    code: 'internal',
    message: 'Something went wrong on our side; nothing was saved. Try again.',
  };
  if (err instanceof AppError) {
    status = err.status;
    body = { code: err.code, message: err.message, fields: err.fields };
  } else if (err instanceof ZodError) {
    status = 400;
    const fields = fieldErrors(err);
    body = { code: 'invalid', message: Object.values(fields).join('; '), fields };
  } else if (err instanceof UniqueConstraintError) {
    status = 409;
    body = { code: 'conflict', message: 'A record with these values exists already' };
  } else if (err instanceof ValidationError) {
    status = 422;
    body = { code: 'invalid', message: err.message };
  } else if (isInputRangeError(err)) {
    // Safety net for input the schemas let through (they must refuse it first): a 400, logged.
    status = 400;
    body = { code: 'out_of_range', message: INPUT_RANGE_MESSAGE };
    logger.warn({ err, url: req.originalUrl }, 'input refused by the database');
  } else if (isDatabaseUnavailable(err)) {
    // Down, restarting or out of connections: not the caller's fault, so 503 and when to retry.
    status = 503;
    body = {
      code: 'unavailable',
      message:
        "Hourstone's database is not answering right now (it may be restarting). Try again in a few seconds.",
    };
    res.set('Retry-After', String(DATABASE_RETRY_AFTER_SECONDS));
    logger.warn({ err, url: req.originalUrl }, 'database unavailable');
  } else if (err?.type === 'entity.parse.failed') {
    status = 400;
    body = { code: 'bad_json', message: 'The request body is not valid JSON' };
  } else if (err?.type === 'entity.too.large') {
    status = 413;
    body = { code: 'too_large', message: 'The request body is too large' };
  } else if (isClientHttpError(err)) {
    // Express's own refusals (a file that is not there, a malformed path): the status they carry.
    status = err.status;
    body = {
      code: status === 404 ? 'not_found' : 'bad_request',
      message: status === 404 ? 'No such file or route' : 'The request was refused',
    };
  } else {
    logger.error({ err, url: req.originalUrl }, 'unhandled error');
  }
  if (body.fields === undefined) delete body.fields;
  res.status(status).json({ error: body });
};

/**
 * An http-errors style 4xx that Express or its static middleware raised (a missing file comes
 * wrapped around ENOENT, marked not to expose). Only the status is used, never their message.
 */
function isClientHttpError(err: unknown): err is { status: number } {
  const e = err as { status?: unknown } | null;
  return typeof e?.status === 'number' && e.status >= 400 && e.status < 500;
}
