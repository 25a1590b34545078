import { QueryTypes } from 'sequelize';
import { REPORT_TARGET_LABELS, type ReportTargetType } from '../../../shared/types/moderation';
import type { Database } from '../../db/database';
import type { Setup } from '../../models/Setup';
import type { User } from '../../models/User';
import { excerpt } from '../notifications';

/*
 * What a reporter may see of reported things, in batches: whether they can open it now, a short
 * label and the app path. Used to refuse reports of things the reporter cannot see (404, never a
 * hint that a private thing exists) and to describe "my reports".
 */

export type TargetRef = { type: ReportTargetType; id: number };

export type TargetView = {
  /** The reporter can open it now (hidden things only for their author and moderators). */
  visible: boolean;
  /** What it is, in a few words; generic once the reporter could not read it even unhidden. */
  label: string;
  /** App path to open it, when visible. */
  path: string | null;
};

export const targetKey = (ref: TargetRef) => `${ref.type}:${ref.id}`;

type Options = {
  /** The share token the reporter opened an unlisted setup with. */
  share?: string;
  /** "My reports": an unlisted setup counts as readable (the report was only accepted with its link). */
  trustUnlisted?: boolean;
};

type SetupAccess = { readable: boolean; visible: boolean; title: string; path: string | null };

const isStaff = (viewer: User) => viewer.role === 'moderator' || viewer.role === 'admin';

/** Like canView, but telling apart "could read it were it not hidden" from "can open it now". */
function setupAccess(setup: Setup | undefined, viewer: User, options: Options): SetupAccess {
  if (!setup || setup.deletedAt) return { readable: false, visible: false, title: '', path: null };
  const owner = setup.ownerId === viewer.id;
  const shared = setup.visibility === 'unlisted' && (options.share === setup.shareToken || !!options.trustUnlisted);
  const readable = owner || setup.visibility === 'public' || shared;
  const visible = readable && (!setup.hiddenAt || owner || isStaff(viewer));
  // An unlisted setup opens only with its link, which "my reports" does not keep.
  const path = visible && (owner || setup.visibility === 'public') ? `/setups/${setup.id}` : null;
  return { readable, visible, title: setup.title, path };
}

const unavailable = (type: ReportTargetType): TargetView => ({ visible: false, label: `${REPORT_TARGET_LABELS[type]} no longer available`, path: null });

type RevisionRow = { id: number; setupId: number; number: number; changeNote: string; authorId: number; hidden: boolean };
type CommentRow = { id: number; setupId: number; revisionId: number | null; authorId: number; bodyMd: string; hiddenAt: Date | null; deletedAt: Date | null };
type PhotoRow = { id: number; ownerId: number; caption: string; hiddenAt: Date | null; setupIds: number[] | null };
type RacerRow = { id: number; handle: string };

async function rows<T extends object>(db: Database, sql: string, ids: number[]): Promise<T[]> {
  if (!ids.length) return [];
  return db.sequelize.query<T>(sql, { type: QueryTypes.SELECT, replacements: { ids } });
}

async function loadRows(db: Database, idsOf: (type: ReportTargetType) => number[]) {
  const [revisions, comments, photos, racers] = await Promise.all([
    rows<RevisionRow>(
      db,
      `SELECT r.id, r.setup_id AS "setupId", r.number, r.change_note AS "changeNote", r.author_id AS "authorId", (h.target_id IS NOT NULL) AS hidden
         FROM setup_revisions r LEFT JOIN content_hides h ON h.target_type = 'revision' AND h.target_id = r.id
        WHERE r.id IN (:ids)`,
      idsOf('revision'),
    ),
    rows<CommentRow>(
      db,
      `SELECT id, setup_id AS "setupId", revision_id AS "revisionId", author_id AS "authorId", body_md AS "bodyMd",
              hidden_at AS "hiddenAt", deleted_at AS "deletedAt"
         FROM comments WHERE id IN (:ids)`,
      idsOf('comment'),
    ),
    rows<PhotoRow>(
      db,
      `SELECT p.id, p.owner_id AS "ownerId", p.caption, p.hidden_at AS "hiddenAt",
              array_agg(sp.setup_id ORDER BY sp.setup_id) FILTER (WHERE sp.setup_id IS NOT NULL) AS "setupIds"
         FROM photos p LEFT JOIN setup_photos sp ON sp.photo_id = p.id
        WHERE p.id IN (:ids) GROUP BY p.id`,
      idsOf('photo'),
    ),
    rows<RacerRow>(db, 'SELECT id, handle FROM users WHERE id IN (:ids)', idsOf('racer')),
  ]);
  return { revisions, comments, photos, racers };
}

/** Views of each reported thing for `viewer`, keyed by targetKey; missing things come back unavailable. */
export async function viewTargets(db: Database, viewer: User, refs: TargetRef[], options: Options = {}): Promise<Map<string, TargetView>> {
  const idsOf = (type: ReportTargetType) => [...new Set(refs.filter((r) => r.type === type).map((r) => r.id))];
  const loaded = await loadRows(db, idsOf);
  const setupIds = new Set<number>([
    ...idsOf('setup'),
    ...loaded.revisions.map((r) => r.setupId),
    ...loaded.comments.map((c) => c.setupId),
    ...loaded.photos.flatMap((p) => p.setupIds ?? []),
  ]);
  const setups = setupIds.size ? await db.models.Setup.findAll({ where: { id: [...setupIds] } }) : [];
  const setupById = new Map(setups.map((s) => [s.id, s]));
  const access = (id: number) => setupAccess(setupById.get(id), viewer, options);
  const staff = isStaff(viewer);
  const views = new Map<string, TargetView>();
  const put = (type: ReportTargetType, id: number, view: TargetView) => views.set(targetKey({ type, id }), view);

  for (const id of idsOf('setup')) {
    const s = access(id);
    put('setup', id, s.readable ? { visible: s.visible, label: s.title, path: s.path } : unavailable('setup'));
  }
  for (const r of loaded.revisions) {
    const s = access(r.setupId);
    const visible = s.visible && (!r.hidden || r.authorId === viewer.id || staff);
    const label = `Revision ${r.number} of “${s.title}”: ${excerpt(r.changeNote, 60)}`;
    put('revision', r.id, s.readable ? { visible, label, path: visible && s.path ? `${s.path}/history` : null } : unavailable('revision'));
  }
  for (const c of loaded.comments) {
    const s = access(c.setupId);
    const visible = s.visible && !c.deletedAt && (!c.hiddenAt || c.authorId === viewer.id || staff);
    const label = `“${excerpt(c.bodyMd, 60)}” on “${s.title}”`;
    // Comments on a change sit beside it in the history.
    const path = visible && s.path ? (c.revisionId ? `${s.path}/history` : s.path) : null;
    put('comment', c.id, s.readable && !c.deletedAt ? { visible, label, path } : unavailable('comment'));
  }
  for (const p of loaded.photos) {
    const on = (p.setupIds ?? []).map(access);
    const readable = on.find((s) => s.readable);
    const shown = on.find((s) => s.visible);
    const visible = !!shown && (!p.hiddenAt || p.ownerId === viewer.id || staff);
    const label = p.caption ? `“${excerpt(p.caption, 60)}” on “${readable?.title}”` : `Photo on “${readable?.title}”`;
    put('photo', p.id, readable ? { visible, label, path: visible ? (shown?.path ?? null) : null } : unavailable('photo'));
  }
  for (const u of loaded.racers) put('racer', u.id, { visible: true, label: `@${u.handle}`, path: `/racers/${u.handle}` });

  for (const ref of refs) if (!views.has(targetKey(ref))) views.set(targetKey(ref), unavailable(ref.type));
  return views;
}
