import { Router } from 'express';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import { declareRoutes, type RouteTable } from '../middleware/access';
import { findPhotoByUrlId } from '../services/photos';
import type { BlobStorage } from '../storage';

/** What the photos router needs; the app's RouterDeps satisfies it once it carries `storage`. */
export type PhotosRouterDeps = { db: Database; routes: RouteTable; storage: BlobStorage };

/**
 * Tells browsers never to treat the bytes as anything but the declared image, and never to run
 * anything if a photo URL is opened as a page. Keys never change, so responses are immutable.
 */
const PHOTO_HEADERS = {
  'X-Content-Type-Options': 'nosniff',
  'Cache-Control': 'public, max-age=31536000, immutable',
  'Content-Disposition': 'inline',
  'Content-Security-Policy': "default-src 'none'; sandbox",
};

/** GET /api/photos/:key — a stored photo variant, by the random id in its URL. */
export function photosRouter(deps: PhotosRouterDeps): Router {
  const router = Router();
  const r = declareRoutes(router, deps.routes, '/photos');
  r.get('/:key', 'public', async (req, res) => {
    const found = await findPhotoByUrlId(deps.db, String(req.params.key));
    // Hidden by moderation answers exactly like unknown: nothing to learn from the difference.
    if (!found || found.photo.hiddenAt) throw ApiError.notFound('That photo');
    const blob = await deps.storage.get(found.key);
    if (!blob) throw ApiError.notFound('That photo');
    res.set(PHOTO_HEADERS).type(found.photo.contentType).send(blob.body);
  });
  return router;
}
