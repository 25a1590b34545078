/**
 * Ranking setups by votes: the lower bound of the Wilson score interval for the share of "works
 * here" votes. A setup with few votes gets a wide interval and so a low bound, which is why 3 for 3
 * does not outrank 90 for 100 (Evan Miller, "How Not To Sort By Average Rating", 2009).
 *
 * The database keeps the same formula in `wilson_lower_bound(works, fails)` (migration
 * 20261202T0800-votes-and-search) for the maintained ranking column; a server test checks the two agree.
 */

/** z for a two-sided 95 % interval, as the issue and Evan Miller use it (the exact quantile is 1.959964…). */
export const WILSON_Z_95 = 1.96;

function requireCount(value: number, name: string): void {
  if (!Number.isSafeInteger(value) || value < 0) {
    throw new RangeError(`${name} must be a whole number of votes, 0 or more; got ${String(value)}`);
  }
}

/**
 * Lower bound of the Wilson score interval for `works` positive out of `works + fails` votes, at
 * confidence `z` (1.96 for 95 %). No votes gives 0, so an unvoted setup ranks last and nothing
 * divides by zero.
 */
export function wilsonLowerBound(works: number, fails: number, z: number = WILSON_Z_95): number {
  requireCount(works, 'works');
  requireCount(fails, 'fails');
  if (!Number.isFinite(z) || z <= 0) throw new RangeError(`z must be a positive number; got ${String(z)}`);
  const n = works + fails;
  // With no "works" vote the bound is exactly 0 (centre and margin are equal); computing it would
  // leave rounding dust of either sign, which could order 0-for-10 above 0-for-5.
  if (n === 0 || works === 0) return 0;
  const share = works / n;
  const z2 = z * z;
  const centre = share + z2 / (2 * n);
  const margin = z * Math.sqrt((share * (1 - share) + z2 / (4 * n)) / n);
  return Math.max(0, (centre - margin) / (1 + z2 / n));
}

export type VoteTally = { works: number; fails: number };

/**
 * Orders tallies best first by their Wilson lower bound; tallies without votes come after every
 * voted one (a setup nobody tried on a surface is not ranked above one tried and found wanting).
 */
export function compareByWilson(a: VoteTally, b: VoteTally): number {
  const aVoted = a.works + a.fails > 0;
  const bVoted = b.works + b.fails > 0;
  if (aVoted !== bVoted) return aVoted ? -1 : 1;
  return wilsonLowerBound(b.works, b.fails) - wilsonLowerBound(a.works, a.fails);
}
