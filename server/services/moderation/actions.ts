import { QueryTypes, type Transaction } from 'sequelize';
import { ERROR_CODES } from '../../../shared/types/errors';
import {
  ACTION_OUTCOME_TEXT,
  APPEAL_WINDOW_DAYS,
  moderationActionRequestSchema,
  type ModerationActionKind,
  type ModerationActionSummary,
  type QueueAction,
  type ReportTargetType,
} from '../../../shared/types/moderation';
import type { Database } from '../../db/database';
import { ApiError } from '../../errors';
import { notify } from '../notifications';
import { destroySessionsOf } from '../sessions';
import { recordAudit } from './audit';
import { requireTarget, setTargetHidden, type ModerationTarget } from './targets';

/*
 * What moderators do on the queue: hide, restore, dismiss, warn, suspend, hide everything of an
 * account. Each action is one transaction: its moderation_actions row, the change itself, the
 * target's open reports resolved, and an audit row with the state before and after. Reporters and
 * the author are notified right after it commits (never with the moderator's name).
 */

/** Who acts: the signed-in moderator or admin. */
export type Actor = { id: number; handle: string; role: string };

/** The racer whose content or account an action is about, as locked for the action. */
export type Subject = {
  id: number;
  handle: string;
  role: 'racer' | 'moderator' | 'admin';
  suspendedUntil: Date | null;
  suspendedIndefinitely: boolean;
  suspensionReason: string | null;
};

const isAdmin = (actor: Pick<Actor, 'role'>) => actor.role === 'admin';

/** Why `actor` may not act on `subject`'s content at all, or null. Nobody acts on their own; moderators never on admins. */
export function cannotActReason(actor: Actor, subject: Pick<Subject, 'id' | 'role'>): string | null {
  if (actor.id === subject.id) return 'This is your own content or account: another moderator has to decide on it.';
  if (subject.role === 'admin' && !isAdmin(actor)) return 'Moderators cannot act on an admin’s content or account.';
  return null;
}

/** Why `actor` may not suspend `subject`, or null: on top of the above, only admins suspend moderators. */
export function cannotSuspendReason(actor: Actor, subject: Pick<Subject, 'id' | 'role'>): string | null {
  const base = cannotActReason(actor, subject);
  if (base) return base;
  if (subject.role !== 'racer' && !isAdmin(actor)) return 'Only admins can suspend a moderator.';
  return null;
}

const forbidden = (message: string) => new ApiError(403, ERROR_CODES.forbidden, message);

/** Loads and locks the subject's row, so two actions on one racer never interleave. */
export async function lockSubject(db: Database, userId: number, transaction: Transaction): Promise<Subject> {
  const [row] = await db.sequelize.query<Subject>(
    `SELECT id, handle, role, suspended_until AS "suspendedUntil", suspended_indefinitely AS "suspendedIndefinitely",
            suspension_reason AS "suspensionReason"
       FROM users WHERE id = :userId FOR UPDATE`,
    { replacements: { userId }, type: QueryTypes.SELECT, transaction },
  );
  if (!row) throw ApiError.notFound('That racer');
  return row;
}

export type ActionRow = {
  id: number;
  actorId: number | null;
  action: ModerationActionKind;
  targetType: ReportTargetType;
  targetId: number;
  subjectUserId: number;
  reason: string;
  suspendedUntil: Date | null;
  suspendedIndefinitely: boolean;
  hideContent: boolean | null;
  appealId: number | null;
  createdAt: Date;
};

/** The columns of an ActionRow, from moderation_actions under `alias` when given. */
export const actionColumns = (alias = '') => {
  const a = alias ? `${alias}.` : '';
  return `${a}id, ${a}actor_id AS "actorId", ${a}action, ${a}target_type AS "targetType", ${a}target_id AS "targetId",
  ${a}subject_user_id AS "subjectUserId", ${a}reason, ${a}suspended_until AS "suspendedUntil",
  ${a}suspended_indefinitely AS "suspendedIndefinitely", ${a}hide_content AS "hideContent", ${a}appeal_id AS "appealId",
  ${a}created_at AS "createdAt"`;
};

/** Stores one moderation action (the row appeals and hides point at). */
export async function insertModerationAction(
  db: Database,
  row: {
    actorId: number | null;
    action: ModerationActionKind;
    targetType: ReportTargetType;
    targetId: number;
    subjectUserId: number;
    reason: string;
    suspendedUntil?: Date | null;
    suspendedIndefinitely?: boolean;
    hideContent?: boolean | null;
    appealId?: number | null;
  },
  transaction: Transaction,
): Promise<ActionRow> {
  const [created] = await db.sequelize.query<ActionRow>(
    `INSERT INTO moderation_actions (actor_id, action, target_type, target_id, subject_user_id, reason, suspended_until,
                                     suspended_indefinitely, hide_content, appeal_id)
     VALUES (:actorId, :action, :targetType, :targetId, :subjectUserId, :reason, :suspendedUntil, :suspendedIndefinitely, :hideContent, :appealId)
     RETURNING ${actionColumns()}`,
    {
      type: QueryTypes.SELECT,
      transaction,
      replacements: {
        suspendedUntil: null,
        suspendedIndefinitely: false,
        hideContent: null,
        appealId: null,
        ...row,
      },
    },
  );
  return created;
}

export function toActionSummary(row: ActionRow, resolvedReports = 0): ModerationActionSummary {
  return {
    id: row.id,
    action: row.action,
    targetType: row.targetType,
    targetId: row.targetId,
    reason: row.reason,
    createdAt: new Date(row.createdAt).toISOString(),
    suspendedUntil: row.suspendedUntil ? new Date(row.suspendedUntil).toISOString() : null,
    resolvedReports,
  };
}

// ---- Suspensions (also used by the admin screen) ----

export type SuspensionState = { suspendedUntil: string | null; suspendedIndefinitely: boolean; suspensionReason: string | null };

export const suspensionState = (s: Pick<Subject, 'suspendedUntil' | 'suspendedIndefinitely' | 'suspensionReason'>): SuspensionState => ({
  suspendedUntil: s.suspendedUntil ? new Date(s.suspendedUntil).toISOString() : null,
  suspendedIndefinitely: s.suspendedIndefinitely,
  suspensionReason: s.suspensionReason,
});

/**
 * Suspends a racer until `until` (null: indefinitely), or lifts the suspension (`lift`). The
 * racer's sessions stop working at once (sessions of suspended racers are refused when read);
 * call endSessions after the transaction commits to delete them too.
 */
export async function applySuspension(
  db: Database,
  userId: number,
  change: { lift: true } | { lift?: false; until: Date | null; reason: string },
  transaction: Transaction,
): Promise<SuspensionState> {
  const values = change.lift
    ? { until: null, indefinitely: false, reason: null }
    : { until: change.until, indefinitely: change.until === null, reason: change.reason };
  await db.sequelize.query(
    `UPDATE users SET suspended_until = :until, suspended_indefinitely = :indefinitely, suspension_reason = :reason, updated_at = now()
      WHERE id = :userId`,
    { replacements: { ...values, userId }, transaction },
  );
  return { suspendedUntil: values.until ? values.until.toISOString() : null, suspendedIndefinitely: values.indefinitely, suspensionReason: values.reason };
}

/** Deletes a suspended racer's sessions (after the suspension committed). */
export function endSessions(db: Database, userId: number): Promise<number> {
  return destroySessionsOf(db, userId);
}

// ---- Hiding many things at once (hide-all, suspend with hideContent, their reversal) ----

export type TargetRef = { type: ReportTargetType; id: number };

const HIDDEN_COLUMNS: Partial<Record<ReportTargetType, { table: string; column: string }>> = {
  setup: { table: 'setups', column: 'hidden_at' },
  comment: { table: 'comments', column: 'hidden_at' },
  photo: { table: 'photos', column: 'hidden_at' },
  racer: { table: 'users', column: 'profile_hidden_at' },
};

/** Sets or clears the tables' own hidden columns for many targets, a statement per table. */
async function setHiddenColumns(db: Database, refs: TargetRef[], hidden: boolean, transaction: Transaction): Promise<void> {
  for (const [type, col] of Object.entries(HIDDEN_COLUMNS)) {
    const ids = refs.filter((r) => r.type === type).map((r) => r.id);
    if (!ids.length) continue;
    // A renewed hide keeps the first hide's time (as setTargetHidden does).
    await db.sequelize.query(`UPDATE ${col.table} SET ${col.column} = ${hidden ? `COALESCE(${col.column}, now())` : 'NULL'} WHERE id IN (:ids)`, {
      replacements: { ids },
      transaction,
    });
  }
}

/**
 * Hides every setup, comment and photo of a racer and their profile, recorded with `actionId` so
 * restoring (or overturning) that action brings exactly these back. Things a moderator hid before
 * keep their own hide; automatic hides are taken over (the reports behind them are resolved now).
 */
export async function hideEverythingOf(db: Database, userId: number, reason: string, actionId: number, transaction: Transaction): Promise<TargetRef[]> {
  const notByModerator = (type: string, id: string) =>
    `NOT EXISTS (SELECT 1 FROM content_hides h WHERE h.target_type = '${type}' AND h.target_id = ${id} AND NOT h.auto)`;
  const refs = await db.sequelize.query<TargetRef>(
    `SELECT 'setup' AS type, s.id FROM setups s WHERE s.owner_id = :userId AND s.deleted_at IS NULL AND ${notByModerator('setup', 's.id')}
     UNION ALL
     SELECT 'comment', c.id FROM comments c WHERE c.author_id = :userId AND c.deleted_at IS NULL AND ${notByModerator('comment', 'c.id')}
     UNION ALL
     SELECT 'photo', p.id FROM photos p WHERE p.owner_id = :userId AND ${notByModerator('photo', 'p.id')}
     UNION ALL
     SELECT 'racer', u.id FROM users u WHERE u.id = :userId AND ${notByModerator('racer', 'u.id')}`,
    { replacements: { userId }, type: QueryTypes.SELECT, transaction },
  );
  if (!refs.length) return [];
  await db.sequelize.query(
    `INSERT INTO content_hides (target_type, target_id, reason, auto, action_id)
     SELECT r.type, r.id, :reason, false, :actionId FROM jsonb_to_recordset(CAST(:refs AS jsonb)) AS r(type text, id int)
     ON CONFLICT (target_type, target_id) DO UPDATE SET reason = EXCLUDED.reason, auto = false, action_id = EXCLUDED.action_id`,
    { replacements: { reason, actionId, refs: JSON.stringify(refs) }, transaction },
  );
  await setHiddenColumns(db, refs, true, transaction);
  return refs;
}

/** Brings back what the given actions hid (and is still hidden by them); returns what came back. */
export async function unhideByActions(db: Database, actionIds: number[], transaction: Transaction): Promise<TargetRef[]> {
  if (!actionIds.length) return [];
  const refs = await db.sequelize.query<TargetRef>(
    'DELETE FROM content_hides WHERE action_id IN (:actionIds) RETURNING target_type AS type, target_id AS id',
    { replacements: { actionIds }, type: QueryTypes.SELECT, transaction },
  );
  await setHiddenColumns(db, refs, false, transaction);
  return refs;
}

const countByType = (refs: TargetRef[]) =>
  Object.fromEntries((['setup', 'revision', 'comment', 'photo', 'racer'] as const).map((t) => [t, refs.filter((r) => r.type === t).length]));

// ---- The queue's actions ----

type Applied = { previousState: Record<string, unknown>; newState: Record<string, unknown>; wideReports: boolean };
type Context = { db: Database; actor: Actor; target: ModerationTarget; subject: Subject; reason: string; action: ActionRow; transaction: Transaction };

const hideState = (t: ModerationTarget) => ({ hidden: t.hiddenAt !== null, autoHidden: t.autoHidden, hiddenReason: t.hiddenReason });

async function applyHide({ db, target, reason, action, transaction }: Context): Promise<Applied> {
  if (target.hiddenAt && !target.autoHidden) throw new ApiError(409, 'already_hidden', 'It is already hidden by the moderators.');
  await setTargetHidden(db, target, { hidden: true, reason, auto: false, actionId: action.id }, transaction);
  return { previousState: hideState(target), newState: { hidden: true, autoHidden: false, hiddenReason: reason }, wideReports: false };
}

/** Restoring a racer brings back their profile and everything hidden with the account (hide-all, suspend). */
async function applyRestore({ db, target, subject, transaction }: Context): Promise<Applied> {
  if (target.type !== 'racer') {
    if (!target.hiddenAt) throw new ApiError(409, 'not_hidden', 'It is not hidden, so there is nothing to restore.');
    await setTargetHidden(db, target, { hidden: false }, transaction);
    return { previousState: hideState(target), newState: { hidden: false }, wideReports: false };
  }
  const accountActions = await db.sequelize.query<{ id: number }>(
    "SELECT id FROM moderation_actions WHERE subject_user_id = :userId AND action IN ('hide-all', 'suspend')",
    { replacements: { userId: subject.id }, type: QueryTypes.SELECT, transaction },
  );
  const restored = await unhideByActions(db, accountActions.map((a) => a.id), transaction);
  if (target.hiddenAt && !restored.some((r) => r.type === 'racer')) {
    await setTargetHidden(db, target, { hidden: false }, transaction);
    restored.push({ type: 'racer', id: target.id });
  }
  if (!restored.length) throw new ApiError(409, 'not_hidden', 'Nothing of this racer’s is hidden by the moderators, so there is nothing to restore.');
  return { previousState: { hidden: countByType(restored) }, newState: { restored: countByType(restored) }, wideReports: false };
}

async function applyDismiss({ db, target, transaction }: Context): Promise<Applied> {
  const open = await openReportCount(db, target, transaction);
  if (open === 0) throw new ApiError(409, 'nothing_to_dismiss', 'There are no open reports on it to dismiss.');
  return { previousState: { ...hideState(target), openReports: open }, newState: { ...hideState(target), openReports: 0 }, wideReports: false };
}

async function applyWarn({ reason }: Context): Promise<Applied> {
  return { previousState: {}, newState: { warning: reason }, wideReports: false };
}

async function applySuspend(ctx: Context, days: number | null, hideContent: boolean): Promise<Applied> {
  const { db, subject, reason, action, transaction } = ctx;
  const until = action.suspendedUntil;
  const next = await applySuspension(db, subject.id, { until: days === null ? null : until, reason }, transaction);
  const hidden = hideContent ? await hideEverythingOf(db, subject.id, reason, action.id, transaction) : [];
  return {
    previousState: suspensionState(subject),
    newState: { ...next, ...(hideContent ? { hidden: countByType(hidden) } : {}) },
    wideReports: hideContent,
  };
}

async function applyHideAll({ db, subject, reason, action, transaction }: Context): Promise<Applied> {
  const hidden = await hideEverythingOf(db, subject.id, reason, action.id, transaction);
  return { previousState: { hidden: {} }, newState: { hidden: countByType(hidden) }, wideReports: true };
}

async function openReportCount(db: Database, target: Pick<ModerationTarget, 'type' | 'id'>, transaction: Transaction): Promise<number> {
  const [row] = await db.sequelize.query<{ n: number }>(
    "SELECT count(*)::int AS n FROM reports WHERE status = 'open' AND target_type = :type AND target_id = :id",
    { replacements: { type: target.type, id: target.id }, type: QueryTypes.SELECT, transaction },
  );
  return row.n;
}

/**
 * Resolves the open reports an action answers: the target's, or (`wide`, when everything of the
 * account was hidden) every open report on that racer's content. Returns each report's reporter.
 */
export async function resolveReports(
  db: Database,
  scope: { target: Pick<ModerationTarget, 'type' | 'id'>; ownerId: number; wide: boolean },
  actionId: number,
  transaction: Transaction,
): Promise<Array<{ reporterId: number; targetType: ReportTargetType; targetId: number }>> {
  return db.sequelize.query(
    `UPDATE reports SET status = 'resolved', resolved_by_action_id = :actionId, resolved_at = now()
      WHERE status = 'open' AND ${scope.wide ? 'target_owner_id = :ownerId' : 'target_type = :type AND target_id = :id'}
      RETURNING reporter_id AS "reporterId", target_type AS "targetType", target_id AS "targetId"`,
    {
      replacements: { actionId, ownerId: scope.ownerId, type: scope.target.type, id: scope.target.id },
      type: QueryTypes.SELECT,
      transaction,
    },
  );
}

/** How the author reads about a thing of theirs in a notice: "your setup “Dusty”", "your comment". */
export function yourThing(target: Pick<ModerationTarget, 'type'>, title?: string | null): string {
  switch (target.type) {
    case 'setup':
      return title ? `your setup “${title}”` : 'your setup';
    case 'revision':
      return title ? `your change note on “${title}”` : 'your change note';
    case 'comment':
      return title ? `your comment on “${title}”` : 'your comment';
    case 'photo':
      return title ? `your photo on “${title}”` : 'your photo';
    case 'racer':
      return 'your profile';
  }
}

const APPEAL_HINT = `You can appeal within ${APPEAL_WINDOW_DAYS} days.`;

/** The author's notice for a queue action, in plain words; never names the moderator. */
export function authorNotice(action: QueueAction | 'unsuspend', what: string, reason: string, until?: Date | null): string | null {
  const because = `Reason: ${reason}`;
  const text: Record<typeof action, string | null> = {
    hide: `The moderators hid ${what}. ${because} ${APPEAL_HINT}`,
    restore: `The moderators restored ${what}; it is visible again. ${because}`,
    dismiss: null,
    warn: `The moderators sent you a warning about ${what}. ${because} ${APPEAL_HINT}`,
    suspend: `Your account is suspended ${until ? `until ${until.toISOString().slice(0, 10)}` : 'until further notice'}. ${because} ${APPEAL_HINT}`,
    'hide-all': `The moderators hid everything your account posted. ${because} ${APPEAL_HINT}`,
    unsuspend: `Your suspension was lifted. ${because}`,
  };
  const t = text[action];
  return t === null ? null : t.length > 500 ? `${t.slice(0, 499)}…` : t;
}

async function setupTitleOf(db: Database, setupId: number | null): Promise<string | null> {
  if (!setupId) return null;
  const [row] = await db.sequelize.query<{ title: string }>('SELECT title FROM setups WHERE id = :setupId', {
    replacements: { setupId },
    type: QueryTypes.SELECT,
  });
  return row?.title ?? null;
}

/** Where a notification about a target points: its setup, and the revision or comment. */
export function notificationLinks(target: Pick<ModerationTarget, 'type' | 'id' | 'setupId'>) {
  return {
    setupId: target.setupId,
    revisionId: target.type === 'revision' ? target.id : null,
    commentId: target.type === 'comment' ? target.id : null,
  };
}

/** Tells each reporter what came of their report, once per reporter, in plain words. */
export async function notifyReporters(db: Database, reporterIds: number[], outcome: ModerationActionKind, setupId: number | null): Promise<void> {
  for (const userId of new Set(reporterIds)) {
    await notify(db, { type: 'report-outcome', userId, actorId: null, setupId, detail: ACTION_OUTCOME_TEXT[outcome] });
  }
}

/**
 * `POST /api/moderation/actions`: one queue action on a reported (or any) target, with a reason
 * the author sees. Refuses moderators acting on their own or an admin's content, and suspending a
 * moderator unless an admin. One transaction; notifications right after it commits.
 */
export async function takeModerationAction(db: Database, actor: Actor, input: unknown): Promise<ModerationActionSummary> {
  const req = moderationActionRequestSchema.parse(input);
  const done = await db.sequelize.transaction(async (transaction) => {
    const target = await requireTarget(db, req.targetType, req.targetId, transaction);
    const subject = await lockSubject(db, target.ownerId, transaction);
    const refusal = req.action === 'suspend' ? cannotSuspendReason(actor, subject) : cannotActReason(actor, subject);
    if (refusal) throw forbidden(refusal);
    const days = req.action === 'suspend' ? (req.suspendDays ?? null) : null;
    const action = await insertModerationAction(
      db,
      {
        actorId: actor.id,
        action: req.action,
        targetType: target.type,
        targetId: target.id,
        subjectUserId: subject.id,
        reason: req.reason,
        suspendedUntil: days === null ? null : new Date(Date.now() + days * 86_400_000),
        suspendedIndefinitely: req.action === 'suspend' && days === null,
        hideContent: req.action === 'suspend' ? (req.hideContent ?? false) : null,
      },
      transaction,
    );
    const ctx: Context = { db, actor, target, subject, reason: req.reason, action, transaction };
    const applied = await {
      hide: () => applyHide(ctx),
      restore: () => applyRestore(ctx),
      dismiss: () => applyDismiss(ctx),
      warn: () => applyWarn(ctx),
      suspend: () => applySuspend(ctx, days, req.hideContent ?? false),
      'hide-all': () => applyHideAll(ctx),
    }[req.action]();
    const resolved = await resolveReports(db, { target, ownerId: subject.id, wide: applied.wideReports }, action.id, transaction);
    await recordAudit(
      db,
      {
        actor,
        action: req.action,
        targetType: target.type,
        targetId: target.id,
        subject,
        reason: req.reason,
        previousState: applied.previousState,
        newState: { ...applied.newState, actionId: action.id, resolvedReports: resolved.length },
      },
      transaction,
    );
    return { target, subject, action, resolved };
  });
  const { target, subject, action, resolved } = done;
  if (req.action === 'suspend') await endSessions(db, subject.id);
  await notifyReporters(db, resolved.map((r) => r.reporterId), req.action, target.setupId);
  const what = yourThing(target, await setupTitleOf(db, target.setupId));
  const detail = authorNotice(req.action, what, req.reason, action.suspendedUntil);
  if (detail) await notify(db, { type: 'moderation-notice', userId: subject.id, actorId: null, ...notificationLinks(target), detail });
  return toActionSummary(action, resolved.length);
}
