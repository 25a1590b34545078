import type { ErrorRequestHandler, RequestHandler } from 'express';
import { UniqueConstraintError } from 'sequelize';
import { ZodError } from 'zod';
import { ERROR_CODES, type ApiErrorBody } from '../../shared/types/errors';
import { ApiError } from '../errors';
import type { Logger } from '../logger';

function body(code: string, message: string, details?: Record<string, unknown>): ApiErrorBody {
  return { error: details ? { code, message, details } : { code, message } };
}

/** Maps what body-parser throws (it sets `type` and `status`) to our codes. */
function fromBodyParser(err: { type?: string; status?: number }): ApiError | null {
  if (err.type === 'entity.parse.failed') {
    return new ApiError(400, ERROR_CODES.malformedJson, 'The request body is not valid JSON.');
  }
  if (err.type === 'entity.too.large') {
    return new ApiError(413, ERROR_CODES.payloadTooLarge, 'The request body is too large.');
  }
  if (typeof err.status === 'number' && err.status >= 400 && err.status < 500 && err.type) {
    return new ApiError(err.status, 'bad_request', 'The request could not be read.');
  }
  return null;
}

function toApiError(err: unknown): ApiError | null {
  if (err instanceof ApiError) return err;
  if (err && typeof err === 'object' && (err as { code?: string }).code === 'EBADCSRFTOKEN') {
    return new ApiError(403, 'csrf_invalid', 'Your session token is missing or out of date. Reload the page and try again.');
  }
  if (err instanceof ZodError) {
    const details: Record<string, string> = {};
    for (const issue of err.issues) details[issue.path.join('.') || '_'] = issue.message;
    return ApiError.validation(details);
  }
  if (err instanceof UniqueConstraintError) {
    const fields = Object.keys(err.fields ?? {});
    return new ApiError(409, ERROR_CODES.conflict, 'That already exists.', fields.length ? { fields } : undefined);
  }
  if (err && typeof err === 'object') return fromBodyParser(err as { type?: string; status?: number });
  return null;
}

/** The only place an error becomes a response. Unknown errors are logged and answered generically. */
export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (err, req, res, next) => {
    if (res.headersSent) {
      next(err);
      return;
    }
    const apiError = toApiError(err);
    if (apiError) {
      res.status(apiError.status).json(body(apiError.code, apiError.message, apiError.details));
      return;
    }
    logger.error({ err, method: req.method, url: req.originalUrl }, 'unhandled error');
    res.status(500).json(body(ERROR_CODES.internal, 'Something went wrong on our side. Please try again.'));
  };
}

/** JSON 404 for any /api path no router claimed. */
export const apiNotFound: RequestHandler = (req, res) => {
  res
    .status(404)
    .json(body(ERROR_CODES.notFound, `No API route matches ${req.method} ${req.originalUrl.split('?')[0]}.`));
};
