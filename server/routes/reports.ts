import { Router } from 'express';
import { REPORTS_PER_HOUR } from '../../shared/types/moderation';
import type { RouterDeps } from '../app';
import { declareRoutes } from '../middleware/access';
import { jsonRateLimit } from '../middleware/rateLimit';
import { getMyLimits, inWords } from '../services/moderation/limits';
import { fileReport, listMyReports } from '../services/moderation/reports';

/** Reports by racers (POST /reports, GET /reports/mine) and new-account limits (GET /me/limits). */
export function reportsRouter(deps: RouterDeps): Router {
  const router = Router();
  const r = declareRoutes(router, deps.routes, '/');
  const { db } = deps;
  // Per racer account, not per address (racers at one track share an address). Runs after the sign-in check.
  const reportLimit = jsonRateLimit({
    windowMs: 3_600_000,
    max: REPORTS_PER_HOUR,
    name: 'reports',
    keyGenerator: (req) => `racer:${req.user!.id}`,
    message: (seconds) => `You can file ${REPORTS_PER_HOUR} reports an hour. You can file the next one ${inWords(seconds * 1000)}.`,
  });

  r.post('/reports', 'signedIn', reportLimit, async (req, res) => {
    res.status(201).json({ report: await fileReport(db, req.user!, req.body) });
  });

  r.get('/reports/mine', 'signedIn', async (req, res) => {
    res.set('Cache-Control', 'private, no-cache').json({ reports: await listMyReports(db, req.user!) });
  });

  r.get('/me/limits', 'signedIn', async (req, res) => {
    res.set('Cache-Control', 'private, no-cache').json(await getMyLimits(db, req.user!));
  });
  return router;
}
