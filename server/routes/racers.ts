import { Router } from 'express';
import type { RouterDeps } from '../app';
import { ApiError } from '../errors';
import { declareRoutes } from '../middleware/access';
import { toPublicRacer } from '../services/accountDto';
import { findByHandle } from '../services/accounts';

export function racersRouter(deps: RouterDeps): Router {
  const router = Router();
  const r = declareRoutes(router, deps.routes, '/racers');
  r.get('/:handle', 'public', async (req, res) => {
    const user = await findByHandle(deps.db, String(req.params.handle));
    if (!user) throw ApiError.notFound('That racer');
    res.json({ racer: toPublicRacer(user) });
  });
  return router;
}
