import type { Database } from '../db/database';

/**
 * Ends a racer's sessions (all of them, or all but `exceptSid`). Sessions are rows of the shared
 * session table, so this signs them out on every app server at once.
 */
export async function destroySessionsOf(db: Database, userId: number, exceptSid?: string): Promise<number> {
  const result = await db.pool.query(
    "DELETE FROM sessions WHERE (sess -> 'passport' ->> 'user') = $1 AND ($2::text IS NULL OR sid <> $2)",
    [String(userId), exceptSid ?? null],
  );
  return result.rowCount ?? 0;
}
