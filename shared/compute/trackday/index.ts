/**
 * Track-day computations shared by the app and the API: lap statistics with crash laps set
 * aside, an A/B verdict between two runs, the lap CSV import, and silicone oil for today's
 * temperature. Pure functions; bad input throws {@link TrackdayInputError} with a message for people.
 */
export { TrackdayInputError } from './inputChecks';

export {
  meanOf,
  medianOf,
  sampleStandardDeviationOf,
  consistencyPercent,
  bestConsecutiveLaps,
  summarizeLaps,
} from './lapStatistics';
export type { BestConsecutiveLaps, LapStatistics, SummarizeLapsOptions } from './lapStatistics';

export {
  DEFAULT_SLOW_LAP_MAD_MULTIPLIER,
  DEFAULT_SLOW_LAP_MINIMUM_MARGIN_SECONDS,
  MAD_TO_STANDARD_DEVIATION,
  findSlowLaps,
  analyzeRun,
} from './lapOutliers';
export type { SlowLapRuleOptions, SlowLapFinding, AnalyzeRunOptions, RunAnalysis } from './lapOutliers';

export { studentTQuantile } from './studentT';
export { summarizeSample, welchTTest, pooledTTest } from './twoSampleTests';
export type { SampleSummary, TwoSampleTTest } from './twoSampleTests';
export { compareRuns, compareRunSummaries } from './runComparison';
export type { RunVerdict, RunComparison, CompareRunsOptions } from './runComparison';

export { MAX_LAP_SECONDS, parseLapTime, formatLapTime } from './lapTime';
export type { LapTimeParse } from './lapTime';
export { LAP_CSV_MAX_BYTES, LAP_CSV_MAX_ROWS, parseLapCsv } from './lapCsv';
export type { CsvLap, LapCsvRowError, LapCsvImport } from './lapCsv';

export {
  WALTHER_OFFSET_CST,
  WALTHER_MIN_VISCOSITY_CST,
  celsiusToKelvin,
  fitWaltherLine,
  viscosityAt,
  viscosityCurve,
} from './waltherViscosity';
export type { ViscosityPoint, WaltherLine, ViscosityCurveOptions } from './waltherViscosity';
export {
  SILICONE_GRADE_RATING_C,
  TYPICAL_SILICONE_VTC,
  MAX_SILICONE_GRADE_CST,
  siliconeOilLine,
  siliconeViscosityAt,
  siliconeOilCurve,
  siliconeGradeFor,
} from './siliconeOil';
export {
  SHOCK_OIL_GRADES_CST,
  DIFF_OIL_GRADES_CST,
  STANDARD_OIL_GRADES_CST,
  nearestOilGrade,
} from './oilGrades';
export { DEFAULT_COMPENSATION_FRACTION, recommendOilForTemperature } from './oilRecommendation';
export type {
  OilForTemperatureInput,
  OilGradeSuggestion,
  OilForTemperatureRecommendation,
} from './oilRecommendation';
