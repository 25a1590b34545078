import type { Health } from '../../shared/types/health';
import { ERROR_CODES } from '../../shared/types/errors';
import type { Database } from '../db/database';
import { ApiError } from '../errors';

const startedAt = Date.now();

/** Checks the database round-trips; throws a 503 ApiError when it does not. */
export async function checkHealth(db: Database, version: string, devTools: boolean): Promise<Health> {
  try {
    await db.ping();
  } catch {
    throw new ApiError(503, ERROR_CODES.databaseUnavailable, 'The database is not reachable right now.');
  }
  return { status: 'ok', database: 'ok', version, uptimeSeconds: Math.round((Date.now() - startedAt) / 1000), devTools };
}
