import { QueryTypes } from 'sequelize';
import type { KitSummary, TrackSummary } from '../../shared/types/catalog';
import type { KitSetupList } from '../../shared/types/forks';
import type { KitStock } from '../../shared/types/setups';
import { ApiError } from '../errors';
import type { Database } from '../db/database';

/** Every kit with its maker's name, by maker then kit name. */
export async function listKits(db: Database): Promise<KitSummary[]> {
  const kits = await db.models.Kit.findAll({
    include: [{ model: db.models.Maker, as: 'maker', attributes: ['name'] }],
    order: [['maker', 'name', 'ASC'], ['name', 'ASC']],
  });
  return kits.map((k) => ({
    id: k.id,
    slug: k.slug,
    name: k.name,
    makerName: k.maker?.name ?? '',
    vehicleClass: k.vehicleClass,
    releasedYear: k.releasedYear,
  }));
}

/** Every track, by name. */
export async function listTracks(db: Database): Promise<TrackSummary[]> {
  const tracks = await db.models.Track.findAll({ order: [['name', 'ASC']], raw: true });
  return tracks.map((t) => ({
    id: t.id,
    slug: t.slug,
    name: t.name,
    surface: t.surface,
    indoor: t.indoor,
    notes: t.notes,
  }));
}

/** A kit's stock sheet and which choice options come in the box. */
export async function getKitStock(db: Database, kitId: number): Promise<KitStock> {
  const kit = Number.isSafeInteger(kitId) ? await db.models.Kit.findByPk(kitId) : null;
  if (!kit) throw ApiError.notFound('That kit');
  return { kitId: kit.id, vehicleClass: kit.vehicleClass, templateVersion: kit.templateVersion, values: kit.stockValues, inBox: kit.stockInBox };
}

/**
 * A kit's public setups, newest change first, with how often each was forked: where a newcomer with
 * that kit starts. Hidden and deleted setups, and those of suspended racers, are left out.
 */
export async function listKitSetups(db: Database, kitId: number, limit = 50): Promise<KitSetupList> {
  const kit = Number.isSafeInteger(kitId) ? await db.models.Kit.findByPk(kitId, { include: [{ model: db.models.Maker, as: 'maker' }] }) : null;
  if (!kit) throw ApiError.notFound('That kit');
  const setups = await db.sequelize.query<KitSetupList['setups'][number] & { updatedAt: Date }>(
    `SELECT s.id, s.title, u.handle AS "ownerHandle", s.revision_count AS "revisionCount", s.track_type AS "trackType",
            s.updated_at AS "updatedAt",
            (SELECT count(*)::int FROM setups f WHERE f.forked_from_setup_id = s.id AND f.deleted_at IS NULL AND f.hidden_at IS NULL) AS "forkCount"
       FROM setups s
       JOIN cars c ON c.id = s.car_id
       JOIN users u ON u.id = s.owner_id
      WHERE c.kit_id = :kitId AND s.visibility = 'public' AND s.deleted_at IS NULL AND s.hidden_at IS NULL
        AND NOT u.suspended_indefinitely AND (u.suspended_until IS NULL OR u.suspended_until <= now())
      ORDER BY s.updated_at DESC, s.id DESC
      LIMIT :limit`,
    { replacements: { kitId: kit.id, limit }, type: QueryTypes.SELECT },
  );
  return {
    kit: { id: kit.id, name: kit.name, makerName: kit.maker?.name ?? '', vehicleClass: kit.vehicleClass },
    setups: setups.map((s) => ({ ...s, updatedAt: new Date(s.updatedAt).toISOString() })),
  };
}
