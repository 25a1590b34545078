import { Router } from 'express';
import type { AppDeps } from '../app';
import { checkHealth } from '../services/health';

export function healthRouter({ db, config }: AppDeps): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    res.set('Cache-Control', 'no-store').json(await checkHealth(db, config.version));
  });
  return router;
}
