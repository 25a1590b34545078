import { Router } from 'express';
import type { RouterDeps } from '../app';
import { declareRoutes } from '../middleware/access';

/** The review queue, moderators' actions, appeals and the audit log. */
export function moderationRouter(deps: RouterDeps): Router {
  const router = Router();
  declareRoutes(router, deps.routes, '/');
  return router;
}
