import { TrackdayInputError, requirePositiveNumber } from './inputChecks';

/**
 * Shock oil grades racers can buy, cSt: 100 to 1000 in steps of 50 (common practice, no source).
 */
export const SHOCK_OIL_GRADES_CST: readonly number[] = Array.from(
  { length: 19 },
  (_, index) => 100 + 50 * index,
);

/**
 * Common differential oil grades, cSt (common practice, no source). The steps widen with the
 * grade because racers feel diff oil changes as ratios, not differences.
 */
export const DIFF_OIL_GRADES_CST: readonly number[] = [
  1000, 1500, 2000, 3000, 4000, 5000, 7000, 10000, 15000, 20000, 30000, 50000, 60000, 100000, 200000,
  300000, 500000, 1000000,
];

/** Every standard grade, shock and diff, thinnest first, each once. */
export const STANDARD_OIL_GRADES_CST: readonly number[] = [
  ...new Set([...SHOCK_OIL_GRADES_CST, ...DIFF_OIL_GRADES_CST]),
].sort((a, b) => a - b);

/**
 * The grade in `grades` nearest to `viscosityCst`, measured as a ratio (on a log scale), because a
 * racer feels the ratio: 6,000 cSt is ×1.2 from 5,000 but only ×1.17 from 7,000, so it snaps to
 * 7,000. An exact tie takes the thinner grade.
 */
export function nearestOilGrade(
  viscosityCst: number,
  grades: readonly number[] = STANDARD_OIL_GRADES_CST,
): number {
  const target = Math.log(requirePositiveNumber(viscosityCst, 'viscosity (cSt)'));
  if (!Array.isArray(grades) || grades.length === 0) {
    throw new TrackdayInputError('the list of oil grades to choose from is empty');
  }
  let nearest = NaN;
  let nearestDistance = Infinity;
  for (const grade of grades) {
    const distance = Math.abs(Math.log(requirePositiveNumber(grade, 'oil grade (cSt)')) - target);
    if (distance < nearestDistance || (distance === nearestDistance && grade < nearest)) {
      nearest = grade;
      nearestDistance = distance;
    }
  }
  return nearest;
}
