import type { z } from '../shared/types/zod';
import { csrfResponseSchema } from '../shared/types/auth';
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

/** The absolute address of an API path, for the few flows that navigate instead of fetching. */
export function apiUrl(path: string): string {
  return `${API_BASE}/api${path}`;
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

type RequestOptions<T> = {
  method?: Method;
  body?: unknown;
  schema: z.ZodType<T>;
  signal?: AbortSignal;
};

export const CSRF_HEADER = 'X-CSRF-Token';
const CSRF_INVALID = 'csrf_invalid';

// Kept in memory only: the token is tied to the session cookie, so a reload simply fetches a new one.
let csrfToken: string | null = null;
let csrfInFlight: Promise<string> | null = null;

/**
 * Replaces the cached CSRF token. Sign-in and sign-up hand back a fresh one (the session is
 * regenerated); sign-out passes null so the next write asks for a token of the new session.
 */
export function rememberCsrfToken(token: string | null): void {
  csrfToken = token;
}

async function currentCsrfToken(): Promise<string> {
  if (csrfToken) return csrfToken;
  // Writes started together share one token request instead of racing for separate tokens.
  csrfInFlight ??= send('/auth/csrf', 'GET', undefined, undefined, null)
    .then((payload) => {
      // A token remembered from a sign-in meanwhile belongs to the newer session: keep it.
      csrfToken ??= csrfResponseSchema.parse(payload).csrfToken;
      return csrfToken;
    })
    .finally(() => {
      csrfInFlight = null;
    });
  return csrfInFlight;
}

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

/** One HTTP exchange: JSON in and out, cookies included; resolves the parsed body (undefined for 204). */
async function send(path: string, method: Method, body: unknown, signal: AbortSignal | undefined, csrf: string | null): Promise<unknown> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (body !== undefined) headers['Content-Type'] = 'application/json';
  if (csrf) headers[CSRF_HEADER] = csrf;
  let response: Response;
  try {
    response = await fetch(apiUrl(path), {
      method,
      credentials: 'include',
      headers,
      body: body === undefined ? undefined : JSON.stringify(body),
      signal,
    });
  } catch (err) {
    if (err instanceof Error && err.name === 'AbortError') throw err;
    throw new ApiRequestError(0, 'network_error', 'Tunefork cannot reach its server. Check your connection and try again.');
  }
  if (!response.ok) throw await readError(response);
  if (response.status === 204) return undefined;
  return response.json();
}

async function sendWithCsrf(path: string, method: Method, body: unknown, signal?: AbortSignal): Promise<unknown> {
  try {
    return await send(path, method, body, signal, await currentCsrfToken());
  } catch (err) {
    // The session may have rotated under us (expired, signed in elsewhere): one fresh token, one retry.
    if (!(err instanceof ApiRequestError && err.status === 403 && err.code === CSRF_INVALID)) throw err;
    rememberCsrfToken(null);
    return send(path, method, body, signal, await currentCsrfToken());
  }
}

/** The one way the client talks to the API: reads go straight out, writes carry the CSRF token. */
export async function apiRequest<T>(path: string, options: RequestOptions<T>): Promise<T> {
  const method = options.method ?? 'GET';
  const payload =
    method === 'GET'
      ? await send(path, method, undefined, options.signal, null)
      : await sendWithCsrf(path, method, options.body, options.signal);
  return options.schema.parse(payload);
}

type MutateOptions = { method?: Exclude<Method, 'GET'>; body?: unknown; signal?: AbortSignal };

/** A JSON write (POST by default) whose answer is checked against `schema`. */
export function apiMutate<T>(path: string, options: MutateOptions & { schema: z.ZodType<T> }): Promise<T>;
/** A JSON write whose answer carries nothing the client needs (204, or a body it ignores). */
export function apiMutate(path: string, options?: MutateOptions): Promise<void>;
export async function apiMutate<T>(path: string, options: MutateOptions & { schema?: z.ZodType<T> } = {}): Promise<T | void> {
  const payload = await sendWithCsrf(path, options.method ?? 'POST', options.body, options.signal);
  return options.schema ? options.schema.parse(payload) : undefined;
}

/**
 * Uploads a multipart form with progress (fetch cannot report upload progress, XMLHttpRequest can).
 * Carries the CSRF token like every write and retries once on `csrf_invalid`.
 */
export async function apiUpload<T>(
  path: string,
  form: FormData,
  options: { schema: z.ZodType<T>; onProgress?: (fraction: number) => void; signal?: AbortSignal },
): Promise<T> {
  const attempt = (token: string) =>
    new Promise<unknown>((resolve, reject) => {
      const xhr = new XMLHttpRequest();
      xhr.open('POST', apiUrl(path));
      xhr.withCredentials = true;
      xhr.setRequestHeader(CSRF_HEADER, token);
      xhr.setRequestHeader('Accept', 'application/json');
      xhr.upload.onprogress = (e) => {
        if (e.lengthComputable) options.onProgress?.(e.loaded / e.total);
      };
      xhr.onerror = () => reject(new ApiRequestError(0, 'network_error', 'The upload could not reach the server. Check your connection and try again.'));
      xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));
      xhr.onload = () => {
        const response = new Response(xhr.responseText || null, { status: xhr.status, headers: { 'Content-Type': 'application/json' } });
        if (xhr.status >= 200 && xhr.status < 300) resolve(xhr.responseText ? JSON.parse(xhr.responseText) : undefined);
        else void readError(response).then(reject);
      };
      options.signal?.addEventListener('abort', () => xhr.abort());
      xhr.send(form);
    });
  try {
    return options.schema.parse(await attempt(await currentCsrfToken()));
  } catch (err) {
    if (!(err instanceof ApiRequestError && err.status === 403 && err.code === CSRF_INVALID)) throw err;
    rememberCsrfToken(null);
    return options.schema.parse(await attempt(await currentCsrfToken()));
  }
}
