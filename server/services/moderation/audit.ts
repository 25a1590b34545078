import { QueryTypes, type Transaction } from 'sequelize';
import type { Database } from '../../db/database';

/** One audit row. `actor` null means the system (the automatic hide). */
export type AuditInput = {
  actor: { id: number; handle: string; role: string } | null;
  /** A moderation action kind, or `role-change`, `admin-suspend`, `admin-unsuspend`, `appeal-filed`, `report-filed`. */
  action: string;
  targetType: string;
  targetId: number | null;
  subject?: { id: number; handle: string } | null;
  reason?: string;
  previousState?: Record<string, unknown>;
  newState?: Record<string, unknown>;
};

/**
 * Appends to the audit log, inside the caller's transaction so the record and the change land
 * together. The table refuses UPDATE, DELETE and TRUNCATE (migration 20261202T1000); this is the
 * only code that writes it.
 */
export async function recordAudit(db: Database, entry: AuditInput, transaction?: Transaction): Promise<number> {
  const rows = await db.sequelize.query<{ id: string }>(
    `INSERT INTO audit_log (actor_id, actor_handle, actor_role, action, target_type, target_id, subject_user_id, subject_handle,
                            reason, previous_state, new_state)
     VALUES (:actorId, :actorHandle, :actorRole, :action, :targetType, :targetId, :subjectId, :subjectHandle,
             :reason, CAST(:previousState AS jsonb), CAST(:newState AS jsonb))
     RETURNING id`,
    {
      type: QueryTypes.SELECT,
      transaction,
      replacements: {
        actorId: entry.actor?.id ?? null,
        actorHandle: entry.actor?.handle ?? null,
        actorRole: entry.actor?.role ?? null,
        action: entry.action,
        targetType: entry.targetType,
        targetId: entry.targetId,
        subjectId: entry.subject?.id ?? null,
        subjectHandle: entry.subject?.handle ?? null,
        reason: entry.reason ?? '',
        previousState: JSON.stringify(entry.previousState ?? {}),
        newState: JSON.stringify(entry.newState ?? {}),
      },
    },
  );
  return Number(rows[0].id);
}
