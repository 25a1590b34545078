import { UniqueConstraintError } from 'sequelize';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { User } from '../models/User';
import { assertNotSuspended, findByHandle, type AccountDeps } from './accounts';

/** What we keep from the provider's profile. */
export type GithubProfile = { id: string; login: string; name: string | null; verifiedEmail: string | null };

/** A valid handle from a provider login: allowed characters only, 3–30 long. */
export function handleBaseFromLogin(login: string): string {
  let base = login.replace(/[^A-Za-z0-9_-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 30);
  if (base.length < 3) base = `racer-${base}`.slice(0, 30).replace(/-+$/, '') || 'racer';
  return base.length < 3 ? 'racer' : base;
}

/** The base handle, or base-2, base-3 … trimmed to fit, whichever is free. */
export async function uniqueHandle(db: Database, login: string): Promise<string> {
  const base = handleBaseFromLogin(login);
  for (let n = 1; n < 1000; n++) {
    const suffix = n === 1 ? '' : `-${n}`;
    const candidate = base.slice(0, 30 - suffix.length) + suffix;
    if (!(await findByHandle(db, candidate))) return candidate;
  }
  throw new ApiError(409, 'conflict', 'Could not find a free handle; sign up with e-mail instead.');
}

/**
 * Signs in with the provider: the linked account, else the account with the same verified
 * address (which gets linked), else a new account whose handle comes from the login.
 */
export async function signInWithGithub(deps: AccountDeps, profile: GithubProfile): Promise<User> {
  const { User } = deps.db.models;
  const linked = await User.findOne({ where: { githubId: profile.id } });
  if (linked) {
    assertNotSuspended(linked);
    return linked.githubLogin === profile.login ? linked : linked.update({ githubLogin: profile.login });
  }
  if (profile.verifiedEmail) {
    const sameAddress = await User.findOne({
      where: deps.db.sequelize.where(deps.db.sequelize.fn('lower', deps.db.sequelize.col('email')), profile.verifiedEmail.toLowerCase()),
    });
    if (sameAddress) {
      assertNotSuspended(sameAddress);
      return sameAddress.update({
        githubId: profile.id,
        githubLogin: profile.login,
        emailVerifiedAt: sameAddress.emailVerifiedAt ?? new Date(),
      });
    }
  }
  try {
    return await User.create({
      handle: await uniqueHandle(deps.db, profile.login),
      displayName: (profile.name ?? profile.login).trim().slice(0, 80) || profile.login,
      email: profile.verifiedEmail?.toLowerCase() ?? null,
      emailVerifiedAt: profile.verifiedEmail ? new Date() : null,
      githubId: profile.id,
      githubLogin: profile.login,
    });
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw new ApiError(409, 'conflict', 'That GitHub account was just linked elsewhere; try again.');
    throw err;
  }
}

/** Links the provider account to a signed-in racer; refuses one already linked to someone else. */
export async function linkGithub(deps: AccountDeps, user: User, profile: GithubProfile): Promise<User> {
  const other = await deps.db.models.User.findOne({ where: { githubId: profile.id } });
  if (other && other.id !== user.id) {
    throw new ApiError(409, 'github_linked_elsewhere', 'That GitHub account is already linked to another Tunefork account.');
  }
  return user.update({ githubId: profile.id, githubLogin: profile.login });
}

/** Unlinks the provider, unless it is the only way this racer can sign in. */
export async function unlinkGithub(user: User): Promise<User> {
  if (!user.githubId) return user;
  if (!user.passwordHash) {
    throw new ApiError(409, 'last_sign_in_method', 'Set a password first: GitHub is your only way to sign in.');
  }
  return user.update({ githubId: null, githubLogin: null });
}
