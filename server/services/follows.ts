import { z } from 'zod';
import type { FollowList, FollowStatus } from '../../shared/types/community';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { User } from '../models/User';
import { findByHandle } from './accounts';
import { activeRacer, cursorIdSchema, cursorTime, cursorTimeSchema, decodeCursor, encodeCursor } from './feed';
import { notify } from './notifications';
import type { Viewer } from './setupAccess';

export const FOLLOW_PAGE_SIZE = 30;
const SELF_FOLLOW = 'You cannot follow yourself.';

async function findRacer(db: Database, handle: string): Promise<User> {
  const racer = handle.length <= 30 ? await findByHandle(db, handle) : null;
  if (!racer) throw ApiError.notFound('That racer');
  return racer;
}

/** Counts leave suspended racers out, as the lists do. */
async function statusOf(db: Database, racer: User, viewer: Viewer): Promise<FollowStatus> {
  const { rows } = await db.pool.query<{ followers: number; following: number; followed: boolean }>(
    `SELECT (SELECT count(*)::int FROM follows f JOIN users u ON u.id = f.follower_id AND ${activeRacer('u')} WHERE f.followee_id = $1) AS followers,
            (SELECT count(*)::int FROM follows f JOIN users u ON u.id = f.followee_id AND ${activeRacer('u')} WHERE f.follower_id = $1) AS following,
            EXISTS (SELECT 1 FROM follows WHERE follower_id = $2 AND followee_id = $1) AS followed`,
    [racer.id, viewer?.id ?? 0],
  );
  const { followers, following, followed } = rows[0];
  return {
    handle: racer.handle,
    followerCount: followers,
    followingCount: following,
    followedByMe: viewer ? followed : null,
    canFollow: Boolean(viewer) && viewer!.id !== racer.id,
  };
}

/** A racer's follower and following counts, and whether I follow them. */
export async function getFollowStatus(db: Database, handle: string, viewer: Viewer): Promise<FollowStatus> {
  return statusOf(db, await findRacer(db, handle), viewer);
}

/** Follows a racer (again is fine); they are told once, when the follow is new. */
export async function followRacer(db: Database, me: User, handle: string): Promise<FollowStatus> {
  const racer = await findRacer(db, handle);
  if (racer.id === me.id) throw ApiError.validation({ handle: SELF_FOLLOW }, SELF_FOLLOW);
  const { rowCount } = await db.pool.query(
    'INSERT INTO follows (follower_id, followee_id) VALUES ($1, $2) ON CONFLICT DO NOTHING',
    [me.id, racer.id],
  );
  if (rowCount) await notify(db, { type: 'new-follower', userId: racer.id, actorId: me.id });
  return statusOf(db, racer, me);
}

/** Stops following a racer (not following already is fine). */
export async function unfollowRacer(db: Database, me: User, handle: string): Promise<FollowStatus> {
  const racer = await findRacer(db, handle);
  await db.pool.query('DELETE FROM follows WHERE follower_id = $1 AND followee_id = $2', [me.id, racer.id]);
  return statusOf(db, racer, me);
}

const followCursorSchema = z.tuple([cursorTimeSchema, cursorIdSchema]);

/**
 * Who follows a racer (`followers`) or whom they follow (`following`), newest follow first, leaving
 * suspended racers out. Keyset on (created_at, the other racer's id).
 */
export async function listFollows(db: Database, handle: string, which: 'followers' | 'following', rawCursor: unknown): Promise<FollowList> {
  const cursor = decodeCursor(rawCursor, followCursorSchema);
  const racer = await findRacer(db, handle);
  const [mine, theirs] = which === 'followers' ? ['followee_id', 'follower_id'] : ['follower_id', 'followee_id'];
  const params: Array<string | number> = [racer.id, FOLLOW_PAGE_SIZE + 1];
  if (cursor) params.push(cursor[0], cursor[1]);
  const { rows } = await db.pool.query<{ id: number; handle: string; display_name: string; created_at: Date; cursor_at: string }>(
    `SELECT u.id, u.handle, u.display_name, f.created_at, ${cursorTime('f.created_at')} AS cursor_at
       FROM follows f JOIN users u ON u.id = f.${theirs} AND ${activeRacer('u')}
      WHERE f.${mine} = $1 ${cursor ? `AND (f.created_at, f.${theirs}) < ($3::timestamptz, $4::integer)` : ''}
      ORDER BY f.created_at DESC, f.${theirs} DESC
      LIMIT $2`,
    params,
  );
  const page = rows.slice(0, FOLLOW_PAGE_SIZE);
  const last = page[page.length - 1];
  return {
    racers: page.map((r) => ({ handle: r.handle, displayName: r.display_name, followedAt: r.created_at.toISOString() })),
    nextCursor: rows.length > FOLLOW_PAGE_SIZE ? encodeCursor([last.cursor_at, last.id]) : null,
  };
}
