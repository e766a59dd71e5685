import type { ErrorRequestHandler, RequestHandler } from 'express';
import { classifyDbError } from '../../db/db-errors';
import { errorCodes, type ErrorEnvelope } from '../../shared/api/errors';
import { ApiError } from './api-error';

/** Seconds a client should wait before retrying while the database is away or busy. */
export const DB_RETRY_AFTER_SECONDS = 2;

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new ApiError(404, errorCodes.notFound, `No API route for ${req.method} ${req.path}`));
};

/** The one place that turns errors into the envelope. Stack traces only in development. */
export function errorHandler(options: { exposeStack: boolean }): ErrorRequestHandler {
  return (err, _req, res, next) => {
    if (res.headersSent) return next(err);
    const dbKind = err instanceof ApiError ? null : classifyDbError(err);
    let status = 500;
    let body: ErrorEnvelope = { error: { code: errorCodes.internal, message: 'Something went wrong on the server' } };
    if (err instanceof ApiError) {
      status = err.status;
      body = { error: { code: err.code, message: err.message, ...(err.details === undefined ? {} : { details: err.details }) } };
    } else if (dbKind) {
      status = 503;
      const message = dbKind === 'busy' ? 'The database is busy; try again in a moment' : 'The database is not reachable right now; try again in a moment';
      body = { error: { code: errorCodes.dbUnavailable, message } };
    } else if (isBodyParserError(err)) {
      status = err.status;
      body = { error: { code: errorCodes.badRequest, message: `Request body could not be read: ${err.message}` } };
    } else {
      console.error(err);
      if (options.exposeStack && err instanceof Error) body.error.details = { stack: err.stack };
    }
    if (body.error.code === errorCodes.dbUnavailable) res.set('Retry-After', String(DB_RETRY_AFTER_SECONDS));
    res.status(status).json(body);
  };
}

function isBodyParserError(err: unknown): err is { status: number; message: string; type: string } {
  return typeof err === 'object' && err !== null && 'type' in err && 'status' in err && typeof (err as { status: unknown }).status === 'number';
}
