import type { Server } from 'node:http';
import { ConfigError, loadConfig } from './config';
import { createApp } from './app';
import { createDatabase } from './db/database';
import { startJobQueue } from './jobs';
import { createLogger } from './logger';
import { useSharedRateLimits } from './middleware/rateLimit';
import { registerEmailNotifications } from './services/emailNotifications';
import { createMailer } from './services/mail';

async function main(): Promise<void> {
  let config;
  try {
    config = loadConfig();
  } catch (err) {
    if (err instanceof ConfigError) {
      console.error(err.message);
      process.exit(2);
    }
    throw err;
  }
  const logger = createLogger(config);
  const db = createDatabase(config.databaseUrl);
  await db.ping(5_000);

  const mailer = createMailer(config, db, logger);
  // The queue (and, unless JOB_WORKERS=false, this process's workers) before the first request.
  const queue = await startJobQueue({ config, db, logger, mailer });
  registerEmailNotifications(queue, logger);
  const app = createApp({ config, db, logger, mailer });
  // Rate-limit counters in PostgreSQL, shared with every other server on this database.
  useSharedRateLimits(app, { pool: db.pool, logger });
  const server: Server = app.listen(config.port, config.host, () => {
    logger.info(`Tunefork is listening on http://${config.host}:${config.port}`);
  });
  server.on('error', (err) => {
    logger.fatal({ err }, 'could not start the HTTP server');
    process.exit(1);
  });

  let closing = false;
  const shutdown = (signal: string) => {
    if (closing) return;
    closing = true;
    logger.info(`${signal}: closing the HTTP server, the job queue, then the database pool`);
    server.close(() => {
      // Jobs in hand get a few seconds to finish; any cut short are retried by another worker.
      queue
        .stop(7_000)
        .then(() => mailer.close())
        .then(() => db.close())
        .finally(() => process.exit(0));
    });
    server.closeIdleConnections();
    setTimeout(() => process.exit(1), 10_000).unref();
  };
  process.on('SIGINT', () => shutdown('SIGINT'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
}

main().catch((err: unknown) => {
  console.error('Tunefork could not start:', err instanceof Error ? err.message : err);
  process.exit(1);
});
