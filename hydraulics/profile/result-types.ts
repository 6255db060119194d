import type { PipeSpec } from '../catalogue/pipe-spec';
import type { LimitRange } from './limit-zones';
import type { ResolvedLineSettings } from './settings';
import type { LineFlowPiece } from './types';

/**
 * Column arrays, one entry per profile point (survey stations plus inserted points, see
 * `ProfileGrid`). Typed arrays keep 100 000-point lines fast; `profileRows` builds objects.
 * Values at a point are those just DOWNSTREAM of it (after a fitting's loss or a tank's reset).
 */
export interface ProfilePoints {
  /** Horizontal chainage, m. */
  chainageM: Float64Array;
  /** Ground elevation, m. */
  groundElevationM: Float64Array;
  /** Pipe elevation (ground minus cover), m. */
  pipeElevationM: Float64Array;
  /** Static head line (no flow): the start level, reset by break-pressure tanks, m above datum. */
  staticHeadM: Float64Array;
  /** Hydraulic grade line while flowing, m above datum. */
  hydraulicGradeM: Float64Array;
  /** Pressure head while flowing = hydraulic grade minus pipe elevation, m (negative = suction). */
  pressureHeadM: Float64Array;
  /** Pressure head with no flow = static head minus pipe elevation, m. */
  staticPressureHeadM: Float64Array;
  /** Mean velocity in the pipe leaving the point, m/s. */
  velocityMs: Float64Array;
  /** Cumulative friction loss from the start, m. */
  frictionLossM: Float64Array;
  /** Cumulative fitting (minor) loss from the start, m. */
  minorLossM: Float64Array;
  /** Survey station index of each point, -1 for a point inserted at a stretch end, fitting or tank. */
  stationIndex: Int32Array;
  /** Stretch of the pipe leaving each point (the last point: the last stretch). */
  stretchIndex: Int32Array;
}

/** Per-stretch figures. */
export interface StretchResult {
  /** Stretch index in the input. */
  index: number;
  pipe: PipeSpec;
  fromM: number;
  toM: number;
  /** 3-D slope length of the pipe in the stretch (the length friction is computed on), m. */
  slopeLengthM: number;
  /** Mean velocity, m/s. */
  velocityMs: number;
  /** Friction loss over the whole stretch, m. */
  frictionLossM: number;
  /** Allowable pressure head: rating derated for temperature, divided by the safety factor, m. */
  allowableHeadM: number;
  /** Joukowsky head rise if the flow stopped suddenly, m. */
  surgeHeadM: number;
  /** Highest static pressure head inside the stretch, m. */
  maxStaticPressureHeadM: number;
}

/** Per-reach figures (start to first tank, tank to tank, last tank to end). */
export interface ReachResult {
  fromM: number;
  toM: number;
  /** Head at the reach start (start head or tank level), m. */
  startHeadM: number;
  /** Head needed at the reach end (next tank level or the end requirement), m. */
  requiredEndHeadM: number;
  /** Hydraulic grade arriving at the reach end before any tank reset, m. */
  arrivingHeadM: number;
  /** Flow this reach carries on its own head, m3/s. */
  capacityM3s: number;
  /** Critical closure time 2 * sum(L/a) of the reach, s. */
  criticalClosureTimeS: number;
}

/** What reaches the end of the line. */
export interface LineEndResult {
  /** Elevation of the outlet or inlet, m. */
  elevationM: number;
  /** Hydraulic grade at the end, m. */
  hydraulicGradeM: number;
  /** Residual pressure head at the end = grade minus elevation, m. */
  residualHeadM: number;
  /** Residual head the end needs, m. */
  targetResidualHeadM: number;
}

/** Sums along the line. Energy balance: start head - end grade = friction + minor + tank drops. */
export interface LineTotals {
  frictionLossM: number;
  minorLossM: number;
  /** Head dissipated in break-pressure tanks, m. */
  breakPressureDropM: number;
  /** Horizontal length (last minus first chainage), m. */
  horizontalLengthM: number;
  /** 3-D pipe length, m. */
  slopeLengthM: number;
}

/** Atmospheric limits used for suction checks, all as positive heads of water, m. */
export interface PressureLimits {
  siteAltitudeM: number;
  /** Where the altitude came from: stated in the settings, or taken from the line's highest ground. */
  siteAltitudeBasis: 'stated' | 'highest-ground';
  atmosphericHeadM: number;
  vapourHeadM: number;
  /** Deepest suction before the water boils: atmospheric minus vapour head, m. */
  vapourLimitHeadM: number;
  /** Practical siphon limit in use, m. */
  siphonLimitHeadM: number;
}

/** Which limit a zone passes. */
export type LimitKind =
  'negative-pressure' | 'siphon-limit' | 'vapour-limit' | 'static-over-rating' | 'surge-over-rating';

/** A chainage range where a limit is passed. */
export interface LimitZone extends LimitRange {
  kind: LimitKind;
}

/** One exact crossing of a limit (a zone's start or end inside the line). */
export interface LimitCrossing {
  kind: LimitKind;
  chainageM: number;
  /** True where the line enters the zone (moving with the flow), false where it leaves. */
  entering: boolean;
}

/** The line profile analysis. */
export interface LineProfile {
  /** Flow analysed, m3/s. */
  flowM3s: number;
  /** `design` when given (a single flow or a schedule), `found` when solved by gravity. */
  flowSource: 'design' | 'found';
  /** The flow per piece when the line was analysed with a schedule (`flowM3s` is then the flow at its start). */
  flowSchedule?: LineFlowPiece[];
  points: ProfilePoints;
  stretches: StretchResult[];
  reaches: ReachResult[];
  end: LineEndResult;
  totals: LineTotals;
  limits: PressureLimits;
  zones: LimitZone[];
  crossings: LimitCrossing[];
  /** Chainages and water levels of the break-pressure tanks used, in order. */
  tanks: { chainageM: number; waterLevelM: number }[];
  /** Settings with defaults filled in. */
  settings: ResolvedLineSettings & { siteAltitudeM: number; siphonLimitHeadM: number };
}
