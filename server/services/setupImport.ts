import crypto from 'node:crypto';
import type { SetupDocument } from '../../shared/types/setups';
import { getTemplate } from '../../shared/types/templates';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { Setup } from '../models/Setup';
import type { User } from '../models/User';
import { findOwnCar } from './garage';
import { assertNewAccountMayPost } from './moderation/limits';
import { validatedValues } from './setups';

/** Creates a private setup with revision 1 holding an imported document's values. */
export async function createSetupWithValues(db: Database, owner: User, carId: number, doc: SetupDocument): Promise<Setup> {
  await assertNewAccountMayPost(db, owner, { kind: 'setup', texts: { 'document.setup.notesMarkdown': doc.setup.notesMarkdown } });
  const car = await findOwnCar(db, owner.id, carId);
  if (car.kit!.vehicleClass !== doc.setup.vehicleClass) {
    throw ApiError.validation({ carId: 'That file is for another class of car; pick a car of the same class.' });
  }
  const { values } = validatedValues(doc.setup.vehicleClass, doc.setup.values);
  return db.sequelize.transaction(async (transaction) => {
    const setup = await db.models.Setup.create(
      {
        ownerId: owner.id,
        carId: car.id,
        vehicleClass: doc.setup.vehicleClass,
        templateVersion: getTemplate(doc.setup.vehicleClass).version,
        title: doc.setup.title || 'Imported setup',
        visibility: 'private',
        shareToken: crypto.randomBytes(18).toString('base64url'),
        notesMd: doc.setup.notesMarkdown,
        trackType: doc.setup.conditions.trackType,
        temperatureC: doc.setup.conditions.temperatureC,
        grip: doc.setup.conditions.grip,
      },
      { transaction },
    );
    const revision = await db.models.SetupRevision.create(
      {
        setupId: setup.id,
        number: 1,
        values,
        changeNote: `Imported from a setup file (revision ${doc.setup.revision.number}).`,
        authorId: owner.id,
        changedFieldCount: 0,
      },
      { transaction },
    );
    return setup.update({ currentRevisionId: revision.id, revisionCount: 1 }, { transaction });
  });
}
