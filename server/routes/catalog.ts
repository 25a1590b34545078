import { Router } from 'express';
import type { AppDeps } from '../app';
import { listKits, listTracks } from '../services/catalog';

export function catalogRouter({ db }: AppDeps): Router {
  const router = Router();
  router.get('/kits', async (_req, res) => {
    res.json({ kits: await listKits(db) });
  });
  router.get('/tracks', async (_req, res) => {
    res.json({ tracks: await listTracks(db) });
  });
  return router;
}
