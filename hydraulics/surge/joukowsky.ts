import { GRAVITY_MS2 } from '../constants';
import { assertFiniteNumber, assertNonNegative, assertPositive } from '../input-guards';

/** Options of `joukowskyHeadRise`. */
export interface JoukowskyOptions {
  /** Pressure-wave speed in the pipe, m/s (> 0). */
  waveSpeedMs: number;
  /** Sudden change of mean velocity, m/s (its size is used; a stop from v is a change of v). */
  velocityChangeMs: number;
}

/**
 * Joukowsky head rise for a sudden velocity change, m: dH = a * dV / g (Pumps & Systems, J. Evans,
 * "Water Hammer: What & Why", Sept 2017 [R14]). It is the full rise of a closure faster than the
 * critical time 2L/a. Caution: a surge estimate, not a transient analysis; defer to local codes and
 * the pipe maker's data.
 */
export function joukowskyHeadRise({ waveSpeedMs, velocityChangeMs }: JoukowskyOptions): number {
  assertPositive(waveSpeedMs, 'waveSpeedMs');
  assertFiniteNumber(velocityChangeMs, 'velocityChangeMs');
  return (waveSpeedMs * Math.abs(velocityChangeMs)) / GRAVITY_MS2;
}

/** Options of `criticalClosureTimeS`. */
export interface CriticalClosureOptions {
  /** Pipe length from the closing valve back to the free water surface, m (>= 0). */
  lengthM: number;
  /** Pressure-wave speed, m/s (> 0). */
  waveSpeedMs: number;
}

/**
 * Critical closure time 2L/a, s: the wave's round trip from the valve to the reservoir and back
 * (Pumps & Systems [R14]). A valve shut faster than this sees the full Joukowsky rise.
 */
export function criticalClosureTimeS({ lengthM, waveSpeedMs }: CriticalClosureOptions): number {
  assertNonNegative(lengthM, 'lengthM');
  assertPositive(waveSpeedMs, 'waveSpeedMs');
  return (2 * lengthM) / waveSpeedMs;
}
