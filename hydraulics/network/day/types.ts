import type { FrictionMethod } from '../../friction/head-loss';
import type { NetworkSolution, NetworkWarning } from '../types';

/** How to run a day of operation. */
export interface NetworkDayOptions {
  /** Time step, s. @default 3600 (hourly) */
  stepS?: number;
  /** Length of the run, s. @default 86400 (one day) */
  durationS?: number;
  /** Keep each step's full solution (heavy on large networks). @default true */
  keepSolutions?: boolean;
}

/** One time step: the demands used, the tank levels at its start and the solution. */
export interface NetworkDayStep {
  /** Start of the step from midnight, s. */
  timeS: number;
  /** Hour of the day whose demand pattern applies (0-23). */
  hour: number;
  /** Tank levels at the start of the step, m above datum. */
  tankLevelsM: Record<string, number>;
  /** Net flow into each tank during the step, m³/s (in minus out). */
  tankNetInflowM3s: Record<string, number>;
  /** Pressure head at each outlet, m. */
  outletPressureHeadsM: Record<string, number>;
  /** Flow drawn from each source, m³/s. */
  sourceDrawM3s: Record<string, number>;
  solution?: NetworkSolution;
}

/** A day of operation. */
export interface NetworkDayResult {
  /** The friction law every step was solved with. */
  frictionMethod: FrictionMethod;
  /** Whether entrance and velocity-head losses at free surfaces were counted. */
  freeSurfaceLosses: boolean;
  steps: NetworkDayStep[];
  /** Level of each tank at every step boundary (steps + 1 values), m. */
  tankLevelsM: Record<string, number[]>;
  /** Water each tank spilled over the run, m³. */
  tankOverflowM3: Record<string, number>;
  /** Demand each tank could not meet once empty, m³. */
  tankShortfallM3: Record<string, number>;
  /** Lowest pressure head each outlet saw and when, m. */
  outletLowestPressureHeadM: Record<string, { pressureHeadM: number; hour: number }>;
  warnings: NetworkWarning[];
}
