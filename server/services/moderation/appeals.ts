import { createHmac, timingSafeEqual } from 'node:crypto';
import { QueryTypes, type Transaction } from 'sequelize';
import { ERROR_CODES } from '../../../shared/types/errors';
import {
  APPEAL_WINDOW_DAYS,
  appealCreateSchema,
  appealDecisionSchema,
  suspensionAppealCreateSchema,
  type ActionOnMe,
  type ModerationActionKind,
  type MyAppeal,
  type SuspendedSignInDetails,
} from '../../../shared/types/moderation';
import type { Database } from '../../db/database';
import { ApiError } from '../../errors';
import { notify } from '../notifications';
import {
  actionColumns,
  applySuspension,
  insertModerationAction,
  lockSubject,
  notificationLinks,
  suspensionState,
  toActionSummary,
  unhideByActions,
  type ActionRow,
  type Actor,
} from './actions';
import { recordAudit } from './audit';
import { cannotDecideReason, describeTargets } from './queue';

/*
 * Appeals. The subject of an action may appeal it once, within APPEAL_WINDOW_DAYS, with text.
 * Appealable: hide, hide-all, suspend and warn — the decisions a moderator took against someone.
 * Not appealable: auto-hide (no moderator decided yet; a moderator reviews it from the queue
 * anyway), restore, dismiss, unsuspend and appeal outcomes (nothing against the racer to reverse).
 * A hide or suspension that is no longer in effect (restored, lifted) has nothing left to appeal.
 *
 * A suspended racer cannot sign in, so the sign-in refusal carries a signed, hour-long token bound
 * to the racer and the suspension; POST /api/appeals/suspension takes it instead of a session.
 */

export const APPEALABLE_ACTIONS: ReadonlySet<ModerationActionKind> = new Set(['hide', 'hide-all', 'suspend', 'warn']);
const DAY_MS = 86_400_000;
export const APPEAL_TOKEN_TTL_MS = 60 * 60_000;

export const appealUntil = (createdAt: Date) => new Date(new Date(createdAt).getTime() + APPEAL_WINDOW_DAYS * DAY_MS);

type AppealRow = {
  id: number;
  actionId: number;
  appellantId: number;
  text: string;
  status: MyAppeal['status'];
  decidedBy: number | null;
  decisionReason: string | null;
  decidedAt: Date | null;
  createdAt: Date;
};

const APPEAL_COLUMNS = `id, action_id AS "actionId", appellant_id AS "appellantId", text, status, decided_by AS "decidedBy",
  decision_reason AS "decisionReason", decided_at AS "decidedAt", created_at AS "createdAt"`;

function toMyAppeal(row: AppealRow): MyAppeal {
  return {
    id: row.id,
    actionId: row.actionId,
    text: row.text,
    status: row.status,
    decisionReason: row.decisionReason,
    createdAt: new Date(row.createdAt).toISOString(),
    decidedAt: row.decidedAt ? new Date(row.decidedAt).toISOString() : null,
  };
}

/**
 * Whether an action still has an effect to appeal: something it hid is still hidden by it, or (a
 * suspension) the racer is still serving it. A warning always stands.
 */
async function stillInEffect(db: Database, action: ActionRow, transaction?: Transaction): Promise<boolean> {
  if (action.action === 'warn') return true;
  const [row] = await db.sequelize.query<{ hidden: boolean; serving: boolean }>(
    `SELECT EXISTS (SELECT 1 FROM content_hides WHERE action_id = :id) AS hidden,
            EXISTS (SELECT 1 FROM users u WHERE u.id = :subject
                      AND (u.suspended_indefinitely OR coalesce(u.suspended_until > now(), false))
                      AND :id = (SELECT max(id) FROM moderation_actions WHERE subject_user_id = :subject AND action = 'suspend')) AS serving`,
    { replacements: { id: action.id, subject: action.subjectUserId }, type: QueryTypes.SELECT, transaction },
  );
  return row.hidden || (action.action === 'suspend' && row.serving);
}

/** Why an appeal of `action` is not possible now, or null. */
async function cannotAppealReason(db: Database, action: ActionRow, existing: AppealRow | null, transaction?: Transaction): Promise<string | null> {
  if (!APPEALABLE_ACTIONS.has(action.action)) {
    return action.action === 'auto-hide'
      ? 'Automatic hides are reviewed by a moderator anyway; you can appeal their decision.'
      : 'This decision did nothing against you, so there is nothing to appeal.';
  }
  if (existing) return 'You already appealed this decision; each decision can be appealed once.';
  if (appealUntil(action.createdAt).getTime() <= Date.now()) return `Appeals are open for ${APPEAL_WINDOW_DAYS} days after a decision; this one’s window has closed.`;
  if (!(await stillInEffect(db, action, transaction))) return 'This decision was already reversed, so there is nothing left to appeal.';
  return null;
}

async function findAction(db: Database, id: number, transaction?: Transaction, lock = false): Promise<ActionRow | null> {
  if (!Number.isSafeInteger(id) || id <= 0 || id > 2_147_483_647) return null;
  const [row] = await db.sequelize.query<ActionRow>(`SELECT ${actionColumns()} FROM moderation_actions WHERE id = :id ${lock ? 'FOR UPDATE' : ''}`, {
    replacements: { id },
    type: QueryTypes.SELECT,
    transaction,
  });
  return row ?? null;
}

async function appealOfAction(db: Database, actionId: number, transaction?: Transaction): Promise<AppealRow | null> {
  const [row] = await db.sequelize.query<AppealRow>(`SELECT ${APPEAL_COLUMNS} FROM appeals WHERE action_id = :actionId`, {
    replacements: { actionId },
    type: QueryTypes.SELECT,
    transaction,
  });
  return row ?? null;
}

/**
 * Files an appeal of one action by its subject (anyone else: 404, as if it did not exist). Once per
 * action, within the window, while the action is in effect; each refusal says which rule applies.
 */
export async function fileAppeal(db: Database, appellant: Actor, input: unknown): Promise<MyAppeal> {
  const { actionId, text } = appealCreateSchema.parse(input);
  return db.sequelize.transaction(async (transaction) => {
    const action = await findAction(db, actionId, transaction, true);
    if (!action || action.subjectUserId !== appellant.id) throw ApiError.notFound('That decision');
    const existing = await appealOfAction(db, action.id, transaction);
    const refusal = await cannotAppealReason(db, action, existing, transaction);
    if (refusal) {
      const code = existing ? 'already_appealed' : APPEALABLE_ACTIONS.has(action.action) ? 'appeal_not_possible' : 'not_appealable';
      throw new ApiError(existing ? 409 : 403, code, refusal, { actionId: action.id });
    }
    const [row] = await db.sequelize.query<AppealRow>(
      `INSERT INTO appeals (action_id, appellant_id, text) VALUES (:actionId, :appellantId, :text) RETURNING ${APPEAL_COLUMNS}`,
      { replacements: { actionId: action.id, appellantId: appellant.id, text }, type: QueryTypes.SELECT, transaction },
    );
    await recordAudit(
      db,
      {
        actor: appellant,
        action: 'appeal-filed',
        targetType: action.targetType,
        targetId: action.targetId,
        subject: appellant,
        reason: text,
        previousState: { actionId: action.id, action: action.action },
        newState: { appealId: row.id, status: 'open' },
      },
      transaction,
    );
    return toMyAppeal(row);
  });
}

// ---- Appeals without a session: the suspended racer's token ----

const TOKEN_PURPOSE = 'tunefork suspension appeal v1';

function sign(secret: string, payload: string): string {
  return createHmac('sha256', secret).update(`${TOKEN_PURPOSE}\n${payload}`).digest('base64url');
}

/** A token that lets `userId` appeal suspension `actionId` until it expires (HMAC-SHA256 with the session secret). */
export function issueAppealToken(secret: string, userId: number, actionId: number, now = Date.now()): { token: string; expiresAt: Date } {
  const expiresAt = new Date(now + APPEAL_TOKEN_TTL_MS);
  const payload = Buffer.from(JSON.stringify({ u: userId, a: actionId, e: expiresAt.getTime() })).toString('base64url');
  return { token: `${payload}.${sign(secret, payload)}`, expiresAt };
}

const BAD_TOKEN = () =>
  new ApiError(400, 'appeal_token_invalid', 'This appeal form is not valid: it was damaged or not issued by Tunefork. Sign in again to get a new one.', {
    appealToken: 'Sign in again to get a new appeal form.',
  });

/** The racer and suspension a token speaks for; a forged, damaged or expired token is refused, each with its own message. */
export function readAppealToken(secret: string, token: string, now = Date.now()): { userId: number; actionId: number } {
  const [payload, signature, extra] = token.split('.');
  if (!payload || !signature || extra !== undefined) throw BAD_TOKEN();
  const expected = Buffer.from(sign(secret, payload));
  const given = Buffer.from(signature);
  if (expected.length !== given.length || !timingSafeEqual(expected, given)) throw BAD_TOKEN();
  let claims: { u?: unknown; a?: unknown; e?: unknown };
  try {
    claims = JSON.parse(Buffer.from(payload, 'base64url').toString('utf8'));
  } catch {
    throw BAD_TOKEN();
  }
  if (!Number.isSafeInteger(claims.u) || !Number.isSafeInteger(claims.a) || typeof claims.e !== 'number') throw BAD_TOKEN();
  if (claims.e <= now) {
    throw new ApiError(400, 'appeal_token_expired', 'This appeal form has expired (they last an hour). Sign in again to get a new one.', {
      appealToken: 'Sign in again to get a new appeal form.',
    });
  }
  return { userId: claims.u as number, actionId: claims.a as number };
}

/**
 * What a suspended racer's sign-in refusal adds (once the password was right): the suspension's
 * action and, while it can be appealed, a token to appeal it without a session.
 */
export async function suspendedSignInDetails(db: Database, secret: string, userId: number): Promise<Omit<SuspendedSignInDetails, 'until' | 'reason'>> {
  const [action] = await db.sequelize.query<ActionRow>(
    `SELECT ${actionColumns()} FROM moderation_actions WHERE subject_user_id = :userId AND action = 'suspend' ORDER BY id DESC LIMIT 1`,
    { replacements: { userId }, type: QueryTypes.SELECT },
  );
  if (!action) return { suspensionActionId: null, cannotAppealReason: 'No moderator’s decision is on record for this suspension; contact the admins.' };
  const refusal = await cannotAppealReason(db, action, await appealOfAction(db, action.id));
  if (refusal) return { suspensionActionId: action.id, cannotAppealReason: refusal };
  const { token, expiresAt } = issueAppealToken(secret, userId, action.id);
  return { suspensionActionId: action.id, appealToken: token, appealTokenExpiresAt: expiresAt.toISOString(), cannotAppealReason: null };
}

/** `POST /api/appeals/suspension`: a suspended racer's appeal, by token. */
export async function fileSuspensionAppeal(db: Database, secret: string, input: unknown): Promise<MyAppeal> {
  const { appealToken, text } = suspensionAppealCreateSchema.parse(input);
  const { userId, actionId } = readAppealToken(secret, appealToken);
  const [user] = await db.sequelize.query<Actor>('SELECT id, handle, role FROM users WHERE id = :userId', {
    replacements: { userId },
    type: QueryTypes.SELECT,
  });
  if (!user) throw BAD_TOKEN();
  return fileAppeal(db, user, { actionId, text });
}

// ---- Deciding ----

/** Undoes what an action did, as far as it is still in effect; returns the state before and after. */
async function reverse(db: Database, action: ActionRow, transaction: Transaction) {
  const restored = await unhideByActions(db, [action.id], transaction);
  const counts = { restored: restored.length };
  if (action.action !== 'suspend') return { previousState: { hiddenByAction: restored.length }, newState: counts, lifted: false };
  const subject = await lockSubject(db, action.subjectUserId, transaction);
  const [latest] = await db.sequelize.query<{ id: number }>(
    "SELECT max(id) AS id FROM moderation_actions WHERE subject_user_id = :userId AND action = 'suspend'",
    { replacements: { userId: subject.id }, type: QueryTypes.SELECT, transaction },
  );
  // Only the suspension being served is lifted; a later, separate one stays.
  const lifted = latest.id === action.id;
  const next = lifted ? await applySuspension(db, subject.id, { lift: true }, transaction) : suspensionState(subject);
  return { previousState: { ...suspensionState(subject), hiddenByAction: restored.length }, newState: { ...next, ...counts }, lifted };
}

const DECISION_TEXT = {
  uphold: (reason: string) => `Your appeal was reviewed and the decision stands. Reason: ${reason}`,
  overturn: (reason: string) => `Your appeal was reviewed and the decision was reversed. Reason: ${reason}`,
};

/**
 * `POST /api/moderation/appeals/:id/decide`: uphold or overturn, by someone other than the
 * moderator who acted (admins may decide any). Overturning reverses the action: what a hide or
 * hide-all hid comes back, a suspension is lifted. The author is told; the audit log records it.
 */
export async function decideAppeal(db: Database, decider: Actor, appealId: number, input: unknown): Promise<MyAppeal> {
  const { decision, reason } = appealDecisionSchema.parse(input);
  if (!Number.isSafeInteger(appealId) || appealId <= 0 || appealId > 2_147_483_647) throw ApiError.notFound('That appeal');
  const done = await db.sequelize.transaction(async (transaction) => {
    const [appeal] = await db.sequelize.query<AppealRow>(`SELECT ${APPEAL_COLUMNS} FROM appeals WHERE id = :appealId FOR UPDATE`, {
      replacements: { appealId },
      type: QueryTypes.SELECT,
      transaction,
    });
    if (!appeal) throw ApiError.notFound('That appeal');
    if (appeal.status !== 'open') throw new ApiError(409, 'appeal_decided', 'This appeal was already decided.');
    const action = (await findAction(db, appeal.actionId, transaction))!;
    const subject = await lockSubject(db, action.subjectUserId, transaction);
    const refusal = cannotDecideReason(decider, { appellantId: appeal.appellantId, actorId: action.actorId, subjectRole: subject.role, action: action.action });
    if (refusal) throw new ApiError(403, ERROR_CODES.forbidden, refusal);
    const change =
      decision === 'overturn'
        ? await reverse(db, action, transaction)
        : { previousState: { status: 'open' }, newState: { status: 'upheld' }, lifted: false };
    const outcome = await insertModerationAction(
      db,
      {
        actorId: decider.id,
        action: decision === 'overturn' ? 'appeal-overturned' : 'appeal-upheld',
        targetType: action.targetType,
        targetId: action.targetId,
        subjectUserId: subject.id,
        reason,
        appealId: appeal.id,
      },
      transaction,
    );
    const [decided] = await db.sequelize.query<AppealRow>(
      `UPDATE appeals SET status = :status, decided_by = :deciderId, decision_reason = :reason, decided_at = now()
        WHERE id = :appealId RETURNING ${APPEAL_COLUMNS}`,
      {
        replacements: { status: decision === 'overturn' ? 'overturned' : 'upheld', deciderId: decider.id, reason, appealId: appeal.id },
        type: QueryTypes.SELECT,
        transaction,
      },
    );
    await recordAudit(
      db,
      {
        actor: decider,
        action: outcome.action,
        targetType: action.targetType,
        targetId: action.targetId,
        subject,
        reason,
        previousState: { appealId: appeal.id, appealedAction: action.action, appealedActionId: action.id, ...change.previousState },
        newState: { appealStatus: decided.status, actionId: outcome.id, ...change.newState },
      },
      transaction,
    );
    return { decided, action, subject };
  });
  const [target] = (await describeTargets(db, [{ type: done.action.targetType, id: done.action.targetId }])).values();
  await notify(db, {
    type: 'moderation-notice',
    userId: done.subject.id,
    actorId: null,
    ...notificationLinks({ type: done.action.targetType, id: done.action.targetId, setupId: target?.setupId ?? null }),
    detail: DECISION_TEXT[decision](reason).slice(0, 500),
  });
  return toMyAppeal(done.decided);
}

// ---- My side ----

/**
 * `GET /api/moderation/mine`: moderation decisions about my content or account, newest first (at
 * most 100; dismissed reports are not decisions about me), each with whether I can still appeal.
 */
export async function listActionsOnMe(db: Database, me: Actor): Promise<ActionOnMe[]> {
  const actions = await db.sequelize.query<ActionRow>(
    `SELECT ${actionColumns()} FROM moderation_actions WHERE subject_user_id = :userId AND action <> 'dismiss'
      ORDER BY created_at DESC, id DESC LIMIT 100`,
    { replacements: { userId: me.id }, type: QueryTypes.SELECT },
  );
  if (!actions.length) return [];
  const appeals = await db.sequelize.query<AppealRow>(`SELECT ${APPEAL_COLUMNS} FROM appeals WHERE action_id IN (:ids)`, {
    replacements: { ids: actions.map((a) => a.id) },
    type: QueryTypes.SELECT,
  });
  const appealBy = new Map(appeals.map((a) => [a.actionId, a]));
  const contents = await describeTargets(db, actions.map((a) => ({ type: a.targetType, id: a.targetId })));
  return Promise.all(
    actions.map(async (a) => {
      const appeal = appealBy.get(a.id) ?? null;
      const refusal = await cannotAppealReason(db, a, appeal);
      const content = contents.get(`${a.targetType}:${a.targetId}`);
      return {
        ...toActionSummary(a),
        targetLabel: a.targetType === 'racer' ? 'Your profile and account' : (content?.label ?? 'Something that was deleted'),
        targetPath: content?.exists ? content.path : null,
        appealUntil: appealUntil(a.createdAt).toISOString(),
        canAppeal: refusal === null,
        cannotAppealReason: refusal,
        appeal: appeal ? toMyAppeal(appeal) : null,
      };
    }),
  );
}
