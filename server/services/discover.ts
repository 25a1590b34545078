import { z } from 'zod';
import { DISCOVER_PAGE_SIZE, discoverQuerySchema, type DiscoverPage, type DiscoverQuery, type DiscoverSetup } from '../../shared/types/community';
import { trackTypeLabel, type TrackTypeKey } from '../../shared/types/trackTypes';
import type { Database } from '../db/database';
import { preparedQuery } from '../db/prepared';
import { ApiError } from '../errors';

/*
 * Discover: public setups, filtered and ordered three ways, a page at a time. Pages are keyset
 * (the cursor carries the last row's sort key), so a page costs the same however deep it is, and
 * each order walks an index: newest (setups_listed_created_idx), most forked
 * (setups_listed_forks_idx, over the maintained fork_count) and best for a track type
 * (setup_vote_counts_rank_idx, over the maintained Wilson bound). Raw SQL, no model instances.
 */

/** Listed: public, neither hidden nor deleted, and its racer not suspended. */
export const LISTED_SQL = `s.visibility = 'public' AND s.hidden_at IS NULL AND s.deleted_at IS NULL
  AND NOT u.suspended_indefinitely AND (u.suspended_until IS NULL OR u.suspended_until <= now())`;

export const CARD_FROM_SQL = `setups s
  JOIN users u ON u.id = s.owner_id
  JOIN cars c ON c.id = s.car_id
  JOIN kits k ON k.id = c.kit_id
  JOIN makers m ON m.id = k.maker_id`;

export const CARD_COLUMNS_SQL = `s.id, s.title, u.handle AS "ownerHandle", k.id AS "kitId", k.name AS "kitName", m.name AS "makerName",
  s.vehicle_class AS "vehicleClass", s.track_type AS "trackType", s.temperature_c AS "temperatureC",
  s.fork_count AS "forkCount", s.revision_count AS "revisionCount", s.created_at AS "createdAt", s.updated_at AS "updatedAt"`;

export type CardRow = Omit<DiscoverSetup, 'createdAt' | 'updatedAt' | 'votes'> & { createdAt: Date | string; updatedAt: Date | string };

export function toCard(row: CardRow, votes: DiscoverSetup['votes'] = null): DiscoverSetup {
  return {
    id: row.id,
    title: row.title,
    ownerHandle: row.ownerHandle,
    kitId: row.kitId,
    kitName: row.kitName,
    makerName: row.makerName,
    vehicleClass: row.vehicleClass,
    trackType: row.trackType,
    temperatureC: row.temperatureC === null ? null : Number(row.temperatureC),
    forkCount: row.forkCount,
    revisionCount: row.revisionCount,
    createdAt: new Date(row.createdAt).toISOString(),
    updatedAt: new Date(row.updatedAt).toISOString(),
    votes,
  };
}

// ---- Cursors: base64url JSON of the last row's sort key, checked strictly before it reaches SQL ----

const idKey = z.number().int().min(1).max(2_147_483_647);
/** A creation time exactly as the query printed it (microseconds, UTC). */
const timeKey = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{6}Z$/)
  .refine((t) => {
    const ms = Date.parse(`${t.slice(0, 23)}Z`);
    return Number.isFinite(ms) && new Date(ms).toISOString().slice(0, 23) === t.slice(0, 23);
  });
const wilsonKey = z.string().regex(/^[01](\.\d{1,8})?$/);

export const cursorSchemas = {
  newest: z.object({ o: z.literal('newest'), t: timeKey, id: idKey }),
  'most-forked': z.object({ o: z.literal('most-forked'), f: z.number().int().min(0).max(2_147_483_647), id: idKey }),
  'best-for': z.union([
    z.object({ o: z.literal('best-for'), p: z.literal('voted'), w: wilsonKey, id: idKey }),
    z.object({ o: z.literal('best-for'), p: z.literal('unvoted'), id: idKey }),
  ]),
  search: z.object({ o: z.literal('search'), r: z.number().min(0).max(1), id: idKey }),
};

export function encodeCursor(key: Record<string, unknown>): string {
  return Buffer.from(JSON.stringify(key)).toString('base64url');
}

/** The cursor's sort key, or a 400 that says to start again: a stale or edited link must not reach SQL. */
export function decodeCursor<S extends z.ZodTypeAny>(schema: S, cursor: string): z.output<S> {
  let json: unknown;
  try {
    json = JSON.parse(Buffer.from(cursor, 'base64url').toString('utf8'));
  } catch {
    json = null;
  }
  const parsed = schema.safeParse(json);
  if (!parsed.success) {
    const message = 'That page link does not fit this list; start again from the top.';
    throw ApiError.validation({ cursor: message }, message);
  }
  return parsed.data;
}

/** Parses a query string with a schema; a refusal names each parameter and leads with the first problem. */
export function parseQuery<S extends z.ZodTypeAny>(schema: S, query: unknown): z.output<S> {
  // An empty parameter (`kit=`) means "any", as a cleared filter in a shared link.
  const present = Object.fromEntries(Object.entries((query ?? {}) as Record<string, unknown>).filter(([, v]) => v !== ''));
  const parsed = schema.safeParse(present);
  if (parsed.success) return parsed.data;
  const details: Record<string, string> = {};
  for (const issue of parsed.error.issues) details[issue.path.join('.') || '_'] = issue.message;
  throw ApiError.validation(details, parsed.error.issues[0].message);
}

// ---- Filters and orders ----

type Sql = { where: string[]; params: Record<string, unknown> };

function filters(q: DiscoverQuery): Sql {
  const sql: Sql = { where: [LISTED_SQL], params: {} };
  const add = (condition: string, name: string, value: unknown) => {
    if (value === undefined) return;
    sql.where.push(condition);
    sql.params[name] = value;
  };
  add('s.vehicle_class = :class', 'class', q.class);
  add('c.kit_id = :kit', 'kit', q.kit);
  add('s.track_type = :trackType', 'trackType', q.trackType);
  add('s.temperature_c >= :tempMin', 'tempMin', q.tempMin);
  add('s.temperature_c <= :tempMax', 'tempMax', q.tempMax);
  return sql;
}

type KeyedRow = CardRow & { createdKey: string; works?: number; fails?: number; wilson?: number; wilsonKey?: string };

/** Each list query's shape is a prepared statement, planned once per connection (server/db/prepared.ts). */
async function select(db: Database, sql: string, params: Record<string, unknown>): Promise<KeyedRow[]> {
  return preparedQuery<KeyedRow>(db.pool, sql, params);
}

const CREATED_KEY_SQL = `to_char(s.created_at AT TIME ZONE 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.US"Z"') AS "createdKey"`;

async function newestPage(db: Database, q: DiscoverQuery, limit: number): Promise<DiscoverPage> {
  const { where, params } = filters(q);
  if (q.cursor) {
    const key = decodeCursor(cursorSchemas.newest, q.cursor);
    where.push('(s.created_at, s.id) < (:afterTime::timestamptz, :afterId)');
    Object.assign(params, { afterTime: key.t, afterId: key.id });
  }
  const rows = await select(
    db,
    `SELECT ${CARD_COLUMNS_SQL}, ${CREATED_KEY_SQL} FROM ${CARD_FROM_SQL}
      WHERE ${where.join(' AND ')} ORDER BY s.created_at DESC, s.id DESC LIMIT :limit`,
    { ...params, limit: limit + 1 },
  );
  const page = rows.slice(0, limit);
  const last = page[page.length - 1];
  return {
    setups: page.map((r) => toCard(r)),
    nextCursor: rows.length > limit ? encodeCursor({ o: 'newest', t: last.createdKey, id: last.id }) : null,
    explanation: 'Newest first: the setups racers started most recently.',
  };
}

async function mostForkedPage(db: Database, q: DiscoverQuery, limit: number): Promise<DiscoverPage> {
  const { where, params } = filters(q);
  if (q.cursor) {
    const key = decodeCursor(cursorSchemas['most-forked'], q.cursor);
    where.push('(s.fork_count, s.id) < (:afterForks, :afterId)');
    Object.assign(params, { afterForks: key.f, afterId: key.id });
  }
  const rows = await select(
    db,
    `SELECT ${CARD_COLUMNS_SQL}, ${CREATED_KEY_SQL} FROM ${CARD_FROM_SQL}
      WHERE ${where.join(' AND ')} ORDER BY s.fork_count DESC, s.id DESC LIMIT :limit`,
    { ...params, limit: limit + 1 },
  );
  const page = rows.slice(0, limit);
  const last = page[page.length - 1];
  return {
    setups: page.map((r) => toCard(r)),
    nextCursor: rows.length > limit ? encodeCursor({ o: 'most-forked', f: last.forkCount, id: last.id }) : null,
    explanation: 'Most forked first: how many racers copied the setup into their own garage (deleted and hidden forks do not count).',
  };
}

/** The "why this order" of best-for, in words a racer can check against the numbers beside each setup. */
export function bestForExplanation(trackType: TrackTypeKey): string {
  const surface = trackTypeLabel(trackType);
  return (
    `Best for ${surface} first. Each setup is ranked by the share of racers who say it works on ${surface.toLowerCase()} ` +
    'tracks, taken at the low end of what its votes can show with 95 % confidence (the lower bound of the Wilson score interval). ' +
    'Few votes leave a wide margin, so 3 of 3 ranks below 90 of 100. Setups nobody has voted on for this surface come last, newest first.'
  );
}

export type BestForKey = z.output<(typeof cursorSchemas)['best-for']>;

/**
 * Best for a track type: first the setups with votes for it, by Wilson bound (index walk over the
 * maintained counts); then those without any vote for it (0/0), newest first. The cursor says
 * which of the two runs the last row came from.
 */
async function bestForPage(db: Database, q: DiscoverQuery, limit: number): Promise<DiscoverPage> {
  const trackType = q.bestFor!;
  const key: BestForKey | null = q.cursor ? decodeCursor(cursorSchemas['best-for'], q.cursor) : null;
  const voted: KeyedRow[] = [];
  if (!key || key.p === 'voted') {
    const { where, params } = filters(q);
    where.push('vc.track_type = :bestFor', 'vc.works + vc.fails > 0');
    if (key?.p === 'voted') {
      where.push('(vc.wilson, vc.setup_id) < (:afterWilson::numeric, :afterId)');
      Object.assign(params, { afterWilson: key.w, afterId: key.id });
    }
    voted.push(
      ...(await select(
        db,
        `SELECT ${CARD_COLUMNS_SQL}, ${CREATED_KEY_SQL}, vc.works, vc.fails, vc.wilson::float8 AS wilson, vc.wilson::text AS "wilsonKey"
           FROM setup_vote_counts vc JOIN ${CARD_FROM_SQL} ON s.id = vc.setup_id
          WHERE ${where.join(' AND ')} ORDER BY vc.wilson DESC, vc.setup_id DESC LIMIT :limit`,
        { ...params, bestFor: trackType, limit: limit + 1 },
      )),
    );
  }
  const unvoted: KeyedRow[] = [];
  if (voted.length <= limit) {
    const { where, params } = filters(q);
    where.push('NOT EXISTS (SELECT 1 FROM setup_vote_counts vc WHERE vc.setup_id = s.id AND vc.track_type = :bestFor AND vc.works + vc.fails > 0)');
    if (key?.p === 'unvoted') {
      where.push('s.id < :afterId');
      params.afterId = key.id;
    }
    unvoted.push(
      ...(await select(
        db,
        `SELECT ${CARD_COLUMNS_SQL}, ${CREATED_KEY_SQL} FROM ${CARD_FROM_SQL}
          WHERE ${where.join(' AND ')} ORDER BY s.id DESC LIMIT :limit`,
        { ...params, bestFor: trackType, limit: limit + 1 - voted.length },
      )),
    );
  }
  const rows = [...voted.map((r) => ({ row: r, voted: true })), ...unvoted.map((r) => ({ row: r, voted: false }))];
  const page = rows.slice(0, limit);
  const last = page[page.length - 1];
  const next = rows.length > limit ? (last.voted ? { o: 'best-for', p: 'voted', w: last.row.wilsonKey, id: last.row.id } : { o: 'best-for', p: 'unvoted', id: last.row.id }) : null;
  return {
    setups: page.map(({ row, voted: hasVotes }) =>
      toCard(row, { trackType, works: hasVotes ? row.works! : 0, fails: hasVotes ? row.fails! : 0, wilson: hasVotes ? row.wilson! : 0 }),
    ),
    nextCursor: next ? encodeCursor(next) : null,
    explanation: bestForExplanation(trackType),
  };
}

/**
 * `GET /api/discover`: public setups of racers in good standing, filtered by class, kit, track
 * type and temperature range, ordered newest, most forked or best for a track type.
 */
export async function discoverSetups(db: Database, query: unknown, limit = DISCOVER_PAGE_SIZE): Promise<DiscoverPage> {
  const q = parseQuery(discoverQuerySchema, query);
  if (q.sort === 'most-forked') return mostForkedPage(db, q, limit);
  if (q.sort === 'best-for') return bestForPage(db, q, limit);
  return newestPage(db, q, limit);
}
