import crypto from 'node:crypto';
import { QueryTypes } from 'sequelize';
import type { Lineage, SetupCreate, SetupDetail, SetupMetaUpdate, StoredSetupValues } from '../../shared/types/setups';
import { setupCreateSchema, setupMetaUpdateSchema } from '../../shared/types/setups';
import { getTemplate, validateSetupValues } from '../../shared/types/templates';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { Setup } from '../models/Setup';
import type { User } from '../models/User';
import { findOwnCar } from './garage';
import { assertNewAccountMayPost } from './moderation/limits';
import { renderMarkdown } from './markdown';
import { photoUrls } from './photos';
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
  await assertNewAccountMayPost(db, owner, { kind: 'setup', texts: { notesMarkdown: data.notesMarkdown } });
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
      { setupId: setup.id, number: 1, values, changeNote: note, authorId: owner.id, changedFieldCount: 0 },
      { transaction },
    );
    return setup.update({ currentRevisionId: revision.id, revisionCount: 1 }, { transaction });
  });
}

/**
 * The setup page's one row: the setup, its car, kit, maker and owner, its hide, its counts and its
 * original. Only the current revision's sheet is read; the list of revisions carries each one's
 * stored changed-field count instead of its values.
 */
const DETAIL_SQL = `
  SELECT s.id, s.owner_id, s.title, s.visibility, s.share_token, s.vehicle_class, s.template_version, s.track_type,
         s.temperature_c, s.grip, s.notes_md, s.current_revision_id, s.hidden_at, s.deleted_at, s.created_at, s.updated_at,
         s.fork_count, s.forked_from_setup_id,
         u.handle AS owner_handle, u.display_name AS owner_display_name,
         c.id AS car_id, c.nickname AS car_nickname, c.stock AS car_stock, k.name AS kit_name, COALESCE(m.name, '') AS maker_name,
         h.hidden_at AS hide_at, h.reason AS hide_reason, h.auto AS hide_auto, h.action_id AS hide_action_id,
         (SELECT count(*)::int FROM setups f WHERE f.family_root_id = COALESCE(s.family_root_id, s.id)
             AND f.deleted_at IS NULL AND f.hidden_at IS NULL) AS family_fork_count,
         (SELECT count(*)::int FROM comments cm WHERE cm.setup_id = s.id AND cm.deleted_at IS NULL AND cm.hidden_at IS NULL) AS comment_count,
         o.id AS original_id, o.title AS original_title, o.visibility AS original_visibility, o.share_token AS original_share_token,
         o.owner_id AS original_owner_id, o.hidden_at AS original_hidden_at, o.deleted_at AS original_deleted_at,
         ou.handle AS original_owner_handle, fr.number AS original_revision_number, cr.values AS current_values,
         (SELECT COALESCE(json_agg(json_build_object(
                   'id', r.id, 'number', r.number, 'change_note', r.change_note, 'author_id', r.author_id,
                   'author_handle', ru.handle, 'created_at', r.created_at, 'note_hidden', rh.target_id IS NOT NULL,
                   'changed_field_count', r.changed_field_count)
                   ORDER BY r.number DESC), '[]')
            FROM setup_revisions r
            JOIN users ru ON ru.id = r.author_id
            LEFT JOIN content_hides rh ON rh.target_type = 'revision' AND rh.target_id = r.id
           WHERE r.setup_id = s.id) AS revisions,
         (SELECT COALESCE(json_agg(json_build_object(
                   'id', p.id, 'storage_key', p.storage_key, 'thumb_key', p.thumb_key, 'width', p.width, 'height', p.height, 'caption', p.caption)
                   ORDER BY sp.position, p.id), '[]')
            FROM setup_photos sp JOIN photos p ON p.id = sp.photo_id
           WHERE sp.setup_id = s.id AND p.hidden_at IS NULL) AS photos
    FROM setups s
    JOIN users u ON u.id = s.owner_id
    JOIN cars c ON c.id = s.car_id
    JOIN kits k ON k.id = c.kit_id
    LEFT JOIN makers m ON m.id = k.maker_id
    LEFT JOIN content_hides h ON h.target_type = 'setup' AND h.target_id = s.id
    LEFT JOIN setups o ON o.id = s.forked_from_setup_id
    LEFT JOIN users ou ON ou.id = o.owner_id
    LEFT JOIN setup_revisions fr ON fr.id = s.forked_from_revision_id
    LEFT JOIN setup_revisions cr ON cr.id = s.current_revision_id
   WHERE s.id = $1`;

type DetailRow = {
  id: number; owner_id: number; title: string; visibility: SetupDetail['visibility']; share_token: string;
  vehicle_class: SetupDetail['vehicleClass']; template_version: number; track_type: SetupDetail['conditions']['trackType'];
  temperature_c: number | null; grip: SetupDetail['conditions']['grip']; notes_md: string; current_revision_id: number;
  hidden_at: Date | null; deleted_at: Date | null; created_at: Date; updated_at: Date; fork_count: number; forked_from_setup_id: number | null;
  owner_handle: string; owner_display_name: string; car_id: number; car_nickname: string; car_stock: boolean; kit_name: string; maker_name: string;
  hide_at: Date | null; hide_reason: string | null; hide_auto: boolean | null; hide_action_id: number | null;
  family_fork_count: number; comment_count: number;
  original_id: number | null; original_title: string | null; original_visibility: SetupDetail['visibility'] | null; original_share_token: string | null;
  original_owner_id: number | null; original_hidden_at: Date | null; original_deleted_at: Date | null;
  original_owner_handle: string | null; original_revision_number: number | null;
  current_values: StoredSetupValues; revisions: RevisionRow[]; photos: PhotoRow[];
};

/** One revision as the detail query aggregates it (times as JSON strings). */
type RevisionRow = {
  id: number; number: number; change_note: string; author_id: number; author_handle: string;
  created_at: string; note_hidden: boolean; changed_field_count: number;
};
type PhotoRow = { id: number; storage_key: string; thumb_key: string; width: number; height: number; caption: string };

/** Where a setup came from, withheld when the viewer may no longer see the original. */
function forkedFromOf(row: DetailRow, viewer: Viewer): Lineage['forkedFrom'] {
  if (!row.forked_from_setup_id) return null;
  if (row.original_id === null || row.original_owner_id === null || !row.original_owner_handle) return { available: false };
  const original = {
    ownerId: row.original_owner_id,
    visibility: row.original_visibility!,
    shareToken: row.original_share_token!,
    hiddenAt: row.original_hidden_at,
    deletedAt: row.original_deleted_at,
  };
  // The fork's owner opened an unlisted original through its link, so they keep that link; anyone
  // else sees an unlisted original only if they hold the link themselves (not through the fork).
  const ownerOfUnlisted = viewer?.id === row.owner_id && original.visibility === 'unlisted' && !original.deletedAt && !original.hiddenAt;
  if (!ownerOfUnlisted && !canView(original, viewer)) return { available: false };
  return {
    available: true,
    setupId: row.original_id,
    title: row.original_title!,
    ownerHandle: row.original_owner_handle,
    revisionNumber: row.original_revision_number ?? 0,
    share: ownerOfUnlisted ? original.shareToken : null,
  };
}

/**
 * Everything the setup page shows, for a viewer allowed to see it: one prepared query (the setup
 * with its car, owner, hide, counts, original, revisions and photos, the lists aggregated as JSON
 * in the database), no model instances. A setup the viewer may not see is a 404 (never a 403: a private setup's existence is
 * not revealed).
 */
export async function getSetupDetail(db: Database, id: number, viewer: Viewer, shareToken?: string): Promise<SetupDetail> {
  if (!Number.isSafeInteger(id) || id <= 0 || id > 2_147_483_647) throw ApiError.notFound('That setup');
  const [row] = (await db.pool.query<DetailRow>({ name: 'setup-detail', text: DETAIL_SQL, values: [id] })).rows;
  const access = row && { ownerId: row.owner_id, visibility: row.visibility, shareToken: row.share_token, hiddenAt: row.hidden_at, deletedAt: row.deleted_at };
  if (!row || !canView(access, viewer, shareToken)) throw ApiError.notFound('That setup');
  const { revisions } = row;
  const current = revisions.find((r) => r.id === row.current_revision_id)!;
  const isOwner = viewer?.id === row.owner_id;
  const seesHiddenNotes = isOwner || viewer?.role === 'moderator' || viewer?.role === 'admin';
  return {
    id: row.id,
    title: row.title,
    visibility: row.visibility,
    shareToken: isOwner && row.visibility === 'unlisted' ? row.share_token : null,
    owner: { handle: row.owner_handle, displayName: row.owner_display_name },
    isOwner,
    car: { id: row.car_id, nickname: row.car_nickname, kitName: row.kit_name, makerName: row.maker_name, stock: row.car_stock },
    vehicleClass: row.vehicle_class,
    templateVersion: row.template_version,
    conditions: { trackType: row.track_type, temperatureC: row.temperature_c, grip: row.grip },
    notesMarkdown: row.notes_md,
    notesHtml: renderMarkdown(row.notes_md),
    currentRevision: {
      id: current.id,
      number: current.number,
      values: row.current_values,
      changeNote: current.note_hidden && !(seesHiddenNotes || viewer?.id === current.author_id) ? '' : current.change_note,
      createdAt: new Date(current.created_at).toISOString(),
    },
    revisions: revisions.map((r) => ({
      id: r.id,
      number: r.number,
      changeNote: r.note_hidden && !(seesHiddenNotes || viewer?.id === r.author_id) ? '' : r.change_note,
      noteHidden: r.note_hidden,
      authorHandle: r.author_handle,
      createdAt: new Date(r.created_at).toISOString(),
      changedFieldCount: r.changed_field_count,
    })),
    photos: row.photos.map((p) => ({
      id: p.id,
      ...photoUrls({ storageKey: p.storage_key, thumbKey: p.thumb_key }),
      width: p.width,
      height: p.height,
      caption: p.caption,
    })),
    lineage: { forkedFrom: forkedFromOf(row, viewer), forkCount: row.fork_count, familyForkCount: row.family_fork_count },
    commentCount: row.comment_count,
    hidden: row.hide_at
      ? { hiddenAt: row.hide_at.toISOString(), reason: row.hide_reason ?? '', autoHidden: row.hide_auto ?? false, actionId: row.hide_auto ? null : row.hide_action_id }
      : null,
    createdAt: row.created_at.toISOString(),
    updatedAt: row.updated_at.toISOString(),
  };
}

/** Title, visibility, conditions and notes: the sheet's values change only through revisions. */
export async function updateSetupMeta(db: Database, owner: User, id: number, input: SetupMetaUpdate): Promise<Setup> {
  const setup = await findOwnSetup(db, owner.id, id);
  const { conditions, notesMarkdown, ...rest } = setupMetaUpdateSchema.parse(input);
  await assertNewAccountMayPost(db, owner, { kind: 'text', texts: { notesMarkdown } });
  return setup.update({ ...rest, ...conditionColumns(conditions), ...(notesMarkdown !== undefined ? { notesMd: notesMarkdown } : {}) });
}

/** Deleting keeps the revisions (history is never removed) but hides the setup from everyone. */
export async function deleteSetup(db: Database, owner: User, id: number): Promise<void> {
  const setup = await findOwnSetup(db, owner.id, id);
  await setup.update({ deletedAt: new Date() });
}

export { canView };
