import { QueryTypes, type Transaction } from 'sequelize';
import { AUTO_HIDE_REPORTER_MIN_AGE_DAYS, AUTO_HIDE_REPORTERS, type ReportTargetType } from '../../../shared/types/moderation';
import type { Database } from '../../db/database';
import { excerpt, notify } from '../notifications';
import { recordAudit } from './audit';
import { setTargetHidden, type ModerationTarget } from './targets';

/*
 * The automatic hide: once enough trusted racers have open reports on one thing, it is hidden
 * pending review. Trusted means e-mail verified, account older than a week and not suspended, so a
 * handful of throwaway accounts cannot hide anything. The reports stay open for the moderators, and
 * a moderator's restore clears the hide.
 */

/**
 * Serialises moderation on one target for the rest of the transaction (two reports arriving
 * together must not both hide it). Two-key advisory lock: the kind of thing, then its id.
 */
export async function lockModerationTarget(db: Database, target: { type: ReportTargetType; id: number }, transaction: Transaction): Promise<void> {
  await db.sequelize.query("SELECT pg_advisory_xact_lock(hashtext('moderation:' || :type), :id)", {
    replacements: { type: target.type, id: target.id },
    transaction,
  });
}

/** Distinct racers with open reports on the target who count towards the automatic hide. */
export async function countTrustedReporters(db: Database, target: { type: ReportTargetType; id: number }, transaction?: Transaction): Promise<number> {
  const [row] = await db.sequelize.query<{ n: number }>(
    `SELECT count(DISTINCT r.reporter_id)::int AS n
       FROM reports r JOIN users u ON u.id = r.reporter_id
      WHERE r.target_type = :type AND r.target_id = :id AND r.status = 'open'
        AND u.email_verified_at IS NOT NULL
        AND u.created_at < now() - make_interval(days => :days)
        AND NOT u.suspended_indefinitely AND (u.suspended_until IS NULL OR u.suspended_until <= now())`,
    { type: QueryTypes.SELECT, replacements: { type: target.type, id: target.id, days: AUTO_HIDE_REPORTER_MIN_AGE_DAYS }, transaction },
  );
  return row.n;
}

const HIDDEN_COLUMN_SQL: Partial<Record<ReportTargetType, string>> = {
  setup: 'SELECT hidden_at AS "hiddenAt" FROM setups WHERE id = :id',
  comment: 'SELECT hidden_at AS "hiddenAt" FROM comments WHERE id = :id',
  photo: 'SELECT hidden_at AS "hiddenAt" FROM photos WHERE id = :id',
  racer: 'SELECT profile_hidden_at AS "hiddenAt" FROM users WHERE id = :id',
};

/** Hidden right now, by a moderator or the threshold (read under the lock, not from an earlier look). */
async function isHiddenNow(db: Database, target: ModerationTarget, transaction: Transaction): Promise<boolean> {
  const options = { type: QueryTypes.SELECT, replacements: { type: target.type, id: target.id }, transaction } as const;
  const hides = await db.sequelize.query('SELECT 1 FROM content_hides WHERE target_type = :type AND target_id = :id', options);
  if (hides.length) return true;
  const sql = HIDDEN_COLUMN_SQL[target.type];
  const [row] = sql ? await db.sequelize.query<{ hiddenAt: Date | null }>(sql, options) : [];
  return !!row?.hiddenAt;
}

export const AUTO_HIDE_REASON = `Reported by ${AUTO_HIDE_REPORTERS} or more racers. Hidden until a moderator reviews it.`;

export type AutoHidden = { target: ModerationTarget; actionId: number; trustedReporters: number };

/**
 * Hides the target (inside the caller's transaction, under the target's lock) when open reports
 * from at least AUTO_HIDE_REPORTERS trusted racers are on it: a moderation action with no actor,
 * the hidden state, an audit row. Already-hidden things are left alone, and so is the content of
 * moderators and admins (their reports still wait in the queue for a person to decide).
 * Returns what was hidden, so the author can be told once the transaction commits.
 */
export async function hideIfReportedEnough(db: Database, target: ModerationTarget, transaction: Transaction): Promise<AutoHidden | null> {
  if (target.ownerRole !== 'racer') return null;
  const trustedReporters = await countTrustedReporters(db, target, transaction);
  if (trustedReporters < AUTO_HIDE_REPORTERS) return null;
  if (await isHiddenNow(db, target, transaction)) return null;
  const [action] = await db.sequelize.query<{ id: number }>(
    `INSERT INTO moderation_actions (actor_id, action, target_type, target_id, subject_user_id, reason)
     VALUES (NULL, 'auto-hide', :type, :id, :subject, :reason) RETURNING id`,
    { type: QueryTypes.SELECT, replacements: { type: target.type, id: target.id, subject: target.ownerId, reason: AUTO_HIDE_REASON }, transaction },
  );
  await setTargetHidden(db, target, { hidden: true, reason: AUTO_HIDE_REASON, auto: true, actionId: action.id }, transaction);
  await recordAudit(
    db,
    {
      actor: null,
      action: 'auto-hide',
      targetType: target.type,
      targetId: target.id,
      subject: { id: target.ownerId, handle: target.ownerHandle },
      reason: AUTO_HIDE_REASON,
      previousState: { hidden: false },
      newState: { hidden: true, auto: true, actionId: action.id, trustedReporters },
    },
    transaction,
  );
  return { target, actionId: action.id, trustedReporters };
}

const THING: Record<ReportTargetType, string> = {
  setup: 'Your setup',
  revision: 'Your change note on',
  comment: 'Your comment on',
  photo: 'Your photo on',
  racer: 'Your profile',
};

/** Tells the author their thing was hidden pending review (after the hide committed; never fails the caller). */
export async function tellAuthorOfAutoHide(db: Database, hidden: AutoHidden): Promise<void> {
  const { target } = hidden;
  const [setup] = target.setupId
    ? await db.sequelize.query<{ title: string }>('SELECT title FROM setups WHERE id = :id', { type: QueryTypes.SELECT, replacements: { id: target.setupId } })
    : [];
  const what = setup ? `${THING[target.type]} “${excerpt(setup.title, 80)}”` : THING[target.type];
  await notify(db, {
    type: 'moderation-notice',
    userId: target.ownerId,
    actorId: null,
    setupId: target.setupId,
    revisionId: target.type === 'revision' ? target.id : null,
    commentId: target.type === 'comment' ? target.id : null,
    detail:
      `${what} was hidden while moderators review reports from several racers. Only you and the moderators can see it until then; ` +
      'if the reports are wrong, a moderator will put it back.',
  });
}
