import type { Photo } from '../../shared/types/setups';
import type { Database } from '../db/database';

/** Photos attached to a setup, in their order; hidden photos are left out. */
export async function listSetupPhotos(db: Database, setupId: number): Promise<Photo[]> {
  const { rows } = await db.pool.query<{ id: number; storage_key: string; thumb_key: string; width: number; height: number; caption: string }>(
    `SELECT p.id, p.storage_key, p.thumb_key, p.width, p.height, p.caption
       FROM setup_photos sp JOIN photos p ON p.id = sp.photo_id
      WHERE sp.setup_id = $1 AND p.hidden_at IS NULL
      ORDER BY sp.position, p.id`,
    [setupId],
  );
  return rows.map((r) => ({
    id: r.id,
    url: `/api/photos/${encodeURIComponent(r.storage_key)}`,
    thumbUrl: `/api/photos/${encodeURIComponent(r.thumb_key)}`,
    width: r.width,
    height: r.height,
    caption: r.caption,
  }));
}
