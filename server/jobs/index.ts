import type { MailDeps } from '../services/emailNotifications';
import { createJobQueue, type JobQueue } from './queue';
import { startWorkers } from './workers';

export { QUEUES, type JobQueue } from './queue';

/**
 * Starts the job queue against the app's database and, unless JOB_WORKERS=false (app servers whose
 * workers run as separate processes), this process's workers. Stop it with `queue.stop()`.
 */
export async function startJobQueue(deps: MailDeps, options: { runWorkers?: boolean } = {}): Promise<JobQueue> {
  const runWorkers = options.runWorkers ?? deps.config.jobs.runWorkers;
  const queue = createJobQueue(deps.config, deps.logger, { runWorkers });
  await queue.start();
  try {
    if (runWorkers) await startWorkers(queue, deps);
  } catch (err) {
    await queue.stop();
    throw err;
  }
  return queue;
}
