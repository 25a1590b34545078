import { Op, UniqueConstraintError } from 'sequelize';
import type { ProfileUpdate, SignUpRequest } from '../../shared/types/auth';
import { signUpRequestSchema } from '../../shared/types/auth';
import type { Config } from '../config';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { User } from '../models/User';
import { describeSuspension } from './accountDto';
import { consumeEmailToken, issueEmailToken } from './emailTokens';
import type { Mailer } from './mail';
import { passwordResetMail, verificationMail } from './mailTemplates';
import { hashPassword, verifyPassword } from './passwords';
import { suspendedSignInDetails } from './moderation/appeals';
import { destroySessionsOf } from './sessions';
import { assertMaySignIn, clearFailedSignIns, recordFailedSignIn } from './signInThrottle';

export type AccountDeps = { db: Database; config: Config; mailer: Mailer };

export const NEUTRAL_EMAIL_MESSAGE =
  'If that address belongs to a Tunefork account, a message is on its way. Check your inbox (and spam folder) in a minute.';

function findByEmail(db: Database, email: string): Promise<User | null> {
  return db.models.User.findOne({ where: db.sequelize.where(db.sequelize.fn('lower', db.sequelize.col('email')), email.toLowerCase()) });
}

function findByHandle(db: Database, handle: string): Promise<User | null> {
  return db.models.User.findOne({ where: db.sequelize.where(db.sequelize.fn('lower', db.sequelize.col('handle')), handle.toLowerCase()) });
}

export { findByHandle };

async function sendVerification(deps: AccountDeps, user: User, address: string): Promise<void> {
  const token = await issueEmailToken(deps.db, user.id, 'verify', address);
  deps.mailer.sendInBackground(verificationMail(address, user.displayName, `${deps.config.publicUrl}/verify-email?token=${token}`));
}

/** Creates an account with a password and sends the verification mail. 409 names the taken field. */
export async function signUp(deps: AccountDeps, input: SignUpRequest): Promise<User> {
  const data = signUpRequestSchema.parse(input);
  const [handleTaken, emailTaken] = await Promise.all([findByHandle(deps.db, data.handle), findByEmail(deps.db, data.email)]);
  const details: Record<string, string> = {};
  if (handleTaken) details.handle = 'That handle is taken; try another.';
  if (emailTaken) details.email = 'That address already has an account. Sign in, or reset your password.';
  if (Object.keys(details).length) throw new ApiError(409, 'conflict', 'Some details are already in use.', details);
  let user: User;
  try {
    user = await deps.db.models.User.create({
      handle: data.handle,
      displayName: data.displayName,
      email: data.email,
      passwordHash: await hashPassword(data.password, deps.config.bcryptCost),
    });
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw new ApiError(409, 'conflict', 'That handle or address was just taken; try another.');
    throw err;
  }
  await sendVerification(deps, user, data.email);
  return user;
}

/** Throws 403 with the end date when the account is suspended; `appeal` adds how to appeal (see suspendedSignInDetails). */
export function assertNotSuspended(user: User, appeal: Record<string, unknown> = {}): void {
  if (user.isSuspended()) {
    throw new ApiError(403, 'account_suspended', `This account is suspended ${describeSuspension(user)}.`, {
      until: user.suspendedIndefinitely ? null : (user.suspendedUntil?.toISOString() ?? null),
      reason: user.suspensionReason,
      ...appeal,
    });
  }
}

const BAD_CREDENTIALS = () => new ApiError(401, 'invalid_credentials', 'That e-mail, handle or password is not right.');

/** Checks a password sign-in: throttled per account and client, suspension refused with its end date. */
export async function authenticateWithPassword(deps: AccountDeps, login: string, password: string, clientKey: string): Promise<User> {
  const user = login.includes('@') ? await findByEmail(deps.db, login) : await findByHandle(deps.db, login);
  if (!user) {
    await verifyPassword(password, null, deps.config.bcryptCost);
    throw BAD_CREDENTIALS();
  }
  await assertMaySignIn(deps.db, user.id, clientKey);
  if (!(await verifyPassword(password, user.passwordHash, deps.config.bcryptCost))) {
    await recordFailedSignIn(deps.db, user.id, clientKey);
    throw BAD_CREDENTIALS();
  }
  // The password was right: the refusal may carry a token to appeal the suspension without a session.
  if (user.isSuspended()) assertNotSuspended(user, await suspendedSignInDetails(deps.db, deps.config.sessionSecret, user.id));
  await clearFailedSignIns(deps.db, user.id);
  return user;
}

/** Confirms an address from a verification link; for an e-mail change the new address takes over. */
export async function verifyEmail(deps: AccountDeps, token: string): Promise<User> {
  return deps.db.sequelize.transaction(async (transaction) => {
    const consumed = await consumeEmailToken(deps.db, token, 'verify', transaction);
    if (!consumed) throw new ApiError(400, 'token_invalid', 'This link has expired or was already used. Ask for a new one.');
    const user = await deps.db.models.User.findByPk(consumed.userId, { transaction, lock: true });
    if (!user) throw new ApiError(400, 'token_invalid', 'This link no longer matches an account.');
    const address = consumed.email ?? user.email;
    try {
      await user.update({ email: address, pendingEmail: null, emailVerifiedAt: new Date() }, { transaction });
    } catch (err) {
      if (err instanceof UniqueConstraintError) throw new ApiError(409, 'conflict', 'That address now belongs to another account.');
      throw err;
    }
    return user;
  });
}

/** Sends a fresh verification link when the address has an unverified account; answers the same either way. */
export async function resendVerification(deps: AccountDeps, email: string): Promise<string> {
  const user = await deps.db.models.User.findOne({
    where: {
      [Op.or]: [
        deps.db.sequelize.where(deps.db.sequelize.fn('lower', deps.db.sequelize.col('email')), email),
        { pendingEmail: email },
      ],
    },
  });
  if (user && (user.pendingEmail === email || user.emailVerifiedAt === null)) await sendVerification(deps, user, email);
  return NEUTRAL_EMAIL_MESSAGE;
}

/** Sends a reset link when the address has an account; answers the same either way. */
export async function requestPasswordReset(deps: AccountDeps, email: string): Promise<string> {
  const user = await findByEmail(deps.db, email);
  if (user) {
    const token = await issueEmailToken(deps.db, user.id, 'reset', email);
    deps.mailer.sendInBackground(passwordResetMail(email, user.displayName, `${deps.config.publicUrl}/reset-password?token=${token}`));
  }
  return NEUTRAL_EMAIL_MESSAGE;
}

/** Sets a new password from a reset link and signs out every session of that racer. */
export async function resetPassword(deps: AccountDeps, token: string, password: string): Promise<void> {
  const passwordHash = await hashPassword(password, deps.config.bcryptCost);
  const userId = await deps.db.sequelize.transaction(async (transaction) => {
    const consumed = await consumeEmailToken(deps.db, token, 'reset', transaction);
    if (!consumed) throw new ApiError(400, 'token_invalid', 'This reset link has expired or was already used. Ask for a new one.');
    // Receiving the link proves the address, so it counts as verified.
    await deps.db.sequelize.query(
      'UPDATE users SET password_hash = :passwordHash, email_verified_at = COALESCE(email_verified_at, now()), updated_at = now() WHERE id = :id',
      { replacements: { passwordHash, id: consumed.userId }, transaction },
    );
    return consumed.userId;
  });
  await destroySessionsOf(deps.db, userId);
  await clearFailedSignIns(deps.db, userId);
}

export async function updateProfile(deps: AccountDeps, user: User, patch: ProfileUpdate): Promise<User> {
  const { units, ...rest } = patch;
  return user.update({
    ...rest,
    ...(units ? { unitsLength: units.length, unitsTemperature: units.temperature } : {}),
  });
}

/** Starts an e-mail change: the new address gets a link; it replaces the old one once clicked. */
export async function requestEmailChange(deps: AccountDeps, user: User, email: string, password?: string): Promise<string> {
  if (user.passwordHash && !(await verifyPassword(password ?? '', user.passwordHash, deps.config.bcryptCost))) {
    throw ApiError.validation({ password: 'Your current password is not right.' });
  }
  const taken = await findByEmail(deps.db, email);
  // Same answer whether or not another account has the address: no enumeration from settings either.
  if (!taken) {
    await user.update({ pendingEmail: email });
    await sendVerification(deps, user, email);
  }
  return `We sent a confirmation link to ${email}. Your address changes once you open it.`;
}

/** Changes the password (current one required when there is one) and signs out other sessions. */
export async function changePassword(deps: AccountDeps, user: User, currentSid: string, current: string | undefined, next: string): Promise<void> {
  if (user.passwordHash && !(await verifyPassword(current ?? '', user.passwordHash, deps.config.bcryptCost))) {
    throw ApiError.validation({ currentPassword: 'Your current password is not right.' });
  }
  await user.update({ passwordHash: await hashPassword(next, deps.config.bcryptCost) });
  await destroySessionsOf(deps.db, user.id, currentSid);
}
