import { QueryTypes } from 'sequelize';
import { ERROR_CODES } from '../../shared/types/errors';
import { voteRequestSchema, type SetupVotes, type TrackTypeVotes } from '../../shared/types/community';
import { TRACK_TYPES, trackTypeKeySchema, type TrackTypeKey } from '../../shared/types/trackTypes';
import type { Database } from '../db/database';
import { preparedQuery } from '../db/prepared';
import { ApiError } from '../errors';
import type { Setup } from '../models/Setup';
import type { User } from '../models/User';
import { findViewableSetup, type Viewer } from './setupAccess';

export const OWN_SETUP_MESSAGE = "You can't vote on your own setup: votes are other racers' word on where it works.";
const NOT_PUBLIC_MESSAGE = 'Votes open once the owner makes this setup public.';
const HIDDEN_MESSAGE = 'Voting is closed while moderators review this setup.';
const SIGN_IN_MESSAGE = 'Sign in to say where this setup works.';

function parseTrackType(raw: string): TrackTypeKey {
  const parsed = trackTypeKeySchema.safeParse(raw);
  if (parsed.success) return parsed.data;
  const message = `"${raw.slice(0, 40)}" is not a track type. Pick one of: ${TRACK_TYPES.map((t) => t.key).join(', ')}.`;
  throw ApiError.validation({ trackType: message }, message);
}

/** Why `viewer` may not vote on `setup`, or null when they may. */
function cannotVoteReason(setup: Pick<Setup, 'ownerId' | 'visibility' | 'hiddenAt'>, viewer: Viewer): string | null {
  if (!viewer) return SIGN_IN_MESSAGE;
  if (viewer.id === setup.ownerId) return OWN_SETUP_MESSAGE;
  if (setup.visibility !== 'public') return NOT_PUBLIC_MESSAGE;
  if (setup.hiddenAt) return HIDDEN_MESSAGE;
  return null;
}

type CountRow = { trackType: TrackTypeKey; works: number; fails: number; wilson: number };

/** The response: every track type of the fixed list, in order, with its counts and the viewer's vote. */
function setupVotes(setupId: number, counts: CountRow[], mine: ReadonlyMap<string, boolean>, reason: string | null): SetupVotes {
  const countBy = new Map(counts.map((c) => [c.trackType, c]));
  const trackTypes: TrackTypeVotes[] = TRACK_TYPES.map(({ key }) => {
    const c = countBy.get(key);
    const my = mine.get(key);
    return { trackType: key, works: c?.works ?? 0, fails: c?.fails ?? 0, wilson: c?.wilson ?? 0, myVote: my === undefined ? null : my ? 'works' : 'fails' };
  });
  return { setupId, canVote: reason === null, cannotVoteReason: reason, trackTypes };
}

async function tallies(db: Database, setup: Setup, viewer: Viewer): Promise<SetupVotes> {
  const [counts, mine] = await Promise.all([
    db.sequelize.query<CountRow>(
      'SELECT track_type AS "trackType", works, fails, wilson::float8 AS wilson FROM setup_vote_counts WHERE setup_id = :id',
      { replacements: { id: setup.id }, type: QueryTypes.SELECT },
    ),
    viewer
      ? db.sequelize.query<{ trackType: TrackTypeKey; works: boolean }>(
          'SELECT track_type AS "trackType", works FROM setup_votes WHERE setup_id = :id AND user_id = :userId',
          { replacements: { id: setup.id, userId: viewer.id }, type: QueryTypes.SELECT },
        )
      : Promise.resolve([]),
  ]);
  return setupVotes(setup.id, counts, new Map(mine.map((m) => [m.trackType, m.works])), cannotVoteReason(setup, viewer));
}

/*
 * A vote is one statement on the pg pool (prepared once per connection, server/db/prepared.ts): it
 * finds the setup as this racer sees it, writes the vote only when they may vote, and reads the
 * counts back. CTEs of one statement share its snapshot and the counts trigger fires at its end, so
 * the counts are read as the statement found them and this racer's change is applied to them here:
 * the voted track type's row is recounted from its old counts, the racer's old vote and the new one.
 * That is the state the trigger leaves unless another racer votes on the same setup in the same
 * instant: the answer may then leave their vote out, as a read a moment earlier would (the next
 * read shows it). Counts and "my vote" always come from one snapshot, so they agree.
 */

/**
 * The setup as a signed-in racer without a share link sees it (canView in setupAccess.ts): not
 * deleted; their own, or public, and when hidden only to moderators and admins. `votable` narrows
 * it to the setups cannotVoteReason lets them vote on; `before` is their vote as it stood.
 */
const VOTE_TARGET = `
  target AS (
    SELECT id, owner_id, visibility, hidden_at FROM setups
     WHERE id = :setupId::int AND deleted_at IS NULL
       AND (owner_id = :userId::int OR (visibility = 'public' AND (hidden_at IS NULL OR :staff::boolean)))
  ),
  votable AS (SELECT id FROM target WHERE owner_id <> :userId AND visibility = 'public' AND hidden_at IS NULL),
  before AS (SELECT works FROM setup_votes WHERE user_id = :userId AND setup_id = :setupId AND track_type = :trackType::text)`;

/** The answer row: who may vote, the other track types' counts, the voted one's recount, my other votes. */
function voteAnswer(newVote: string): string {
  return `
  SELECT t.owner_id AS "ownerId", t.visibility, t.hidden_at AS "hiddenAt",
         (SELECT json_agg(json_build_object('trackType', c.track_type, 'works', c.works, 'fails', c.fails, 'wilson', c.wilson::float8))
            FROM setup_vote_counts c WHERE c.setup_id = t.id AND c.track_type <> :trackType) AS counts,
         n.works, n.fails, wilson_lower_bound(n.works, n.fails)::numeric(9, 8)::float8 AS wilson,
         (SELECT json_object_agg(m.track_type, m.works)
            FROM setup_votes m WHERE m.user_id = :userId AND m.setup_id = t.id AND m.track_type <> :trackType) AS mine
    FROM target t
    LEFT JOIN setup_vote_counts k ON k.setup_id = t.id AND k.track_type = :trackType
    CROSS JOIN LATERAL (
      SELECT coalesce(k.works, 0) - coalesce((SELECT works::int FROM before), 0) + coalesce((${newVote})::int, 0) AS works,
             coalesce(k.fails, 0) - coalesce((SELECT (NOT works)::int FROM before), 0) + coalesce((NOT ${newVote})::int, 0) AS fails
    ) n`;
}

const CAST_VOTE_SQL = `
  WITH ${VOTE_TARGET},
  cast_vote AS (
    INSERT INTO setup_votes AS v (user_id, setup_id, track_type, works)
    SELECT :userId, id, :trackType, :works::boolean FROM votable
    ON CONFLICT (user_id, setup_id, track_type)
    DO UPDATE SET works = EXCLUDED.works, updated_at = now() WHERE v.works IS DISTINCT FROM EXCLUDED.works
  )
  ${voteAnswer(':works::boolean')}`;

const WITHDRAW_VOTE_SQL = `
  WITH ${VOTE_TARGET},
  withdraw_vote AS (
    DELETE FROM setup_votes v USING votable WHERE v.user_id = :userId AND v.setup_id = votable.id AND v.track_type = :trackType
  )
  ${voteAnswer('NULL::boolean')}`;

type VoteRow = Pick<Setup, 'ownerId' | 'visibility' | 'hiddenAt'> & {
  counts: CountRow[] | null;
  works: number;
  fails: number;
  wilson: number;
  mine: Record<string, boolean> | null;
};

const INT4_MAX = 2_147_483_647;

/** Runs a vote statement; 404 when the racer cannot see the setup, 403 when they may not vote on it. */
async function writeVote(db: Database, user: User, setupId: number, key: TrackTypeKey, works: boolean | null): Promise<SetupVotes> {
  // An id the setups' integer key cannot hold is not a setup (and must not reach pg as a bad parameter).
  if (!Number.isInteger(setupId) || Math.abs(setupId) > INT4_MAX) throw ApiError.notFound('That setup');
  const staff = user.role === 'moderator' || user.role === 'admin';
  const params = { setupId, userId: user.id, staff, trackType: key, works };
  const [row] = await preparedQuery<VoteRow>(db.pool, works === null ? WITHDRAW_VOTE_SQL : CAST_VOTE_SQL, params);
  if (!row) throw ApiError.notFound('That setup');
  const reason = cannotVoteReason(row, user);
  if (reason) throw new ApiError(403, ERROR_CODES.forbidden, reason);
  const counts: CountRow[] = [...(row.counts ?? []), { trackType: key, works: row.works, fails: row.fails, wilson: row.wilson }];
  const mine = new Map(Object.entries(row.mine ?? {}));
  if (works !== null) mine.set(key, works);
  return setupVotes(setupId, counts, mine, null);
}

/**
 * Per track type of the fixed list, how many racers said a setup works or doesn't work there, its
 * Wilson bound, and the viewer's own vote; whether the viewer may vote and, if not, why.
 */
export async function getSetupVotes(db: Database, setupId: number, viewer: Viewer, shareToken?: string): Promise<SetupVotes> {
  return tallies(db, await findViewableSetup(db, setupId, viewer, shareToken), viewer);
}

/**
 * Casts or changes the racer's vote on one track type of someone else's public setup. One vote per
 * racer, setup and track type (the primary key); the counts follow by trigger in the same statement.
 */
export async function castVote(db: Database, user: User, setupId: number, trackType: string, body: unknown): Promise<SetupVotes> {
  const key = parseTrackType(trackType);
  const parsed = voteRequestSchema.safeParse(body ?? {});
  if (!parsed.success) throw ApiError.validation({ works: parsed.error.issues[0].message }, parsed.error.issues[0].message);
  return writeVote(db, user, setupId, key, parsed.data.works);
}

/** Withdraws the racer's vote on one track type; withdrawing a vote that is not there changes nothing. */
export async function withdrawVote(db: Database, user: User, setupId: number, trackType: string): Promise<SetupVotes> {
  const key = parseTrackType(trackType);
  return writeVote(db, user, setupId, key, null);
}
