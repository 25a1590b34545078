import { QueryTypes, UniqueConstraintError, type Transaction } from 'sequelize';
import { ERROR_CODES } from '../../../shared/types/errors';
import {
  ACTION_OUTCOME_TEXT,
  REPORT_REASON_LABELS,
  reportCreateSchema,
  type ModerationActionKind,
  type MyReport,
  type ReportReason,
  type ReportTargetType,
} from '../../../shared/types/moderation';
import type { Database } from '../../db/database';
import { ApiError } from '../../errors';
import type { User } from '../../models/User';
import { hideIfReportedEnough, lockModerationTarget, tellAuthorOfAutoHide, type AutoHidden } from './autoHide';
import { recordAudit } from './audit';
import { viewTargets, targetKey } from './reportTargetViews';
import { findTarget, type ModerationTarget } from './targets';

/** How the kind of thing reads in a sentence. */
const NOUN: Record<ReportTargetType, string> = {
  setup: 'setup',
  revision: 'change note',
  comment: 'comment',
  photo: 'photo',
  racer: 'profile',
};

/** "My reports" shows this many, newest first (reports are rate-limited, so it covers months). */
export const MY_REPORTS_LIMIT = 200;

function parseReport(input: unknown) {
  const parsed = reportCreateSchema.safeParse(input ?? {});
  if (parsed.success) return parsed.data;
  const details: Record<string, string> = {};
  for (const issue of parsed.error.issues) details[issue.path.join('.') || '_'] = issue.message;
  throw ApiError.validation(details, parsed.error.issues[0].message);
}

function notFound(type: ReportTargetType): ApiError {
  return ApiError.notFound(type === 'racer' ? 'That racer' : `That ${NOUN[type]}`);
}

function alreadyReported(type: ReportTargetType, reportId: number | null): ApiError {
  return new ApiError(
    409,
    ERROR_CODES.conflict,
    `You have already reported this ${NOUN[type]} and your report is still open. You can follow it under My reports.`,
    reportId ? { reportId } : undefined,
  );
}

async function openReportId(db: Database, reporterId: number, type: ReportTargetType, id: number, transaction?: Transaction) {
  const [row] = await db.sequelize.query<{ id: number }>(
    "SELECT id FROM reports WHERE reporter_id = :reporterId AND target_type = :type AND target_id = :id AND status = 'open'",
    { type: QueryTypes.SELECT, replacements: { reporterId, type, id }, transaction },
  );
  return row?.id ?? null;
}

type ReportInput = ReturnType<typeof parseReport>;

/** The report row and its audit row, inside the caller's transaction; returns the report's id. */
async function storeReport(db: Database, reporter: User, target: ModerationTarget, data: ReportInput, transaction: Transaction): Promise<number> {
  const [row] = await db.sequelize.query<{ id: number }>(
    `INSERT INTO reports (reporter_id, target_type, target_id, target_owner_id, reason, note)
     VALUES (:reporterId, :type, :id, :ownerId, :reason, :note) RETURNING id`,
    {
      type: QueryTypes.SELECT,
      replacements: { reporterId: reporter.id, type: target.type, id: target.id, ownerId: target.ownerId, reason: data.reason, note: data.note },
      transaction,
    },
  );
  const label = REPORT_REASON_LABELS[data.reason].label;
  await recordAudit(
    db,
    {
      actor: { id: reporter.id, handle: reporter.handle, role: reporter.role },
      action: 'report-filed',
      targetType: target.type,
      targetId: target.id,
      subject: { id: target.ownerId, handle: target.ownerHandle },
      reason: data.note ? `${label}: ${data.note}` : label,
      newState: { reportId: row.id, reason: data.reason, status: 'open' },
    },
    transaction,
  );
  return row.id;
}

/**
 * Files a report on something the reporter can see. Refuses what they cannot see (404, as if it did
 * not exist), their own content (409) and a second open report on the same thing (409, also when two
 * arrive at once: the unique index decides). In one transaction with the report: its audit row and
 * the automatic hide when the report tips the threshold; the author is told after commit.
 */
export async function fileReport(db: Database, reporter: User, input: unknown): Promise<MyReport> {
  const data = parseReport(input);
  const ref = { type: data.targetType, id: data.targetId };
  const target = await findTarget(db, ref.type, ref.id);
  const view = target ? (await viewTargets(db, reporter, [ref], { share: data.share })).get(targetKey(ref)) : undefined;
  if (!target || !view?.visible) throw notFound(ref.type);
  if (target.ownerId === reporter.id) {
    throw new ApiError(409, ERROR_CODES.conflict, `You cannot report your own ${NOUN[ref.type]}. Edit or delete it instead.`);
  }
  const existing = await openReportId(db, reporter.id, ref.type, ref.id);
  if (existing) throw alreadyReported(ref.type, existing);

  let filed: { reportId: number; hidden: AutoHidden | null };
  try {
    filed = await db.sequelize.transaction(async (transaction) => {
      await lockModerationTarget(db, ref, transaction);
      const reportId = await storeReport(db, reporter, target, data, transaction);
      return { reportId, hidden: await hideIfReportedEnough(db, target, transaction) };
    });
  } catch (err) {
    // Two reports by one racer at once: the partial unique index lets only one stay open.
    if (err instanceof UniqueConstraintError) throw alreadyReported(ref.type, await openReportId(db, reporter.id, ref.type, ref.id));
    throw err;
  }
  if (filed.hidden) await tellAuthorOfAutoHide(db, filed.hidden);
  const [report] = await listMyReports(db, reporter, filed.reportId);
  return report;
}

type ReportRow = {
  id: number;
  targetType: ReportTargetType;
  targetId: number;
  reason: ReportReason;
  note: string;
  status: 'open' | 'resolved';
  createdAt: Date;
  resolvedAt: Date | null;
  outcome: ModerationActionKind | null;
};

/**
 * My reports, newest first, each with what happened in plain words (never who decided) and what it
 * was; the path only while I can still open it. `onlyId` picks one of them.
 */
export async function listMyReports(db: Database, reporter: User, onlyId?: number): Promise<MyReport[]> {
  const rows = await db.sequelize.query<ReportRow>(
    `SELECT r.id, r.target_type AS "targetType", r.target_id AS "targetId", r.reason, r.note, r.status,
            r.created_at AS "createdAt", r.resolved_at AS "resolvedAt", a.action AS outcome
       FROM reports r LEFT JOIN moderation_actions a ON a.id = r.resolved_by_action_id
      WHERE r.reporter_id = :reporterId ${onlyId ? 'AND r.id = :onlyId' : ''}
      ORDER BY r.created_at DESC, r.id DESC
      LIMIT :limit`,
    { type: QueryTypes.SELECT, replacements: { reporterId: reporter.id, onlyId: onlyId ?? null, limit: MY_REPORTS_LIMIT } },
  );
  const views = await viewTargets(
    db,
    reporter,
    rows.map((r) => ({ type: r.targetType, id: r.targetId })),
    { trustUnlisted: true },
  );
  return rows.map((r) => {
    const view = views.get(targetKey({ type: r.targetType, id: r.targetId }))!;
    const resolved = r.status === 'resolved';
    return {
      id: r.id,
      targetType: r.targetType,
      targetId: r.targetId,
      targetLabel: view.label,
      targetPath: view.visible ? view.path : null,
      reason: r.reason,
      note: r.note,
      status: r.status,
      outcome: resolved ? r.outcome : null,
      outcomeText: resolved ? (r.outcome ? ACTION_OUTCOME_TEXT[r.outcome] : 'The moderators reviewed it.') : null,
      createdAt: r.createdAt.toISOString(),
      resolvedAt: r.resolvedAt?.toISOString() ?? null,
    };
  });
}
