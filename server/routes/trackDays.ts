import { Router } from 'express';
import type { RouterDeps } from '../app';
import { declareRoutes } from '../middleware/access';
import {
  createRun,
  createTrack,
  createTrackDay,
  deleteRun,
  deleteTrackDay,
  getRunPair,
  getTrackDay,
  listTrackDays,
  updateRun,
  updateTrackDay,
} from '../services/trackDays';

/** Tracks racers add, and their own track days with runs and laps: private to each racer. */
export function trackDaysRouter(deps: RouterDeps): Router {
  const router = Router();
  const r = declareRoutes(router, deps.routes, '/');
  const { db } = deps;

  r.post('/tracks', 'signedIn', async (req, res) => {
    res.status(201).json({ track: await createTrack(db, req.user!.id, req.body) });
  });

  r.get('/track-days', 'signedIn', async (req, res) => {
    const trackDays = await listTrackDays(db, req.user!.id, { carId: req.query.carId });
    res.set('Cache-Control', 'private, no-cache').json({ trackDays });
  });

  r.post('/track-days', 'signedIn', async (req, res) => {
    res.status(201).json({ trackDay: await createTrackDay(db, req.user!.id, req.body) });
  });

  r.get('/track-days/:id', 'signedIn', async (req, res) => {
    const trackDay = await getTrackDay(db, req.user!.id, Number(req.params.id));
    res.set('Cache-Control', 'private, no-cache').json({ trackDay });
  });

  r.patch('/track-days/:id', 'signedIn', async (req, res) => {
    res.json({ trackDay: await updateTrackDay(db, req.user!.id, Number(req.params.id), req.body) });
  });

  r.delete('/track-days/:id', 'signedIn', async (req, res) => {
    await deleteTrackDay(db, req.user!.id, Number(req.params.id));
    res.status(204).end();
  });

  r.post('/track-days/:id/runs', 'signedIn', async (req, res) => {
    res.status(201).json({ run: await createRun(db, req.user!.id, Number(req.params.id), req.body) });
  });

  r.get('/runs/compare', 'signedIn', async (req, res) => {
    res.set('Cache-Control', 'private, no-cache').json(await getRunPair(db, req.user!.id, req.query));
  });

  r.patch('/runs/:id', 'signedIn', async (req, res) => {
    res.json({ run: await updateRun(db, req.user!.id, Number(req.params.id), req.body) });
  });

  r.delete('/runs/:id', 'signedIn', async (req, res) => {
    await deleteRun(db, req.user!.id, Number(req.params.id));
    res.status(204).end();
  });

  return router;
}
