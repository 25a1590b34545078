import { Router } from 'express';
import type { RouterDeps } from '../app';
import { declareRoutes } from '../middleware/access';
import { createCar, deleteCar, getGarage, updateCar } from '../services/garage';

export function garageRouter(deps: RouterDeps): Router {
  const router = Router();
  const r = declareRoutes(router, deps.routes, '/');
  r.get('/garage', 'signedIn', async (req, res) => {
    res.json(await getGarage(deps.db, req.user!.id));
  });
  r.post('/cars', 'signedIn', async (req, res) => {
    res.status(201).json({ car: await createCar(deps.db, req.user!.id, req.body) });
  });
  r.patch('/cars/:id', 'signedIn', async (req, res) => {
    res.json({ car: await updateCar(deps.db, req.user!.id, Number(req.params.id), req.body) });
  });
  r.delete('/cars/:id', 'signedIn', async (req, res) => {
    await deleteCar(deps.db, req.user!.id, Number(req.params.id));
    res.status(204).end();
  });
  return router;
}
