import { ERROR_CODES, type ErrorCode } from '../shared/types/errors';

/** The one error type services and routes throw; the error handler turns it into a response. */
export class ApiError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: ErrorCode | string,
    message: string,
    public readonly details?: Record<string, unknown>,
  ) {
    super(message);
    this.name = 'ApiError';
  }

  static notFound(what = 'That'): ApiError {
    return new ApiError(404, ERROR_CODES.notFound, `${what} was not found.`);
  }

  static validation(details: Record<string, string>, message = 'Some fields need fixing.'): ApiError {
    return new ApiError(400, ERROR_CODES.validation, message, details);
  }
}
