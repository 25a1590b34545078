/**
 * The arithmetic of RC setup sheets, shared by client and server: gearing, gear geometry, toe,
 * units and plausibility warnings. Pure functions over SI-ish stored values (mm, degrees, teeth,
 * °C); every function throws a RangeError naming the argument instead of returning NaN or
 * Infinity.
 */
export {
  computeElectricTopSpeedKmh,
  computeFinalDriveRatio,
  computeGearRatio,
  computeInternalDiffRatio,
  computeNoLoadMotorRpm,
  computeRolloutMm,
  computeTopSpeedKmh,
  kmhToMetresPerSecond,
  metresPerSecondToKmh,
  type DiffGearing,
  type SpurGearing,
} from './gearing';
export { computeCentreDistanceChangeMm, computeCentreDistanceMm, computePitchDiameterMm } from './gearGeometry';
export { computeTotalRearToeDeg, type RearToeAngles } from './toe';
export { MM_PER_INCH, celsiusToFahrenheit, fahrenheitToCelsius, inchesToMm, mmToInches } from './units';
export {
  displayUnitLabel,
  formatForDisplay,
  parseFromDisplay,
  type ConvertedKind,
  type DisplayValue,
  type LengthUnit,
  type TemperatureUnit,
  type UnitKind,
  type UnitPreferences,
} from './display';
export { PLAUSIBLE_RIDE_HEIGHT_MM, checkRideHeightPlausibility, type RangeMm } from './plausibility';
export { computeSetupSummary, SUMMARY_KEYS, type SetupSummaryFigures, type SummaryFigure } from './summary';
export { diffSetupValues, type FieldChange } from './diff';
export {
  compareSheets,
  OTHER_SECTION,
  type ComparedSheet,
  type CompareRow,
  type CompareSection,
  type ComputedRow,
  type ComputedUnit,
  type OneSideField,
  type SheetComparison,
} from './compare';
export { applyDiff, applyMerge, threeWayMerge, upstreamChanges, type FieldMerge, type MergeChoice, type MergeStatus } from './merge';
export {
  applyStockFork,
  forkCompatible,
  planStockFork,
  type DroppedRow,
  type FilledFromStockRow,
  type OptionPartRow,
  type StockForkInput,
  type StockForkPlan,
} from './stockFork';
