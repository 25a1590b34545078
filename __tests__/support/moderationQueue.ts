import { QueryTypes } from 'sequelize';
import type { ModerationActionRequest, ReportReason, ReportTargetType } from '../../shared/types/moderation';
import type { Database } from '../../server/db/database';
import { requireTarget } from '../../server/services/moderation/targets';
import type { SessionAgent } from './accounts';

/**
 * Helpers for the moderation tests. Reports are stored straight in the table (their API is tested
 * with the reports feature); everything a moderator does goes through the API.
 */

/** Stores an open report on a target, as the reports feature does. */
export async function fileReport(
  db: Database,
  reporterId: number,
  target: { type: ReportTargetType; id: number },
  reason: ReportReason = 'spam',
  note = '',
): Promise<number> {
  const found = await requireTarget(db, target.type, target.id);
  const [row] = await db.sequelize.query<{ id: number }>(
    `INSERT INTO reports (reporter_id, target_type, target_id, target_owner_id, reason, note)
     VALUES (:reporterId, :type, :id, :ownerId, :reason, :note) RETURNING id`,
    { replacements: { reporterId, type: target.type, id: target.id, ownerId: found.ownerId, reason, note }, type: QueryTypes.SELECT },
  );
  return row.id;
}

/** A moderator's action through the API. */
export function act(s: SessionAgent, body: ModerationActionRequest) {
  return s.agent.post('/api/moderation/actions').set('X-CSRF-Token', s.csrf).send(body);
}

export function sql<T extends object>(db: Database, query: string, replacements: Record<string, unknown> = {}): Promise<T[]> {
  return db.sequelize.query<T>(query, { replacements, type: QueryTypes.SELECT });
}

/** Notifications stored for a racer, newest first. */
export function notificationsOf(db: Database, userId: number, type?: string) {
  return sql<{ type: string; actor_id: number | null; setup_id: number | null; detail: string }>(
    db,
    `SELECT type, actor_id, setup_id, detail FROM notifications WHERE user_id = :userId ${type ? 'AND type = :type' : ''} ORDER BY id DESC`,
    { userId, type },
  );
}

/** Audit rows about a target, oldest first. */
export function auditOf(db: Database, targetType: string, targetId: number) {
  return sql<{ action: string; actor_id: number | null; actor_handle: string | null; reason: string; previous_state: Record<string, unknown>; new_state: Record<string, unknown> }>(
    db,
    'SELECT action, actor_id, actor_handle, reason, previous_state, new_state FROM audit_log WHERE target_type = :targetType AND target_id = :targetId ORDER BY id',
    { targetType, targetId },
  );
}
