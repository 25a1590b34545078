import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import type { Config } from '../config';
import type { Database } from '../db/database';

export const SESSION_COOKIE = 'tunefork.sid';
const THIRTY_DAYS_MS = 30 * 24 * 60 * 60 * 1000;

/**
 * Sessions live in PostgreSQL (the `sessions` table), so they survive restarts and every app
 * server sees the same ones. Cookies are httpOnly, SameSite=Lax, and Secure whenever the request
 * arrived over HTTPS.
 */
export function sessionMiddleware(config: Config, db: Database) {
  const PgStore = connectPgSimple(session);
  return session({
    name: SESSION_COOKIE,
    secret: config.sessionSecret,
    store: new PgStore({
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
