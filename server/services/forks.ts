import crypto from 'node:crypto';
import { z } from 'zod';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { Setup } from '../models/Setup';
import type { User } from '../models/User';
import { findOwnCar } from './garage';
import { findViewableSetup } from './setupAccess';
import { validatedValues } from './setups';

export const forkRequestSchema = z.object({
  carId: z.number().int().positive(),
  title: z.string().trim().min(1).max(120).optional(),
  /** Fork an older revision of the original; the current one by default. */
  revisionId: z.number().int().positive().optional(),
  /** The share token, when forking an unlisted setup from its link. */
  share: z.string().max(60).optional(),
});

/** Called once a fork exists (notifications hook in here later); must not throw. */
export type ForkListener = (fork: Setup, source: Setup) => void;
const listeners: ForkListener[] = [];
export function onSetupForked(listener: ForkListener): void {
  listeners.push(listener);
}

/**
 * Copies a setup the racer may see into their garage, in one transaction: a new private setup whose
 * revision 1 holds the chosen revision's values, with where it came from and its family root. A fork
 * is a snapshot: nothing done to the original later changes it.
 */
export async function forkSetup(db: Database, user: User, sourceId: number, input: unknown): Promise<Setup> {
  const data = forkRequestSchema.parse(input);
  const source = await findViewableSetup(db, sourceId, user, data.share);
  const car = await findOwnCar(db, user.id, data.carId);
  if (car.kit!.vehicleClass !== source.vehicleClass) {
    throw ApiError.validation({ carId: 'Pick a car of the same class as the setup you are forking.' });
  }
  const revisionId = data.revisionId ?? source.currentRevisionId!;
  const revision = await db.models.SetupRevision.findOne({ where: { id: revisionId, setupId: source.id } });
  if (!revision) throw ApiError.validation({ revisionId: 'That revision is not part of this setup.' });
  const { values } = validatedValues(source.vehicleClass, revision.values);
  const author = await db.models.User.findByPk(source.ownerId);

  const fork = await db.sequelize.transaction(async (transaction) => {
    const created = await db.models.Setup.create(
      {
        ownerId: user.id,
        carId: car.id,
        vehicleClass: source.vehicleClass,
        templateVersion: source.templateVersion,
        title: data.title ?? source.title,
        visibility: 'private',
        shareToken: crypto.randomBytes(18).toString('base64url'),
        trackType: source.trackType,
        temperatureC: source.temperatureC,
        grip: source.grip,
        notesMd: '',
        forkedFromSetupId: source.id,
        forkedFromRevisionId: revision.id,
        upstreamRevisionId: revision.id,
        familyRootId: source.familyRootId ?? source.id,
      },
      { transaction },
    );
    const first = await db.models.SetupRevision.create(
      {
        setupId: created.id,
        number: 1,
        values,
        changeNote: `Forked from “${source.title}” by @${author?.handle ?? 'unknown'} (revision ${revision.number}).`,
        authorId: user.id,
      },
      { transaction },
    );
    return created.update({ currentRevisionId: first.id, revisionCount: 1 }, { transaction });
  });
  for (const listener of listeners) listener(fork, source);
  return fork;
}
