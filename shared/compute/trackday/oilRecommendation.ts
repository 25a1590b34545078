import { TrackdayInputError, requireNumberInRange } from './inputChecks';
import { STANDARD_OIL_GRADES_CST, nearestOilGrade } from './oilGrades';
import { TYPICAL_SILICONE_VTC, siliconeGradeFor, siliconeViscosityAt } from './siliconeOil';

/**
 * How far racers go, in log viscosity, from the setup grade toward full compensation: half-way
 * (common practice, no source). Oil is not the only thing that changes with the cold, so matching
 * the viscosity exactly tends to over-correct.
 */
export const DEFAULT_COMPENSATION_FRACTION = 0.5;

/** What worked, when it worked, and today's conditions. */
export interface OilForTemperatureInput {
  /** Grade of the silicone oil in the setup, cSt at 25 °C. */
  setupGradeCst: number;
  /** Track temperature when the setup worked, °C: a stand-in for the oil's own temperature. */
  setupTemperatureC: number;
  /** Track temperature today, °C. */
  todayTemperatureC: number;
  /** 0 keeps the setup grade, 1 is full compensation; default {@link DEFAULT_COMPENSATION_FRACTION}. */
  compensationFraction?: number;
  /** Default {@link TYPICAL_SILICONE_VTC}. */
  viscosityTemperatureCoefficient?: number;
  /** Grades to snap to, cSt; default every standard shock and diff grade. */
  availableGradesCst?: readonly number[];
}

/** One suggested oil. */
export interface OilGradeSuggestion {
  /** The grade the model asks for, cSt at 25 °C, before snapping. */
  exactGradeCst: number;
  /** The nearest grade in the list, cSt at 25 °C. */
  nearestGradeCst: number;
  /** What the nearest grade's viscosity will be today, cSt. */
  nearestGradeViscosityTodayCst: number;
}

/** Two answers to "which oil today?": the model's and the racers' half-way rule. */
export interface OilForTemperatureRecommendation {
  /** What the setup oil's viscosity was on the day it worked, cSt. */
  setupViscosityThenCst: number;
  /** What the same oil's viscosity is today, cSt. */
  setupViscosityTodayCst: number;
  /** The grade whose viscosity today equals the setup oil's on the day it worked. */
  fullCompensation: OilGradeSuggestion;
  /** Part of the way from the setup grade to full compensation, in log viscosity. */
  partialCompensation: OilGradeSuggestion & { fraction: number };
}

const TRACK_TEMPERATURE_MIN_C = -30;
const TRACK_TEMPERATURE_MAX_C = 70;

/**
 * Which silicone oil to run today so that a setup found at another temperature feels the same:
 * full compensation matches viscosity exactly; partial compensation moves `compensationFraction`
 * of the way there in log viscosity. Both are snapped to the nearest grade available.
 */
export function recommendOilForTemperature(input: OilForTemperatureInput): OilForTemperatureRecommendation {
  if (typeof input !== 'object' || input === null) {
    throw new TrackdayInputError('the oil question needs a setup grade and two temperatures');
  }
  const { setupGradeCst, availableGradesCst = STANDARD_OIL_GRADES_CST } = input;
  const setupTemperatureC = trackTemperature(input.setupTemperatureC, 'setup track temperature (°C)');
  const todayTemperatureC = trackTemperature(input.todayTemperatureC, "today's track temperature (°C)");
  const fraction = requireNumberInRange(
    input.compensationFraction ?? DEFAULT_COMPENSATION_FRACTION,
    'compensation fraction',
    0,
    1,
  );
  const vtc = input.viscosityTemperatureCoefficient ?? TYPICAL_SILICONE_VTC;

  const setupViscosityThenCst = siliconeViscosityAt(setupGradeCst, setupTemperatureC, vtc);
  const setupViscosityTodayCst = siliconeViscosityAt(setupGradeCst, todayTemperatureC, vtc);
  const fullGradeCst = siliconeGradeFor(setupViscosityThenCst, todayTemperatureC, vtc);
  const partialGradeCst = setupGradeCst * (fullGradeCst / setupGradeCst) ** fraction;
  const suggest = (exactGradeCst: number): OilGradeSuggestion => {
    const nearestGradeCst = nearestOilGrade(exactGradeCst, availableGradesCst);
    return {
      exactGradeCst,
      nearestGradeCst,
      nearestGradeViscosityTodayCst: siliconeViscosityAt(nearestGradeCst, todayTemperatureC, vtc),
    };
  };
  return {
    setupViscosityThenCst,
    setupViscosityTodayCst,
    fullCompensation: suggest(fullGradeCst),
    partialCompensation: { ...suggest(partialGradeCst), fraction },
  };
}

function trackTemperature(value: number, what: string): number {
  return requireNumberInRange(value, what, TRACK_TEMPERATURE_MIN_C, TRACK_TEMPERATURE_MAX_C);
}
