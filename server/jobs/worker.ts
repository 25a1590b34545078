import { ConfigError, loadConfig } from '../config';
import { createDatabase } from '../db/database';
import { createLogger } from '../logger';
import { createMailer } from '../services/mail';
import { startJobQueue } from '.';

/**
 * A queue worker without HTTP: `tsx server/jobs/worker.ts` with the app's environment. Run any
 * number beside app servers started with JOB_WORKERS=false; SIGINT/SIGTERM finish the job in hand.
 */
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
  const queue = await startJobQueue({ config, db, logger, mailer }, { runWorkers: true });
  logger.info('Tunefork queue worker is running');

  let closing = false;
  const shutdown = (signal: string) => {
    if (closing) return;
    closing = true;
    logger.info(`${signal}: finishing the job in hand, then closing`);
    queue
      .stop()
      .then(() => mailer.close())
      .then(() => db.close())
      .finally(() => process.exit(0));
    setTimeout(() => process.exit(1), 15_000).unref();
  };
  process.on('SIGINT', () => shutdown('SIGINT'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
}

main().catch((err: unknown) => {
  console.error('Tunefork queue worker could not start:', err instanceof Error ? err.message : err);
  process.exit(1);
});
