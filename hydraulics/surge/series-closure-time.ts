import { assertNonNegative, assertPositive } from '../input-guards';

/** One pipe of a series run, for the wave's travel time. */
export interface SurgePipeRun {
  /** Length of the run, m. */
  lengthM: number;
  /** Wave speed in it, m/s. */
  waveSpeedMs: number;
}

/**
 * Critical closure time of pipes in series, s: 2 * sum(L_i / a_i). For one pipe this is 2L/a;
 * for several it is the true round-trip time of the wave (an averaged `a` would misstate it).
 */
export function seriesCriticalClosureTimeS(runs: readonly SurgePipeRun[]): number {
  let travelS = 0;
  runs.forEach((run, i) => {
    assertNonNegative(run.lengthM, 'runs.lengthM', i);
    assertPositive(run.waveSpeedMs, 'runs.waveSpeedMs', i);
    travelS += run.lengthM / run.waveSpeedMs;
  });
  return 2 * travelS;
}
