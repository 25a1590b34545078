import { Router } from 'express';
import { roleChangeRequestSchema, suspendRequestSchema } from '../../shared/types/auth';
import type { RouterDeps } from '../app';
import { declareRoutes } from '../middleware/access';
import { changeRole, listUsers, suspendUser, unsuspendUser } from '../services/admin';
import { createKit, updateKitStock } from '../services/kitAdmin';

export function adminRouter(deps: RouterDeps): Router {
  const router = Router();
  const r = declareRoutes(router, deps.routes, '/admin');

  r.get('/users', 'admin', async (req, res) => {
    res.json({ users: await listUsers(deps.db, typeof req.query.query === 'string' ? req.query.query : '') });
  });

  r.patch('/users/:id/role', 'admin', async (req, res) => {
    const { role } = roleChangeRequestSchema.parse(req.body);
    res.json({ user: await changeRole(deps.db, req.user!, Number(req.params.id), role) });
  });

  r.post('/users/:id/suspend', 'admin', async (req, res) => {
    const { until, reason } = suspendRequestSchema.parse(req.body);
    res.json({ user: await suspendUser(deps.db, req.user!, Number(req.params.id), until ? new Date(until) : null, reason) });
  });

  r.post('/users/:id/unsuspend', 'admin', async (req, res) => {
    res.json({ user: await unsuspendUser(deps.db, req.user!, Number(req.params.id)) });
  });
  r.post('/kits', 'admin', async (req, res) => {
    res.status(201).json({ kit: await createKit(deps.db, req.body) });
  });

  r.put('/kits/:id/stock', 'admin', async (req, res) => {
    res.json({ stock: await updateKitStock(deps.db, Number(req.params.id), req.body) });
  });
  return router;
}
