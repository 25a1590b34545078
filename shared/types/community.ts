import { z } from './zod';
import { vehicleClassKeySchema } from './vehicleClasses';
import { trackTypeKeySchema } from './trackTypes';

/*
 * Community: follows, the activity feed, votes by track type, notifications and e-mail preferences.
 * Shared by the API and the client. Each part's schemas sit under its heading; the people building
 * each part add to their own section.
 */

// ---- Notifications (in-app and e-mail share these event types) ----

export const NOTIFICATION_TYPES = [
  'new-follower',
  'comment-on-setup',
  'comment-on-revision',
  'comment-reply',
  'setup-forked',
  'original-changed',
  'report-outcome',
  /** What moderators did to my content or account (hidden, restored, warned, suspended, appeal decided). */
  'moderation-notice',
] as const;
export const notificationTypeSchema = z.enum(NOTIFICATION_TYPES);
export type NotificationType = z.infer<typeof notificationTypeSchema>;

/** What a notification is about, as stored; the text is composed when it is shown or mailed. */
export const notificationEventSchema = z.object({
  type: notificationTypeSchema,
  /** Who receives it. */
  userId: z.number().int().positive(),
  /** Who did it (null for system events such as report outcomes). */
  actorId: z.number().int().positive().nullable(),
  setupId: z.number().int().positive().nullable().default(null),
  revisionId: z.number().int().positive().nullable().default(null),
  commentId: z.number().int().positive().nullable().default(null),
  /** Short plain-text detail, e.g. a change note's first line or a report's outcome. */
  detail: z.string().max(500).default(''),
});
export type NotificationEvent = z.input<typeof notificationEventSchema>;

// ---- Follows and feed ----

/** A racer as lists show them: followers, following, suggestions, who did something. */
export const racerSummarySchema = z.object({ handle: z.string(), displayName: z.string() });
export type RacerSummary = z.infer<typeof racerSummarySchema>;

/** `GET|POST|DELETE /api/racers/:handle/follow`: the counts a profile shows and my side of it. */
export const followStatusSchema = z.object({
  handle: z.string(),
  followerCount: z.number().int(),
  followingCount: z.number().int(),
  /** Null when nobody is signed in. */
  followedByMe: z.boolean().nullable(),
  /** False on my own page and when signed out. */
  canFollow: z.boolean(),
});
export type FollowStatus = z.infer<typeof followStatusSchema>;
export const followStatusResponseSchema = z.object({ follow: followStatusSchema });

/** `GET /api/racers/:handle/followers|following?cursor=`: newest follows first. */
export const followListSchema = z.object({
  racers: z.array(racerSummarySchema.extend({ followedAt: z.string() })),
  /** Opaque; null on the last page. */
  nextCursor: z.string().nullable(),
});
export type FollowList = z.infer<typeof followListSchema>;

/** Feed items by kind; the order here is the feed's tiebreak order (after time) and never changes. */
export const FEED_KINDS = ['fork', 'revision', 'setup'] as const;
export type FeedKind = (typeof FEED_KINDS)[number];

const feedSetupSchema = z.object({ id: z.number().int(), title: z.string(), vehicleClass: vehicleClassKeySchema });
const feedBase = { id: z.number().int(), createdAt: z.string(), actor: racerSummarySchema, setup: feedSetupSchema };

/**
 * One thing in my activity feed: a racer I follow published a setup (`setup`) or saved a new
 * revision of a public one (`revision`, with its change note), or anyone published a fork of one of
 * my setups (`fork`: `setup` is the fork, `original` mine). `id` is the setup's, revision's or
 * fork's id: unique within its kind.
 */
export const feedItemSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('setup'), ...feedBase }),
  z.object({ kind: z.literal('revision'), ...feedBase, revision: z.object({ number: z.number().int(), changeNote: z.string() }) }),
  z.object({ kind: z.literal('fork'), ...feedBase, original: z.object({ id: z.number().int(), title: z.string() }) }),
]);
export type FeedItem = z.infer<typeof feedItemSchema>;

/** `GET /api/feed?cursor=`: newest first; `nextCursor` null on the last page. */
export const feedPageSchema = z.object({ items: z.array(feedItemSchema), nextCursor: z.string().nullable() });
export type FeedPage = z.infer<typeof feedPageSchema>;

/** `GET /api/feed/suggestions`: racers to follow, most forked first, in the classes I race (all when I list none). */
export const feedSuggestionsSchema = z.object({
  classes: z.array(vehicleClassKeySchema),
  racers: z.array(racerSummarySchema.extend({ forkCount: z.number().int(), setupCount: z.number().int() })),
});
export type FeedSuggestions = z.infer<typeof feedSuggestionsSchema>;

/**
 * One in-app notification as its recipient sees it. `setup` is the setup it links to (mine, or my
 * fork for `original-changed`); `available` is false once I can no longer open it, and its title is
 * then withheld. `revision` is the change it is about, when there is one.
 */
export const notificationSchema = z.object({
  id: z.number().int(),
  type: notificationTypeSchema,
  createdAt: z.string(),
  read: z.boolean(),
  actor: racerSummarySchema.nullable(),
  setup: z.object({ id: z.number().int(), title: z.string().nullable(), available: z.boolean() }).nullable(),
  revision: z.object({ id: z.number().int(), number: z.number().int(), setupId: z.number().int() }).nullable(),
  commentId: z.number().int().nullable(),
  detail: z.string(),
});
export type NotificationDto = z.infer<typeof notificationSchema>;

/** `GET /api/notifications?cursor=`: mine, newest first. */
export const notificationPageSchema = z.object({ notifications: z.array(notificationSchema), nextCursor: z.string().nullable() });
export type NotificationPage = z.infer<typeof notificationPageSchema>;

/** `GET /api/notifications/unread-count`, and the answer of both "read" writes. */
export const unreadCountSchema = z.object({ unreadCount: z.number().int() });

// ---- Votes and discover ----

/** `PUT /api/setups/:id/votes/:trackType`: does the setup work on that surface? */
export const voteRequestSchema = z.object({
  works: z.boolean({ error: 'Say whether the setup works on this surface: works is true or false.' }),
});
export type VoteRequest = z.infer<typeof voteRequestSchema>;

export const VOTE_CHOICES = ['works', 'fails'] as const;
export type VoteChoice = (typeof VOTE_CHOICES)[number];

/** One track type's tally on one setup, with the viewer's own vote. */
export const trackTypeVotesSchema = z.object({
  trackType: trackTypeKeySchema,
  works: z.number().int(),
  fails: z.number().int(),
  /** Lower bound of the 95 % Wilson score interval over the votes (what "best for" ranks by); 0 without votes. */
  wilson: z.number(),
  /** Null when the viewer has not voted on this track type (or is not signed in). */
  myVote: z.enum(VOTE_CHOICES).nullable(),
});
export type TrackTypeVotes = z.infer<typeof trackTypeVotesSchema>;

/** `GET /api/setups/:id/votes` (and the answer of every vote and withdrawal): every track type, list order. */
export const setupVotesSchema = z.object({
  setupId: z.number().int(),
  canVote: z.boolean(),
  /** Why the viewer cannot vote, in words for them; null when they can. */
  cannotVoteReason: z.string().nullable(),
  trackTypes: z.array(trackTypeVotesSchema),
});
export type SetupVotes = z.infer<typeof setupVotesSchema>;
export const setupVotesResponseSchema = z.object({ votes: setupVotesSchema });

export const DISCOVER_SORTS = ['newest', 'most-forked', 'best-for'] as const;
export const discoverSortSchema = z.enum(DISCOVER_SORTS, { error: 'Sort by newest, most-forked or best-for.' });
export type DiscoverSort = z.infer<typeof discoverSortSchema>;

/** Track temperatures a setup can be tagged with (the conditions schema's bounds), in °C. */
export const DISCOVER_TEMPERATURE_C = { min: -30, max: 60 } as const;
export const DISCOVER_PAGE_SIZE = 20;

/** A query-string number: one value, digits only, within bounds. */
function queryNumber(name: string, min: number, max: number, example: string, integer = false) {
  return z
    .string({ error: `Give ${name} once, as a number.` })
    .trim()
    .regex(integer ? /^\d+$/ : /^-?\d+(\.\d+)?$/, { error: `${name} must be a number, such as ${example}.` })
    .transform(Number)
    .refine((n) => n >= min && n <= max, { error: `${name} must be from ${min} to ${max}.` });
}

const cursorSchema = z.string({ error: 'Give the cursor once.' }).max(500, 'That page link is not one of ours; start again from the top.');

/**
 * `GET /api/discover`: every value arrives as a string. Temperatures are °C (the app converts from
 * the racer's unit); best-for needs the track type to rank for.
 */
export const discoverQuerySchema = z
  .object({
    class: z.enum(vehicleClassKeySchema.options, { error: 'Pick a class from the list.' }).optional(),
    kit: queryNumber('kit', 1, 2_147_483_647, '3', true).optional(),
    trackType: z.enum(trackTypeKeySchema.options, { error: 'Pick a track type from the list.' }).optional(),
    tempMin: queryNumber('tempMin', DISCOVER_TEMPERATURE_C.min, DISCOVER_TEMPERATURE_C.max, '15').optional(),
    tempMax: queryNumber('tempMax', DISCOVER_TEMPERATURE_C.min, DISCOVER_TEMPERATURE_C.max, '30').optional(),
    sort: discoverSortSchema.default('newest'),
    bestFor: z.enum(trackTypeKeySchema.options, { error: 'Pick the track type to rank for from the list.' }).optional(),
    cursor: cursorSchema.optional(),
  })
  .superRefine((q, ctx) => {
    if (q.tempMin !== undefined && q.tempMax !== undefined && q.tempMin > q.tempMax) {
      ctx.addIssue({ code: 'custom', path: ['tempMax'], message: 'The highest temperature must be at or above the lowest.' });
    }
    if (q.sort === 'best-for' && !q.bestFor) {
      ctx.addIssue({ code: 'custom', path: ['bestFor'], message: 'Pick the track type to rank for (bestFor).' });
    }
  });
export type DiscoverQuery = z.output<typeof discoverQuerySchema>;

/** `GET /api/search?q=`: websearch syntax ("quoted phrase", -without, or). */
export const searchQuerySchema = z.object({
  q: z.string({ error: 'Give the search words once (q).' }).max(500, 'Searches are at most 500 characters.').default(''),
  cursor: cursorSchema.optional(),
});

/** A public setup as Discover and search list it. */
export const discoverSetupSchema = z.object({
  id: z.number().int(),
  title: z.string(),
  ownerHandle: z.string(),
  kitId: z.number().int(),
  kitName: z.string(),
  makerName: z.string(),
  vehicleClass: vehicleClassKeySchema,
  trackType: trackTypeKeySchema.nullable(),
  temperatureC: z.number().nullable(),
  forkCount: z.number().int(),
  revisionCount: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
  /** For "best for": the votes for the chosen track type; null in the other orders. */
  votes: z.object({ trackType: trackTypeKeySchema, works: z.number().int(), fails: z.number().int(), wilson: z.number() }).nullable(),
});
export type DiscoverSetup = z.infer<typeof discoverSetupSchema>;

export const discoverPageSchema = z.object({
  setups: z.array(discoverSetupSchema),
  /** Pass back as `cursor` for the next page; null on the last page. */
  nextCursor: z.string().nullable(),
  /** Why the list is in this order, in a sentence or two for people. */
  explanation: z.string(),
});
export type DiscoverPage = z.infer<typeof discoverPageSchema>;

export const kitSuggestionSchema = z.object({ id: z.number().int(), name: z.string(), makerName: z.string(), vehicleClass: vehicleClassKeySchema });
export type KitSuggestion = z.infer<typeof kitSuggestionSchema>;

export const searchPageSchema = z.object({
  setups: z.array(discoverSetupSchema),
  nextCursor: z.string().nullable(),
  /** Kits whose names are close to the words searched for, typos and all; best match first. */
  kitSuggestions: z.array(kitSuggestionSchema),
});
export type SearchPage = z.infer<typeof searchPageSchema>;

// ---- E-mail preferences ----

/** How notification e-mail arrives: one mail per event, or one mail a day listing them. */
export const EMAIL_DELIVERIES = ['immediate', 'daily-digest'] as const;
export const emailDeliverySchema = z.enum(EMAIL_DELIVERIES);
export type EmailDelivery = z.infer<typeof emailDeliverySchema>;

/** What each event type is called in settings, unsubscribe pages and digests. */
export const EMAIL_TYPE_LABELS: Record<NotificationType, string> = {
  'new-follower': 'New followers',
  'comment-on-setup': 'Comments on my setups',
  'comment-on-revision': 'Comments on my changes',
  'comment-reply': 'Replies to my comments',
  'setup-forked': 'Forks of my setups',
  'original-changed': 'Changes to setups I forked from',
  'report-outcome': 'Outcomes of my reports',
  'moderation-notice': 'Moderators’ decisions about my content',
};

/**
 * A racer's notification e-mail choices. `enabled` is the master switch ("unsubscribe from all"
 * turns it off); `types` lists every event type, so a type added later shows its default.
 */
export const emailPreferencesSchema = z.object({
  enabled: z.boolean(),
  delivery: emailDeliverySchema,
  types: z.record(notificationTypeSchema, z.boolean()),
});
export type EmailPreferences = z.infer<typeof emailPreferencesSchema>;

/** Everything on: these are events about the racer's own setups, comments and reports, and rare. */
export const DEFAULT_EMAIL_PREFERENCES: EmailPreferences = {
  enabled: true,
  delivery: 'immediate',
  types: Object.fromEntries(NOTIFICATION_TYPES.map((t) => [t, true])) as Record<NotificationType, boolean>,
};

/** PUT /api/me/email-preferences: any subset; what is left out keeps its value. */
export const emailPreferencesUpdateSchema = z.strictObject(
  {
    enabled: z.boolean({ error: 'enabled must be true or false.' }).optional(),
    delivery: z.enum(EMAIL_DELIVERIES, { error: `delivery must be one of: ${EMAIL_DELIVERIES.join(', ')}.` }).optional(),
    types: z
      .partialRecord(notificationTypeSchema, z.boolean({ error: 'Each type must be true or false.' }), {
        error: `types may only name: ${NOTIFICATION_TYPES.join(', ')}.`,
      })
      .optional(),
  },
  { error: 'Only enabled, delivery and types can be changed here.' },
);
export type EmailPreferencesUpdate = z.infer<typeof emailPreferencesUpdateSchema>;

export const emailPreferencesResponseSchema = z.object({ preferences: emailPreferencesSchema });

/** An unsubscribe link stops one event type, or every notification e-mail ('all'). */
export const unsubscribeScopeSchema = z.union([notificationTypeSchema, z.literal('all')]);
export type UnsubscribeScope = z.infer<typeof unsubscribeScopeSchema>;

export const unsubscribeRequestSchema = z.object({
  token: z
    .string({ error: 'The unsubscribe link has no token. Open the link from the e-mail again.' })
    .min(1, 'The unsubscribe link has no token. Open the link from the e-mail again.')
    .max(300, 'That unsubscribe token is too long to be one of ours.'),
});

/** GET /api/unsubscribe?token=: what the link would stop, shown before the one click. */
export const unsubscribeInfoSchema = z.object({
  scope: unsubscribeScopeSchema,
  /** e.g. "Comments on my setups" or "All notification e-mail". */
  label: z.string(),
  handle: z.string(),
  /** True when these e-mails are already off. */
  alreadyOff: z.boolean(),
});
export type UnsubscribeInfo = z.infer<typeof unsubscribeInfoSchema>;

export const unsubscribeResponseSchema = z.object({ message: z.string(), scope: unsubscribeScopeSchema });
