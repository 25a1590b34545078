import { Router } from 'express';
import type { RouterDeps } from '../app';
import { declareRoutes } from '../middleware/access';

/** Reports by racers (POST /reports, GET /reports/mine) and new-account limits (GET /me/limits). */
export function reportsRouter(deps: RouterDeps): Router {
  const router = Router();
  declareRoutes(router, deps.routes, '/');
  return router;
}
