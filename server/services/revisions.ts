import type { RevisionCreate } from '../../shared/types/setups';
import { revisionCreateSchema } from '../../shared/types/setups';
import { diffSetupValues } from '../../shared/compute/setup/diff';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { Transaction } from 'sequelize';
import type { Setup } from '../models/Setup';
import type { SetupRevision } from '../models/SetupRevision';
import type { User } from '../models/User';
import { assertNewAccountMayPost } from './moderation/limits';
import { findOwnSetup } from './setupAccess';
import { validatedValues } from './setups';

/** The 409 a save from an old base gets, carrying the revision that is now current. */
export async function staleRevisionError(db: Database, setup: Setup, transaction: Transaction, message: string): Promise<ApiError> {
  const current = (await db.models.SetupRevision.findByPk(setup.currentRevisionId!, {
    transaction,
    include: [{ model: db.models.User, as: 'author', attributes: ['handle'] }],
  }))!;
  return new ApiError(409, 'stale_revision', message, {
    currentRevision: {
      id: current.id,
      number: current.number,
      values: current.values,
      changeNote: current.changeNote,
      authorHandle: current.author?.handle ?? '',
      createdAt: current.createdAt.toISOString(),
    },
  });
}

export type SavedRevision = { revision: SetupRevision; warnings: Record<string, string> };

/** Called once a revision is committed (notifications listen here); a listener's failure never fails the save. */
export type RevisionListener = (db: Database, setup: Setup, revision: SetupRevision) => void | Promise<void>;
const revisionListeners: RevisionListener[] = [];
export function onRevisionSaved(listener: RevisionListener): void {
  revisionListeners.push(listener);
}

/** Tells the listeners about a committed revision; every path that writes a revision calls it. */
export async function revisionSaved(db: Database, setup: Setup, revision: SetupRevision): Promise<void> {
  await Promise.allSettled(revisionListeners.map(async (listener) => listener(db, setup, revision)));
}

/**
 * Saves the sheet as a new immutable revision. The setup row is locked for the transaction, so two
 * saves from the same base cannot both win: the second gets 409 with the revision that is current.
 */
export async function saveRevision(db: Database, owner: User, setupId: number, input: RevisionCreate): Promise<SavedRevision> {
  const data = revisionCreateSchema.parse(input);
  await assertNewAccountMayPost(db, owner, { kind: 'text', texts: { changeNote: data.changeNote } });
  const found = await findOwnSetup(db, owner.id, setupId);
  const { values, warnings } = validatedValues(found.vehicleClass, data.values);
  const revision = await db.sequelize.transaction(async (transaction) => {
    const setup = await db.models.Setup.findByPk(found.id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!setup) throw ApiError.notFound('That setup');
    if (setup.currentRevisionId !== data.baseRevisionId) {
      throw await staleRevisionError(db, setup, transaction, 'This setup changed since you opened it. Your values are kept; review the differences and save again.');
    }
    // The setup page lists how many fields each revision changed: counted once, here, against the
    // revision this one follows (validated values are stored as they are, -0 already made 0).
    const previous = await db.models.SetupRevision.findByPk(setup.currentRevisionId!, { attributes: ['values'], transaction });
    const created = await db.models.SetupRevision.create(
      {
        setupId: setup.id,
        number: setup.revisionCount + 1,
        values,
        changeNote: data.changeNote,
        authorId: owner.id,
        changedFieldCount: previous ? diffSetupValues(previous.values, values).length : 0,
      },
      { transaction },
    );
    await setup.update({ currentRevisionId: created.id, revisionCount: setup.revisionCount + 1 }, { transaction });
    return created;
  });
  await revisionSaved(db, found, revision);
  return { revision, warnings };
}
