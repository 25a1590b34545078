import { Router, type Request, type RequestHandler } from 'express';
import type { RouterDeps } from '../app';
import { declareRoutes } from '../middleware/access';
import { jsonRateLimit } from '../middleware/rateLimit';
import { createComment, deleteComment, editComment, listComments } from '../services/comments';

const shareToken = (req: Request) => (typeof req.query.share === 'string' ? req.query.share : undefined);

/**
 * Posting limit per racer account, not per address: racers at one track share an address, and one
 * account must not flood a thread from many. Runs after the sign-in check, so `req.user` is set.
 */
function perRacerLimit(name: string, options: { max: number; windowMs: number }): RequestHandler {
  return jsonRateLimit({
    ...options,
    name,
    keyGenerator: (req) => `racer:${req.user!.id}`,
    message: (seconds) => `You are posting comments too fast. Try again in ${seconds} s.`,
  });
}

export function commentsRouter(deps: RouterDeps): Router {
  const router = Router();
  const r = declareRoutes(router, deps.routes, '/');
  const { db } = deps;
  const { burst, sustained } = deps.config.commentRateLimit;
  const postingLimits = [perRacerLimit('comments-burst', burst), perRacerLimit('comments-sustained', sustained)];

  r.get('/setups/:id/comments', 'public', async (req, res) => {
    const comments = await listComments(db, Number(req.params.id), req.user, shareToken(req));
    res.set('Cache-Control', 'private, no-cache').json({ comments });
  });

  r.post('/setups/:id/comments', 'signedIn', ...postingLimits, async (req, res) => {
    res.status(201).json({ comment: await createComment(db, req.user!, Number(req.params.id), req.body) });
  });

  r.patch('/comments/:id', 'signedIn', async (req, res) => {
    res.json({ comment: await editComment(db, req.user!, Number(req.params.id), req.body) });
  });

  r.delete('/comments/:id', 'signedIn', async (req, res) => {
    await deleteComment(db, req.user!, Number(req.params.id));
    res.status(204).end();
  });

  return router;
}
