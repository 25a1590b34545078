import { diffSetupValues } from '../../shared/compute/setup/diff';
import type { History, RevisionDetail } from '../../shared/types/forks';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import { isNoteHidden, noteHiddenAttribute, visibleChangeNote } from './moderation/visibility';
import { findViewableSetup, type Viewer } from './setupAccess';

const authorHandle = (db: Database) => ({ model: db.models.User, as: 'author', attributes: ['handle'] });

/**
 * Every revision of a setup the viewer may see, newest first, each with the fields it changed from
 * the revision before. The revisions and their authors come in one query whatever their number.
 */
export async function getHistory(db: Database, setupId: number, viewer: Viewer, share?: string): Promise<History> {
  const setup = await findViewableSetup(db, setupId, viewer, share);
  const revisions = await db.models.SetupRevision.findAll({
    where: { setupId: setup.id },
    attributes: { include: [noteHiddenAttribute(db)] },
    include: [authorHandle(db)],
    order: [['number', 'DESC']],
  });
  return {
    revisions: revisions.map((revision, i) => {
      const previous = revisions[i + 1];
      return {
        id: revision.id,
        number: revision.number,
        changeNote: visibleChangeNote(revision.changeNote, isNoteHidden(revision), revision.authorId, viewer),
        authorHandle: revision.author?.handle ?? '',
        createdAt: revision.createdAt.toISOString(),
        changes: previous
          ? diffSetupValues(previous.values, revision.values).map((c) => ({ key: c.key, before: c.before ?? null, after: c.after ?? null }))
          : [],
      };
    }),
  };
}

/** One revision of a setup the viewer may see, by its number within the setup; 404 when it has none such. */
export async function getRevisionDetail(db: Database, setupId: number, number: number, viewer: Viewer, share?: string): Promise<RevisionDetail> {
  const setup = await findViewableSetup(db, setupId, viewer, share);
  if (!Number.isSafeInteger(number) || number < 1) throw ApiError.notFound('That revision');
  const [revision, owner, car] = await Promise.all([
    db.models.SetupRevision.findOne({ where: { setupId: setup.id, number }, attributes: { include: [noteHiddenAttribute(db)] }, include: [authorHandle(db)] }),
    db.models.User.findByPk(setup.ownerId, { attributes: ['handle'] }),
    db.models.Car.findByPk(setup.carId, { include: [{ model: db.models.Kit, as: 'kit', attributes: ['name'] }] }),
  ]);
  if (!revision) throw ApiError.notFound('That revision');
  return {
    setup: {
      id: setup.id,
      title: setup.title,
      vehicleClass: setup.vehicleClass,
      ownerHandle: owner?.handle ?? '',
      kitName: car?.kit?.name ?? '',
      revisionCount: setup.revisionCount,
    },
    revision: {
      id: revision.id,
      number: revision.number,
      values: revision.values,
      changeNote: visibleChangeNote(revision.changeNote, isNoteHidden(revision), revision.authorId, viewer),
      authorHandle: revision.author?.handle ?? '',
      createdAt: revision.createdAt.toISOString(),
    },
  };
}
