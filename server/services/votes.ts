import { QueryTypes } from 'sequelize';
import { ERROR_CODES } from '../../shared/types/errors';
import { voteRequestSchema, type SetupVotes, type TrackTypeVotes } from '../../shared/types/community';
import { TRACK_TYPES, trackTypeKeySchema, type TrackTypeKey } from '../../shared/types/trackTypes';
import type { Database } from '../db/database';
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
function cannotVoteReason(setup: Setup, viewer: Viewer): string | null {
  if (!viewer) return SIGN_IN_MESSAGE;
  if (viewer.id === setup.ownerId) return OWN_SETUP_MESSAGE;
  if (setup.visibility !== 'public') return NOT_PUBLIC_MESSAGE;
  if (setup.hiddenAt) return HIDDEN_MESSAGE;
  return null;
}

/** A public, visible setup of someone else, else 404 (cannot see it) or 403 (may not vote on it). */
async function findVotableSetup(db: Database, user: User, setupId: number): Promise<Setup> {
  const setup = await findViewableSetup(db, setupId, user);
  const reason = cannotVoteReason(setup, user);
  if (reason) throw new ApiError(403, ERROR_CODES.forbidden, reason);
  return setup;
}

async function tallies(db: Database, setup: Setup, viewer: Viewer): Promise<SetupVotes> {
  const [counts, mine] = await Promise.all([
    db.sequelize.query<{ trackType: TrackTypeKey; works: number; fails: number; wilson: number }>(
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
  const countBy = new Map(counts.map((c) => [c.trackType, c]));
  const mineBy = new Map(mine.map((m) => [m.trackType, m.works]));
  const trackTypes: TrackTypeVotes[] = TRACK_TYPES.map(({ key }) => {
    const c = countBy.get(key);
    const my = mineBy.get(key);
    return { trackType: key, works: c?.works ?? 0, fails: c?.fails ?? 0, wilson: c?.wilson ?? 0, myVote: my === undefined ? null : my ? 'works' : 'fails' };
  });
  const reason = cannotVoteReason(setup, viewer);
  return { setupId: setup.id, canVote: reason === null, cannotVoteReason: reason, trackTypes };
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
  const setup = await findVotableSetup(db, user, setupId);
  await db.sequelize.query(
    `INSERT INTO setup_votes AS v (user_id, setup_id, track_type, works) VALUES (:userId, :setupId, :trackType, :works)
     ON CONFLICT (user_id, setup_id, track_type)
     DO UPDATE SET works = EXCLUDED.works, updated_at = now() WHERE v.works IS DISTINCT FROM EXCLUDED.works`,
    { replacements: { userId: user.id, setupId: setup.id, trackType: key, works: parsed.data.works } },
  );
  return tallies(db, setup, user);
}

/** Withdraws the racer's vote on one track type; withdrawing a vote that is not there changes nothing. */
export async function withdrawVote(db: Database, user: User, setupId: number, trackType: string): Promise<SetupVotes> {
  const key = parseTrackType(trackType);
  const setup = await findVotableSetup(db, user, setupId);
  await db.sequelize.query('DELETE FROM setup_votes WHERE user_id = :userId AND setup_id = :setupId AND track_type = :trackType', {
    replacements: { userId: user.id, setupId: setup.id, trackType: key },
  });
  return tallies(db, setup, user);
}
