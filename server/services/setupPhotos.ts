import { MAX_PHOTOS_PER_SETUP, type Photo as PhotoDto } from '../../shared/types/setups';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { User } from '../models/User';
import { deletePhoto, photoUrls, storeUploadedPhoto, type PhotoDeps, type UploadedPhotoFile } from './photos';
import { assertNewAccountMayPost } from './moderation/limits';
import { findOwnSetup } from './setupAccess';

/** Photos attached to a setup, in their order; hidden photos are left out. */
export async function listSetupPhotos(db: Database, setupId: number): Promise<PhotoDto[]> {
  const { rows } = await db.pool.query<{ id: number; storage_key: string; thumb_key: string; width: number; height: number; caption: string }>(
    `SELECT p.id, p.storage_key, p.thumb_key, p.width, p.height, p.caption
       FROM setup_photos sp JOIN photos p ON p.id = sp.photo_id
      WHERE sp.setup_id = $1 AND p.hidden_at IS NULL
      ORDER BY sp.position, p.id`,
    [setupId],
  );
  return rows.map((r) => ({
    id: r.id,
    ...photoUrls({ storageKey: r.storage_key, thumbKey: r.thumb_key }),
    width: r.width,
    height: r.height,
    caption: r.caption,
  }));
}

/** Stores an uploaded photo and attaches it to one of the racer's setups, last in order. */
export async function addSetupPhoto(deps: PhotoDeps, owner: User, setupId: number, file: UploadedPhotoFile, caption?: string): Promise<void> {
  await assertNewAccountMayPost(deps.db, owner, { kind: 'photo' });
  const setup = await findOwnSetup(deps.db, owner.id, setupId);
  const { rows } = await deps.db.pool.query<{ n: number; last: number }>(
    'SELECT count(*)::int AS n, COALESCE(max(position), -1)::int AS last FROM setup_photos WHERE setup_id = $1',
    [setup.id],
  );
  if (rows[0].n >= MAX_PHOTOS_PER_SETUP) {
    throw new ApiError(409, 'too_many_photos', `A setup holds at most ${MAX_PHOTOS_PER_SETUP} photos; remove one first.`);
  }
  const photo = await storeUploadedPhoto(deps, owner.id, file, { caption });
  try {
    await deps.db.pool.query('INSERT INTO setup_photos (setup_id, photo_id, position) VALUES ($1, $2, $3)', [setup.id, photo.id, rows[0].last + 1]);
  } catch (err) {
    await deletePhoto(deps, photo);
    throw err;
  }
}

/** Removes a photo from one of the racer's setups and deletes its files. */
export async function removeSetupPhoto(deps: PhotoDeps, owner: User, setupId: number, photoId: number): Promise<void> {
  const setup = await findOwnSetup(deps.db, owner.id, setupId);
  const linked = await deps.db.pool.query('SELECT 1 FROM setup_photos WHERE setup_id = $1 AND photo_id = $2', [setup.id, photoId]);
  const photo = linked.rowCount ? await deps.db.models.Photo.findByPk(photoId) : null;
  if (!photo) throw ApiError.notFound('That photo');
  await deletePhoto(deps, photo);
}
