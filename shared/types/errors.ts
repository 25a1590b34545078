import { z } from './zod';

/**
 * The one error body every API failure uses: `{ "error": { code, message, details? } }`.
 * `details` carries field-level problems for validation errors (field path → message).
 */
export const apiErrorBodySchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    details: z.record(z.string(), z.unknown()).optional(),
  }),
});

export type ApiErrorBody = z.infer<typeof apiErrorBodySchema>;

/** Stable error codes the client may branch on. */
export const ERROR_CODES = {
  validation: 'validation_failed',
  malformedJson: 'malformed_json',
  payloadTooLarge: 'payload_too_large',
  notFound: 'not_found',
  conflict: 'conflict',
  /** The original setup has a newer revision than the one its changes were chosen from. */
  upstreamMoved: 'upstream_moved',
  forbidden: 'forbidden',
  unauthenticated: 'unauthenticated',
  rateLimited: 'rate_limited',
  databaseUnavailable: 'database_unavailable',
  internal: 'internal_error',
} as const;

export type ErrorCode = (typeof ERROR_CODES)[keyof typeof ERROR_CODES];
