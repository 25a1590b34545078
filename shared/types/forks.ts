import { z } from './zod';
import { hiddenNoticeSchema, type HiddenNotice } from './moderation';
import { setupValueSchema, setupValuesSchema } from './setups';
import { vehicleClassKeySchema } from './vehicleClasses';

/*
 * What the client and the API exchange about forks, lineage, upstream sync, history and comments.
 * One file so both sides read the same contract.
 */

export { lineageSchema, type Lineage } from './setups';

// ---- Fork ----

export const STOCK_CHOICES = ['keep', 'stock'] as const;
export const stockChoiceSchema = z.enum(STOCK_CHOICES);
export type StockChoice = z.infer<typeof stockChoiceSchema>;

/** Ids are PostgreSQL integers: anything larger is refused here, not by the database. */
const idSchema = (message: string) => z.number(message).int(message).positive(message).max(2_147_483_647, message);

export const forkRequestSchema = z.object({
  carId: idSchema('Pick one of your cars.'),
  title: z.string().trim().min(1, 'Give the fork a title.').max(120, 'Titles are at most 120 characters.').optional(),
  /** Fork an older revision of the original; the current one by default. */
  revisionId: idSchema('That revision is not part of this setup.').optional(),
  /** The share token, when forking an unlisted setup from its link. */
  share: z.string().max(60).optional(),
  /** Per option-part field: keep the original's value (I will buy the part) or take my kit's stock value. Missing = keep. */
  stockChoices: z.record(z.string(), stockChoiceSchema).default({}),
});
export type ForkRequest = z.input<typeof forkRequestSchema>;

const previewFieldSchema = z.object({
  key: z.string(),
  label: z.string(),
  /** Section title on the target class's sheet (or the source's, for dropped fields). */
  section: z.string(),
});

export const forkPreviewSchema = z.object({
  source: z.object({
    setupId: z.number().int(),
    revisionId: z.number().int(),
    revisionNumber: z.number().int(),
    title: z.string(),
    ownerHandle: z.string(),
    vehicleClass: vehicleClassKeySchema,
    kitName: z.string(),
  }),
  target: z.object({
    carId: z.number().int(),
    nickname: z.string(),
    kitName: z.string(),
    vehicleClass: vehicleClassKeySchema,
    stock: z.boolean(),
  }),
  /** True when the option-part check ran: the car is marked stock, or its kit differs from the source's. */
  checkedOptionParts: z.boolean(),
  /** Values the target kit does not have in the box; each can be kept or replaced by the stock value. */
  optionParts: z.array(previewFieldSchema.extend({ value: setupValueSchema, stockValue: setupValueSchema })),
  /** Source fields that the target class's sheet does not have; they are left out of the fork. */
  dropped: z.array(previewFieldSchema.extend({ value: setupValueSchema })),
  /** Target fields the source does not have, or whose value the target sheet cannot hold: the kit's stock value is used. */
  filledFromStock: z.array(previewFieldSchema.extend({ value: setupValueSchema.nullable(), stockValue: setupValueSchema })),
});
export type ForkPreview = z.infer<typeof forkPreviewSchema>;

// ---- Upstream sync ----

export const upstreamRowSchema = z.object({
  key: z.string(),
  label: z.string(),
  section: z.string(),
  base: setupValueSchema.nullable(),
  theirs: setupValueSchema.nullable(),
  mine: setupValueSchema.nullable(),
  /** theirs-only: only the original changed it; conflict: both changed it, to different values. */
  status: z.enum(['theirs-only', 'conflict']),
});
export type UpstreamRow = z.infer<typeof upstreamRowSchema>;

export const upstreamSchema = z.discriminatedUnion('status', [
  z.object({ status: z.literal('not-a-fork') }),
  /** The original was deleted, hidden or is no longer shared with this racer. */
  z.object({ status: z.literal('unavailable') }),
  z.object({
    status: z.literal('available'),
    original: z.object({
      setupId: z.number().int(),
      title: z.string(),
      ownerHandle: z.string(),
      revisionId: z.number().int(),
      revisionNumber: z.number().int(),
    }),
    /** The original's revision this fork last took changes from (the fork point at first). */
    syncedRevisionNumber: z.number().int(),
    /** The fork's current revision: send it back as baseRevisionId when applying. */
    mineRevisionId: z.number().int(),
    rows: z.array(upstreamRowSchema),
  }),
]);
export type Upstream = z.infer<typeof upstreamSchema>;

export const upstreamApplySchema = z.object({
  /** The fork's revision the racer was looking at; a newer one answers 409. */
  baseRevisionId: z.number().int().positive(),
  /** The original's revision the racer was looking at; a newer one answers 409 so they can look again. */
  theirsRevisionId: z.number().int().positive(),
  /** Fields to take from the original (theirs-only rows, or conflicts resolved for theirs). */
  take: z.array(z.string()).default([]),
  /** Fields not to be offered again until the original changes them once more. */
  dismiss: z.array(z.string()).default([]),
});
export type UpstreamApply = z.input<typeof upstreamApplySchema>;

// ---- History and single revisions ----

export const fieldChangeSchema = z.object({
  key: z.string(),
  before: setupValueSchema.nullable(),
  after: setupValueSchema.nullable(),
});
export type FieldChangeDto = z.infer<typeof fieldChangeSchema>;

export const historySchema = z.object({
  revisions: z.array(
    z.object({
      id: z.number().int(),
      number: z.number().int(),
      changeNote: z.string(),
      authorHandle: z.string(),
      createdAt: z.string(),
      /** Field changes from the revision before; empty for the first. */
      changes: z.array(fieldChangeSchema),
    }),
  ),
});
export type History = z.infer<typeof historySchema>;

export const revisionDetailSchema = z.object({
  setup: z.object({
    id: z.number().int(),
    title: z.string(),
    vehicleClass: vehicleClassKeySchema,
    ownerHandle: z.string(),
    kitName: z.string(),
    revisionCount: z.number().int(),
  }),
  revision: z.object({
    id: z.number().int(),
    number: z.number().int(),
    values: setupValuesSchema,
    changeNote: z.string(),
    authorHandle: z.string(),
    createdAt: z.string(),
  }),
});
export type RevisionDetail = z.infer<typeof revisionDetailSchema>;

// ---- Comments ----

export const COMMENT_MAX = 5_000;
/** Minutes during which an author may edit a comment. */
export const COMMENT_EDIT_MINUTES = 15;

export const commentCreateSchema = z.object({
  bodyMarkdown: z
    .string()
    .trim()
    .min(1, 'Write something before posting.')
    .max(COMMENT_MAX, `Comments are at most ${COMMENT_MAX.toLocaleString('en')} characters.`),
  /** The change (revision) the comment is about; null for the setup as a whole. */
  revisionId: z.number().int().positive().nullable().default(null),
  /** A field of that revision's change ("why 450 cSt at the rear?"); needs revisionId. */
  fieldKey: z.string().max(80).nullable().default(null),
  /** Replying to a top-level comment (one level of replies). */
  parentId: z.number().int().positive().nullable().default(null),
  share: z.string().max(60).optional(),
});
export type CommentCreate = z.input<typeof commentCreateSchema>;
export const commentUpdateSchema = commentCreateSchema.pick({ bodyMarkdown: true });

export type CommentDto = {
  id: number;
  setupId: number;
  revisionId: number | null;
  revisionNumber: number | null;
  fieldKey: string | null;
  fieldLabel: string | null;
  parentId: number | null;
  author: { handle: string; displayName: string };
  /** Empty when deleted. */
  bodyHtml: string;
  /** Only for the author (to edit); empty otherwise. */
  bodyMarkdown: string;
  createdAt: string;
  editedAt: string | null;
  deleted: boolean;
  canEdit: boolean;
  canDelete: boolean;
  /** Set only for the comment's author and moderators when moderators hid it (others never get it). */
  hidden?: HiddenNotice | null;
  replies: CommentDto[];
};
const commentBase = z.object({
  id: z.number().int(),
  setupId: z.number().int(),
  revisionId: z.number().int().nullable(),
  revisionNumber: z.number().int().nullable(),
  fieldKey: z.string().nullable(),
  fieldLabel: z.string().nullable(),
  parentId: z.number().int().nullable(),
  author: z.object({ handle: z.string(), displayName: z.string() }),
  bodyHtml: z.string(),
  bodyMarkdown: z.string(),
  createdAt: z.string(),
  editedAt: z.string().nullable(),
  deleted: z.boolean(),
  canEdit: z.boolean(),
  canDelete: z.boolean(),
  hidden: hiddenNoticeSchema.nullable().optional(),
});
export const commentSchema: z.ZodType<CommentDto> = commentBase.extend({
  replies: z.array(z.lazy(() => commentSchema)),
});
export const commentListSchema = z.object({ comments: z.array(commentSchema) });
export const commentResponseSchema = z.object({ comment: commentSchema });

// ---- Public setups of a kit (the newcomer's way in, before search exists) ----

export const kitSetupListSchema = z.object({
  kit: z.object({ id: z.number().int(), name: z.string(), makerName: z.string(), vehicleClass: vehicleClassKeySchema }),
  setups: z.array(
    z.object({
      id: z.number().int(),
      title: z.string(),
      ownerHandle: z.string(),
      revisionCount: z.number().int(),
      forkCount: z.number().int(),
      trackType: z.string().nullable(),
      updatedAt: z.string(),
    }),
  ),
});
export type KitSetupList = z.infer<typeof kitSetupListSchema>;
