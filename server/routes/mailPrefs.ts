import { Router } from 'express';
import type { RouterDeps } from '../app';
import { declareRoutes } from '../middleware/access';
import { getEmailPreferences, updateEmailPreferences } from '../services/emailPreferences';
import { applyUnsubscribe, describeUnsubscribe } from '../services/unsubscribe';

/** E-mail preferences of the signed-in racer, and unsubscribe links that need no sign-in. */
export function mailPrefsRouter(deps: RouterDeps): Router {
  const router = Router();
  const r = declareRoutes(router, deps.routes, '/');
  const { pool } = deps.db;
  const secret = deps.config.notificationMail.unsubscribeSecret;

  r.get('/me/email-preferences', 'signedIn', async (req, res) => {
    res.set('Cache-Control', 'no-store').json({ preferences: await getEmailPreferences(pool, req.user!.id) });
  });

  r.put('/me/email-preferences', 'signedIn', async (req, res) => {
    res.json({ preferences: await updateEmailPreferences(pool, req.user!.id, req.body) });
  });

  // Reading what a link would stop changes nothing: mail scanners open links before people do.
  r.get('/unsubscribe', 'public', async (req, res) => {
    res.set('Cache-Control', 'no-store').json(await describeUnsubscribe(pool, secret, req.query.token));
  });

  // The token comes in the JSON body (the confirmation page) or in the address, as mail programs
  // send it for List-Unsubscribe-Post (RFC 8058: a form body "List-Unsubscribe=One-Click").
  r.post('/unsubscribe', 'public', async (req, res) => {
    const token = (req.body as { token?: unknown } | undefined)?.token ?? req.query.token;
    res.set('Cache-Control', 'no-store').json(await applyUnsubscribe(pool, secret, token));
  });

  return router;
}
