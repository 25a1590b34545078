import { Op } from 'sequelize';
import type { AdminUser, Role } from '../../shared/types/auth';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { User } from '../models/User';
import { toAdminUser } from './accountDto';
import { applySuspension, endSessions, insertModerationAction, lockSubject, suspensionState } from './moderation/actions';
import { recordAudit } from './moderation/audit';

async function findTarget(db: Database, id: number): Promise<User> {
  const user = Number.isSafeInteger(id) ? await db.models.User.findByPk(id) : null;
  if (!user) throw ApiError.notFound('That racer');
  return user;
}

/** Racers matching a handle, name or e-mail fragment; newest first, at most 50. */
export async function listUsers(db: Database, query: string): Promise<AdminUser[]> {
  const q = query.trim();
  const like = `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
  const users = await db.models.User.findAll({
    where: q ? { [Op.or]: [{ handle: { [Op.iLike]: like } }, { displayName: { [Op.iLike]: like } }, { email: { [Op.iLike]: like } }] } : {},
    order: [['createdAt', 'DESC'], ['id', 'DESC']],
    limit: 50,
  });
  return users.map(toAdminUser);
}

/** Changes a role. The last admin cannot stop being one, so the site always has an admin. */
export async function changeRole(db: Database, actor: User, targetId: number, role: Role): Promise<AdminUser> {
  return db.sequelize.transaction(async (transaction) => {
    const target = await db.models.User.findByPk(targetId, { transaction, lock: true });
    if (!target) throw ApiError.notFound('That racer');
    if (target.role === 'admin' && role !== 'admin') {
      const admins = await db.models.User.count({ where: { role: 'admin' }, transaction });
      if (admins <= 1) {
        throw new ApiError(409, 'last_admin', target.id === actor.id
          ? 'You are the last admin: make someone else an admin first.'
          : 'That is the last admin.');
      }
    }
    const previousRole = target.role;
    await target.update({ role }, { transaction });
    await recordAudit(
      db,
      {
        actor,
        action: 'role-change',
        targetType: 'racer',
        targetId: target.id,
        subject: target,
        previousState: { role: previousRole },
        newState: { role },
      },
      transaction,
    );
    return toAdminUser(target);
  });
}

/**
 * Suspends a racer until a time (or indefinitely) and ends their sessions at once. Recorded as a
 * moderation action (so the racer can appeal it like any suspension) and in the audit log.
 */
export async function suspendUser(db: Database, actor: User, targetId: number, until: Date | null, reason: string): Promise<AdminUser> {
  const target = await findTarget(db, targetId);
  if (target.id === actor.id) throw new ApiError(409, 'cannot_suspend_self', 'You cannot suspend yourself.');
  if (until && until <= new Date()) throw ApiError.validation({ until: 'Pick an end date in the future, or none for an indefinite suspension.' });
  await db.sequelize.transaction(async (transaction) => {
    const subject = await lockSubject(db, target.id, transaction);
    const action = await insertModerationAction(
      db,
      { actorId: actor.id, action: 'suspend', targetType: 'racer', targetId: target.id, subjectUserId: target.id, reason, suspendedUntil: until, suspendedIndefinitely: until === null, hideContent: false },
      transaction,
    );
    const next = await applySuspension(db, target.id, { until, reason }, transaction);
    await recordAudit(
      db,
      { actor, action: 'admin-suspend', targetType: 'racer', targetId: target.id, subject, reason, previousState: suspensionState(subject), newState: { ...next, actionId: action.id } },
      transaction,
    );
  });
  await endSessions(db, target.id);
  return toAdminUser(await target.reload());
}

/** Lifts a suspension early; recorded as an `unsuspend` moderation action and in the audit log. */
export async function unsuspendUser(db: Database, actor: User, targetId: number): Promise<AdminUser> {
  const target = await findTarget(db, targetId);
  await db.sequelize.transaction(async (transaction) => {
    const subject = await lockSubject(db, target.id, transaction);
    const reason = 'Lifted by an admin.';
    const action = await insertModerationAction(
      db,
      { actorId: actor.id, action: 'unsuspend', targetType: 'racer', targetId: target.id, subjectUserId: target.id, reason },
      transaction,
    );
    const next = await applySuspension(db, target.id, { lift: true }, transaction);
    await recordAudit(
      db,
      { actor, action: 'admin-unsuspend', targetType: 'racer', targetId: target.id, subject, reason, previousState: suspensionState(subject), newState: { ...next, actionId: action.id } },
      transaction,
    );
  });
  return toAdminUser(await target.reload());
}
