import crypto from 'node:crypto';
import type { Database } from '../db/database';
import { ApiError } from '../errors';

/** Failures allowed before waits begin, and the longest wait: guessing slows, owners are never locked out for long. */
export const FREE_FAILURES = 5;
export const MAX_WAIT_SECONDS = 15 * 60;

/** Waits double from 1 s after the free failures, capped at 15 minutes. */
export function waitSecondsAfter(failures: number): number {
  if (failures < FREE_FAILURES) return 0;
  return Math.min(2 ** (failures - FREE_FAILURES), MAX_WAIT_SECONDS);
}

export function clientKeyFor(ip: string | undefined): string {
  return crypto.createHash('sha256').update(ip ?? 'unknown').digest('hex').slice(0, 32);
}

/**
 * Throws 429 when this account has failed too often from this client address recently. Keyed by
 * account AND address, so someone guessing from elsewhere cannot keep the owner out.
 */
export async function assertMaySignIn(db: Database, userId: number, clientKey: string, now = new Date()): Promise<void> {
  const { rows } = await db.pool.query<{ failures: number; last_failed_at: Date }>(
    'SELECT failures, last_failed_at FROM sign_in_failures WHERE user_id = $1 AND client_key = $2',
    [userId, clientKey],
  );
  if (!rows[0]) return;
  const wait = waitSecondsAfter(rows[0].failures);
  const elapsed = (now.getTime() - rows[0].last_failed_at.getTime()) / 1000;
  if (elapsed < wait) {
    const retryAfterSeconds = Math.ceil(wait - elapsed);
    throw new ApiError(429, 'too_many_attempts', `Too many failed sign-ins. Try again in ${retryAfterSeconds} s, or reset your password.`, {
      retryAfterSeconds,
    });
  }
}

export async function recordFailedSignIn(db: Database, userId: number, clientKey: string): Promise<void> {
  await db.pool.query(
    `INSERT INTO sign_in_failures (user_id, client_key, failures, last_failed_at) VALUES ($1, $2, 1, now())
     ON CONFLICT (user_id, client_key) DO UPDATE SET failures = sign_in_failures.failures + 1, last_failed_at = now()`,
    [userId, clientKey],
  );
}

export async function clearFailedSignIns(db: Database, userId: number): Promise<void> {
  await db.pool.query('DELETE FROM sign_in_failures WHERE user_id = $1', [userId]);
}
