import { trackTypeKeySchema } from './trackTypes';
import { vehicleClassKeySchema } from './vehicleClasses';
import { z } from './zod';
import { hiddenNoticeSchema } from './moderation';

export const VISIBILITIES = ['private', 'unlisted', 'public'] as const;
export const visibilitySchema = z.enum(VISIBILITIES);
export type Visibility = z.infer<typeof visibilitySchema>;

export const GRIP_LEVELS = ['low', 'medium', 'high'] as const;
export const gripSchema = z.enum(GRIP_LEVELS);

/** A stored setup value: numbers in the template's SI unit, choices by option value. */
export const setupValueSchema = z.union([z.number(), z.string(), z.boolean()]);
export const setupValuesSchema = z.record(z.string(), setupValueSchema);
export type StoredSetupValues = z.infer<typeof setupValuesSchema>;

/** What the setup was built for. */
export const conditionsSchema = z.object({
  trackType: trackTypeKeySchema.nullable(),
  temperatureC: z.number().min(-30, 'Below −30 °C nobody is racing.').max(60, 'Above 60 °C is not a track temperature.').nullable(),
  grip: gripSchema.nullable(),
});
export type SetupConditions = z.infer<typeof conditionsSchema>;

// ---- Cars ----

export const carSchema = z.object({
  id: z.number().int(),
  nickname: z.string(),
  kitId: z.number().int(),
  kitName: z.string(),
  makerName: z.string(),
  vehicleClass: vehicleClassKeySchema,
  /** "No option parts": the car is as it came in the box. */
  stock: z.boolean(),
  photoUrl: z.string().nullable(),
  createdAt: z.string(),
});
export type Car = z.infer<typeof carSchema>;

export const carCreateSchema = z.object({
  kitId: z.number().int().positive(),
  nickname: z.string().trim().min(1, 'Give the car a name you will recognise.').max(60, 'Car names are at most 60 characters.'),
  stock: z.boolean().default(false),
});
export type CarCreate = z.input<typeof carCreateSchema>;
export const carUpdateSchema = carCreateSchema.omit({ kitId: true }).partial();

// ---- Setups ----

export const setupSummarySchema = z.object({
  id: z.number().int(),
  title: z.string(),
  visibility: visibilitySchema,
  carId: z.number().int(),
  vehicleClass: vehicleClassKeySchema,
  revisionCount: z.number().int(),
  updatedAt: z.string(),
  conditions: conditionsSchema,
});
export type SetupSummary = z.infer<typeof setupSummarySchema>;

export const garageSchema = z.object({
  cars: z.array(carSchema.extend({ setups: z.array(setupSummarySchema) })),
});
export type Garage = z.infer<typeof garageSchema>;

export const revisionSummarySchema = z.object({
  id: z.number().int(),
  number: z.number().int(),
  changeNote: z.string(),
  authorHandle: z.string(),
  createdAt: z.string(),
  /** How many fields differ from the revision before (0 for the first). */
  changedFieldCount: z.number().int(),
  /** Moderators hid this change note; `changeNote` is empty unless the viewer is its author or a moderator. */
  noteHidden: z.boolean(),
});
export type RevisionSummary = z.infer<typeof revisionSummarySchema>;

/** A setup page has room for a dozen photos; more is a gallery, not a setup sheet. */
export const MAX_PHOTOS_PER_SETUP = 12;

export const photoSchema = z.object({
  id: z.number().int(),
  url: z.string(),
  thumbUrl: z.string(),
  width: z.number().int(),
  height: z.number().int(),
  caption: z.string(),
});
export type Photo = z.infer<typeof photoSchema>;

// ---- Lineage (part of the setup page) ----

export const lineageSchema = z.object({
  /** null when the setup is not a fork; `available: false` when the original was deleted, hidden or made private. */
  forkedFrom: z
    .discriminatedUnion('available', [
      z.object({
        available: z.literal(true),
        setupId: z.number().int(),
        title: z.string(),
        ownerHandle: z.string(),
        revisionNumber: z.number().int(),
        /** The original's share token, for the fork's owner when the original is unlisted. */
        share: z.string().nullable(),
      }),
      z.object({ available: z.literal(false) }),
    ])
    .nullable(),
  /** Forks of this setup that are not deleted or hidden. */
  forkCount: z.number().int(),
  /** Every setup in the family below its root, this one's included when it is a fork. */
  familyForkCount: z.number().int(),
});
export type Lineage = z.infer<typeof lineageSchema>;

export const setupDetailSchema = z.object({
  id: z.number().int(),
  title: z.string(),
  visibility: visibilitySchema,
  /** Present for the owner of an unlisted setup: the link to share. */
  shareToken: z.string().nullable(),
  owner: z.object({ handle: z.string(), displayName: z.string() }),
  isOwner: z.boolean(),
  car: z.object({ id: z.number().int(), nickname: z.string(), kitName: z.string(), makerName: z.string(), stock: z.boolean() }),
  vehicleClass: vehicleClassKeySchema,
  templateVersion: z.number().int(),
  conditions: conditionsSchema,
  notesMarkdown: z.string(),
  notesHtml: z.string(),
  currentRevision: z.object({
    id: z.number().int(),
    number: z.number().int(),
    values: setupValuesSchema,
    changeNote: z.string(),
    createdAt: z.string(),
  }),
  revisions: z.array(revisionSummarySchema),
  photos: z.array(photoSchema),
  lineage: lineageSchema,
  /** Comments on the setup and its changes that the viewer can see (deleted ones not counted). */
  commentCount: z.number().int(),
  /** Set when moderators hid the setup (only its owner and moderators can then open it): why, and how to appeal. */
  hidden: hiddenNoticeSchema.nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type SetupDetail = z.infer<typeof setupDetailSchema>;
export const setupDetailResponseSchema = z.object({ setup: setupDetailSchema });

const setupTitleSchema = z.string().trim().min(1, 'Give the setup a title.').max(120, 'Titles are at most 120 characters.');
const notesSchema = z.string().max(20_000, 'Notes are at most 20,000 characters.');

export const setupCreateSchema = z.object({
  carId: z.number().int().positive(),
  title: setupTitleSchema,
  visibility: visibilitySchema.default('private'),
  conditions: conditionsSchema.default({ trackType: null, temperatureC: null, grip: null }),
  notesMarkdown: notesSchema.default(''),
  /** Start from the kit's stock sheet, or from a copy of one of my own setups' current revision. */
  startFrom: z.discriminatedUnion('kind', [
    z.object({ kind: z.literal('stock') }),
    z.object({ kind: z.literal('copy'), setupId: z.number().int().positive() }),
  ]),
});
export type SetupCreate = z.input<typeof setupCreateSchema>;

/** Only what is sent changes: no defaults here, or an edit of the title would reset the notes. */
export const setupMetaUpdateSchema = z
  .object({ title: setupTitleSchema, visibility: visibilitySchema, conditions: conditionsSchema, notesMarkdown: notesSchema })
  .partial();
export type SetupMetaUpdate = z.input<typeof setupMetaUpdateSchema>;

export const CHANGE_NOTE_MAX = 2_000;
export const revisionCreateSchema = z.object({
  /** The revision the editor started from; a stale base answers 409 with the current revision. */
  baseRevisionId: z.number().int().positive(),
  values: setupValuesSchema,
  changeNote: z
    .string()
    .trim()
    .min(1, 'Say what changed and why: it is how you (and anyone who forks this) will learn from it.')
    .max(CHANGE_NOTE_MAX, `Change notes are at most ${CHANGE_NOTE_MAX} characters.`),
});
export type RevisionCreate = z.input<typeof revisionCreateSchema>;

/** Body of the 409 a stale save gets: the revision that is now current. */
export const staleRevisionDetailsSchema = z.object({
  currentRevision: z.object({ id: z.number().int(), number: z.number().int(), values: setupValuesSchema, changeNote: z.string(), authorHandle: z.string(), createdAt: z.string() }),
});

// ---- Kit stock sheets ----

export const kitStockSchema = z.object({
  kitId: z.number().int(),
  vehicleClass: vehicleClassKeySchema,
  templateVersion: z.number().int(),
  values: setupValuesSchema,
  /** For choice fields: which options come in the box; the rest are option parts sold separately. */
  inBox: z.record(z.string(), z.array(z.string())),
});
export type KitStock = z.infer<typeof kitStockSchema>;

// ---- Export format ----

/** Tunefork's own setup document, versioned. Documented in README ("Setup files"). */
export const SETUP_DOCUMENT_FORMAT = 'tunefork.setup';
export const SETUP_DOCUMENT_VERSION = 1;
export const setupDocumentSchema = z.object({
  format: z.literal(SETUP_DOCUMENT_FORMAT),
  formatVersion: z.literal(SETUP_DOCUMENT_VERSION),
  exportedAt: z.string(),
  setup: z.object({
    title: z.string().max(120),
    vehicleClass: vehicleClassKeySchema,
    templateVersion: z.number().int().positive(),
    kit: z.object({ maker: z.string(), name: z.string() }),
    conditions: conditionsSchema,
    notesMarkdown: z.string().max(20_000),
    revision: z.object({ number: z.number().int().positive(), createdAt: z.string(), changeNote: z.string() }),
    values: setupValuesSchema,
  }),
});
export type SetupDocument = z.infer<typeof setupDocumentSchema>;
export const setupImportSchema = z.object({ carId: z.number().int().positive(), document: z.unknown() });
