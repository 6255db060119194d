/**
 * Runnel's engineering core: the one public entry point. Pure functions, SI units inside
 * (m, m3/s, Pa, m of head, C). Bad input throws `HydraulicsInputError` (field + index).
 * Caution: pressure, rating and surge figures are estimates from published formulas; defer to
 * local codes, the pipe maker's data and licensed practice.
 */

// Errors and constants
export { HydraulicsInputError } from './errors';
export {
  GRAVITY_MS2,
  INCH_M,
  FOOT_M,
  POUND_KG,
  PSI_PA,
  BAR_PA,
  US_GALLON_M3,
  IMPERIAL_GALLON_M3,
  SECONDS_PER_DAY,
  STANDARD_ATMOSPHERE_PA,
  DEFAULT_WATER_TEMPERATURE_C,
  WATER_TEMPERATURE_MIN_C,
  WATER_TEMPERATURE_MAX_C,
} from './constants';

// Units and water properties
export {
  LENGTH_UNITS_M,
  FLOW_UNITS_M3S,
  PRESSURE_UNITS_PA,
  HEAD_UNITS_M,
  lengthToM,
  lengthFromM,
  flowToM3s,
  flowFromM3s,
  pressureToPa,
  pressureFromPa,
  headToM,
  headFromM,
  pressurePaToHeadM,
  headMToPressurePa,
  type LengthUnit,
  type FlowUnit,
  type PressureUnit,
  type HeadUnit,
} from './units';
export {
  waterDensityKgM3,
  waterDynamicViscosityPaS,
  waterKinematicViscosityM2s,
  waterVapourPressurePa,
  atmosphericPressurePa,
  atmosphericHeadM,
  vapourHeadM,
  type AtmosphericHeadOptions,
} from './water';

// Pipe catalogue and ratings
export {
  PIPE_CATALOGUE,
  PIPE_SERIES,
  PIPE_SERIES_IDS,
  findPipe,
  pipesOfSeries,
  assertPipeSpec,
  pressureRatingFromSdr,
  pressureRatingFromSidr,
  nominalPressureClass,
  ASTM_PRESSURE_CLASSES_PSI,
  ISO_PRESSURE_CLASSES_BAR,
  deratedPressureRatingPa,
  plasticDeratingFactor,
  ratingReferenceTemperatureC,
  kortewegWaveSpeedMs,
  WATER_BULK_MODULUS_PA,
  MATERIAL_GRADES,
  type MaterialGrade,
  type MaterialProperties,
  type PipeMaterial,
  type PipeSpec,
  type PipeSeries,
} from './catalogue/index';

// Friction
export {
  hazenWilliamsHeadLoss,
  hazenWilliamsFlowM3s,
  type HazenWilliamsOptions,
  type HazenWilliamsFlowOptions,
} from './friction/hazen-williams';
export { darcyWeisbachHeadLoss, darcyFrictionFactor, type DarcyWeisbachOptions } from './friction/darcy-weisbach';
export { colebrookFrictionFactor } from './friction/colebrook';
export { swameeJainFrictionFactor, type FrictionFactorOptions } from './friction/swamee-jain';
export {
  FITTING_LOSS_COEFFICIENTS,
  minorLossHeadM,
  totalLossCoefficient,
  suddenExpansionLossCoefficient,
  type FittingKind,
  type FittingCount,
  type FittingLossCoefficient,
  type MinorLossOptions,
  type SuddenExpansionOptions,
} from './friction/minor-losses';
export { pipeHeadLossM, type FrictionMethod, type PipeHeadLossOptions } from './friction/head-loss';
export {
  flowForHeadLoss,
  smallestPipeForFlow,
  type FlowForHeadLossOptions,
  type SmallestPipeOptions,
  type SmallestPipeResult,
} from './friction/inverse';
export { pipeAreaM2, meanVelocityMs } from './friction/pipe-flow';

// Surge
export {
  joukowskyHeadRise,
  criticalClosureTimeS,
  type JoukowskyOptions,
  type CriticalClosureOptions,
} from './surge/joukowsky';
export { seriesCriticalClosureTimeS, type SurgePipeRun } from './surge/series-closure-time';

// Line profile
export { analyzeProfile } from './profile/analyze-profile';
export { assertLineInput } from './profile/validate-line';
export {
  DEFAULT_LINE_SETTINGS,
  highLowToleranceM,
  resolveLineSettings,
  type ResolvedLineSettings,
} from './profile/settings';
export { profileRows, type ProfileRow } from './profile/rows';
export { findLimitRanges, type LimitRange, type LimitRangeArgs } from './profile/limit-zones';
export type {
  LineStation,
  LineStretch,
  LineFitting,
  LineDevice,
  LineDeviceKind,
  LineStart,
  LineEnd,
  LineFlow,
  LineFlowPiece,
  LineSettings,
  LineInput,
} from './profile/types';
export type {
  LineProfile,
  ProfilePoints,
  StretchResult,
  ReachResult,
  LineEndResult,
  LineTotals,
  PressureLimits,
  LimitKind,
  LimitZone,
  LimitCrossing,
} from './profile/result-types';

// Checks
export { analyzeLine, type LineAnalysis } from './checks/analyze-line';
export { findTurningPoints, type TurningPoints } from './checks/air-points';
export { PRESSURE_CAUTION } from './checks/wording';
export type { LineWarning, WarningValues, LineFix, WarningCode, WarningSeverity, WarningPlace } from './checks/types';

// Design helpers
export {
  planBreakPressureTanks,
  type TankPlanInput,
  type TankPlan,
  type PlannedTank,
} from './design/break-pressure-tanks';
export { suggestBreakPressureTanks } from './design/suggest-tanks';
export { suggestPipeUpsize, nextSizeInSeries, type PipeUpsize } from './design/upsize';
export { applyLineFixes } from './design/apply-fixes';

// Survey geometry, field-book reduction and clean-up proposals
export * from './survey/index';

// Daily demand, ram pump planning, storage sizing, source yield and seasonal upkeep
export * from './demand/index';
export * from './ram/index';
export * from './storage/index';
export * from './yield/index';
export * from './seasons/index';

// Networks: one model of the system (sources, tanks, take-offs, outlets, pipes and valves), solved
export * from './network/index';
