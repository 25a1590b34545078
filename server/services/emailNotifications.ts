import type { Pool } from 'pg';
import { EMAIL_TYPE_LABELS, notificationEventSchema, type NotificationType } from '../../shared/types/community';
import type { Config } from '../config';
import type { Database } from '../db/database';
import { QUEUES, type JobQueue } from '../jobs/queue';
import type { Logger } from '../logger';
import type { Mailer, OutgoingMail } from './mail';
import { notificationMail, type UnsubscribeLinks } from './mailTemplates';
import { deliveryFor, getEmailPreferences } from './emailPreferences';
import { onNotification, type StoredNotification } from './notifications';
import { createUnsubscribeToken } from './unsubscribe';

/** What a notification mail job carries: the stored notification's fields. */
export type NotificationMailJob = {
  id: number;
  type: NotificationType;
  userId: number;
  actorId: number | null;
  setupId: number | null;
  revisionId: number | null;
  commentId: number | null;
  detail: string;
};

export type MailDeps = { db: Database; mailer: Mailer; config: Config; logger: Logger };

/** A mail plus the headers that make mail programs offer one-click unsubscribe (RFC 2369, RFC 8058). */
export type MailWithHeaders = OutgoingMail & { headers: Record<string, string> };

function toJob(n: StoredNotification): NotificationMailJob {
  return { id: n.id, ...notificationEventSchema.parse(n) };
}

/**
 * The listener the in-app notifications service calls with each stored notification: it only
 * queues a job (one INSERT), so the request that caused the event never waits for SMTP, and a
 * queue failure is logged rather than failing that request.
 */
export function notificationMailListener(queue: JobQueue, logger: Logger) {
  return async (notification: StoredNotification): Promise<void> => {
    if (!queue.running) return;
    try {
      await queue.send(QUEUES.notificationMail, toJob(notification));
    } catch (err) {
      logger.error({ err, type: notification.type }, 'could not queue a notification e-mail');
    }
  };
}

/**
 * Sends notification e-mail for every notification the in-app service stores from now on, through
 * `queue`. Listeners cannot be removed; once the queue stops, this one does nothing.
 */
export function registerEmailNotifications(queue: JobQueue, logger: Logger): void {
  onNotification(notificationMailListener(queue, logger));
}

type Person = { handle: string; displayName: string; suspended: boolean };

async function person(pool: Pool, id: number | null): Promise<Person | null> {
  if (id === null) return null;
  const { rows } = await pool.query<{ handle: string; display_name: string; suspended: boolean }>(
    `SELECT handle, display_name, (suspended_indefinitely OR coalesce(suspended_until > now(), false)) AS suspended
     FROM users WHERE id = $1`,
    [id],
  );
  return rows[0] ? { handle: rows[0].handle, displayName: rows[0].display_name, suspended: rows[0].suspended } : null;
}

async function setupTitle(pool: Pool, id: number | null): Promise<string | null | undefined> {
  if (id === null) return undefined;
  const { rows } = await pool.query<{ title: string }>('SELECT title FROM setups WHERE id = $1 AND deleted_at IS NULL AND hidden_at IS NULL', [id]);
  return rows[0]?.title ?? null;
}

export type ComposedNotification = { subject: string; lines: string[]; link: { label: string; url: string }; digestLine: string };

/**
 * The words and link of one notification, read fresh from the database. Null when there is nothing
 * worth mailing any more: the setup was deleted or hidden, or the racer who acted is suspended.
 */
export async function composeNotification(pool: Pool, publicUrl: string, n: NotificationMailJob): Promise<ComposedNotification | null> {
  // Moderation outcomes are about hidden things on purpose: they are mailed even when the setup is hidden.
  const aboutModeration = n.type === 'report-outcome' || n.type === 'moderation-notice';
  const [actor, title] = await Promise.all([
    person(pool, n.actorId),
    aboutModeration ? Promise.resolve(undefined) : setupTitle(pool, n.setupId),
  ]);
  if (title === null || actor?.suspended) return null;
  const who = actor ? actor.displayName : 'A racer';
  const quoted = `“${title ?? 'your setup'}”`;
  const setupUrl = n.setupId ? `${publicUrl}/setups/${n.setupId}` : `${publicUrl}/`;
  const historyUrl = n.setupId ? `${publicUrl}/setups/${n.setupId}/history` : setupUrl;
  const detail = n.detail.trim();
  const said = detail ? [`“${detail}”`] : [];
  switch (n.type) {
    case 'new-follower':
      return {
        subject: `${who} now follows you on Tunefork`,
        lines: [`${who}${actor ? ` (@${actor.handle})` : ''} now follows you and will see your public setups in their feed.`],
        link: { label: 'See their profile', url: actor ? `${publicUrl}/racers/${encodeURIComponent(actor.handle)}` : `${publicUrl}/` },
        digestLine: `${who} started following you`,
      };
    case 'comment-on-setup':
      return {
        subject: `${who} commented on ${quoted}`,
        lines: [`${who} commented on your setup ${quoted}:`, ...said],
        link: { label: 'Read the comment', url: setupUrl },
        digestLine: `${who} commented on ${quoted}`,
      };
    case 'comment-on-revision':
      return {
        subject: `${who} commented on a change to ${quoted}`,
        lines: [`${who} commented on one of your changes to ${quoted}:`, ...said],
        link: { label: 'See the change and the comment', url: historyUrl },
        digestLine: `${who} commented on a change to ${quoted}`,
      };
    case 'comment-reply':
      return {
        subject: `${who} replied to your comment on ${quoted}`,
        lines: [`${who} replied to your comment on ${quoted}:`, ...said],
        link: { label: 'Read the reply', url: n.revisionId ? historyUrl : setupUrl },
        digestLine: `${who} replied to your comment on ${quoted}`,
      };
    case 'setup-forked':
      return {
        subject: `${who} forked ${quoted}`,
        lines: [`${who} forked your setup ${quoted} into their garage.`],
        link: { label: 'See the setup', url: setupUrl },
        digestLine: `${who} forked ${quoted}`,
      };
    case 'original-changed':
      return {
        subject: `The original of ${quoted} changed`,
        lines: [`The setup your fork ${quoted} came from has a new revision.`, ...(detail ? [`Change note: ${detail}`] : [])],
        link: { label: 'Review the changes', url: n.setupId ? `${setupUrl}/sync` : setupUrl },
        digestLine: `The original of ${quoted} changed${detail ? ` (${detail})` : ''}`,
      };
    case 'report-outcome':
      return {
        subject: 'A moderator reviewed your report',
        lines: [detail || 'A moderator reviewed your report. Thank you for helping keep Tunefork useful.'],
        link: { label: 'Open Tunefork', url: `${publicUrl}/` },
        digestLine: `A moderator reviewed your report${detail ? `: ${detail}` : ''}`,
      };
    case 'moderation-notice':
      return {
        subject: 'A message from the Tunefork moderators',
        lines: [detail || 'The moderators made a decision about your content or account.'],
        link: { label: 'See what was decided and how to appeal', url: `${publicUrl}/moderation/mine` },
        digestLine: `The moderators made a decision${detail ? `: ${detail}` : ''}`,
      };
  }
}

/** The footer's links and the List-Unsubscribe headers for one kind of mail (a type, or all). */
export function unsubscribeParts(config: Config, userId: number, type: NotificationType | null) {
  const secret = config.notificationMail.unsubscribeSecret;
  const page = (scope: NotificationType | 'all') => `${config.publicUrl}/unsubscribe?token=${createUnsubscribeToken(secret, userId, scope)}`;
  const links: UnsubscribeLinks = {
    ...(type ? { thisKind: { label: EMAIL_TYPE_LABELS[type], url: page(type) } } : {}),
    all: page('all'),
    settings: `${config.publicUrl}/settings`,
  };
  // The header's address takes the one-click POST itself (RFC 8058); the page asks first.
  const oneClick = `${config.publicUrl}/api/unsubscribe?token=${createUnsubscribeToken(secret, userId, type ?? 'all')}`;
  const headers = {
    'List-Unsubscribe': `<${oneClick}>`,
    'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click',
    'Auto-Submitted': 'auto-generated',
  };
  return { links, headers };
}

/** Who gets notification mail: a racer with a confirmed address. */
export async function recipient(pool: Pool, userId: number): Promise<{ email: string; displayName: string } | null> {
  const { rows } = await pool.query<{ email: string | null; display_name: string; email_verified_at: Date | null }>(
    'SELECT email, display_name, email_verified_at FROM users WHERE id = $1',
    [userId],
  );
  const r = rows[0];
  return r?.email && r.email_verified_at ? { email: r.email, displayName: r.display_name } : null;
}

/**
 * The notification-mail job: per the racer's preferences, mail it now, keep it for the daily digest,
 * or drop it. Throws when SMTP fails, so the queue retries with backoff.
 */
export async function deliverNotificationMail(deps: MailDeps, job: NotificationMailJob): Promise<'sent' | 'digest' | 'skipped'> {
  const { pool } = deps.db;
  const to = await recipient(pool, job.userId);
  if (!to) return 'skipped';
  const route = deliveryFor(await getEmailPreferences(pool, job.userId), job.type);
  if (route === 'none') return 'skipped';
  if (route === 'digest') {
    await pool.query('INSERT INTO email_digest_items (user_id, notification) VALUES ($1, $2)', [job.userId, JSON.stringify(job)]);
    return 'digest';
  }
  const content = await composeNotification(pool, deps.config.publicUrl, job);
  if (!content) return 'skipped';
  const { links, headers } = unsubscribeParts(deps.config, job.userId, job.type);
  const mail: MailWithHeaders = { ...notificationMail(to.email, to.displayName, content, links), headers };
  await deps.mailer.send(mail);
  return 'sent';
}
