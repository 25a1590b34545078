import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Writable } from 'node:stream';
import pino from 'pino';
import type { Express } from 'express';
import { createApp } from '../../server/app';
import { loadConfig, type Config } from '../../server/config';
import { createDatabase, type Database } from '../../server/db/database';
import type { Logger } from '../../server/logger';
import { useSharedRateLimits } from '../../server/middleware/rateLimit';
import { createMailer, type Mailer } from '../../server/services/mail';

/** Config for tests: the test database from scripts/test.sh, overridable per test. */
export function testConfig(overrides: Partial<Config> = {}): Config {
  // Rate limits are lifted unless a test is about them: one test file makes thousands of calls.
  return {
    ...loadConfig({ ...process.env, NODE_ENV: 'test' }),
    authRateLimit: { max: 100_000, windowMs: 60_000 },
    apiRateLimit: { max: 100_000, windowMs: 60_000 },
    commentRateLimit: { burst: { max: 100_000, windowMs: 60_000 }, sustained: { max: 100_000, windowMs: 60_000 } },
    // Photos go to a throwaway folder, never into the repository's .data.
    storage: { driver: 'local', directory: fs.mkdtempSync(path.join(os.tmpdir(), 'tunefork-photos-')) },
    ...overrides,
  };
}

/** A logger whose lines are kept in memory so tests can read what was logged. */
export function memoryLogger(): { logger: Logger; lines: string[] } {
  const lines: string[] = [];
  const stream = new Writable({
    write(chunk, _enc, done) {
      lines.push(String(chunk));
      done();
    },
  });
  return { logger: pino({ level: 'info' }, stream), lines };
}

export type TestApp = {
  app: Express;
  db: Database;
  mailer: Mailer;
  config: Config;
  logLines: string[];
  /** Closes the mailer (and its fake SMTP server) and the database pools. */
  close(): Promise<void>;
};

/** The real app on the real test database (already migrated by scripts/test.sh). */
export function buildTestApp(overrides: Partial<Config> = {}): TestApp {
  const config = testConfig(overrides);
  const db = createDatabase(config.databaseUrl);
  const { logger, lines } = memoryLogger();
  const mailer = createMailer(config, db, logger);
  const app = createApp({ config, db, logger, mailer });
  // As the server does: rate-limit counters in PostgreSQL.
  useSharedRateLimits(app, { pool: db.pool, logger });
  return {
    app,
    db,
    mailer,
    config,
    logLines: lines,
    async close() {
      await mailer.close();
      await db.close();
      if (config.storage.driver === 'local' && config.storage.directory.startsWith(path.join(os.tmpdir(), 'tunefork-photos-'))) {
        fs.rmSync(config.storage.directory, { recursive: true, force: true });
      }
    },
  };
}

/** Empties every application table (keeps the migration record) so tests start clean. */
export async function resetDatabase(db: Database): Promise<void> {
  const [rows] = await db.sequelize.query(
    "SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename <> 'migrations_meta'",
  );
  const tables = (rows as Array<{ tablename: string }>).map((r) => `"${r.tablename}"`);
  if (!tables.length) return;
  // setup_revisions refuses TRUNCATE by trigger; a test database reset is the one place allowed to
  // wipe it, by switching triggers off for this transaction only.
  await db.sequelize.transaction(async (transaction) => {
    await db.sequelize.query('SET LOCAL session_replication_role = replica', { transaction });
    await db.sequelize.query(`TRUNCATE ${tables.join(', ')} RESTART IDENTITY CASCADE`, { transaction });
  });
}
