import type { ErrorRequestHandler, RequestHandler } from 'express';
import { NotFoundError, OptimisticLockError } from '@mikro-orm/core';
import { ZodError } from 'zod';
import { describeFields, ERROR_CODES, issuesToFields, type ErrorBody } from '../../shared/errors.js';
import { AppError } from '../errors.js';

export type Logger = Pick<Console, 'error' | 'warn' | 'info'>;

function body(code: string, message: string, fields?: Record<string, string>): ErrorBody {
  return fields ? { error: { code, message, fields } } : { error: { code, message } };
}

/** Errors thrown by body-parser (bad JSON, body too large) carry a status and `expose`. */
function isHttpError(err: unknown): err is { status: number; expose?: boolean; type?: string; message: string } {
  return typeof err === 'object' && err !== null && typeof (err as { status?: unknown }).status === 'number';
}

/**
 * The one error handler (STYLE.md "How errors reach the user"): ZodError → 400 with `fields`,
 * AppError → its status, MikroORM NotFoundError → 404, OptimisticLockError → 409, anything else → 500
 * with a generic message (the stack is logged, never sent).
 */
export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (err, req, res, next) => {
    if (res.headersSent) {
      next(err);
      return;
    }
    if (err instanceof ZodError) {
      const fields = issuesToFields(err.issues);
      res.status(400).json(body(ERROR_CODES.invalid, describeFields(fields), fields));
      return;
    }
    if (err instanceof AppError) {
      res.status(err.status).json(body(err.code, err.message, err.fields));
      return;
    }
    if (err instanceof NotFoundError) {
      res.status(404).json(body(ERROR_CODES.notFound, 'Not found.'));
      return;
    }
    if (err instanceof OptimisticLockError) {
      res
        .status(409)
        .json(body(ERROR_CODES.conflict, 'Someone else saved this since you loaded it. Reload their version or keep yours.'));
      return;
    }
    if (isHttpError(err) && err.status >= 400 && err.status < 500) {
      const message = err.type === 'entity.parse.failed' ? 'The request body is not valid JSON.' : err.expose ? err.message : 'Bad request.';
      res.status(err.status).json(body(err.status === 400 ? ERROR_CODES.invalid : 'bad_request', message));
      return;
    }
    logger.error(`[${req.method} ${req.originalUrl}]`, err instanceof Error ? (err.stack ?? err.message) : err);
    res.status(500).json(body(ERROR_CODES.internal, 'Something went wrong on the server. Please try again.'));
  };
}

/** Unknown routes under /api answer JSON, not the client's index.html. */
export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json(body(ERROR_CODES.notFound, `No API route ${req.method} ${req.baseUrl}${req.path}.`));
};
