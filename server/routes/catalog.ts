import { Router } from 'express';
import type { RouterDeps } from '../app';
import { declareRoutes } from '../middleware/access';
import { getKitStock, listKitSetups, listKits, listTracks } from '../services/catalog';

export function catalogRouter(deps: RouterDeps): Router {
  const router = Router();
  const r = declareRoutes(router, deps.routes, '/');
  r.get('/kits', 'public', async (_req, res) => {
    res.json({ kits: await listKits(deps.db) });
  });
  r.get('/kits/:id/stock', 'public', async (req, res) => {
    res.json({ stock: await getKitStock(deps.db, Number(req.params.id)) });
  });
  r.get('/kits/:id/setups', 'public', async (req, res) => {
    res.json(await listKitSetups(deps.db, Number(req.params.id)));
  });
  r.get('/tracks', 'public', async (_req, res) => {
    res.json({ tracks: await listTracks(deps.db) });
  });
  return router;
}
