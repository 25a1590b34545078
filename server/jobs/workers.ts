import { deleteExpiredRateLimits } from '../middleware/rateLimit';
import { trimFeeds } from '../services/feed';
import { deliverNotificationMail, type MailDeps, type NotificationMailJob } from '../services/emailNotifications';
import { queueDigests, sendDigest } from './digest';
import { QUEUES, type JobQueue } from './queue';

/** Housekeeping schedule for rate-limit counters (every 15 minutes). */
const RATE_LIMIT_CLEANUP_CRON = '*/15 * * * *';
/** The feed trim, nightly at 03:40 (server time), away from the digest. */
const FEED_TRIM_CRON = '40 3 * * *';

/**
 * Registers this process's workers and the schedules. Schedules are rows keyed by queue name, so
 * every server writing them leaves one schedule, and pg-boss makes one job per cron slot.
 */
export async function startWorkers(queue: JobQueue, deps: MailDeps): Promise<void> {
  const { logger } = deps;
  await queue.work<NotificationMailJob>(QUEUES.notificationMail, async (job) => {
    const outcome = await deliverNotificationMail(deps, job.data);
    logger.debug({ jobId: job.id, type: job.data.type, outcome, attempt: job.retryCount + 1 }, 'notification e-mail job done');
  });
  await queue.work(QUEUES.digestRun, async () => {
    logger.info({ racers: await queueDigests(deps.db.pool, queue) }, 'daily digests queued');
  });
  await queue.work<{ userId: number }>(QUEUES.digestMail, async (job) => {
    await sendDigest(deps, job.data.userId, job.id);
  });
  await queue.work(QUEUES.rateLimitCleanup, async () => {
    await deleteExpiredRateLimits(deps.db.pool);
  });
  await queue.work(QUEUES.feedTrim, async () => {
    logger.info({ rows: await trimFeeds(deps.db) }, 'activity feeds trimmed');
  });
  const { digestCron, digestTimezone } = deps.config.notificationMail;
  await queue.boss.schedule(QUEUES.digestRun, digestCron, {}, { tz: digestTimezone });
  await queue.boss.schedule(QUEUES.rateLimitCleanup, RATE_LIMIT_CLEANUP_CRON, {});
  await queue.boss.schedule(QUEUES.feedTrim, FEED_TRIM_CRON, {});
}
