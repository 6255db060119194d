import type { PipeSpec } from '../catalogue/pipe-spec';
import type { FrictionMethod } from '../friction/head-loss';

export type { FrictionMethod };

/**
 * One surveyed station of the line. Chainage is the HORIZONTAL distance from the start of the line
 * (as a map or GPS track gives it); the friction length is the 3-D slope length of the pipe
 * between stations, computed from chainage and pipe elevation.
 */
export interface LineStation {
  /** Horizontal distance from the start of the line, m. Strictly increasing along the line. */
  chainageM: number;
  /** Ground elevation, m above the survey datum. */
  groundElevationM: number;
  /** Depth from ground to the pipe, m. @default settings.defaultCoverM */
  coverM?: number;
}

/**
 * A run of one pipe along the chainage. The stretches together must cover the line from the first
 * to the last station without gaps or overlaps.
 */
export interface LineStretch {
  /** Chainage where the stretch starts, m. */
  fromM: number;
  /** Chainage where the stretch ends, m (greater than `fromM`). */
  toM: number;
  /** The pipe itself, or the id of a pipe in `LineInput.pipes` or the pipe catalogue. */
  pipe: PipeSpec | string;
}

/** A local loss (bend, tee, valve, entrance, exit) at one chainage. */
export interface LineFitting {
  /** Chainage of the fitting, m. */
  chainageM: number;
  /** Loss coefficient K (dimensionless); head loss = K v^2 / 2g with the pipe velocity there. */
  k: number;
  /** Free label for reports, e.g. `gate valve`. */
  label?: string;
}

/** Kinds of device a line can carry at a chainage. */
export type LineDeviceKind = 'break-pressure-tank' | 'air-release-valve' | 'washout' | 'isolation-valve';

/**
 * A device on the line. A break-pressure tank resets the static line and the hydraulic grade
 * to its water level; the others are carried so the checks know which high and low points are
 * already served and where a valve can be shut.
 */
export interface LineDevice {
  kind: LineDeviceKind;
  /** Chainage of the device, m. */
  chainageM: number;
  /**
   * Water level of a break-pressure tank, m above datum.
   * @default the ground elevation at the tank's chainage
   */
  waterLevelM?: number;
  /** Free label for reports. */
  label?: string;
}

/** How the line is fed at chainage 0. */
export type LineStart =
  /** Free water surface of a source box, spring catchment or tank. */
  | { kind: 'water-level'; levelM: number }
  /**
   * A pump delivering into the line: `outletHeadM` is the hydraulic grade (m above datum) at the
   * pump outlet while delivering the flow; `shutoffHeadM` the grade with the line shut
   * (the static line), never below `outletHeadM`. @default the pipe at the pump plus 1.25 × the
   * pump's head above it (DEFAULT_SHUTOFF_TO_DUTY_HEAD)
   */
  | { kind: 'pump'; outletHeadM: number; shutoffHeadM?: number };

/** What the line must deliver into at its last station. */
export type LineEnd =
  /** A tap, trough valve or other outlet at `elevationM` that needs `residualHeadM` of pressure. */
  | { kind: 'outlet'; elevationM: number; residualHeadM?: number }
  /** An inlet discharging into a tank above its water, at `elevationM`. */
  | { kind: 'tank-inlet'; elevationM: number }
  /** The pipe simply runs out at the last station's pipe elevation. */
  | { kind: 'free-discharge' };

/** The flow from one chainage onwards, until the next piece (e.g. between two take-offs). */
export interface LineFlowPiece {
  /** Chainage where this flow starts, m (before the first piece the first flow applies). */
  fromM: number;
  /** Flow along the line from here, m3/s (>= 0). */
  flowM3s: number;
}

/** What flow to analyse. */
export type LineFlow =
  /** A chosen design flow, m3/s (>= 0). */
  | { kind: 'design'; flowM3s: number }
  /**
   * A flow per piece of the line, as a network gives it: the flow drops at every take-off. Pieces in
   * increasing `fromM`; every check runs with the flow of each piece.
   */
  | { kind: 'schedule'; pieces: readonly LineFlowPiece[] }
  /** The flow the line carries by gravity between its fixed ends. */
  | { kind: 'find' };

/** Settings of one analysis. Every field is optional; defaults are listed with their sources. */
export interface LineSettings {
  /**
   * @default 'darcy-weisbach' (Colebrook friction factor from each pipe's roughness): Hazen-Williams
   * with C = 150 predicts less friction than a smooth pipe in small bores (profile-and-checks.md §5.1)
   */
  frictionMethod?: FrictionMethod;
  /** Water temperature, C; used for viscosity, density, vapour pressure and pipe derating. @default 20 */
  waterTemperatureC?: number;
  /** Divides the (derated) pipe rating to give the allowable pressure. @default 1 */
  safetyFactor?: number;
  /** Self-cleaning minimum velocity, m/s. @default 0.7 (Jordan p.53 via ITACA [R1]) */
  velocityMinMs?: number;
  /** Maximum velocity, m/s. @default 3.0 (Jordan p.53 via ITACA [R1]) */
  velocityMaxMs?: number;
  /** Residual pressure head an outlet needs when its end condition does not say, m. @default 3 (Akvopedia [R2]) */
  minResidualHeadM?: number;
  /** Smallest rise/fall of the pipe profile that counts as a high or low point, m. @default 1 */
  airPointToleranceM?: number;
  /**
   * How far the surveyed heights along this line scatter about the real ground, m (see
   * `surveyHeightScatterM`). High and low points must stand out by more than this, limit zones
   * closer than it can resolve merge, and results within it of their limit say so.
   * @default 0 (heights taken as exact: a level book or hose level)
   */
  heightScatterM?: number;
  /**
   * Altitude of the site above sea level for atmospheric pressure, m.
   * @default the highest ground elevation of the line (only right when `heightDatum` is 'geodetic')
   */
  siteAltitudeM?: number;
  /**
   * Whether the stations' heights are above sea level ('geodetic': GPS, map) or on a datum the
   * surveyor chose ('assumed': a level book started at 100 m). On an assumed datum the highest ground
   * says nothing about the altitude, and the analysis warns until `siteAltitudeM` is given.
   * @default 'geodetic'
   */
  heightDatum?: 'geodetic' | 'assumed';
  /**
   * Practical limit of negative pressure head in a siphon, m (positive number).
   * @default 7.5 m at sea level ([R7]) scaled to the site's atmospheric head (`practicalSiphonLimitHeadM`)
   */
  siphonLimitHeadM?: number;
  /** Cover used for stations that give none, m. @default 0.75 (common burial practice, no source; see settings.ts) */
  defaultCoverM?: number;
  /**
   * Loss coefficient K of the pipe entrance where water leaves a free surface (the source at a water
   * level, each break-pressure tank). The velocity head v²/2g itself is always taken there as well.
   * @default 0.5 (sharp-edged entrance; profile-and-checks.md §5.2)
   */
  entranceLossK?: number;
  /** Check static pressure plus a sudden-stop surge against the ratings. @default true */
  checkSurge?: boolean;
}

/** Everything one line analysis needs. SI units throughout. */
export interface LineInput {
  /** At least two stations with strictly increasing chainage. */
  stations: readonly LineStation[];
  /** Pipe stretches covering the line exactly. */
  stretches: readonly LineStretch[];
  /** Local losses. @default [] */
  fittings?: readonly LineFitting[];
  /** Break-pressure tanks, air-release valves, washouts, isolation valves. @default [] */
  devices?: readonly LineDevice[];
  /** Custom pipes that stretches may name by id (searched before the catalogue). @default [] */
  pipes?: readonly PipeSpec[];
  start: LineStart;
  end: LineEnd;
  flow: LineFlow;
  settings?: LineSettings;
}
