import PgBoss from 'pg-boss';
import type { Config } from '../config';
import type { Logger } from '../logger';

/** Every queue Tunefork uses. Names are stable: they are rows in pg-boss's tables. */
export const QUEUES = {
  /** One notification's e-mail (or its place in the racer's next digest). */
  notificationMail: 'notification-mail',
  /** The daily run that hands each racer with waiting items a digest job. */
  digestRun: 'email-digest',
  /** One racer's digest mail. */
  digestMail: 'email-digest-racer',
  /** Drops rate-limit counters whose window has ended. */
  rateLimitCleanup: 'rate-limit-cleanup',
  /** Keeps each racer's activity feed to its newest FEED_KEEP_PER_READER items (nightly). */
  feedTrim: 'feed-trim',
} as const;
export type QueueName = (typeof QUEUES)[keyof typeof QUEUES];

export type JobQueue = {
  readonly boss: PgBoss;
  /** True between start() and stop(): a stopped queue takes no new jobs. */
  readonly running: boolean;
  /** Creates or updates pg-boss's schema and our queues. Safe on many servers at once. */
  start(): Promise<void>;
  /** Stops polling, waits up to `timeoutMs` for jobs in hand, then closes the pool. */
  stop(timeoutMs?: number): Promise<void>;
  send(name: QueueName, data: object, options?: PgBoss.SendOptions): Promise<string | null>;
  /** Registers a worker that takes one job at a time; a thrown error fails the job for a retry. */
  work<T extends object>(name: QueueName, handler: (job: PgBoss.JobWithMetadata<T>) => Promise<void>): Promise<string>;
};

/** Retry policy per queue: mail retries with exponential backoff; housekeeping does not retry. */
function queuePolicies(config: Config): Record<QueueName, PgBoss.Queue> {
  const { retryLimit, retryDelaySeconds } = config.notificationMail;
  const mail = { retryLimit, retryDelay: retryDelaySeconds, retryBackoff: true, expireInSeconds: 5 * 60 };
  return {
    [QUEUES.notificationMail]: { name: QUEUES.notificationMail, ...mail },
    [QUEUES.digestMail]: { name: QUEUES.digestMail, ...mail },
    [QUEUES.digestRun]: { name: QUEUES.digestRun, retryLimit: 3, retryDelay: 60, retryBackoff: true, expireInSeconds: 10 * 60 },
    [QUEUES.rateLimitCleanup]: { name: QUEUES.rateLimitCleanup, retryLimit: 0, expireInSeconds: 5 * 60 },
    [QUEUES.feedTrim]: { name: QUEUES.feedTrim, retryLimit: 0, expireInSeconds: 15 * 60 },
  };
}

/**
 * pg-boss over its own small pool on the app's database (its tables live in the `pgboss` schema;
 * finished jobs move to its archive after 12 hours and are deleted after a week, its defaults).
 * Jobs are rows: any number of servers may send and work; a job is fetched by exactly one worker
 * (SELECT … FOR UPDATE SKIP LOCKED) and goes back for a retry when its handler throws.
 */
export function createJobQueue(config: Config, logger: Logger, options: { runWorkers: boolean }): JobQueue {
  const boss = new PgBoss({
    connectionString: config.databaseUrl,
    application_name: 'tunefork-jobs',
    max: 4,
    // Cron slots and maintenance (expiry, archiving) belong to processes that work jobs; an app
    // server that only sends jobs needs neither.
    schedule: options.runWorkers,
    supervise: options.runWorkers,
  });
  // pg-boss reports pool and maintenance problems as events; unhandled, they would end the process.
  boss.on('error', (err) => logger.error({ err }, 'job queue error'));
  let running = false;
  const policies = queuePolicies(config);

  return {
    boss,
    get running() {
      return running;
    },
    async start() {
      await boss.start();
      for (const policy of Object.values(policies)) {
        // Servers starting together create and update the same queues; PostgreSQL may then end one
        // of them as a deadlock victim. That server tries again after a short random pause.
        await retryOnDeadlock(async () => {
          await boss.createQueue(policy.name, policy);
          // A restart with new settings (MAIL_RETRY_LIMIT…) applies them to the existing queue.
          await boss.updateQueue(policy.name, policy);
        });
      }
      running = true;
    },
    async stop(timeoutMs = 10_000) {
      running = false;
      await boss.stop({ graceful: true, timeout: timeoutMs, close: true });
    },
    send(name, data, options = {}) {
      return boss.send(name, data, options);
    },
    work<T extends object>(name: QueueName, handler: (job: PgBoss.JobWithMetadata<T>) => Promise<void>) {
      return boss.work<T>(
        name,
        { includeMetadata: true, batchSize: 1, pollingIntervalSeconds: config.jobs.pollIntervalSeconds },
        async ([job]) => {
          await handler(job);
        },
      );
    },
  };
}

/** Runs `step` again (up to 5 tries in all) when PostgreSQL ends it as a deadlock victim. */
async function retryOnDeadlock(step: () => Promise<void>): Promise<void> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await step();
    } catch (err) {
      if ((err as { code?: string }).code !== '40P01' || attempt >= 5) throw err;
      await new Promise((resolve) => setTimeout(resolve, 50 + Math.random() * 200 * attempt));
    }
  }
}
