import { QueryTypes } from 'sequelize';
import { NEW_ACCOUNT_HOURS, NEW_ACCOUNT_LIMIT_CODE, NEW_ACCOUNT_LIMITS, type MyLimits } from '../../../shared/types/moderation';
import type { Database } from '../../db/database';
import { ApiError } from '../../errors';
import type { User } from '../../models/User';
import { countRenderedLinks } from '../markdown';

/*
 * Limits on new accounts (under NEW_ACCOUNT_HOURS old, or e-mail not verified): fewer setups and
 * comments per rolling hour, few links per post, no photos until verified. Every refusal says what
 * the limit is and when it lifts; nothing is ever held back silently. Staff are never limited.
 */

const HOUR_MS = 3_600_000;

/** The parts of an account the limits read. */
export type LimitedAccount = Pick<User, 'id' | 'role' | 'createdAt' | 'emailVerifiedAt'>;

export type NewAccountStatus = {
  limited: boolean;
  because: MyLimits['because'];
  /** When the age part ends; null when age is not a reason. */
  ageLiftsAt: Date | null;
};

/** Whether the new-account limits apply to `user` now, and why. */
export function newAccountStatus(user: LimitedAccount, now = new Date()): NewAccountStatus {
  if (user.role === 'moderator' || user.role === 'admin') return { limited: false, because: [], ageLiftsAt: null };
  const ageLiftsAt = new Date(user.createdAt.getTime() + NEW_ACCOUNT_HOURS * HOUR_MS);
  const young = ageLiftsAt.getTime() > now.getTime();
  const because: NewAccountStatus['because'] = [];
  if (young) because.push('new-account');
  if (!user.emailVerifiedAt) because.push('unverified');
  return { limited: because.length > 0, because, ageLiftsAt: young ? ageLiftsAt : null };
}

/** "in 42 min", "in 5 h 12 min": how long until `at`, rounded up to the minute. */
export function inWords(ms: number): string {
  const minutes = Math.max(1, Math.ceil(ms / 60_000));
  if (minutes < 60) return `in ${minutes} min`;
  const hours = Math.floor(minutes / 60);
  const rest = minutes % 60;
  return rest ? `in ${hours} h ${rest} min` : `in ${hours} h`;
}

/** The sentence every refusal ends with: when the new-account limits end altogether. */
function whenLimitsEnd(status: NewAccountStatus, now: Date): string {
  const parts: string[] = [];
  if (status.ageLiftsAt) parts.push(`your account is ${NEW_ACCOUNT_HOURS} hours old (${inWords(status.ageLiftsAt.getTime() - now.getTime())})`);
  if (status.because.includes('unverified')) parts.push('you confirm your e-mail address');
  return `New-account limits end once ${parts.join(' and ')}.`;
}

/** Where a racer's posts of each kind are, and the column naming the racer. */
const POSTS = { setup: { table: 'setups', by: 'owner_id' }, comment: { table: 'comments', by: 'author_id' } } as const;

/** How many setups or comments the racer made in the last hour (deleted ones too), and the oldest's time. */
async function postsThisHour(db: Database, kind: keyof typeof POSTS, userId: number): Promise<{ used: number; oldest: Date | null }> {
  const { table, by } = POSTS[kind];
  const [row] = await db.sequelize.query<{ used: number; oldest: Date | null }>(
    `SELECT count(*)::int AS used, min(created_at) AS oldest FROM ${table} WHERE ${by} = :id AND created_at > now() - interval '1 hour'`,
    { type: QueryTypes.SELECT, replacements: { id: userId } },
  );
  return row;
}

const PER_HOUR = {
  setup: { perHour: NEW_ACCOUNT_LIMITS.setupsPerHour, verb: 'create', made: 'created', noun: 'setup', plural: 'setups' },
  comment: { perHour: NEW_ACCOUNT_LIMITS.commentsPerHour, verb: 'post', made: 'posted', noun: 'comment', plural: 'comments' },
} as const;

async function refuseOverHourlyLimit(db: Database, user: LimitedAccount, kind: keyof typeof PER_HOUR, status: NewAccountStatus, now: Date) {
  const { perHour, verb, made, noun, plural } = PER_HOUR[kind];
  const { used, oldest } = await postsThisHour(db, kind, user.id);
  if (used < perHour) return;
  // The rolling hour frees a place when the oldest post in it turns an hour old.
  const nextAt = new Date((oldest ?? now).getTime() + HOUR_MS);
  const waitMs = Math.max(0, nextAt.getTime() - now.getTime());
  const message =
    `New accounts can ${verb} ${perHour} ${plural} an hour, and you have ${made} ${used} in the last hour. ` +
    `You can ${verb} the next ${noun} ${inWords(waitMs)}. ${whenLimitsEnd(status, now)}`;
  throw new ApiError(429, NEW_ACCOUNT_LIMIT_CODE, message, {
    limit: `${plural}PerHour`,
    perHour,
    usedThisHour: used,
    retryAfterSeconds: Math.max(1, Math.ceil(waitMs / 1000)),
    nextAllowedAt: nextAt.toISOString(),
    ageLiftsAt: status.ageLiftsAt?.toISOString() ?? null,
    because: status.because,
  });
}

/** Counts links in a note or comment as it will render: markdown links, autolinks and bare URLs (GFM). */
export function countLinks(markdown: string): number {
  return countRenderedLinks(markdown);
}

function refuseTooManyLinks(field: string, text: string | undefined, status: NewAccountStatus, now: Date) {
  if (!text) return;
  const links = countLinks(text);
  const max = NEW_ACCOUNT_LIMITS.linksPerPost;
  if (links <= max) return;
  const over = links - max;
  const message =
    `New accounts can put at most ${max} links in one note or comment; this has ${links}. ` +
    `Remove ${over} ${over === 1 ? 'link' : 'links'} and try again. ${whenLimitsEnd(status, now)}`;
  throw new ApiError(422, NEW_ACCOUNT_LIMIT_CODE, message, { [field]: message });
}

function refuseUnverifiedPhoto(status: NewAccountStatus) {
  if (!status.because.includes('unverified')) return;
  throw new ApiError(
    403,
    NEW_ACCOUNT_LIMIT_CODE,
    'Photos can be added once your e-mail address is confirmed. Open the link in the e-mail we sent you, or send a new one from your profile.',
  );
}

/** What a racer is about to post; text fields are checked for links, under the field's name. */
export type NewPost =
  | { kind: 'setup'; texts?: Record<string, string | undefined> }
  | { kind: 'comment'; texts?: Record<string, string | undefined> }
  | { kind: 'text'; texts: Record<string, string | undefined> }
  | { kind: 'photo' };

/**
 * Refuses a post that breaks the new-account limits: 429 over the setups or comments per hour,
 * 422 with the field named for too many links, 403 for a photo before the e-mail is verified.
 * Does nothing for established accounts, moderators and admins.
 */
export async function assertNewAccountMayPost(db: Database, user: LimitedAccount, post: NewPost): Promise<void> {
  const now = new Date();
  const status = newAccountStatus(user, now);
  if (!status.limited) return;
  if (post.kind === 'photo') return refuseUnverifiedPhoto(status);
  for (const [field, text] of Object.entries(post.texts ?? {})) refuseTooManyLinks(field, text, status, now);
  if (post.kind === 'setup' || post.kind === 'comment') await refuseOverHourlyLimit(db, user, post.kind, status, now);
}

/** `GET /api/me/limits`: what applies to me now, what I have used this hour and when it lifts. */
export async function getMyLimits(db: Database, user: LimitedAccount): Promise<MyLimits> {
  const status = newAccountStatus(user);
  const photosAllowed = !status.because.includes('unverified');
  if (!status.limited) {
    return { limited: false, because: [], ageLiftsAt: null, setups: null, comments: null, linksPerPost: null, photosAllowed };
  }
  const [setups, comments] = await Promise.all([postsThisHour(db, 'setup', user.id), postsThisHour(db, 'comment', user.id)]);
  return {
    limited: true,
    because: status.because,
    ageLiftsAt: status.ageLiftsAt?.toISOString() ?? null,
    setups: { perHour: NEW_ACCOUNT_LIMITS.setupsPerHour, usedThisHour: setups.used },
    comments: { perHour: NEW_ACCOUNT_LIMITS.commentsPerHour, usedThisHour: comments.used },
    linksPerPost: NEW_ACCOUNT_LIMITS.linksPerPost,
    photosAllowed,
  };
}
