import { Router } from 'express';
import { z } from 'zod';
import type { RouterDeps } from '../app';
import { declareRoutes } from '../middleware/access';
import { renderMarkdown } from '../services/markdown';

const previewSchema = z.object({ markdown: z.string().max(20_000, 'Notes are at most 20,000 characters.') });

/** Renders racer-written markdown exactly as the server will store and show it, for editor previews. */
export function markdownRouter(deps: RouterDeps): Router {
  const router = Router();
  const r = declareRoutes(router, deps.routes, '/markdown');
  r.post('/preview', 'signedIn', (req, res) => {
    res.json({ html: renderMarkdown(previewSchema.parse(req.body).markdown) });
  });
  return router;
}
