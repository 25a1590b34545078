import { Op, type WhereOptions } from 'sequelize';
import type { z } from 'zod';
import { diffSetupValues } from '../../shared/compute/setup/diff';
import { ERROR_CODES } from '../../shared/types/errors';
import { COMMENT_EDIT_MINUTES, commentCreateSchema, commentUpdateSchema, type CommentDto } from '../../shared/types/forks';
import type { HiddenNotice } from '../../shared/types/moderation';
import { fieldsByKey, getTemplate } from '../../shared/types/templates';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { Comment } from '../models/Comment';
import type { Setup } from '../models/Setup';
import type { User } from '../models/User';
import { renderMarkdown } from './markdown';
import { hiddenNoticesOf } from './moderation/visibility';
import { assertNewAccountMayPost } from './moderation/limits';
import { canView, findViewableSetup, type Viewer } from './setupAccess';

const EDIT_WINDOW_MS = COMMENT_EDIT_MINUTES * 60_000;
export const EDIT_WINDOW_MESSAGE = `Comments can be edited for ${COMMENT_EDIT_MINUTES} minutes after posting.`;

const isModerator = (viewer: Viewer) => viewer?.role === 'moderator' || viewer?.role === 'admin';

/** Parses with a schema; a refusal names each field and leads with the first problem, so a one-field form can show it as is. */
function parseInput<S extends z.ZodTypeAny>(schema: S, input: unknown): z.output<S> {
  const parsed = schema.safeParse(input ?? {});
  if (parsed.success) return parsed.data;
  const details: Record<string, string> = {};
  for (const issue of parsed.error.issues) details[issue.path.join('.') || '_'] = issue.message;
  throw ApiError.validation(details, parsed.error.issues[0].message);
}

function refuse(field: string, message: string): ApiError {
  return ApiError.validation({ [field]: message }, message);
}

/** Comments of `where` the viewer may see (hidden ones only for their author and moderators), oldest first: one query. */
async function findVisibleComments(db: Database, where: WhereOptions<Comment>, viewer: Viewer): Promise<Comment[]> {
  const hidden: WhereOptions<Comment> = isModerator(viewer) ? {} : { [Op.or]: [{ hiddenAt: null }, { authorId: viewer?.id ?? 0 }] };
  return db.models.Comment.findAll({
    where: { [Op.and]: [where, hidden] },
    include: [
      { model: db.models.User, as: 'author', attributes: ['handle', 'displayName'] },
      { model: db.models.SetupRevision, as: 'revision', attributes: ['number'], required: false },
    ],
    order: [
      ['createdAt', 'ASC'],
      ['id', 'ASC'],
    ],
  });
}

function toDto(comment: Comment, setup: Setup, viewer: Viewer, now: number): CommentDto {
  const isAuthor = viewer?.id === comment.authorId;
  const deleted = comment.deletedAt !== null;
  const field = comment.fieldKey ? fieldsByKey(getTemplate(setup.vehicleClass)).get(comment.fieldKey) : undefined;
  return {
    id: comment.id,
    setupId: comment.setupId,
    revisionId: comment.revisionId,
    revisionNumber: comment.revision?.number ?? null,
    fieldKey: comment.fieldKey,
    fieldLabel: field?.label ?? null,
    parentId: comment.parentId,
    // A deleted comment keeps its author so the replies below it still read as a conversation.
    author: { handle: comment.author?.handle ?? '', displayName: comment.author?.displayName ?? '' },
    // The same rendering and cleaning as setup notes.
    bodyHtml: deleted ? '' : renderMarkdown(comment.bodyMd),
    bodyMarkdown: isAuthor && !deleted ? comment.bodyMd : '',
    createdAt: comment.createdAt.toISOString(),
    editedAt: comment.editedAt?.toISOString() ?? null,
    deleted,
    canEdit: isAuthor && !deleted && now - comment.createdAt.getTime() < EDIT_WINDOW_MS,
    canDelete: isAuthor && !deleted,
    replies: [],
  };
}

/** Why moderators hid the comments the viewer wrote (or, for moderators, any): a query only when there are such. */
function hiddenNoticesFor(db: Database, rows: Comment[], viewer: Viewer): Promise<Map<number, HiddenNotice>> {
  const ids = rows.filter((r) => r.hiddenAt && (r.authorId === viewer?.id || isModerator(viewer))).map((r) => r.id);
  return hiddenNoticesOf(db, 'comment', ids);
}

function withHiddenNotices(dtos: CommentDto[], notices: Map<number, HiddenNotice>): CommentDto[] {
  for (const dto of dtos) {
    const notice = notices.get(dto.id);
    if (notice) dto.hidden = notice;
  }
  return dtos;
}

/** Top-level comments with their replies nested; replies whose thread the viewer cannot see are left out. */
function nestReplies(dtos: CommentDto[]): CommentDto[] {
  const topLevel = new Map(dtos.filter((c) => c.parentId === null).map((c) => [c.id, c]));
  for (const reply of dtos) if (reply.parentId !== null) topLevel.get(reply.parentId)?.replies.push(reply);
  return [...topLevel.values()];
}

/**
 * The comments on a setup the viewer may see, threaded: top-level comments oldest first, each with
 * its replies oldest first. Deleted comments stay as `deleted` with an empty body. Two queries
 * whatever the number of comments.
 */
export async function listComments(db: Database, setupId: number, viewer: Viewer, shareToken?: string): Promise<CommentDto[]> {
  const setup = await findViewableSetup(db, setupId, viewer, shareToken);
  const now = Date.now();
  const rows = await findVisibleComments(db, { setupId: setup.id }, viewer);
  return nestReplies(withHiddenNotices(rows.map((row) => toDto(row, setup, viewer, now)), await hiddenNoticesFor(db, rows, viewer)));
}

/** One comment as the viewer sees it, with its replies when it starts a thread. */
async function commentDto(db: Database, setup: Setup, comment: Comment, viewer: Viewer): Promise<CommentDto> {
  const rootId = comment.parentId ?? comment.id;
  const rows = await findVisibleComments(db, { setupId: setup.id, [Op.or]: [{ id: rootId }, { parentId: rootId }] }, viewer);
  const now = Date.now();
  const dtos = withHiddenNotices(rows.map((row) => toDto(row, setup, viewer, now)), await hiddenNoticesFor(db, rows, viewer));
  nestReplies(dtos);
  const dto = dtos.find((d) => d.id === comment.id);
  if (!dto) throw ApiError.notFound('That comment');
  return dto;
}

/**
 * Which fields a comment on `revision` may point at. Stricter of the two possible rules: a field the
 * change touched (its difference from the revision before), so a racer can ask about anything the
 * change did and nothing it did not. The first revision has no revision before it; it sets the
 * whole sheet, so any field of the class's sheet may be asked about.
 */
async function checkFieldOfChange(db: Database, setup: Setup, revision: { number: number; values: Record<string, unknown> }, fieldKey: string) {
  const template = getTemplate(setup.vehicleClass);
  const label = fieldsByKey(template).get(fieldKey)?.label;
  if (revision.number === 1) {
    if (!label) throw refuse('fieldKey', `"${fieldKey}" is not a field of this class's sheet.`);
    return;
  }
  const previous = await db.models.SetupRevision.findOne({ where: { setupId: setup.id, number: revision.number - 1 } });
  const touched = diffSetupValues(previous?.values ?? {}, revision.values as Record<string, number | string | boolean>).some((c) => c.key === fieldKey);
  if (!touched) {
    throw refuse('fieldKey', `${label ?? `"${fieldKey}"`} did not change in revision ${revision.number}. Comment on the change as a whole, or on a field it changed.`);
  }
}

type Target = { revisionId: number | null; fieldKey: string | null; parentId: number | null };

/** The thread a reply joins: a visible top-level comment of the same setup, whose change the reply shares. */
async function replyTarget(db: Database, setup: Setup, user: User, input: Target): Promise<Target> {
  const parent = await db.models.Comment.findOne({ where: { id: input.parentId!, setupId: setup.id } });
  if (!parent || (parent.hiddenAt && parent.authorId !== user.id && !isModerator(user))) {
    throw refuse('parentId', 'That comment is not on this setup.');
  }
  if (parent.parentId !== null) throw refuse('parentId', 'Reply to the first comment of the thread.');
  if (input.revisionId !== null && input.revisionId !== parent.revisionId) {
    throw refuse('revisionId', 'A reply is about the same change as the comment it answers.');
  }
  if (input.fieldKey !== null && input.fieldKey !== parent.fieldKey) {
    throw refuse('fieldKey', 'A reply is about the same field as the comment it answers.');
  }
  return { revisionId: parent.revisionId, fieldKey: parent.fieldKey, parentId: parent.id };
}

/** Where a new top-level comment points: the setup, one of its changes, or one field of that change. */
async function topLevelTarget(db: Database, setup: Setup, input: Target): Promise<Target> {
  if (input.revisionId === null) {
    if (input.fieldKey !== null) throw refuse('fieldKey', 'Pick the change this field belongs to.');
    return { revisionId: null, fieldKey: null, parentId: null };
  }
  const revision = await db.models.SetupRevision.findOne({ where: { id: input.revisionId, setupId: setup.id } });
  if (!revision) throw refuse('revisionId', 'That change is not part of this setup.');
  if (input.fieldKey !== null) await checkFieldOfChange(db, setup, revision, input.fieldKey);
  return { revisionId: revision.id, fieldKey: input.fieldKey, parentId: null };
}

/** Called once a comment is stored (notifications listen here); a listener's failure never fails the comment. */
export type CommentListener = (db: Database, comment: Comment, setup: Setup) => void | Promise<void>;
const commentListeners: CommentListener[] = [];
export function onCommentCreated(listener: CommentListener): void {
  commentListeners.push(listener);
}

/** Posts a comment on a setup the racer can see (an unlisted one with its share token in `share`). */
export async function createComment(db: Database, user: User, setupId: number, input: unknown): Promise<CommentDto> {
  const data = parseInput(commentCreateSchema, input);
  await assertNewAccountMayPost(db, user, { kind: 'comment', texts: { bodyMarkdown: data.bodyMarkdown } });
  const setup = await findViewableSetup(db, setupId, user, data.share);
  const target = data.parentId !== null ? await replyTarget(db, setup, user, data) : await topLevelTarget(db, setup, data);
  const comment = await db.models.Comment.create({ setupId: setup.id, authorId: user.id, bodyMd: data.bodyMarkdown, ...target });
  await Promise.allSettled(commentListeners.map(async (listener) => listener(db, comment, setup)));
  return commentDto(db, setup, comment, user);
}

/**
 * A comment its author may change. Anyone else gets 404 when they cannot see it (a private setup,
 * a hidden comment) and 403 when they can.
 */
async function findOwnComment(db: Database, user: User, id: number): Promise<{ comment: Comment; setup: Setup }> {
  const comment = Number.isSafeInteger(id) ? await db.models.Comment.findByPk(id) : null;
  const setup = comment ? await db.models.Setup.findByPk(comment.setupId) : null;
  if (!comment || !setup || setup.deletedAt) throw ApiError.notFound('That comment');
  if (comment.authorId !== user.id) {
    const visible = canView(setup, user) && (!comment.hiddenAt || isModerator(user));
    if (!visible) throw ApiError.notFound('That comment');
    throw new ApiError(403, ERROR_CODES.forbidden, 'Only the racer who wrote a comment can change it.');
  }
  return { comment, setup };
}

/** Changes the body of the author's comment within the edit window; marks it edited. */
export async function editComment(db: Database, user: User, id: number, input: unknown): Promise<CommentDto> {
  const { bodyMarkdown } = parseInput(commentUpdateSchema, input);
  await assertNewAccountMayPost(db, user, { kind: 'text', texts: { bodyMarkdown } });
  const { comment, setup } = await findOwnComment(db, user, id);
  if (comment.deletedAt) throw new ApiError(403, ERROR_CODES.forbidden, 'Deleted comments cannot be edited.');
  if (Date.now() - comment.createdAt.getTime() >= EDIT_WINDOW_MS) throw new ApiError(403, ERROR_CODES.forbidden, EDIT_WINDOW_MESSAGE);
  await comment.update({ bodyMd: bodyMarkdown, editedAt: new Date() });
  return commentDto(db, setup, comment, user);
}

/** Deletes the author's comment softly: it stays in its thread as deleted, with its replies. */
export async function deleteComment(db: Database, user: User, id: number): Promise<void> {
  const { comment } = await findOwnComment(db, user, id);
  if (comment.deletedAt) throw ApiError.notFound('That comment');
  await comment.update({ deletedAt: new Date() });
}

/** Comments a setup page counts: neither deleted nor hidden. */
export async function countVisibleComments(db: Database, setupId: number): Promise<number> {
  return db.models.Comment.count({ where: { setupId, deletedAt: null, hiddenAt: null } });
}
