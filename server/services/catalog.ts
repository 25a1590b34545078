import type { KitSummary, TrackSummary } from '../../shared/types/catalog';
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
