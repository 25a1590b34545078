import { TrackdayInputError, requireNumberInRange } from './inputChecks';
import {
  ViscosityCurveOptions,
  ViscosityPoint,
  WALTHER_MIN_VISCOSITY_CST,
  WaltherLine,
  celsiusToKelvin,
  doubleLog,
  viscosityAt,
  viscosityCurve,
} from './waltherViscosity';

/** Temperature at which silicone shock and diff oil grades are rated, °C. */
export const SILICONE_GRADE_RATING_C = 25;

/**
 * Viscosity-temperature coefficient of silicone (PDMS) fluids, VTC = 1 − ν(99 °C) / ν(38 °C).
 * 0.6 is the typical figure manufacturers' data sheets give for PDMS fluids, quoted from memory,
 * not from a source we can name.
 */
export const TYPICAL_SILICONE_VTC = 0.6;

/** Thickest grade modelled, cSt: beyond the thickest diff oils sold. */
export const MAX_SILICONE_GRADE_CST = 1e7;

const VTC_LOW_C = 38;
const VTC_HIGH_C = 99;
// On [0, 10] the 99/38 °C ratio falls steadily as the slope grows, for every grade from 2 cSt up;
// beyond it the 0.7 offset starts to dominate and the ratio turns back up.
const MAX_SLOPE = 10;
const BISECTION_STEPS = 80;

/**
 * The Walther line of a silicone oil from its grade (cSt at 25 °C) alone: the line passes through
 * the grade at 25 °C, and its slope is the one that gives ν(99 °C) / ν(38 °C) = 1 − VTC.
 */
export function siliconeOilLine(
  gradeCst: number,
  viscosityTemperatureCoefficient = TYPICAL_SILICONE_VTC,
): WaltherLine {
  requireNumberInRange(gradeCst, 'oil grade (cSt)', WALTHER_MIN_VISCOSITY_CST, MAX_SILICONE_GRADE_CST);
  const vtc = requireNumberInRange(
    viscosityTemperatureCoefficient,
    'viscosity-temperature coefficient',
    0.05,
    0.9,
  );
  const targetRatio = 1 - vtc;
  const ratioAt = (b: number): number => {
    const line = lineThroughGrade(gradeCst, b);
    return viscosityAt(line, VTC_HIGH_C) / viscosityAt(line, VTC_LOW_C);
  };
  if (ratioAt(MAX_SLOPE) > targetRatio) {
    throw new TrackdayInputError(
      `a ${gradeCst} cSt oil cannot have a viscosity-temperature coefficient of ${vtc} in this model`,
    );
  }
  let flatter = 0;
  let steeper = MAX_SLOPE;
  for (let step = 0; step < BISECTION_STEPS; step += 1) {
    const middle = (flatter + steeper) / 2;
    if (ratioAt(middle) > targetRatio) flatter = middle;
    else steeper = middle;
  }
  return lineThroughGrade(gradeCst, (flatter + steeper) / 2);
}

/** Viscosity in cSt of a silicone oil of `gradeCst` at `temperatureC`. */
export function siliconeViscosityAt(
  gradeCst: number,
  temperatureC: number,
  viscosityTemperatureCoefficient = TYPICAL_SILICONE_VTC,
): number {
  return viscosityAt(siliconeOilLine(gradeCst, viscosityTemperatureCoefficient), temperatureC);
}

/** Points of a silicone oil's modelled viscosity across a temperature range, for a chart. */
export function siliconeOilCurve(
  gradeCst: number,
  options: ViscosityCurveOptions,
  viscosityTemperatureCoefficient = TYPICAL_SILICONE_VTC,
): ViscosityPoint[] {
  return viscosityCurve(siliconeOilLine(gradeCst, viscosityTemperatureCoefficient), options);
}

/**
 * The grade (cSt at 25 °C) whose viscosity at `temperatureC` is `viscosityCst`: the inverse of
 * {@link siliconeViscosityAt}, by bisection on the logarithm of the grade.
 */
export function siliconeGradeFor(
  viscosityCst: number,
  temperatureC: number,
  viscosityTemperatureCoefficient = TYPICAL_SILICONE_VTC,
): number {
  requireNumberInRange(
    viscosityCst,
    'viscosity (cSt)',
    WALTHER_MIN_VISCOSITY_CST,
    MAX_SILICONE_GRADE_CST,
  );
  // Clamped because 10 ** log10(x) can land a rounding error outside the range the model accepts.
  const gradeOf = (logGrade: number): number =>
    Math.min(MAX_SILICONE_GRADE_CST, Math.max(WALTHER_MIN_VISCOSITY_CST, 10 ** logGrade));
  const at = (logGrade: number): number =>
    siliconeViscosityAt(gradeOf(logGrade), temperatureC, viscosityTemperatureCoefficient);
  let thinner = Math.log10(WALTHER_MIN_VISCOSITY_CST);
  let thicker = Math.log10(MAX_SILICONE_GRADE_CST);
  if (at(thinner) > viscosityCst || at(thicker) < viscosityCst) {
    throw new TrackdayInputError(
      `no silicone grade between ${WALTHER_MIN_VISCOSITY_CST} and ${MAX_SILICONE_GRADE_CST} cSt has ` +
        `${viscosityCst} cSt at ${temperatureC} °C`,
    );
  }
  for (let step = 0; step < BISECTION_STEPS; step += 1) {
    const middle = (thinner + thicker) / 2;
    if (at(middle) < viscosityCst) thinner = middle;
    else thicker = middle;
  }
  return gradeOf((thinner + thicker) / 2);
}

function lineThroughGrade(gradeCst: number, b: number): WaltherLine {
  return { a: doubleLog(gradeCst) + b * Math.log10(celsiusToKelvin(SILICONE_GRADE_RATING_C)), b };
}
