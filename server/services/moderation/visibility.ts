import { QueryTypes, type Model } from 'sequelize';
import type { PublicRacer } from '../../../shared/types/auth';
import type { HiddenNotice, ReportTargetType } from '../../../shared/types/moderation';
import type { Database } from '../../db/database';
import type { User } from '../../models/User';
import { toPublicRacer } from '../accountDto';

/*
 * What hidden content looks like to whom: its author and moderators see it with a notice (the
 * reason and how to appeal); everyone else does not see it at all.
 */

type Viewer = Pick<User, 'id' | 'role'> | undefined | null;

/** Moderators and admins see hidden content (they review it). */
export const seesHiddenContent = (viewer: Viewer) => viewer?.role === 'moderator' || viewer?.role === 'admin';

/** The notice on one hidden thing, or null when it is not hidden. Auto-hides carry no action to appeal. */
export async function hiddenNoticeOf(db: Database, type: ReportTargetType, id: number): Promise<HiddenNotice | null> {
  return (await hiddenNoticesOf(db, type, [id])).get(id) ?? null;
}

/** Notices for many hidden things of one kind, by id (nothing asked, no query). */
export async function hiddenNoticesOf(db: Database, type: ReportTargetType, ids: number[]): Promise<Map<number, HiddenNotice>> {
  if (!ids.length) return new Map();
  const rows = await db.sequelize.query<{ id: number; hiddenAt: Date; reason: string; auto: boolean; actionId: number | null }>(
    `SELECT target_id AS id, hidden_at AS "hiddenAt", reason, auto, action_id AS "actionId" FROM content_hides
      WHERE target_type = :type AND target_id IN (:ids)`,
    { replacements: { type, ids }, type: QueryTypes.SELECT },
  );
  return new Map(rows.map((r) => [r.id, { hiddenAt: r.hiddenAt.toISOString(), reason: r.reason, autoHidden: r.auto, actionId: r.auto ? null : r.actionId }]));
}

/**
 * A racer's public page for `viewer`. A hidden profile keeps its handle and name for everyone, but
 * its bio and home track are withheld from others; the racer and moderators see it all with the notice.
 */
export async function publicRacerFor(db: Database, racer: User, viewer: Viewer): Promise<PublicRacer> {
  const view = toPublicRacer(racer);
  const notice = await hiddenNoticeOf(db, 'racer', racer.id);
  if (!notice) return view;
  if (viewer?.id === racer.id || seesHiddenContent(viewer)) return { ...view, hidden: notice };
  return { ...view, bioHtml: '', homeTrack: '' };
}

/**
 * An extra column for SetupRevision queries: whether moderators hid the revision's change note.
 * Part of the same query, so reading a history stays one query however long it is.
 */
export function noteHiddenAttribute(db: Database): [ReturnType<Database['sequelize']['literal']>, string] {
  return [
    db.sequelize.literal(`EXISTS (SELECT 1 FROM content_hides h WHERE h.target_type = 'revision' AND h.target_id = "SetupRevision"."id")`),
    'noteHidden',
  ];
}

/** Reads the column noteHiddenAttribute added. */
export const isNoteHidden = (revision: Model) => revision.get('noteHidden') === true;

/** A change note as `viewer` may read it: empty when hidden, unless they wrote it or moderate. */
export function visibleChangeNote(note: string, hidden: boolean, authorId: number, viewer: Viewer): string {
  return hidden && viewer?.id !== authorId && !seesHiddenContent(viewer) ? '' : note;
}
