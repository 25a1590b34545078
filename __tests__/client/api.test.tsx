import { apiMutate, apiRequest, ApiRequestError, rememberCsrfToken } from '../../hooks/api';
import { messageResponseSchema } from '../../shared/types/auth';
import { stubFetch } from './support/render';

const csrfInvalid = { status: 403, body: { error: { code: 'csrf_invalid', message: 'Reload and try again.' } } };
const ok = { status: 200, body: { message: 'Done.' } };

describe('API client CSRF handling', () => {
  beforeEach(() => rememberCsrfToken(null));

  it('reads without a token and without asking for one', async () => {
    const { calls } = stubFetch(() => ok);
    await apiRequest('/health-ish', { schema: messageResponseSchema });
    expect(calls).toHaveLength(1);
    expect(calls[0].headers['X-CSRF-Token']).toBeUndefined();
  });

  it('asks for a token on the first write only, then reuses it', async () => {
    let issued = 0;
    const { calls } = stubFetch(({ url }) => (url.endsWith('/api/auth/csrf') ? { status: 200, body: { csrfToken: `t${++issued}` } } : ok));
    await apiMutate('/auth/forgot-password', { body: { email: 'a@example.test' }, schema: messageResponseSchema });
    await apiMutate('/auth/forgot-password', { body: { email: 'b@example.test' }, schema: messageResponseSchema });
    expect(calls.map((c) => `${c.method} ${c.url}`)).toEqual([
      'GET /api/auth/csrf',
      'POST /api/auth/forgot-password',
      'POST /api/auth/forgot-password',
    ]);
    expect(calls[1].headers['X-CSRF-Token']).toBe('t1');
    expect(calls[2].headers['X-CSRF-Token']).toBe('t1');
  });

  it('shares one token request between writes that start together', async () => {
    const { calls } = stubFetch(({ url }) => (url.endsWith('/api/auth/csrf') ? { status: 200, body: { csrfToken: 'shared' } } : ok));
    await Promise.all([apiMutate('/me/a'), apiMutate('/me/b'), apiMutate('/me/c')]);
    expect(calls.filter((c) => c.url.endsWith('/api/auth/csrf'))).toHaveLength(1);
  });

  it('uses a token handed over by sign-in without asking the server', async () => {
    rememberCsrfToken('from-sign-in');
    const { calls } = stubFetch(() => ok);
    await apiMutate('/me/password', { body: { newPassword: 'x' }, schema: messageResponseSchema });
    expect(calls).toHaveLength(1);
    expect(calls[0].headers['X-CSRF-Token']).toBe('from-sign-in');
  });

  it('fetches a fresh token and retries once when the server rejects the token', async () => {
    rememberCsrfToken('stale');
    let posts = 0;
    const { calls } = stubFetch(({ url, method }) => {
      if (url.endsWith('/api/auth/csrf')) return { status: 200, body: { csrfToken: 'fresh' } };
      posts += 1;
      return method === 'POST' && posts === 1 ? csrfInvalid : ok;
    });
    await expect(apiMutate('/me/email', { body: { email: 'n@example.test' }, schema: messageResponseSchema })).resolves.toEqual({
      message: 'Done.',
    });
    expect(calls.map((c) => c.headers['X-CSRF-Token'] ?? 'none')).toEqual(['stale', 'none', 'fresh']);
  });

  it('gives up after one retry instead of looping', async () => {
    const { calls } = stubFetch(({ url }) => (url.endsWith('/api/auth/csrf') ? { status: 200, body: { csrfToken: 'never-good' } } : csrfInvalid));
    await expect(apiMutate('/me/email', { body: {} })).rejects.toMatchObject({ status: 403, code: 'csrf_invalid' });
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(2);
  });

  it('resolves a 204 answer to nothing', async () => {
    rememberCsrfToken('t');
    stubFetch(() => ({ status: 204 }));
    await expect(apiMutate('/auth/sign-out')).resolves.toBeUndefined();
  });

  it('turns an error body into a typed error with the server’s code and details', async () => {
    rememberCsrfToken('t');
    stubFetch(() => ({
      status: 409,
      body: { error: { code: 'last_sign_in_method', message: 'Set a password before unlinking.', details: { method: 'github' } } },
    }));
    const failure = await apiMutate('/me/github', { method: 'DELETE' }).catch((e: unknown) => e);
    expect(failure).toBeInstanceOf(ApiRequestError);
    expect(failure).toMatchObject({ status: 409, code: 'last_sign_in_method', message: 'Set a password before unlinking.' });
  });
});
