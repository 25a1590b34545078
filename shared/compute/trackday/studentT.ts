import { jStat } from 'jstat';
import { TrackdayInputError, requireFiniteNumber } from './inputChecks';

/**
 * Above this many degrees of freedom the t distribution is the normal distribution to better than
 * 1e-5, and jstat's t quantile loses accuracy (it drifts from 1.95996 towards 1.957 by 1e9), so
 * the normal quantile is used instead.
 */
const NORMAL_LIMIT_DEGREES_OF_FREEDOM = 1e6;

/**
 * Quantile (inverse cumulative distribution) of Student's t distribution: the t below which
 * `probability` of the distribution lies. Fractional degrees of freedom (Welch) are fine;
 * `Infinity` gives the normal quantile.
 */
export function studentTQuantile(probability: number, degreesOfFreedom: number): number {
  requireFiniteNumber(probability, 'probability');
  if (probability <= 0 || probability >= 1) {
    throw new TrackdayInputError(`probability must be strictly between 0 and 1, got ${probability}`);
  }
  if (typeof degreesOfFreedom !== 'number' || Number.isNaN(degreesOfFreedom) || degreesOfFreedom <= 0) {
    throw new TrackdayInputError(`degrees of freedom must be more than 0, got ${String(degreesOfFreedom)}`);
  }
  const quantile =
    degreesOfFreedom > NORMAL_LIMIT_DEGREES_OF_FREEDOM
      ? jStat.normal.inv(probability, 0, 1)
      : jStat.studentt.inv(probability, degreesOfFreedom);
  if (!Number.isFinite(quantile)) {
    throw new TrackdayInputError(
      `no t quantile for probability ${probability} with ${degreesOfFreedom} degrees of freedom`,
    );
  }
  return quantile;
}
