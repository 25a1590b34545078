import { Router } from 'express';
import type { RouterDeps } from '../app';
import { declareRoutes } from '../middleware/access';
import { jsonRateLimit } from '../middleware/rateLimit';
import { takeModerationAction } from '../services/moderation/actions';
import { decideAppeal, fileAppeal, fileSuspensionAppeal, listActionsOnMe } from '../services/moderation/appeals';
import { listAuditLog } from '../services/moderation/auditLog';
import { listModerationQueue } from '../services/moderation/queue';

/** The review queue, moderators' actions, appeals and the audit log. */
export function moderationRouter(deps: RouterDeps): Router {
  const router = Router();
  const r = declareRoutes(router, deps.routes, '/');
  const { db } = deps;
  // A suspended racer appeals without a session: limited like sign-in, per address.
  const appealLimit = jsonRateLimit({ ...deps.config.authRateLimit, name: 'suspension-appeal' });
  router.use('/moderation', (_req, res, next) => {
    res.set('Cache-Control', 'private, no-store');
    next();
  });

  r.get('/moderation/queue', 'moderator', async (req, res) => {
    res.json(await listModerationQueue(db, req.user!, req.query));
  });
  r.post('/moderation/actions', 'moderator', async (req, res) => {
    res.json({ action: await takeModerationAction(db, req.user!, req.body) });
  });
  r.get('/moderation/audit', 'moderator', async (req, res) => {
    res.json(await listAuditLog(db, req.query));
  });
  r.get('/moderation/mine', 'signedIn', async (req, res) => {
    res.json({ actions: await listActionsOnMe(db, req.user!) });
  });
  r.post('/moderation/appeals/:id/decide', 'moderator', async (req, res) => {
    res.json({ appeal: await decideAppeal(db, req.user!, Number(req.params.id), req.body) });
  });

  r.post('/appeals', 'signedIn', async (req, res) => {
    res.status(201).json({ appeal: await fileAppeal(db, req.user!, req.body) });
  });
  r.post('/appeals/suspension', 'public', appealLimit, async (req, res) => {
    res.status(201).json({ appeal: await fileSuspensionAppeal(db, deps.config.sessionSecret, req.body) });
  });
  return router;
}
