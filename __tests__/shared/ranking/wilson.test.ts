import fc from 'fast-check';
import { jStat } from 'jstat';
import { WILSON_Z_95, compareByWilson, wilsonLowerBound, type VoteTally } from '../../../shared/compute/ranking';

/** Rounded to the four decimals the published values are given in. */
const fourDecimals = (x: number) => Number(x.toFixed(4));

// Evan Miller, "How Not To Sort By Average Rating" (2009): lower bound of the Wilson score interval
// at 95 % (z = 1.96). Values as quoted in the votes issue (works / doesn't work → bound).
const EVAN_MILLER_2009: Array<[works: number, fails: number, bound: number]> = [
  [209, 50, 0.7545],
  [118, 25, 0.7546],
  [10, 1, 0.6226],
  [40, 20, 0.5406],
];

describe('Wilson lower bound against Evan Miller, "How Not To Sort By Average Rating" (2009)', () => {
  it.each(EVAN_MILLER_2009)('%i works / %i doesn\'t → %f', (works, fails, bound) => {
    expect(fourDecimals(wilsonLowerBound(works, fails))).toBe(bound);
  });

  it('ranks 10/1 (0.6226) above 40/20 (0.5406), though 40/20 has more votes', () => {
    expect(compareByWilson({ works: 10, fails: 1 }, { works: 40, fails: 20 })).toBeLessThan(0);
  });

  it('ranks 118/25 just above 209/50, as the published bounds say', () => {
    expect(wilsonLowerBound(118, 25)).toBeGreaterThan(wilsonLowerBound(209, 50));
  });

  it('does not let 3 for 3 beat 90 for 100 (the issue\'s own example)', () => {
    expect(wilsonLowerBound(3, 0)).toBeLessThan(wilsonLowerBound(90, 10));
  });

  it('gives 0/0 a bound of 0 without dividing by zero, and sorts it last', () => {
    expect(wilsonLowerBound(0, 0)).toBe(0);
    const tallies: VoteTally[] = [
      { works: 0, fails: 0 },
      { works: 40, fails: 20 },
      { works: 0, fails: 3 },
      { works: 10, fails: 1 },
    ];
    expect([...tallies].sort(compareByWilson)).toEqual([
      { works: 10, fails: 1 },
      { works: 40, fails: 20 },
      { works: 0, fails: 3 },
      { works: 0, fails: 0 },
    ]);
  });
});

describe('z for 95 % against an independent quantile (jstat.normal.inv)', () => {
  const jstatZ = jStat.normal.inv(0.975, 0, 1);

  it('1.96 is the two-sided 95 % normal quantile (1.959964…) to within 0.0001', () => {
    expect(Math.abs(jstatZ - WILSON_Z_95)).toBeLessThan(0.0001);
  });

  it.each(EVAN_MILLER_2009)('the exact quantile gives the same four decimals for %i/%i', (works, fails, bound) => {
    expect(fourDecimals(wilsonLowerBound(works, fails, jstatZ))).toBe(bound);
  });
});

describe('refuses input that is not a vote count', () => {
  it.each([
    [-1, 0],
    [1.5, 2],
    [Number.NaN, 1],
    [1, Number.POSITIVE_INFINITY],
  ])('%p works, %p fails', (works, fails) => {
    expect(() => wilsonLowerBound(works, fails)).toThrow(/whole number of votes/);
  });

  it('a z of 0 or less', () => {
    expect(() => wilsonLowerBound(1, 1, 0)).toThrow(/z must be a positive number/);
  });
});

// Properties of any lower confidence bound of a proportion: common practice, no source beyond the
// definition of the interval.
describe('properties', () => {
  const count = fc.integer({ min: 0, max: 100_000 });

  it('lies between 0 and 1', () => {
    fc.assert(
      fc.property(count, count, (works, fails) => {
        const bound = wilsonLowerBound(works, fails);
        return bound >= 0 && bound <= 1;
      }),
    );
  });

  it('lies at or below the observed share of "works" votes', () => {
    fc.assert(
      fc.property(count, count, (works, fails) => {
        fc.pre(works + fails > 0);
        return wilsonLowerBound(works, fails) <= works / (works + fails) + 1e-12;
      }),
    );
  });

  it('rises with one more "works" vote and falls with one more "doesn\'t work" vote', () => {
    fc.assert(
      fc.property(count, count, (works, fails) => {
        const bound = wilsonLowerBound(works, fails);
        return wilsonLowerBound(works + 1, fails) > bound && wilsonLowerBound(works, fails + 1) <= bound;
      }),
    );
  });

  it('rises with more votes at the same share', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 1_000 }), fc.integer({ min: 0, max: 1_000 }), fc.integer({ min: 2, max: 50 }), (works, fails, times) => {
        return wilsonLowerBound(works * times, fails * times) > wilsonLowerBound(works, fails);
      }),
    );
  });
});
