import fs from 'node:fs';
import path from 'node:path';
import express, { Router } from 'express';

/**
 * Serves the exported web app: hashed bundles cached for a year, everything else revalidated,
 * and index.html for any non-API path so Expo Router handles deep links.
 */
export function webAppRouter(distDir: string): Router {
  const router = Router();
  const indexFile = path.join(distDir, 'index.html');

  router.use(
    express.static(distDir, {
      index: false,
      setHeaders(res, filePath) {
        const hashed = filePath.includes(`${path.sep}_expo${path.sep}`) || filePath.includes(`${path.sep}assets${path.sep}`);
        res.setHeader('Cache-Control', hashed ? 'public, max-age=31536000, immutable' : 'no-cache');
      },
    }),
  );

  router.get('/{*splat}', (_req, res) => {
    if (!fs.existsSync(indexFile)) {
      res
        .status(503)
        .type('text/plain')
        .send('The web app has not been built yet. Run `npm start` (it builds it) or `npm run build:web`.');
      return;
    }
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexFile);
  });
  return router;
}
