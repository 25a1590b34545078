import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import type { Config } from '../config';
import type { Database } from '../db/database';
import { sessionUserHandoff } from './sessionUser';

export const SESSION_COOKIE = 'tunefork.sid';
const THIRTY_DAYS_MS = 30 * 24 * 60 * 60 * 1000;
const TOUCH_EVERY_MS = 10 * 60 * 1000;
const TOUCH_MEMO_ENTRIES = 50_000;

/**
 * Sessions live in PostgreSQL (the `sessions` table), so they survive restarts and every app
 * server sees the same ones. Cookies are httpOnly, SameSite=Lax, and Secure whenever the request
 * arrived over HTTPS.
 */
export function sessionMiddleware(config: Config, db: Database) {
  const PgStore = connectPgSimple(session);
  /**
   * express-session touches a stored session on every request that uses it, to push its expiry
   * (30 days) forward: one UPDATE per signed-in request. A session touched by this server in the
   * last TOUCH_EVERY_MS keeps its expiry; at worst a session then ends that long before 30 days of
   * idleness. Which sessions this server touched lately is a speed-up only: a server that has not
   * seen a session touches it.
   */
  const handoff = sessionUserHandoff(db);
  // The session and its racer in one prepared statement (see sessionUser.ts); the expiry test is
  // the store's own. A session whose racer is gone reads as before, with no racer handed over.
  const sessionWithUser = `SELECT s.sess AS "__sess", ${handoff.userColumns}
      FROM sessions s
      LEFT JOIN users u ON u.id = CASE WHEN s.sess #>> '{passport,user}' ~ '^[0-9]{1,9}$' THEN (s.sess #>> '{passport,user}')::integer END
     WHERE s.sid = $1 AND s.expire >= to_timestamp($2)`;
  class ThrottledPgStore extends PgStore {
    private readonly touchedAt = new Map<string, number>();
    override get(sid: string, callback: (err: unknown, session?: session.SessionData | null) => void): void {
      db.pool.query({ name: 'session-with-user', text: sessionWithUser, values: [sid, Math.ceil(Date.now() / 1000)] }).then(
        ({ rows }) => {
          if (!rows.length) return callback(null, null);
          const { __sess: sess, ...user } = rows[0] as { __sess: unknown } & Record<string, unknown>;
          if (user.id !== null && user.id !== undefined) handoff.put(user);
          if (typeof sess !== 'string') return callback(null, sess as session.SessionData);
          try {
            callback(null, JSON.parse(sess) as session.SessionData);
          } catch {
            // The store's own answer to a damaged row: forget it.
            this.destroy(sid, (err) => callback(err, null));
          }
        },
        (err: unknown) => callback(err),
      );
    }
    override touch(sid: string, sess: session.SessionData, callback?: (err?: unknown) => void): void {
      const now = Date.now();
      const last = this.touchedAt.get(sid);
      if (last !== undefined && now - last < TOUCH_EVERY_MS) {
        callback?.();
        return;
      }
      this.touchedAt.set(sid, now);
      if (this.touchedAt.size > TOUCH_MEMO_ENTRIES) this.touchedAt.delete(this.touchedAt.keys().next().value!);
      super.touch(sid, sess, callback);
    }
  }
  return session({
    name: SESSION_COOKIE,
    secret: config.sessionSecret,
    store: new ThrottledPgStore({
      pool: db.pool,
      tableName: 'sessions',
      createTableIfMissing: false,
      // Tests build many short-lived apps; only long-running servers prune expired rows.
      pruneSessionInterval: config.nodeEnv === 'test' ? false : 15 * 60,
    }),
    resave: false,
    saveUninitialized: false,
    cookie: { httpOnly: true, sameSite: 'lax', secure: 'auto', maxAge: THIRTY_DAYS_MS },
  });
}
