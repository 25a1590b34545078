import { Router } from 'express';
import type { RouterDeps } from '../app';
import { declareRoutes } from '../middleware/access';
import { checkHealth } from '../services/health';

export function healthRouter(deps: RouterDeps): Router {
  const router = Router();
  const r = declareRoutes(router, deps.routes, '/health');
  r.get('/', 'public', async (_req, res) => {
    res.set('Cache-Control', 'no-store').json(await checkHealth(deps.db, deps.config.version, deps.config.nodeEnv !== 'production'));
  });
  return router;
}
