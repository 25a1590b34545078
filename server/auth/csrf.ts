import { csrfSync } from 'csrf-sync';
import type { Request } from 'express';

/**
 * Synchroniser-token CSRF protection: the token lives in the session and every state-changing
 * request must echo it in the X-CSRF-Token header. GET, HEAD and OPTIONS are exempt.
 */
export const csrf = csrfSync({
  // One-click unsubscribe (RFC 8058): mail programs POST without a session; the signed token in
  // the body is the proof there, not a cookie.
  skipCsrfProtection: (req: Request) => req.method === 'POST' && req.path === '/unsubscribe',
  getTokenFromRequest: (req: Request) => {
    const header = req.headers['x-csrf-token'];
    return Array.isArray(header) ? header[0] : header;
  },
});

export const CSRF_HEADER = 'X-CSRF-Token';
