import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { Setup } from '../models/Setup';
import type { User } from '../models/User';

export type Viewer = User | undefined;

/**
 * Whether `viewer` may see `setup`. Private setups are the owner's alone; unlisted ones open to the
 * share link; public ones to everyone. Deleted setups are gone for all; hidden ones stay visible to
 * their owner and to moderators (who need to review them).
 */
export function canView(
  setup: Pick<Setup, 'ownerId' | 'deletedAt' | 'hiddenAt' | 'visibility' | 'shareToken'>,
  viewer: Viewer,
  shareToken?: string,
): boolean {
  const isOwner = viewer?.id === setup.ownerId;
  if (setup.deletedAt) return false;
  if (setup.hiddenAt && !isOwner && viewer?.role !== 'moderator' && viewer?.role !== 'admin') return false;
  if (isOwner) return true;
  if (setup.visibility === 'public') return true;
  if (setup.visibility === 'unlisted') return typeof shareToken === 'string' && shareToken === setup.shareToken;
  return false;
}

/** A setup the viewer may see, else 404 (never 403: a private setup's existence is not revealed). */
export async function findViewableSetup(db: Database, id: number, viewer: Viewer, shareToken?: string): Promise<Setup> {
  const setup = Number.isSafeInteger(id) ? await db.models.Setup.findByPk(id) : null;
  if (!setup || !canView(setup, viewer, shareToken)) throw ApiError.notFound('That setup');
  return setup;
}

/** One of the racer's own setups (not deleted), else 404. */
export async function findOwnSetup(db: Database, ownerId: number, id: number): Promise<Setup> {
  const setup = Number.isSafeInteger(id) ? await db.models.Setup.findOne({ where: { id, ownerId, deletedAt: null } }) : null;
  if (!setup) throw ApiError.notFound('That setup');
  return setup;
}
