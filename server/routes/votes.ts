import { Router, type Request } from 'express';
import type { RouterDeps } from '../app';
import { declareRoutes } from '../middleware/access';
import { discoverSetups } from '../services/discover';
import { searchSetups } from '../services/search';
import { castVote, getSetupVotes, withdrawVote } from '../services/votes';

const shareToken = (req: Request) => (typeof req.query.share === 'string' ? req.query.share : undefined);

/** Votes by track type, Discover and search. */
export function votesRouter(deps: RouterDeps): Router {
  const router = Router();
  const r = declareRoutes(router, deps.routes, '/');
  const { db } = deps;

  r.get('/setups/:id/votes', 'public', async (req, res) => {
    const votes = await getSetupVotes(db, Number(req.params.id), req.user, shareToken(req));
    res.set('Cache-Control', 'private, no-cache').json({ votes });
  });

  r.put('/setups/:id/votes/:trackType', 'signedIn', async (req, res) => {
    res.json({ votes: await castVote(db, req.user!, Number(req.params.id), String(req.params.trackType), req.body) });
  });

  r.delete('/setups/:id/votes/:trackType', 'signedIn', async (req, res) => {
    res.json({ votes: await withdrawVote(db, req.user!, Number(req.params.id), String(req.params.trackType)) });
  });

  r.get('/discover', 'public', async (req, res) => {
    res.set('Cache-Control', 'no-cache').json(await discoverSetups(db, req.query));
  });

  r.get('/search', 'public', async (req, res) => {
    res.set('Cache-Control', 'no-cache').json(await searchSetups(db, req.query));
  });

  return router;
}
