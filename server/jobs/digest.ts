import type { Pool } from 'pg';
import type { NotificationMailJob, MailDeps, MailWithHeaders } from '../services/emailNotifications';
import { composeNotification, recipient, unsubscribeParts } from '../services/emailNotifications';
import { getEmailPreferences } from '../services/emailPreferences';
import { digestMail } from '../services/mailTemplates';
import { QUEUES, type JobQueue } from './queue';

/** Rows claimed longer ago than this belong to a digest job that gave up; the next run retakes them. */
const STALE_CLAIM = "interval '1 day'";

/**
 * The daily digest run (scheduled; tests call it directly): one digest job per racer with waiting
 * events, so one racer's failing mail server never holds up the others. Returns how many it queued.
 */
export async function queueDigests(pool: Pool, queue: JobQueue): Promise<number> {
  const { rows } = await pool.query<{ user_id: number }>(
    `SELECT DISTINCT user_id FROM email_digest_items
     WHERE claimed_by_job IS NULL OR claimed_at < now() - ${STALE_CLAIM}`,
  );
  for (const row of rows) await queue.send(QUEUES.digestMail, { userId: row.user_id });
  return rows.length;
}

/**
 * Claims a racer's waiting events for this job (a retry of the same job gets the same rows; another
 * job gets none), so a digest is sent once even when two runs overlap.
 */
async function claim(pool: Pool, userId: number, jobId: string): Promise<Array<{ id: number; notification: NotificationMailJob }>> {
  const { rows } = await pool.query<{ id: number; notification: NotificationMailJob }>(
    `UPDATE email_digest_items SET claimed_by_job = $2, claimed_at = now()
     WHERE user_id = $1 AND (claimed_by_job IS NULL OR claimed_by_job = $2 OR claimed_at < now() - ${STALE_CLAIM})
     RETURNING id, notification`,
    [userId, jobId],
  );
  return rows.sort((a, b) => a.id - b.id);
}

/**
 * One racer's digest job: everything still wanted (preferences are read again now) in one mail,
 * then the rows are gone. Throws when SMTP fails, so the queue retries this job with backoff.
 */
export async function sendDigest(deps: MailDeps, userId: number, jobId: string): Promise<'sent' | 'skipped'> {
  const { pool } = deps.db;
  const items = await claim(pool, userId, jobId);
  const done = () => pool.query('DELETE FROM email_digest_items WHERE claimed_by_job = $1', [jobId]);
  const [to, preferences] = await Promise.all([recipient(pool, userId), getEmailPreferences(pool, userId)]);
  const wanted = preferences.enabled && to ? items.filter((i) => preferences.types[i.notification.type]) : [];
  const lines: Array<{ text: string; url: string }> = [];
  for (const item of wanted) {
    const composed = await composeNotification(pool, deps.config.publicUrl, item.notification);
    if (composed) lines.push({ text: composed.digestLine, url: composed.link.url });
  }
  if (!to || lines.length === 0) {
    await done();
    return 'skipped';
  }
  const { links, headers } = unsubscribeParts(deps.config, userId, null);
  const mail: MailWithHeaders = { ...digestMail(to.email, to.displayName, lines, `${deps.config.publicUrl}/`, links), headers };
  await deps.mailer.send(mail);
  await done();
  return 'sent';
}
