import { QueryTypes } from 'sequelize';
import {
  queueFilterSchema,
  type ModerationActionKind,
  type QueueItem,
  type QueueResponse,
  type ReportReason,
  type ReportTargetType,
} from '../../../shared/types/moderation';
import type { Database } from '../../db/database';
import { parseQuery } from '../discover';
import { renderMarkdown } from '../markdown';
import { photoUrls } from '../photos';
import { actionColumns, cannotActReason, cannotSuspendReason, toActionSummary, type ActionRow, type Actor, type TargetRef } from './actions';

/*
 * The review queue: open reports grouped by what they are about (one row per thing), and open
 * appeals, each with the thing shown inline and its author's history. A handful of queries per
 * page whatever its length: reports grouped in SQL, then contents, authors and histories in batches.
 */

/** Rows per kind on one queue page (reported things, appeals). */
export const QUEUE_LIMIT = 100;
const HISTORY_PER_AUTHOR = 10;

const key = (type: string, id: number) => `${type}:${id}`;

/** A thing as the queue and "my moderation" show it. `exists` is false once it was deleted. */
export type TargetContent = {
  exists: boolean;
  title: string;
  /** Short words for lists: "Setup “Dusty”", "Comment on “Dusty”", "@handle". */
  label: string;
  bodyHtml: string;
  imageUrl: string | null;
  path: string | null;
  setupId: number | null;
  hiddenAt: string | null;
  hiddenReason: string | null;
  autoHidden: boolean;
};

type Loaded = Omit<TargetContent, 'hiddenAt' | 'hiddenReason' | 'autoHidden'> & { id: number };

const quoted = (title: string | null) => (title ? `“${title}”` : 'a deleted setup');
const thumb = (storageKey: string | null, thumbKey: string | null) => (storageKey && thumbKey ? photoUrls({ storageKey, thumbKey }).thumbUrl : null);

/** Loads one kind of target in a query; what each kind shows as title, body and image. */
const LOADERS: Record<ReportTargetType, (db: Database, ids: number[]) => Promise<Loaded[]>> = {
  async setup(db, ids) {
    const rows = await select<{ id: number; title: string; notes: string; deleted: boolean; storageKey: string | null; thumbKey: string | null }>(
      db,
      `SELECT s.id, s.title, s.notes_md AS notes, s.deleted_at IS NOT NULL AS deleted, p.storage_key AS "storageKey", p.thumb_key AS "thumbKey"
         FROM setups s
         LEFT JOIN LATERAL (SELECT p.storage_key, p.thumb_key FROM setup_photos sp JOIN photos p ON p.id = sp.photo_id
                             WHERE sp.setup_id = s.id ORDER BY sp.position, p.id LIMIT 1) p ON true
        WHERE s.id IN (:ids)`,
      ids,
    );
    return rows.map((r) => ({
      id: r.id,
      exists: !r.deleted,
      title: r.title,
      label: `Setup ${quoted(r.title)}`,
      bodyHtml: renderMarkdown(r.notes),
      imageUrl: thumb(r.storageKey, r.thumbKey),
      path: r.deleted ? null : `/setups/${r.id}`,
      setupId: r.id,
    }));
  },
  async revision(db, ids) {
    const rows = await select<{ id: number; number: number; note: string; setupId: number; title: string; deleted: boolean }>(
      db,
      `SELECT r.id, r.number, r.change_note AS note, r.setup_id AS "setupId", s.title, s.deleted_at IS NOT NULL AS deleted
         FROM setup_revisions r JOIN setups s ON s.id = r.setup_id WHERE r.id IN (:ids)`,
      ids,
    );
    return rows.map((r) => ({
      id: r.id,
      exists: !r.deleted,
      title: r.title,
      label: `Change note of revision ${r.number} of ${quoted(r.title)}`,
      bodyHtml: renderMarkdown(r.note),
      imageUrl: null,
      path: r.deleted ? null : `/setups/${r.setupId}/history`,
      setupId: r.setupId,
    }));
  },
  async comment(db, ids) {
    const rows = await select<{ id: number; body: string; setupId: number; title: string; deleted: boolean }>(
      db,
      `SELECT c.id, c.body_md AS body, c.setup_id AS "setupId", s.title, (c.deleted_at IS NOT NULL OR s.deleted_at IS NOT NULL) AS deleted
         FROM comments c JOIN setups s ON s.id = c.setup_id WHERE c.id IN (:ids)`,
      ids,
    );
    return rows.map((r) => ({
      id: r.id,
      exists: !r.deleted,
      title: r.title,
      label: `Comment on ${quoted(r.title)}`,
      bodyHtml: renderMarkdown(r.body),
      imageUrl: null,
      path: r.deleted ? null : `/setups/${r.setupId}`,
      setupId: r.setupId,
    }));
  },
  async photo(db, ids) {
    const rows = await select<{ id: number; caption: string; storageKey: string; thumbKey: string; setupId: number | null; title: string | null }>(
      db,
      `SELECT p.id, p.caption, p.storage_key AS "storageKey", p.thumb_key AS "thumbKey", s.id AS "setupId", s.title
         FROM photos p
         LEFT JOIN LATERAL (SELECT s.id, s.title FROM setup_photos sp JOIN setups s ON s.id = sp.setup_id
                             WHERE sp.photo_id = p.id ORDER BY sp.setup_id LIMIT 1) s ON true
        WHERE p.id IN (:ids)`,
      ids,
    );
    return rows.map((r) => ({
      id: r.id,
      exists: true,
      title: r.title ?? 'Photo',
      label: r.title ? `Photo on ${quoted(r.title)}` : 'Photo',
      bodyHtml: renderMarkdown(r.caption),
      imageUrl: thumb(r.storageKey, r.thumbKey),
      path: r.setupId ? `/setups/${r.setupId}` : null,
      setupId: r.setupId,
    }));
  },
  async racer(db, ids) {
    const rows = await select<{ id: number; handle: string; bio: string }>(db, 'SELECT id, handle, bio FROM users WHERE id IN (:ids)', ids);
    return rows.map((r) => ({
      id: r.id,
      exists: true,
      title: `@${r.handle}`,
      label: `Profile of @${r.handle}`,
      bodyHtml: renderMarkdown(r.bio),
      imageUrl: null,
      path: `/racers/${encodeURIComponent(r.handle)}`,
      setupId: null,
    }));
  },
};

function select<T extends object>(db: Database, sql: string, ids: number[]): Promise<T[]> {
  return db.sequelize.query<T>(sql, { replacements: { ids }, type: QueryTypes.SELECT });
}

/** Contents of many targets, by `type:id`: a query per kind, one for their hidden state. */
export async function describeTargets(db: Database, refs: TargetRef[]): Promise<Map<string, TargetContent>> {
  const out = new Map<string, TargetContent>();
  if (!refs.length) return out;
  const hides = await db.sequelize.query<{ type: string; id: number; hiddenAt: Date; reason: string; auto: boolean }>(
    `SELECT target_type AS type, target_id AS id, hidden_at AS "hiddenAt", reason, auto FROM content_hides
      WHERE target_type || ':' || target_id IN (:keys)`,
    { replacements: { keys: refs.map((r) => key(r.type, r.id)) }, type: QueryTypes.SELECT },
  );
  const hideBy = new Map(hides.map((h) => [key(h.type, h.id), h]));
  for (const type of Object.keys(LOADERS) as ReportTargetType[]) {
    const ids = [...new Set(refs.filter((r) => r.type === type).map((r) => r.id))];
    if (!ids.length) continue;
    for (const row of await LOADERS[type](db, ids)) {
      const hide = hideBy.get(key(type, row.id));
      const { id: _id, ...content } = row;
      out.set(key(type, row.id), {
        ...content,
        hiddenAt: hide ? hide.hiddenAt.toISOString() : null,
        hiddenReason: hide?.reason ?? null,
        autoHidden: hide?.auto ?? false,
      });
    }
  }
  return out;
}

/** What a queue row shows for a thing that no longer exists. */
const GONE: TargetContent = {
  exists: false,
  title: 'No longer available',
  label: 'Something that was deleted',
  bodyHtml: '',
  imageUrl: null,
  path: null,
  setupId: null,
  hiddenAt: null,
  hiddenReason: null,
  autoHidden: false,
};

type AuthorRow = {
  id: number;
  handle: string;
  role: 'racer' | 'moderator' | 'admin';
  createdAt: Date;
  emailVerified: boolean;
  suspended: boolean;
  suspendedUntil: Date | null;
};

/** Authors with up to ten earlier actions each, newest first: two queries. */
async function loadAuthors(db: Database, ids: number[]): Promise<Map<number, QueueItem['author']>> {
  if (!ids.length) return new Map();
  const [users, history] = await Promise.all([
    db.sequelize.query<AuthorRow>(
      `SELECT id, handle, role, created_at AS "createdAt", (email_verified_at IS NOT NULL AND email IS NOT NULL) AS "emailVerified",
              (suspended_indefinitely OR coalesce(suspended_until > now(), false)) AS suspended,
              CASE WHEN suspended_until > now() THEN suspended_until END AS "suspendedUntil"
         FROM users WHERE id IN (:ids)`,
      { replacements: { ids }, type: QueryTypes.SELECT },
    ),
    db.sequelize.query<{ subject: number; action: ModerationActionKind; reason: string; createdAt: Date }>(
      `SELECT subject, action, reason, "createdAt" FROM (
         SELECT subject_user_id AS subject, action, reason, created_at AS "createdAt",
                row_number() OVER (PARTITION BY subject_user_id ORDER BY created_at DESC, id DESC) AS n
           FROM moderation_actions WHERE subject_user_id IN (:ids)) a
        WHERE n <= :limit ORDER BY "createdAt" DESC`,
      { replacements: { ids, limit: HISTORY_PER_AUTHOR }, type: QueryTypes.SELECT },
    ),
  ]);
  return new Map(
    users.map((u) => [
      u.id,
      {
        id: u.id,
        handle: u.handle,
        role: u.role,
        createdAt: u.createdAt.toISOString(),
        emailVerified: u.emailVerified,
        suspended: u.suspended,
        suspendedUntil: u.suspendedUntil ? u.suspendedUntil.toISOString() : null,
        history: history
          .filter((h) => h.subject === u.id)
          .map((h) => ({ action: h.action, reason: h.reason, createdAt: h.createdAt.toISOString() })),
      },
    ]),
  );
}

type ReportGroup = {
  targetType: ReportTargetType;
  targetId: number;
  ownerId: number;
  reportCount: number;
  firstReportedAt: Date;
  reasons: ReportReason[];
  notes: string[] | null;
};

async function openReportGroups(db: Database, filter: { reason?: ReportReason; type?: ReportTargetType; order: 'oldest' | 'newest' }) {
  return db.sequelize.query<ReportGroup>(
    `SELECT target_type AS "targetType", target_id AS "targetId", min(target_owner_id) AS "ownerId", count(*)::int AS "reportCount",
            min(created_at) AS "firstReportedAt", array_agg(reason ORDER BY created_at, id) AS reasons,
            array_agg(note ORDER BY created_at, id) FILTER (WHERE note <> '') AS notes
       FROM reports
      WHERE status = 'open' ${filter.type ? 'AND target_type = :type' : ''}
      GROUP BY target_type, target_id
      ${filter.reason ? 'HAVING bool_or(reason = :reason)' : ''}
      ORDER BY "firstReportedAt" ${filter.order === 'oldest' ? 'ASC' : 'DESC'}, target_type, target_id
      LIMIT :limit`,
    { replacements: { type: filter.type ?? null, reason: filter.reason ?? null, limit: QUEUE_LIMIT }, type: QueryTypes.SELECT },
  );
}

type AppealRow = ActionRow & { openAppealId: number; appealText: string; appealCreatedAt: Date; appellantId: number; openReports: number };

async function openAppeals(db: Database, filter: { type?: ReportTargetType; order: 'oldest' | 'newest' }) {
  return db.sequelize.query<AppealRow>(
    `SELECT ${actionColumns('a')}, ap.id AS "openAppealId", ap.text AS "appealText", ap.created_at AS "appealCreatedAt",
            ap.appellant_id AS "appellantId",
            (SELECT count(*)::int FROM reports r WHERE r.status = 'open' AND r.target_type = a.target_type AND r.target_id = a.target_id) AS "openReports"
       FROM appeals ap JOIN moderation_actions a ON a.id = ap.action_id
      WHERE ap.status = 'open' ${filter.type ? 'AND a.target_type = :type' : ''}
      ORDER BY ap.created_at ${filter.order === 'oldest' ? 'ASC' : 'DESC'}, ap.id
      LIMIT :limit`,
    { replacements: { type: filter.type ?? null, limit: QUEUE_LIMIT }, type: QueryTypes.SELECT },
  );
}

/**
 * Whether `viewer` may decide an appeal: not their own appeal; for moderators, not against their
 * own decision and not about an admin (admins may decide any, their own decisions included).
 */
export function cannotDecideReason(viewer: Actor, appeal: { appellantId: number; actorId: number | null; subjectRole: string; action: string }): string | null {
  if (viewer.id === appeal.appellantId) return 'This is your own appeal: another moderator has to decide it.';
  if (viewer.role === 'admin') return null;
  if (appeal.actorId === viewer.id) return 'You took the decision under appeal: a different moderator has to decide it.';
  if (appeal.subjectRole === 'admin') return 'Moderators cannot decide appeals about an admin.';
  if (appeal.action === 'suspend' && appeal.subjectRole !== 'racer') return 'Only admins decide appeals against suspending a moderator.';
  return null;
}

function countReasons(reasons: ReportReason[]): QueueItem['reasons'] {
  const counts = new Map<ReportReason, number>();
  for (const r of reasons) counts.set(r, (counts.get(r) ?? 0) + 1);
  return [...counts].map(([reason, count]) => ({ reason, count })).sort((a, b) => b.count - a.count);
}

function queueContent(c: TargetContent): QueueItem['content'] {
  return { title: c.title, bodyHtml: c.bodyHtml, imageUrl: c.imageUrl, path: c.path, hiddenAt: c.hiddenAt, hiddenReason: c.hiddenReason, autoHidden: c.autoHidden };
}

function actRules(viewer: Actor, author: QueueItem['author']) {
  const reason = cannotActReason(viewer, author);
  return { canAct: reason === null, cannotActReason: reason, canSuspend: cannotSuspendReason(viewer, author) === null };
}

/**
 * `GET /api/moderation/queue`: reported things (oldest first report first, by default) and open
 * appeals, filtered by report reason (reported things only), target type and kind.
 */
export async function listModerationQueue(db: Database, viewer: Actor, query: unknown): Promise<QueueResponse> {
  const filter = parseQuery(queueFilterSchema, query);
  const [groups, appeals, [totals]] = await Promise.all([
    filter.kind === 'appeals' ? Promise.resolve([]) : openReportGroups(db, filter),
    filter.kind === 'reports' ? Promise.resolve([]) : openAppeals(db, filter),
    db.sequelize.query<{ openReports: number; openAppeals: number }>(
      `SELECT (SELECT count(*)::int FROM reports WHERE status = 'open') AS "openReports",
              (SELECT count(*)::int FROM appeals WHERE status = 'open') AS "openAppeals"`,
      { type: QueryTypes.SELECT },
    ),
  ]);
  const refs = [...groups.map((g) => ({ type: g.targetType, id: g.targetId })), ...appeals.map((a) => ({ type: a.targetType, id: a.targetId }))];
  const [contents, authors] = await Promise.all([
    describeTargets(db, refs),
    loadAuthors(db, [...new Set([...groups.map((g) => g.ownerId), ...appeals.map((a) => a.subjectUserId)])]),
  ]);
  const rows: Array<{ at: number; item: QueueItem }> = [];
  for (const g of groups) {
    const author = authors.get(g.ownerId);
    if (!author) continue;
    rows.push({
      at: new Date(g.firstReportedAt).getTime(),
      item: {
        targetType: g.targetType,
        targetId: g.targetId,
        reportCount: g.reportCount,
        reasons: countReasons(g.reasons),
        notes: g.notes ?? [],
        firstReportedAt: new Date(g.firstReportedAt).toISOString(),
        content: queueContent(contents.get(key(g.targetType, g.targetId)) ?? GONE),
        author,
        appeal: null,
        ...actRules(viewer, author),
      },
    });
  }
  for (const a of appeals) {
    const author = authors.get(a.subjectUserId);
    if (!author) continue;
    const refusal = cannotDecideReason(viewer, { appellantId: a.appellantId, actorId: a.actorId, subjectRole: author.role, action: a.action });
    rows.push({
      at: new Date(a.appealCreatedAt).getTime(),
      item: {
        targetType: a.targetType,
        targetId: a.targetId,
        reportCount: a.openReports,
        reasons: [],
        notes: [],
        firstReportedAt: null,
        content: queueContent(contents.get(key(a.targetType, a.targetId)) ?? GONE),
        author,
        appeal: {
          id: a.openAppealId,
          text: a.appealText,
          createdAt: new Date(a.appealCreatedAt).toISOString(),
          action: toActionSummary(a),
          canDecide: refusal === null,
        },
        ...actRules(viewer, author),
        ...(refusal ? { canAct: false, cannotActReason: refusal } : {}),
      },
    });
  }
  rows.sort((x, y) => (filter.order === 'oldest' ? x.at - y.at : y.at - x.at));
  return { items: rows.map((r) => r.item), openReports: totals.openReports, openAppeals: totals.openAppeals };
}
