import crypto from 'node:crypto';
import { QueryTypes } from 'sequelize';
import type { Lineage, SetupCreate, SetupDetail, SetupMetaUpdate, StoredSetupValues } from '../../shared/types/setups';
import type { HiddenNotice } from '../../shared/types/moderation';
import { setupCreateSchema, setupMetaUpdateSchema } from '../../shared/types/setups';
import { getTemplate, validateSetupValues } from '../../shared/types/templates';
import { diffSetupValues } from '../../shared/compute/setup/diff';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { Setup } from '../models/Setup';
import type { User } from '../models/User';
import { findOwnCar } from './garage';
import { renderMarkdown } from './markdown';
import { listSetupPhotos } from './setupPhotos';
import { canView, findOwnSetup, findViewableSetup, type Viewer } from './setupAccess';
import { conditionsOf } from './setupDto';

/** Validates values against the class template; 400 with a message per field when any is wrong. */
export function validatedValues(vehicleClass: Setup['vehicleClass'], values: unknown): { values: StoredSetupValues; warnings: Record<string, string> } {
  const result = validateSetupValues(getTemplate(vehicleClass), values);
  if (!result.ok) throw ApiError.validation(result.errors, 'Some values on the sheet need fixing.');
  return { values: result.values as StoredSetupValues, warnings: result.warnings };
}

function conditionColumns(c: SetupCreate['conditions']) {
  return c ? { trackType: c.trackType ?? null, temperatureC: c.temperatureC ?? null, grip: c.grip ?? null } : {};
}

/** Creates a setup on one of my cars from the kit's stock sheet or a copy of my own setup; revision 1 in the same transaction. */
export async function createSetup(db: Database, owner: User, input: SetupCreate): Promise<Setup> {
  const data = setupCreateSchema.parse(input);
  const car = await findOwnCar(db, owner.id, data.carId);
  const kit = car.kit!;
  let startValues: StoredSetupValues = kit.stockValues;
  if (data.startFrom.kind === 'copy') {
    const source = await findOwnSetup(db, owner.id, data.startFrom.setupId);
    if (source.vehicleClass !== kit.vehicleClass) {
      throw ApiError.validation({ startFrom: 'That setup is for another class of car; copy one for the same class.' });
    }
    startValues = (await db.models.SetupRevision.findByPk(source.currentRevisionId!))!.values;
  }
  const { values } = validatedValues(kit.vehicleClass, startValues);
  return db.sequelize.transaction(async (transaction) => {
    const setup = await db.models.Setup.create(
      {
        ownerId: owner.id,
        carId: car.id,
        vehicleClass: kit.vehicleClass,
        templateVersion: getTemplate(kit.vehicleClass).version,
        title: data.title,
        visibility: data.visibility,
        shareToken: crypto.randomBytes(18).toString('base64url'),
        notesMd: data.notesMarkdown,
        ...conditionColumns(data.conditions),
      },
      { transaction },
    );
    const note = data.startFrom.kind === 'stock' ? `Started from the ${kit.name} stock sheet.` : 'Started from a copy of one of my setups.';
    const revision = await db.models.SetupRevision.create(
      { setupId: setup.id, number: 1, values, changeNote: note, authorId: owner.id },
      { transaction },
    );
    return setup.update({ currentRevisionId: revision.id, revisionCount: 1 }, { transaction });
  });
}

/**
 * Where a setup came from (withheld when the viewer may no longer see the original), how many forks
 * it and its family have, and how many comments it carries: one query.
 */
async function lineageAndComments(db: Database, setup: Setup, viewer: Viewer): Promise<{ lineage: Lineage; commentCount: number }> {
  const [row] = await db.sequelize.query<{ forkCount: number; familyForkCount: number; commentCount: number; revisionNumber: number | null; ownerHandle: string | null }>(
    `SELECT (SELECT count(*)::int FROM setups WHERE forked_from_setup_id = :id AND deleted_at IS NULL AND hidden_at IS NULL) AS "forkCount",
            (SELECT count(*)::int FROM setups WHERE family_root_id = :root AND deleted_at IS NULL AND hidden_at IS NULL) AS "familyForkCount",
            (SELECT count(*)::int FROM comments WHERE setup_id = :id AND deleted_at IS NULL AND hidden_at IS NULL) AS "commentCount",
            (SELECT number FROM setup_revisions WHERE id = :forkedRevision) AS "revisionNumber",
            (SELECT u.handle FROM setups s JOIN users u ON u.id = s.owner_id WHERE s.id = :forkedFrom) AS "ownerHandle"`,
    {
      replacements: { id: setup.id, root: setup.familyRootId ?? setup.id, forkedRevision: setup.forkedFromRevisionId ?? 0, forkedFrom: setup.forkedFromSetupId ?? 0 },
      type: QueryTypes.SELECT,
    },
  );
  let forkedFrom: Lineage['forkedFrom'] = null;
  if (setup.forkedFromSetupId) {
    const original = await db.models.Setup.findByPk(setup.forkedFromSetupId);
    // The fork's owner opened an unlisted original through its link, so they keep that link; anyone
    // else sees an unlisted original only if they hold the link themselves (not through the fork).
    const ownerOfUnlisted =
      !!original && viewer?.id === setup.ownerId && original.visibility === 'unlisted' && !original.deletedAt && !original.hiddenAt;
    forkedFrom =
      original && row.ownerHandle && (ownerOfUnlisted || canView(original, viewer))
        ? {
            available: true,
            setupId: original.id,
            title: original.title,
            ownerHandle: row.ownerHandle,
            revisionNumber: row.revisionNumber ?? 0,
            share: ownerOfUnlisted ? original.shareToken : null,
          }
        : { available: false };
  }
  return {
    lineage: { forkedFrom, forkCount: row.forkCount, familyForkCount: row.familyForkCount },
    commentCount: row.commentCount,
  };
}

/** Moderators' hides on a setup and on its revisions' change notes: one query. */
async function moderationHidesOf(db: Database, setupId: number): Promise<{ setup: HiddenNotice | null; revisionIds: Set<number> }> {
  const rows = await db.sequelize.query<{ targetType: string; targetId: number; hiddenAt: Date; reason: string; auto: boolean; actionId: number | null }>(
    `SELECT h.target_type AS "targetType", h.target_id AS "targetId", h.hidden_at AS "hiddenAt", h.reason, h.auto, h.action_id AS "actionId"
       FROM content_hides h
      WHERE (h.target_type = 'setup' AND h.target_id = :id)
         OR (h.target_type = 'revision' AND h.target_id IN (SELECT r.id FROM setup_revisions r WHERE r.setup_id = :id))`,
    { replacements: { id: setupId }, type: QueryTypes.SELECT },
  );
  const own = rows.find((r) => r.targetType === 'setup');
  return {
    setup: own ? { hiddenAt: own.hiddenAt.toISOString(), reason: own.reason, autoHidden: own.auto, actionId: own.actionId } : null,
    revisionIds: new Set(rows.filter((r) => r.targetType === 'revision').map((r) => r.targetId)),
  };
}

/** Everything the setup page shows, for a viewer allowed to see it. */
export async function getSetupDetail(db: Database, id: number, viewer: Viewer, shareToken?: string): Promise<SetupDetail> {
  const setup = await findViewableSetup(db, id, viewer, shareToken);
  const [car, owner, revisions] = await Promise.all([
    db.models.Car.findByPk(setup.carId, { include: [{ model: db.models.Kit, as: 'kit', include: [{ model: db.models.Maker, as: 'maker' }] }] }),
    db.models.User.findByPk(setup.ownerId),
    db.models.SetupRevision.findAll({
      where: { setupId: setup.id },
      include: [{ model: db.models.User, as: 'author', attributes: ['handle'] }],
      order: [['number', 'DESC']],
    }),
  ]);
  const current = revisions.find((r) => r.id === setup.currentRevisionId)!;
  const isOwner = viewer?.id === setup.ownerId;
  const hides = await moderationHidesOf(db, setup.id);
  const seesHidden = isOwner || viewer?.role === 'moderator' || viewer?.role === 'admin';
  return {
    id: setup.id,
    title: setup.title,
    visibility: setup.visibility,
    shareToken: isOwner && setup.visibility === 'unlisted' ? setup.shareToken : null,
    owner: { handle: owner!.handle, displayName: owner!.displayName },
    isOwner,
    car: { id: car!.id, nickname: car!.nickname, kitName: car!.kit!.name, makerName: car!.kit!.maker?.name ?? '', stock: car!.stock },
    vehicleClass: setup.vehicleClass,
    templateVersion: setup.templateVersion,
    conditions: conditionsOf(setup),
    notesMarkdown: setup.notesMd,
    notesHtml: renderMarkdown(setup.notesMd),
    currentRevision: { id: current.id, number: current.number, values: current.values, changeNote: current.changeNote, createdAt: current.createdAt.toISOString() },
    revisions: revisions.map((r, i) => ({
      id: r.id,
      number: r.number,
      changeNote: hides.revisionIds.has(r.id) && !(seesHidden || viewer?.id === r.authorId) ? '' : r.changeNote,
      noteHidden: hides.revisionIds.has(r.id),
      authorHandle: r.author?.handle ?? '',
      createdAt: r.createdAt.toISOString(),
      changedFieldCount: revisions[i + 1] ? diffSetupValues(revisions[i + 1].values, r.values).length : 0,
    })),
    photos: await listSetupPhotos(db, setup.id),
    ...(await lineageAndComments(db, setup, viewer)),
    hidden: hides.setup,
    createdAt: setup.createdAt.toISOString(),
    updatedAt: setup.updatedAt.toISOString(),
  };
}

/** Title, visibility, conditions and notes: the sheet's values change only through revisions. */
export async function updateSetupMeta(db: Database, owner: User, id: number, input: SetupMetaUpdate): Promise<Setup> {
  const setup = await findOwnSetup(db, owner.id, id);
  const { conditions, notesMarkdown, ...rest } = setupMetaUpdateSchema.parse(input);
  return setup.update({ ...rest, ...conditionColumns(conditions), ...(notesMarkdown !== undefined ? { notesMd: notesMarkdown } : {}) });
}

/** Deleting keeps the revisions (history is never removed) but hides the setup from everyone. */
export async function deleteSetup(db: Database, owner: User, id: number): Promise<void> {
  const setup = await findOwnSetup(db, owner.id, id);
  await setup.update({ deletedAt: new Date() });
}

export { canView };
