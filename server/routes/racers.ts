import { Router } from 'express';
import type { RouterDeps } from '../app';
import { ApiError } from '../errors';
import { declareRoutes } from '../middleware/access';
import { findByHandle } from '../services/accounts';
import { publicRacerFor } from '../services/moderation/visibility';

export function racersRouter(deps: RouterDeps): Router {
  const router = Router();
  const r = declareRoutes(router, deps.routes, '/racers');
  r.get('/:handle', 'public', async (req, res) => {
    const user = await findByHandle(deps.db, String(req.params.handle));
    if (!user) throw ApiError.notFound('That racer');
    // A profile hidden by moderators keeps its name but withholds its bio from others.
    res.set('Cache-Control', 'private, no-cache').json({ racer: await publicRacerFor(deps.db, user, req.user) });
  });
  return router;
}
