import { ERROR_CODES, type ErrorCode } from '../shared/errors.js';

/**
 * An expected failure a service reports to the user: the error handler answers `status` with
 * `{"error": {"code", "message", "fields"?}}`. Anything else thrown becomes a generic 500.
 */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode | string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = 'AppError';
  }

  static invalid(message: string, fields?: Record<string, string>): AppError {
    return new AppError(400, ERROR_CODES.invalid, message, fields);
  }
  static unauthenticated(message = 'Sign in to continue.'): AppError {
    return new AppError(401, ERROR_CODES.unauthenticated, message);
  }
  static forbidden(message = 'Your role in this workshop does not allow this.'): AppError {
    return new AppError(403, ERROR_CODES.forbidden, message);
  }
  static notFound(message = 'Not found.'): AppError {
    return new AppError(404, ERROR_CODES.notFound, message);
  }
}
