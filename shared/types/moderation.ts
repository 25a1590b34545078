import { z } from './zod';

/*
 * Moderation: reports, the review queue, actions, appeals, the audit log and new-account limits.
 * Shared by the API and the client. Each part's schemas sit under its heading.
 */

// ---- What can be reported ----

/** Things a racer can report. `revision` is a revision's change note; `racer` a racer's profile. */
export const REPORT_TARGET_TYPES = ['setup', 'revision', 'comment', 'photo', 'racer'] as const;
export const reportTargetTypeSchema = z.enum(REPORT_TARGET_TYPES);
export type ReportTargetType = z.infer<typeof reportTargetTypeSchema>;

export const REPORT_TARGET_LABELS: Record<ReportTargetType, string> = {
  setup: 'Setup',
  revision: 'Change note',
  comment: 'Comment',
  photo: 'Photo',
  racer: 'Racer profile',
};

/** Why: a short list of our own. `other` needs a note. */
export const REPORT_REASONS = ['spam', 'abusive', 'unsafe', 'stolen', 'other'] as const;
export const reportReasonSchema = z.enum(REPORT_REASONS);
export type ReportReason = z.infer<typeof reportReasonSchema>;

export const REPORT_REASON_LABELS: Record<ReportReason, { label: string; hint: string }> = {
  spam: { label: 'Spam or advertising', hint: 'Selling something, links to shops, the same post again and again.' },
  abusive: { label: 'Abusive', hint: 'Insults, harassment or threats aimed at someone.' },
  unsafe: { label: 'Unsafe advice', hint: 'Advice that could hurt someone: fuel, batteries, hot engines, spinning parts.' },
  stolen: { label: 'Stolen photo or content', hint: 'Someone else’s photo or setup passed off as their own.' },
  other: { label: 'Something else', hint: 'Tell the moderators what is wrong in the note.' },
};

export const REPORT_NOTE_MAX = 1000;

/** `POST /api/reports` → 201 `{ report: MyReport }`. */
export const reportCreateSchema = z
  .strictObject({
    targetType: reportTargetTypeSchema,
    targetId: z.number({ error: 'targetId must be a number.' }).int().positive(),
    reason: reportReasonSchema,
    note: z.string().trim().max(REPORT_NOTE_MAX, `Keep the note under ${REPORT_NOTE_MAX} characters.`).default(''),
    /** The share token of an unlisted setup the reporter opened through its link (for it, its changes, comments, photos). */
    share: z.string().max(100).optional(),
  })
  .refine((r) => r.reason !== 'other' || r.note.length > 0, {
    path: ['note'],
    message: 'Say what is wrong when the reason is “Something else”.',
  });
export type ReportCreate = z.input<typeof reportCreateSchema>;

// ---- Actions ----

/**
 * What a moderator (or the automatic hide) did. `hide-all` hides everything by the target's author;
 * `auto-hide` is the system's hide at the report threshold; `appeal-upheld` keeps an action,
 * `appeal-overturned` reverses it; `unsuspend` lifts a suspension early.
 */
export const MODERATION_ACTIONS = [
  'hide',
  'restore',
  'dismiss',
  'warn',
  'suspend',
  'unsuspend',
  'hide-all',
  'auto-hide',
  'appeal-upheld',
  'appeal-overturned',
] as const;
export const moderationActionKindSchema = z.enum(MODERATION_ACTIONS);
export type ModerationActionKind = z.infer<typeof moderationActionKindSchema>;

/** Actions a moderator picks on the queue (the rest are made by the system or by appeals). */
export const QUEUE_ACTIONS = ['hide', 'restore', 'dismiss', 'warn', 'suspend', 'hide-all'] as const;
export const queueActionSchema = z.enum(QUEUE_ACTIONS);
export type QueueAction = z.infer<typeof queueActionSchema>;

/** Plain words for the reporter and the author; never names the moderator. */
export const ACTION_OUTCOME_TEXT: Record<ModerationActionKind, string> = {
  hide: 'The moderators hid it.',
  restore: 'The moderators looked at it and put it back.',
  dismiss: 'The moderators looked at it and left it as it is.',
  warn: 'The moderators warned its author.',
  suspend: 'The moderators suspended its author.',
  unsuspend: 'The suspension was lifted.',
  'hide-all': 'The moderators hid everything that account posted.',
  'auto-hide': 'It was hidden while moderators review several reports.',
  'appeal-upheld': 'The appeal was reviewed and the decision stands.',
  'appeal-overturned': 'The appeal was reviewed and the decision was reversed.',
};

export const ACTION_REASON_MAX = 1000;

/** `POST /api/moderation/actions` → 200 `{ action: ModerationActionSummary }`. */
export const moderationActionRequestSchema = z
  .strictObject({
    targetType: reportTargetTypeSchema,
    targetId: z.number().int().positive(),
    action: queueActionSchema,
    /** Shown to the author (and, in plain words, summarised for reporters). Always required. */
    reason: z.string().trim().min(1, 'Give a reason; the author will see it.').max(ACTION_REASON_MAX),
    /** `suspend` only: days from now, or null for indefinitely. */
    suspendDays: z.number().int().min(1).max(3650).nullable().optional(),
    /** `suspend` only: also hide everything the account posted (default false: content stays). */
    hideContent: z.boolean().optional(),
  })
  .refine((r) => r.action !== 'suspend' || r.suspendDays !== undefined, {
    path: ['suspendDays'],
    message: 'Choose how long the suspension lasts, or indefinitely.',
  });
export type ModerationActionRequest = z.input<typeof moderationActionRequestSchema>;

export const moderationActionSummarySchema = z.object({
  id: z.number().int(),
  action: moderationActionKindSchema,
  targetType: reportTargetTypeSchema,
  targetId: z.number().int(),
  reason: z.string(),
  createdAt: z.string(),
  /** `suspend`: ISO time it ends; null when indefinite or not a suspension. */
  suspendedUntil: z.string().nullable(),
  /** How many open reports this action resolved. */
  resolvedReports: z.number().int(),
});
export type ModerationActionSummary = z.infer<typeof moderationActionSummarySchema>;

// ---- Reports as the reporter sees them ----

export const REPORT_STATUSES = ['open', 'resolved'] as const;
export type ReportStatus = (typeof REPORT_STATUSES)[number];

/** `GET /api/reports/mine` → `{ reports: MyReport[] }`, newest first. */
export const myReportSchema = z.object({
  id: z.number().int(),
  targetType: reportTargetTypeSchema,
  targetId: z.number().int(),
  /** A short description of what was reported (setup title, first words of a comment, handle). */
  targetLabel: z.string(),
  /** App path to open it, when the reporter can still see it. */
  targetPath: z.string().nullable(),
  reason: reportReasonSchema,
  note: z.string(),
  status: z.enum(REPORT_STATUSES),
  /** Filled when resolved: what happened, in plain words. */
  outcome: moderationActionKindSchema.nullable(),
  outcomeText: z.string().nullable(),
  createdAt: z.string(),
  resolvedAt: z.string().nullable(),
});
export type MyReport = z.infer<typeof myReportSchema>;

// ---- Review queue ----

export const queueFilterSchema = z.object({
  reason: reportReasonSchema.optional(),
  type: reportTargetTypeSchema.optional(),
  /** `reports`: reported things; `appeals`: appeals waiting; default both. */
  kind: z.enum(['all', 'reports', 'appeals']).default('all'),
  order: z.enum(['oldest', 'newest']).default('oldest'),
});
export type QueueFilter = z.input<typeof queueFilterSchema>;

/** The thing under review, shown inline so the moderator need not open it. */
export const queueContentSchema = z.object({
  /** Setup title, racer handle, or the setup a comment/revision/photo belongs to. */
  title: z.string(),
  /** The text in question as sanitized HTML (comment body, change note, setup notes, profile bio). */
  bodyHtml: z.string(),
  /** Photo thumbnail URL for photos (and a setup's first photo). */
  imageUrl: z.string().nullable(),
  /** App path to open it. */
  path: z.string().nullable(),
  hiddenAt: z.string().nullable(),
  hiddenReason: z.string().nullable(),
  /** True when hidden by the report threshold rather than by a moderator. */
  autoHidden: z.boolean(),
});

export const queueAuthorSchema = z.object({
  id: z.number().int(),
  handle: z.string(),
  role: z.enum(['racer', 'moderator', 'admin']),
  createdAt: z.string(),
  emailVerified: z.boolean(),
  suspended: z.boolean(),
  suspendedUntil: z.string().nullable(),
  /** Earlier moderation actions on this racer's content or account, newest first (up to 10). */
  history: z.array(z.object({ action: moderationActionKindSchema, reason: z.string(), createdAt: z.string() })),
});

export const queueAppealSchema = z.object({
  id: z.number().int(),
  text: z.string(),
  createdAt: z.string(),
  action: moderationActionSummarySchema,
  /** False when the signed-in moderator took the appealed action (only another may decide; admins may). */
  canDecide: z.boolean(),
});

/** One row per reported thing (and per open appeal). */
export const queueItemSchema = z.object({
  targetType: reportTargetTypeSchema,
  targetId: z.number().int(),
  reportCount: z.number().int(),
  reasons: z.array(z.object({ reason: reportReasonSchema, count: z.number().int() })),
  /** Reporters' notes (no reporter names). */
  notes: z.array(z.string()),
  firstReportedAt: z.string().nullable(),
  content: queueContentSchema,
  author: queueAuthorSchema,
  appeal: queueAppealSchema.nullable(),
  /** False when the signed-in moderator may not act here (own content, an admin's, a moderator's when suspending). */
  canAct: z.boolean(),
  /** Why not, in words, when canAct is false. */
  cannotActReason: z.string().nullable(),
  /** Whether the signed-in moderator may suspend this author (only admins suspend moderators and admins). */
  canSuspend: z.boolean().optional(),
});
export type QueueItem = z.infer<typeof queueItemSchema>;

/** `GET /api/moderation/queue?reason=&type=&kind=&order=` → `{ items, openReports, openAppeals }`. */
export const queueResponseSchema = z.object({
  items: z.array(queueItemSchema),
  openReports: z.number().int(),
  openAppeals: z.number().int(),
});
export type QueueResponse = z.infer<typeof queueResponseSchema>;

// ---- Appeals ----

export const APPEAL_WINDOW_DAYS = 20;
export const APPEAL_TEXT_MAX = 2000;

/** `POST /api/appeals` → 201 `{ appeal: MyAppeal }`. */
export const appealCreateSchema = z.strictObject({
  actionId: z.number().int().positive(),
  text: z.string().trim().min(1, 'Say why the decision should change.').max(APPEAL_TEXT_MAX),
});

/**
 * `POST /api/appeals/suspension` (no session: a suspended racer cannot sign in) → 201 `{ appeal: MyAppeal }`.
 * `appealToken` comes from the `account_suspended` sign-in refusal's details; it lasts an hour.
 */
export const suspensionAppealCreateSchema = z.strictObject({
  appealToken: z.string().trim().min(1, 'The appeal form has no token: sign in again to get one.').max(600),
  text: z.string().trim().min(1, 'Say why the decision should change.').max(APPEAL_TEXT_MAX),
});

/** The details of a `403 account_suspended` sign-in refusal (the password was right). */
export const suspendedSignInDetailsSchema = z.object({
  until: z.string().nullable(),
  reason: z.string().nullable(),
  /** The suspension being served; null when no moderation action recorded it. */
  suspensionActionId: z.number().int().nullable().optional(),
  /** Signed, short-lived: lets the racer appeal without a session. Absent when an appeal is no longer possible. */
  appealToken: z.string().optional(),
  /** When the appeal token stops working (ISO). */
  appealTokenExpiresAt: z.string().optional(),
  /** Why no appeal is possible (already appealed, window closed), when that is the case. */
  cannotAppealReason: z.string().nullable().optional(),
});
export type SuspendedSignInDetails = z.infer<typeof suspendedSignInDetailsSchema>;

/** `POST /api/moderation/appeals/:id/decide` → `{ appeal: MyAppeal }`. */
export const appealDecisionSchema = z.strictObject({
  decision: z.enum(['uphold', 'overturn']),
  reason: z.string().trim().min(1, 'Give a reason; the author will see it.').max(ACTION_REASON_MAX),
});

export const myAppealSchema = z.object({
  id: z.number().int(),
  actionId: z.number().int(),
  text: z.string(),
  status: z.enum(['open', 'upheld', 'overturned']),
  decisionReason: z.string().nullable(),
  createdAt: z.string(),
  decidedAt: z.string().nullable(),
});
export type MyAppeal = z.infer<typeof myAppealSchema>;

/**
 * `GET /api/moderation/mine` → `{ actions: ActionOnMe[] }`: moderation actions on my content or
 * account, newest first, with whether I can still appeal.
 */
export const actionOnMeSchema = moderationActionSummarySchema.extend({
  targetLabel: z.string(),
  targetPath: z.string().nullable(),
  /** Last moment an appeal is accepted (created + 20 days). */
  appealUntil: z.string(),
  canAppeal: z.boolean(),
  /** Why not, when canAppeal is false (already appealed, window closed, nothing to appeal). */
  cannotAppealReason: z.string().nullable(),
  appeal: myAppealSchema.nullable(),
});
export type ActionOnMe = z.infer<typeof actionOnMeSchema>;

/** What the author sees on their own hidden thing (setup page, comment, photo, profile). */
export const hiddenNoticeSchema = z.object({
  hiddenAt: z.string(),
  reason: z.string(),
  autoHidden: z.boolean(),
  /** The action to appeal; null for auto-hides (a moderator reviews those anyway). */
  actionId: z.number().int().nullable(),
});
export type HiddenNotice = z.infer<typeof hiddenNoticeSchema>;

// ---- Audit log ----

/** `GET /api/moderation/audit?actor=&action=&targetType=&cursor=` → `{ entries, nextCursor }`. */
export const auditFilterSchema = z.object({
  actor: z.string().max(40).optional(),
  action: z.string().max(40).optional(),
  targetType: z.string().max(20).optional(),
  cursor: z.string().max(100).optional(),
});

export const auditEntrySchema = z.object({
  id: z.number().int(),
  /** Null for the system (automatic hide). */
  actorHandle: z.string().nullable(),
  actorRole: z.string().nullable(),
  /** A moderation action kind, or `role-change`, `admin-suspend`, `admin-unsuspend`, `appeal-filed`, `report-filed`. */
  action: z.string(),
  targetType: z.string(),
  targetId: z.number().int().nullable(),
  subjectHandle: z.string().nullable(),
  reason: z.string(),
  previousState: z.record(z.string(), z.unknown()),
  newState: z.record(z.string(), z.unknown()),
  createdAt: z.string(),
});
export type AuditEntry = z.infer<typeof auditEntrySchema>;
export const auditPageSchema = z.object({ entries: z.array(auditEntrySchema), nextCursor: z.string().nullable() });

// ---- New-account limits ----

/** An account is "new" until 24 h after sign-up and until its e-mail is verified. */
export const NEW_ACCOUNT_HOURS = 24;
export const NEW_ACCOUNT_LIMITS = {
  setupsPerHour: 3,
  commentsPerHour: 5,
  linksPerPost: 2,
} as const;
/** Auto-hide: open reports from this many distinct verified racers whose accounts are older than a week. */
export const AUTO_HIDE_REPORTERS = 3;
export const AUTO_HIDE_REPORTER_MIN_AGE_DAYS = 7;
export const REPORTS_PER_HOUR = 10;
/** The error code of every new-account limit refusal (429 counts, 422 links, 403 photos). */
export const NEW_ACCOUNT_LIMIT_CODE = 'new_account_limit';

/** `GET /api/me/limits`: what applies to me now and when it lifts; `limited: false` means none. */
export const myLimitsSchema = z.object({
  limited: z.boolean(),
  /** Why: the account is under a day old, and/or the e-mail is not verified yet. */
  because: z.array(z.enum(['new-account', 'unverified'])),
  /** When the age part lifts (ISO); null when age is not a reason. Verification lifts the other part. */
  ageLiftsAt: z.string().nullable(),
  setups: z.object({ perHour: z.number().int(), usedThisHour: z.number().int() }).nullable(),
  comments: z.object({ perHour: z.number().int(), usedThisHour: z.number().int() }).nullable(),
  /** Most links allowed in one note or comment; null = no limit. */
  linksPerPost: z.number().int().nullable(),
  /** False until the e-mail is verified. */
  photosAllowed: z.boolean(),
});
export type MyLimits = z.infer<typeof myLimitsSchema>;
