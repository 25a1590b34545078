import { QueryTypes } from 'sequelize';
import { z } from 'zod';
import { auditFilterSchema, type AuditEntry } from '../../../shared/types/moderation';
import type { Database } from '../../db/database';
import { parseQuery } from '../discover';
import { decodeCursor, encodeCursor } from '../feed';

/*
 * Reading the audit log (recordAudit in ./audit is its only writer; the database refuses UPDATE,
 * DELETE and TRUNCATE on it). Newest first, keyset on the id, so a page costs the same however deep.
 */

export const AUDIT_PAGE_SIZE = 50;
const auditCursorSchema = z.tuple([z.number().int().positive().max(Number.MAX_SAFE_INTEGER)]);

type Row = {
  id: string;
  actorHandle: string | null;
  actorRole: string | null;
  action: string;
  targetType: string;
  targetId: number | null;
  subjectHandle: string | null;
  reason: string;
  previousState: Record<string, unknown>;
  newState: Record<string, unknown>;
  createdAt: Date;
};

/**
 * `GET /api/moderation/audit?actor=&action=&targetType=&cursor=`: who did what, newest first,
 * filtered by the actor's handle (with or without "@", any case), the action and the target type.
 */
export async function listAuditLog(db: Database, query: unknown): Promise<{ entries: AuditEntry[]; nextCursor: string | null }> {
  const filter = parseQuery(auditFilterSchema, query);
  const cursor = decodeCursor(filter.cursor, auditCursorSchema);
  const where: string[] = [];
  const replacements: Record<string, unknown> = { limit: AUDIT_PAGE_SIZE + 1 };
  const actor = filter.actor?.trim().replace(/^@/, '');
  if (actor) {
    where.push('lower(actor_handle) = lower(:actor)');
    replacements.actor = actor;
  }
  if (filter.action?.trim()) {
    where.push('action = :action');
    replacements.action = filter.action.trim();
  }
  if (filter.targetType?.trim()) {
    where.push('target_type = :targetType');
    replacements.targetType = filter.targetType.trim();
  }
  if (cursor) {
    where.push('id < :after');
    replacements.after = cursor[0];
  }
  const rows = await db.sequelize.query<Row>(
    `SELECT id, actor_handle AS "actorHandle", actor_role AS "actorRole", action, target_type AS "targetType", target_id AS "targetId",
            subject_handle AS "subjectHandle", reason, previous_state AS "previousState", new_state AS "newState", created_at AS "createdAt"
       FROM audit_log ${where.length ? `WHERE ${where.join(' AND ')}` : ''}
      ORDER BY id DESC LIMIT :limit`,
    { replacements, type: QueryTypes.SELECT },
  );
  const page = rows.slice(0, AUDIT_PAGE_SIZE);
  return {
    entries: page.map((r) => ({ ...r, id: Number(r.id), createdAt: new Date(r.createdAt).toISOString() })),
    nextCursor: rows.length > AUDIT_PAGE_SIZE ? encodeCursor([Number(page[page.length - 1].id)]) : null,
  };
}
