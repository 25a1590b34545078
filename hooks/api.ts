import type { z } from '../shared/types/zod';
import { apiErrorBodySchema } from '../shared/types/errors';

/** A failed API call, carrying the server's stable code and field-level details. */
export class ApiRequestError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: string,
    message: string,
    public readonly details?: Record<string, unknown>,
  ) {
    super(message);
    this.name = 'ApiRequestError';
  }
}

/** Same-origin on web (the server serves the app); EXPO_PUBLIC_API_URL points elsewhere in dev. */
export const API_BASE = (process.env.EXPO_PUBLIC_API_URL ?? '').replace(/\/$/, '');

type RequestOptions<T> = {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  schema: z.ZodType<T>;
  signal?: AbortSignal;
};

async function readError(response: Response): Promise<ApiRequestError> {
  let payload: unknown = null;
  try {
    payload = await response.json();
  } catch {
    // Not JSON (a proxy page, say): fall through to a generic message.
  }
  const parsed = apiErrorBodySchema.safeParse(payload);
  if (parsed.success) {
    const { code, message, details } = parsed.data.error;
    return new ApiRequestError(response.status, code, message, details);
  }
  return new ApiRequestError(response.status, 'http_error', `The server answered ${response.status}.`);
}

/** The one way the client talks to the API: JSON in and out, cookies included, typed errors. */
export async function apiRequest<T>(path: string, options: RequestOptions<T>): Promise<T> {
  let response: Response;
  try {
    response = await fetch(`${API_BASE}/api${path}`, {
      method: options.method ?? 'GET',
      credentials: 'include',
      headers: options.body === undefined ? { Accept: 'application/json' } : { Accept: 'application/json', 'Content-Type': 'application/json' },
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (err) {
    if (err instanceof Error && err.name === 'AbortError') throw err;
    throw new ApiRequestError(0, 'network_error', 'Tunefork cannot reach its server. Check your connection and try again.');
  }
  if (!response.ok) throw await readError(response);
  return options.schema.parse(await response.json());
}
