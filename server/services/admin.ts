import { Op } from 'sequelize';
import type { AdminUser, Role } from '../../shared/types/auth';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { User } from '../models/User';
import { toAdminUser } from './accountDto';
import { destroySessionsOf } from './sessions';

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
    await target.update({ role }, { transaction });
    return toAdminUser(target);
  });
}

/** Suspends a racer until a time (or indefinitely) and ends their sessions at once. */
export async function suspendUser(db: Database, actor: User, targetId: number, until: Date | null, reason: string): Promise<AdminUser> {
  const target = await findTarget(db, targetId);
  if (target.id === actor.id) throw new ApiError(409, 'cannot_suspend_self', 'You cannot suspend yourself.');
  if (until && until <= new Date()) throw ApiError.validation({ until: 'Pick an end date in the future, or none for an indefinite suspension.' });
  await target.update({ suspendedUntil: until, suspendedIndefinitely: until === null, suspensionReason: reason });
  await destroySessionsOf(db, target.id);
  return toAdminUser(target);
}

export async function unsuspendUser(db: Database, targetId: number): Promise<AdminUser> {
  const target = await findTarget(db, targetId);
  await target.update({ suspendedUntil: null, suspendedIndefinitely: false, suspensionReason: null });
  return toAdminUser(target);
}
