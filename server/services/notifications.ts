import { z } from 'zod';
import {
  notificationEventSchema,
  type NotificationDto,
  type NotificationEvent,
  type NotificationPage,
  type NotificationType,
} from '../../shared/types/community';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { Logger } from '../logger';
import type { Comment } from '../models/Comment';
import type { Setup } from '../models/Setup';
import type { SetupRevision } from '../models/SetupRevision';
import type { User } from '../models/User';
import { onCommentCreated } from './comments';
import { activeRacer, cursorIdSchema, cursorTime, cursorTimeSchema, decodeCursor, encodeCursor } from './feed';
import { onSetupForked } from './forks';
import { onRevisionSaved } from './revisions';

/** A notification as stored, handed to `onNotification` listeners (the e-mail queue listens here). */
export type StoredNotification = {
  id: number;
  userId: number;
  type: NotificationType;
  actorId: number | null;
  setupId: number | null;
  revisionId: number | null;
  commentId: number | null;
  detail: string;
  createdAt: Date;
};

/** Called after a notification is stored; may be async. Its failures are logged, never passed on. */
export type NotificationListener = (notification: StoredNotification) => void | Promise<void>;
const listeners: NotificationListener[] = [];

export function onNotification(listener: NotificationListener): void {
  listeners.push(listener);
}

// Set by registerNotificationHooks with the app's logger; before that, failures still reach stderr.
let logger: Pick<Logger, 'error'> = { error: (...args: unknown[]) => console.error(...args) };

function logFailure(err: unknown, message: string, context: Record<string, unknown>): void {
  try {
    logger.error({ err, ...context }, message);
  } catch {
    // A broken logger must not turn a notification into a failed request either.
  }
}

function emit(rows: StoredNotification[]): void {
  for (const row of rows) {
    for (const listener of listeners) {
      // Not awaited: whatever a listener does (queue a mail) must not hold up the request that caused it.
      Promise.resolve()
        .then(() => listener(row))
        .catch((err: unknown) => logFailure(err, 'notification listener failed', { notificationId: row.id }));
    }
  }
}

const RETURNING = `RETURNING id, user_id AS "userId", type, actor_id AS "actorId", setup_id AS "setupId",
  revision_id AS "revisionId", comment_id AS "commentId", detail, created_at AS "createdAt"`;

/** Repeated follows from the same racer make one unread notification, not one per click. */
const COLLAPSE_UNREAD: ReadonlySet<NotificationType> = new Set(['new-follower']);

/**
 * Stores one notification and tells the listeners. Never throws into the caller's request: a
 * failure is logged and the result is null. Nobody is told about their own action.
 */
export async function notify(db: Database, event: NotificationEvent): Promise<StoredNotification | null> {
  try {
    const e = notificationEventSchema.parse(event);
    if (e.actorId !== null && e.actorId === e.userId) return null;
    const { rows } = await db.pool.query<StoredNotification>(
      `INSERT INTO notifications (user_id, type, actor_id, setup_id, revision_id, comment_id, detail)
       SELECT $1::integer, $2::varchar, $3::integer, $4::integer, $5::integer, $6::integer, $7::varchar
        WHERE NOT ($8::boolean AND EXISTS (
          SELECT 1 FROM notifications WHERE user_id = $1 AND type = $2 AND actor_id IS NOT DISTINCT FROM $3 AND read_at IS NULL))
       ${RETURNING}`,
      [e.userId, e.type, e.actorId, e.setupId, e.revisionId, e.commentId, e.detail, COLLAPSE_UNREAD.has(e.type)],
    );
    emit(rows);
    return rows[0] ?? null;
  } catch (err) {
    logFailure(err, 'could not store a notification', { type: (event as { type?: unknown })?.type });
    return null;
  }
}

/** The first line of a text, shortened: what a notification quotes from a change note or comment. */
export function excerpt(text: string, max = 140): string {
  const line = text.trim().split('\n')[0].replace(/\s+/g, ' ').trim();
  return line.length <= max ? line : `${line.slice(0, max - 1).trimEnd()}…`;
}

/**
 * The owners of forks of a setup that just got a new revision, one notification per fork, in one
 * statement. Only while the fork's owner can still read the original (not private, hidden or
 * deleted, as the upstream review requires).
 */
async function notifyForkOwners(db: Database, original: Setup, revision: SetupRevision): Promise<void> {
  if (original.visibility === 'private' || original.hiddenAt || original.deletedAt) return;
  try {
    const { rows } = await db.pool.query<StoredNotification>(
      `INSERT INTO notifications (user_id, type, actor_id, setup_id, revision_id, detail)
       SELECT f.owner_id, 'original-changed', $2, f.id, $3, $4 FROM setups f
        WHERE f.forked_from_setup_id = $1 AND f.deleted_at IS NULL AND f.owner_id <> $2
       ${RETURNING}`,
      [original.id, revision.authorId, revision.id, excerpt(revision.changeNote, 500)],
    );
    emit(rows);
  } catch (err) {
    logFailure(err, 'could not notify fork owners', { setupId: original.id, revisionId: revision.id });
  }
}

/**
 * Who hears of a new comment, each once, most specific reason first: the author of the comment it
 * answers, the author of the change it is about, the setup's owner.
 */
async function notifyCommentReaders(db: Database, comment: Comment, setup: Setup): Promise<void> {
  try {
    const recipients = new Map<number, NotificationType>();
    const [parent, revision] = await Promise.all([
      comment.parentId ? db.models.Comment.findByPk(comment.parentId, { attributes: ['authorId'] }) : null,
      comment.revisionId ? db.models.SetupRevision.findByPk(comment.revisionId, { attributes: ['authorId'] }) : null,
    ]);
    if (parent) recipients.set(parent.authorId, 'comment-reply');
    if (revision && !recipients.has(revision.authorId)) recipients.set(revision.authorId, 'comment-on-revision');
    if (!recipients.has(setup.ownerId)) recipients.set(setup.ownerId, 'comment-on-setup');
    const detail = excerpt(comment.bodyMd);
    for (const [userId, type] of recipients) {
      await notify(db, { type, userId, actorId: comment.authorId, setupId: setup.id, revisionId: comment.revisionId, commentId: comment.id, detail });
    }
  } catch (err) {
    logFailure(err, 'could not notify about a comment', { commentId: comment.id });
  }
}

let hooked = false;
// A fork reports itself without a database handle: the one registered last is used.
let forkDb: Database | null = null;

/**
 * Listens to forks, revisions and comments and turns them into notifications. Called when the API
 * is built; safe to call again (the listeners are added once, the database and logger replaced).
 */
export function registerNotificationHooks(db: Database, log: Logger): void {
  forkDb = db;
  logger = log;
  if (hooked) return;
  hooked = true;
  onSetupForked((fork, source) => {
    if (!forkDb) return;
    void notify(forkDb, { type: 'setup-forked', userId: source.ownerId, actorId: fork.ownerId, setupId: source.id, revisionId: fork.forkedFromRevisionId });
  });
  onRevisionSaved((database, setup, revision) => notifyForkOwners(database, setup, revision));
  onCommentCreated((database, comment, setup) => notifyCommentReaders(database, comment, setup));
}

// ---- Reading my notifications ----

export const NOTIFICATION_PAGE_SIZE = 30;
const notificationCursorSchema = z.tuple([cursorTimeSchema, cursorIdSchema]);

/** Shown only while the actor is not suspended (the same rule as the feed); events without an actor always. */
const FROM_ACTIVE_ACTOR = `(a.id IS NULL OR ${activeRacer('a')})`;

type NotificationRow = {
  id: number;
  type: NotificationType;
  created_at: Date;
  read_at: Date | null;
  comment_id: number | null;
  detail: string;
  actor_handle: string | null;
  actor_name: string | null;
  setup_id: number | null;
  setup_title: string | null;
  setup_owner_id: number | null;
  visibility: string | null;
  hidden_at: Date | null;
  deleted_at: Date | null;
  revision_id: number | null;
  revision_number: number | null;
  revision_setup_id: number | null;
  cursor_at: string;
};

function toDto(row: NotificationRow, me: User): NotificationDto {
  const mine = row.setup_owner_id === me.id;
  // Only what I can open now: my own setup (unless deleted), or a public one nobody has hidden.
  const available = row.setup_id !== null && !row.deleted_at && (mine || (row.visibility === 'public' && !row.hidden_at));
  return {
    id: row.id,
    type: row.type,
    createdAt: row.created_at.toISOString(),
    read: row.read_at !== null,
    actor: row.actor_handle ? { handle: row.actor_handle, displayName: row.actor_name ?? '' } : null,
    setup: row.setup_id === null ? null : { id: row.setup_id, title: available ? row.setup_title : null, available },
    revision: row.revision_id === null ? null : { id: row.revision_id, number: row.revision_number!, setupId: row.revision_setup_id! },
    commentId: row.comment_id,
    detail: row.detail,
  };
}

/** My notifications, newest first, a page at a time (keyset on created_at, id). */
export async function listNotifications(db: Database, me: User, rawCursor: unknown): Promise<NotificationPage> {
  const cursor = decodeCursor(rawCursor, notificationCursorSchema);
  const params: Array<string | number> = [me.id, NOTIFICATION_PAGE_SIZE + 1];
  if (cursor) params.push(cursor[0], cursor[1]);
  const { rows } = await db.pool.query<NotificationRow>(
    `SELECT n.id, n.type, n.created_at, n.read_at, n.comment_id, n.detail, ${cursorTime('n.created_at')} AS cursor_at,
            a.handle AS actor_handle, a.display_name AS actor_name,
            s.id AS setup_id, s.title AS setup_title, s.owner_id AS setup_owner_id, s.visibility, s.hidden_at, s.deleted_at,
            r.id AS revision_id, r.number AS revision_number, r.setup_id AS revision_setup_id
       FROM notifications n
       LEFT JOIN users a ON a.id = n.actor_id
       LEFT JOIN setups s ON s.id = n.setup_id
       LEFT JOIN setup_revisions r ON r.id = n.revision_id
      WHERE n.user_id = $1 AND ${FROM_ACTIVE_ACTOR} ${cursor ? 'AND (n.created_at, n.id) < ($3::timestamptz, $4::integer)' : ''}
      ORDER BY n.created_at DESC, n.id DESC
      LIMIT $2`,
    params,
  );
  const page = rows.slice(0, NOTIFICATION_PAGE_SIZE);
  const last = page[page.length - 1];
  return {
    notifications: page.map((row) => toDto(row, me)),
    nextCursor: rows.length > NOTIFICATION_PAGE_SIZE ? encodeCursor([last.cursor_at, last.id]) : null,
  };
}

/** How many of my notifications are unread (what the bell shows). */
export async function countUnread(db: Database, me: User): Promise<number> {
  const { rows } = await db.pool.query<{ n: number }>(
    `SELECT count(*)::int AS n FROM notifications n LEFT JOIN users a ON a.id = n.actor_id
      WHERE n.user_id = $1 AND n.read_at IS NULL AND ${FROM_ACTIVE_ACTOR}`,
    [me.id],
  );
  return rows[0].n;
}

/** Marks one of my notifications read (again is fine); anyone else's is 404. Answers the new unread count. */
export async function markRead(db: Database, me: User, id: number): Promise<number> {
  if (!cursorIdSchema.safeParse(id).success) throw ApiError.notFound('That notification');
  const { rowCount } = await db.pool.query('UPDATE notifications SET read_at = coalesce(read_at, now()) WHERE id = $1 AND user_id = $2', [id, me.id]);
  if (!rowCount) throw ApiError.notFound('That notification');
  return countUnread(db, me);
}

/** Marks every notification of mine read. */
export async function markAllRead(db: Database, me: User): Promise<number> {
  await db.pool.query('UPDATE notifications SET read_at = now() WHERE user_id = $1 AND read_at IS NULL', [me.id]);
  return countUnread(db, me);
}
