import { createHmac, timingSafeEqual } from 'node:crypto';
import type { Pool } from 'pg';
import {
  EMAIL_TYPE_LABELS,
  unsubscribeRequestSchema,
  unsubscribeScopeSchema,
  type UnsubscribeInfo,
  type UnsubscribeScope,
} from '../../shared/types/community';
import { ApiError } from '../errors';
import { getEmailPreferences, isAlreadyOff, unsubscribeFrom } from './emailPreferences';

/*
 * One-click unsubscribe links: `<user id>.<scope>.<signature>`, the signature an HMAC-SHA256 over
 * the first two parts with a key of its own (config.notificationMail.unsubscribeSecret). Anyone
 * holding the link may use it without signing in, and nobody can make one for another racer or
 * another scope without the key. Links do not expire: a mail read months later must still work.
 */

const VERSION = 'u1';
const TOKEN_SHAPE = /^(\d{1,10})\.([a-z-]{1,40})\.([A-Za-z0-9_-]{43})$/;

function sign(secret: string, userId: number, scope: UnsubscribeScope): string {
  return createHmac('sha256', secret).update(`${VERSION}:${userId}:${scope}`).digest('base64url');
}

/** The token for an unsubscribe link of `userId` for one type of mail, or 'all'. */
export function createUnsubscribeToken(secret: string, userId: number, scope: UnsubscribeScope): string {
  return `${userId}.${scope}.${sign(secret, userId, scope)}`;
}

const refused = () =>
  new ApiError(
    400,
    'token_invalid',
    'This unsubscribe link is not valid: it may have been cut short or changed. Open the link from the e-mail again, or sign in and change your e-mail settings.',
  );

/** Checks a token's signature in constant time; returns whom and what it is for, or throws 400. */
export function verifyUnsubscribeToken(secret: string, token: string): { userId: number; scope: UnsubscribeScope } {
  const match = TOKEN_SHAPE.exec(token);
  if (!match) throw refused();
  const userId = Number(match[1]);
  const scope = unsubscribeScopeSchema.safeParse(match[2]);
  if (!scope.success) throw refused();
  const expected = Buffer.from(sign(secret, userId, scope.data));
  const given = Buffer.from(match[3]);
  if (expected.length !== given.length || !timingSafeEqual(expected, given)) throw refused();
  return { userId, scope: scope.data };
}

function scopeLabel(scope: UnsubscribeScope): string {
  return scope === 'all' ? 'All notification e-mail' : EMAIL_TYPE_LABELS[scope];
}

async function handleOf(pool: Pool, userId: number): Promise<string> {
  const { rows } = await pool.query<{ handle: string }>('SELECT handle FROM users WHERE id = $1', [userId]);
  // A signed link of an account deleted since: nothing left to unsubscribe.
  if (!rows[0]) throw new ApiError(404, 'not_found', 'The account this link was for no longer exists, so it gets no e-mail.');
  return rows[0].handle;
}

/** What a link would stop, for the confirmation page (reading it changes nothing). */
export async function describeUnsubscribe(pool: Pool, secret: string, token: unknown): Promise<UnsubscribeInfo> {
  const { userId, scope } = verifyUnsubscribeToken(secret, unsubscribeRequestSchema.parse({ token }).token);
  const handle = await handleOf(pool, userId);
  const alreadyOff = isAlreadyOff(await getEmailPreferences(pool, userId), scope);
  return { scope, label: scopeLabel(scope), handle, alreadyOff };
}

/** Applies a link: the type (or all notification mail) is off from now on. Repeating it is harmless. */
export async function applyUnsubscribe(pool: Pool, secret: string, token: unknown): Promise<{ message: string; scope: UnsubscribeScope }> {
  const { userId, scope } = verifyUnsubscribeToken(secret, unsubscribeRequestSchema.parse({ token }).token);
  await handleOf(pool, userId);
  await unsubscribeFrom(pool, userId, scope);
  const message =
    scope === 'all'
      ? 'You will get no more notification e-mail from Tunefork. Account e-mail (address checks, password resets) still arrives.'
      : `You will get no more e-mail about: ${EMAIL_TYPE_LABELS[scope].toLowerCase()}.`;
  return { message: `${message} You can change this any time in Settings.`, scope };
}
