import { z } from 'zod';
import { FEED_KINDS, type FeedItem, type FeedKind, type FeedPage, type FeedSuggestions } from '../../shared/types/community';
import type { VehicleClassKey } from '../../shared/types/vehicleClasses';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { User } from '../models/User';

/*
 * The activity feed, and the keyset cursors every list of this feature pages with.
 * Hot read path: raw SQL through the pg pool, no model instances.
 */

export const FEED_PAGE_SIZE = 20;

/** A racer whose content may be shown: not suspended, now. */
export const activeRacer = (u: string) => `NOT ${u}.suspended_indefinitely AND (${u}.suspended_until IS NULL OR ${u}.suspended_until <= now())`;

/** A setup anyone may see in a list: public, neither hidden by moderation nor deleted. */
export const listableSetup = (s: string) => `${s}.visibility = 'public' AND ${s}.hidden_at IS NULL AND ${s}.deleted_at IS NULL`;

/**
 * A timestamp as cursor text, to the microsecond. PostgreSQL keeps microseconds and a JavaScript
 * Date only milliseconds: a cursor rounded to the millisecond would skip or repeat rows.
 */
export const cursorTime = (column: string) => `to_char(${column} AT TIME ZONE 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.US"Z"')`;

const CURSOR_TIME = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{6}Z$/;
export const cursorTimeSchema = z.string().regex(CURSOR_TIME);
export const cursorIdSchema = z.number().int().min(1).max(2_147_483_647);
const DAMAGED_CURSOR = 'That page link is damaged or out of date. Reload the list from the top.';

/** An opaque cursor: the sort key of the last row of a page. */
export function encodeCursor(parts: ReadonlyArray<string | number>): string {
  return Buffer.from(JSON.stringify(parts)).toString('base64url');
}

/** The cursor of `?cursor=`, checked against `schema`; null when absent. Anything else is a 400, never a 500. */
export function decodeCursor<T>(raw: unknown, schema: z.ZodType<T>): T | null {
  if (raw === undefined || raw === '') return null;
  if (typeof raw !== 'string' || raw.length > 200) throw ApiError.validation({ cursor: DAMAGED_CURSOR }, DAMAGED_CURSOR);
  let parsed: unknown;
  try {
    parsed = JSON.parse(Buffer.from(raw, 'base64url').toString('utf8'));
  } catch {
    parsed = undefined;
  }
  const checked = schema.safeParse(parsed);
  if (!checked.success) throw ApiError.validation({ cursor: DAMAGED_CURSOR }, DAMAGED_CURSOR);
  return checked.data;
}

const feedCursorSchema = z.tuple([cursorTimeSchema, z.enum(FEED_KINDS), cursorIdSchema]);
type FeedCursor = z.infer<typeof feedCursorSchema>;

/**
 * One page of my feed_items (kept by triggers: see migration 20261202T1200-feed-items), newest
 * first, with what each item shows. Whether an item may be shown is decided here, at read time:
 * its setup public and neither hidden nor deleted, its owner not suspended; a fork only while its
 * original is still mine and listed, and a followed racer's new setup that is a fork of mine only
 * once, as the fork. $1 is me, $2 the page size plus one (to know whether there is more), and after
 * a cursor $3..$5 its (time, kind, id): the row comparison is a range of the primary key.
 */
function feedSql(cursor: FeedCursor | null): string {
  return `
    SELECT fi.kind, fi.item_id AS id, fi.created_at, ${cursorTime('fi.created_at')} AS cursor_at,
           u.handle AS actor_handle, u.display_name AS actor_name, s.id AS setup_id, s.title AS setup_title, s.vehicle_class,
           r.number AS revision_number,
           -- A change note hidden by moderators is blanked; the change itself stays in the feed.
           CASE WHEN r.id IS NULL THEN NULL
                WHEN EXISTS (SELECT 1 FROM content_hides h WHERE h.target_type = 'revision' AND h.target_id = r.id) THEN ''
                ELSE r.change_note END AS change_note,
           o.id AS original_id, o.title AS original_title
      FROM feed_items fi
      LEFT JOIN setup_revisions r ON fi.kind = 'revision' AND r.id = fi.item_id
      JOIN setups s ON s.id = CASE WHEN fi.kind = 'revision' THEN r.setup_id ELSE fi.item_id END AND ${listableSetup('s')}
      JOIN users u ON u.id = s.owner_id AND ${activeRacer('u')}
      -- OFFSET 0 keeps this a primary-key lookup per item (flattened, the planner joined all my setups).
      LEFT JOIN LATERAL (SELECT o.id, o.title FROM setups o
                          WHERE o.id = s.forked_from_setup_id AND o.owner_id = $1 AND o.hidden_at IS NULL AND o.deleted_at IS NULL
                         OFFSET 0) o ON TRUE
     WHERE fi.reader_id = $1
       ${cursor ? 'AND (fi.created_at, fi.kind, fi.item_id) < ($3::timestamptz, $4::text, $5::integer)' : ''}
       AND CASE fi.kind WHEN 'fork' THEN o.id IS NOT NULL AND s.owner_id <> $1
                        WHEN 'setup' THEN o.id IS NULL
                        ELSE TRUE END
     ORDER BY fi.created_at DESC, fi.kind DESC, fi.item_id DESC
     LIMIT $2`;
}

type FeedRow = {
  kind: FeedKind;
  id: number;
  created_at: Date;
  cursor_at: string;
  actor_handle: string;
  actor_name: string;
  setup_id: number;
  setup_title: string;
  vehicle_class: VehicleClassKey;
  revision_number: number | null;
  change_note: string | null;
  original_id: number | null;
  original_title: string | null;
};

function toItem(row: FeedRow): FeedItem {
  const base = {
    id: row.id,
    createdAt: row.created_at.toISOString(),
    actor: { handle: row.actor_handle, displayName: row.actor_name },
    setup: { id: row.setup_id, title: row.setup_title, vehicleClass: row.vehicle_class },
  };
  if (row.kind === 'revision') return { kind: 'revision', ...base, revision: { number: row.revision_number!, changeNote: row.change_note ?? '' } };
  if (row.kind === 'fork') return { kind: 'fork', ...base, original: { id: row.original_id!, title: row.original_title ?? '' } };
  return { kind: 'setup', ...base };
}

/**
 * What the racers I follow did, newest first: their new public setups, new revisions of their
 * public setups, and public forks of my setups by anyone. Hidden, deleted and non-public setups
 * and suspended racers never appear. `rawCursor` is the previous page's `nextCursor`: rows that
 * arrive meanwhile sort before it, so the next page neither repeats nor skips anything.
 */
export async function getFeed(db: Database, me: User, rawCursor: unknown): Promise<FeedPage> {
  const cursor = decodeCursor(rawCursor, feedCursorSchema);
  const params: Array<string | number> = [me.id, FEED_PAGE_SIZE + 1];
  if (cursor) params.push(...cursor);
  // Named statements (first page, later pages): each connection plans them once, not per request.
  const { rows } = await db.pool.query<FeedRow>({ name: cursor ? 'feed-after' : 'feed-first', text: feedSql(cursor), values: params });
  const page = rows.slice(0, FEED_PAGE_SIZE);
  const last = page[page.length - 1];
  return {
    items: page.map(toItem),
    nextCursor: rows.length > FEED_PAGE_SIZE ? encodeCursor([last.cursor_at, last.kind, last.id]) : null,
  };
}

/** How many items each racer's feed keeps; the nightly trim drops older ones (they stay in each setup's history). */
export const FEED_KEEP_PER_READER = 1000;

/**
 * The nightly trim of feed_items: for each racer with more than `keep` items, drops those older
 * than their `keep`-th newest (by the feed's own order). Answers how many rows went.
 */
export async function trimFeeds(db: Database, keep = FEED_KEEP_PER_READER): Promise<number> {
  if (!Number.isInteger(keep) || keep < 1) throw new Error(`trimFeeds: keep must be a whole number ≥ 1, got ${keep}`);
  const { rowCount } = await db.pool.query(
    `WITH over AS (SELECT reader_id FROM feed_items GROUP BY reader_id HAVING count(*) > $1),
          cut AS (SELECT o.reader_id, k.created_at, k.kind, k.item_id
                    FROM over o
                    CROSS JOIN LATERAL (SELECT fi.created_at, fi.kind, fi.item_id FROM feed_items fi WHERE fi.reader_id = o.reader_id
                                         ORDER BY fi.created_at DESC, fi.kind DESC, fi.item_id DESC OFFSET $1 - 1 LIMIT 1) k)
     DELETE FROM feed_items fi USING cut
      WHERE fi.reader_id = cut.reader_id AND (fi.created_at, fi.kind, fi.item_id) < (cut.created_at, cut.kind, cut.item_id)`,
    [keep],
  );
  return rowCount ?? 0;
}

const SUGGESTION_COUNT = 8;

/**
 * Racers to follow when my feed is empty: the most-forked racers in the classes I race (every class
 * when I list none), counting forks by others of their public setups in those classes. Racers I
 * already follow, suspended racers and I are left out; ties go to more public setups, then handle.
 */
export async function suggestRacers(db: Database, me: User): Promise<FeedSuggestions> {
  const classes = me.classesRaced ?? [];
  const { rows } = await db.pool.query<{ handle: string; display_name: string; fork_count: number; setup_count: number }>(
    `SELECT u.handle, u.display_name, count(DISTINCT k.id)::int AS fork_count, count(DISTINCT s.id)::int AS setup_count
       FROM users u
       JOIN setups s ON s.owner_id = u.id AND ${listableSetup('s')}
       LEFT JOIN setups k ON k.forked_from_setup_id = s.id AND k.deleted_at IS NULL AND k.hidden_at IS NULL AND k.owner_id <> u.id
      WHERE u.id <> $1 AND ${activeRacer('u')}
        AND (cardinality($2::text[]) = 0 OR s.vehicle_class = ANY ($2::text[]))
        AND NOT EXISTS (SELECT 1 FROM follows f WHERE f.follower_id = $1 AND f.followee_id = u.id)
      GROUP BY u.id
      ORDER BY fork_count DESC, setup_count DESC, lower(u.handle)
      LIMIT $3`,
    [me.id, classes, SUGGESTION_COUNT],
  );
  return {
    classes,
    racers: rows.map((r) => ({ handle: r.handle, displayName: r.display_name, forkCount: r.fork_count, setupCount: r.setup_count })),
  };
}
