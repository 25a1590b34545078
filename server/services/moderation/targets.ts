import { QueryTypes, type Transaction } from 'sequelize';
import type { ReportTargetType } from '../../../shared/types/moderation';
import type { Database } from '../../db/database';
import { ApiError } from '../../errors';

/** A reportable thing as moderation needs it: who owns it and whether it is hidden now. */
export type ModerationTarget = {
  type: ReportTargetType;
  id: number;
  ownerId: number;
  ownerHandle: string;
  ownerRole: 'racer' | 'moderator' | 'admin';
  /** The setup a revision, comment or photo belongs to (a photo's first setup); null for racers. */
  setupId: number | null;
  hiddenAt: Date | null;
  hiddenReason: string | null;
  autoHidden: boolean;
  hideActionId: number | null;
};

const OWNER_SQL: Record<ReportTargetType, string> = {
  setup: `SELECT s.owner_id AS "ownerId", s.id AS "setupId" FROM setups s WHERE s.id = :id AND s.deleted_at IS NULL`,
  revision: `SELECT r.author_id AS "ownerId", r.setup_id AS "setupId" FROM setup_revisions r
             JOIN setups s ON s.id = r.setup_id AND s.deleted_at IS NULL WHERE r.id = :id`,
  comment: `SELECT c.author_id AS "ownerId", c.setup_id AS "setupId" FROM comments c WHERE c.id = :id AND c.deleted_at IS NULL`,
  photo: `SELECT p.owner_id AS "ownerId",
                 (SELECT sp.setup_id FROM setup_photos sp WHERE sp.photo_id = p.id ORDER BY sp.setup_id LIMIT 1) AS "setupId"
          FROM photos p WHERE p.id = :id`,
  racer: `SELECT u.id AS "ownerId", NULL::int AS "setupId" FROM users u WHERE u.id = :id`,
};

/** Loads a target (locking nothing), or null when it does not exist (or was deleted). */
export async function findTarget(db: Database, type: ReportTargetType, id: number, transaction?: Transaction): Promise<ModerationTarget | null> {
  if (!Number.isSafeInteger(id) || id <= 0) return null;
  const [row] = await db.sequelize.query<{ ownerId: number; setupId: number | null }>(OWNER_SQL[type], {
    type: QueryTypes.SELECT,
    replacements: { id },
    transaction,
  });
  if (!row) return null;
  const [meta] = await db.sequelize.query<{
    handle: string;
    role: ModerationTarget['ownerRole'];
    hiddenAt: Date | null;
    reason: string | null;
    auto: boolean | null;
    actionId: number | null;
  }>(
    `SELECT u.handle, u.role, h.hidden_at AS "hiddenAt", h.reason, h.auto, h.action_id AS "actionId"
     FROM users u LEFT JOIN content_hides h ON h.target_type = :type AND h.target_id = :id
     WHERE u.id = :ownerId`,
    { type: QueryTypes.SELECT, replacements: { type, id, ownerId: row.ownerId }, transaction },
  );
  return {
    type,
    id,
    ownerId: row.ownerId,
    ownerHandle: meta.handle,
    ownerRole: meta.role,
    setupId: row.setupId,
    hiddenAt: meta.hiddenAt,
    hiddenReason: meta.reason,
    autoHidden: meta.auto ?? false,
    hideActionId: meta.actionId,
  };
}

/** Like findTarget, but a missing target is a 404 with the kind of thing named. */
export async function requireTarget(db: Database, type: ReportTargetType, id: number, transaction?: Transaction): Promise<ModerationTarget> {
  const target = await findTarget(db, type, id, transaction);
  if (!target) throw ApiError.notFound(type === 'racer' ? 'That racer' : type === 'revision' ? 'That change note' : `That ${type}`);
  return target;
}

/** The table and column that lists filter on, where the target's table has one. */
const HIDDEN_COLUMN: Partial<Record<ReportTargetType, { table: string; column: string }>> = {
  setup: { table: 'setups', column: 'hidden_at' },
  comment: { table: 'comments', column: 'hidden_at' },
  photo: { table: 'photos', column: 'hidden_at' },
  racer: { table: 'users', column: 'profile_hidden_at' },
};

/**
 * Hides or restores one target: never deletes anything, so restoring brings it back whole. Keeps
 * `content_hides` (reason, automatic or not, which action) and the table's own hidden column in step.
 */
export async function setTargetHidden(
  db: Database,
  target: { type: ReportTargetType; id: number },
  state: { hidden: true; reason: string; auto: boolean; actionId: number | null } | { hidden: false },
  transaction: Transaction,
): Promise<void> {
  const at = state.hidden ? new Date() : null;
  if (state.hidden) {
    await db.sequelize.query(
      `INSERT INTO content_hides (target_type, target_id, hidden_at, reason, auto, action_id)
       VALUES (:type, :id, :at, :reason, :auto, :actionId)
       ON CONFLICT (target_type, target_id) DO UPDATE
         SET reason = EXCLUDED.reason, auto = EXCLUDED.auto, action_id = EXCLUDED.action_id`,
      { replacements: { type: target.type, id: target.id, at, reason: state.reason, auto: state.auto, actionId: state.actionId }, transaction },
    );
  } else {
    await db.sequelize.query('DELETE FROM content_hides WHERE target_type = :type AND target_id = :id', {
      replacements: { type: target.type, id: target.id },
      transaction,
    });
  }
  const col = HIDDEN_COLUMN[target.type];
  if (col) {
    // A renewed hide keeps the first hide's time.
    const value = state.hidden ? `COALESCE(${col.column}, :at)` : 'NULL';
    await db.sequelize.query(`UPDATE ${col.table} SET ${col.column} = ${value} WHERE id = :id`, { replacements: { at, id: target.id }, transaction });
  }
}
