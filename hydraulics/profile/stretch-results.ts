import { deratedPressureRatingPa } from '../catalogue/derating';
import type { PipeSpec } from '../catalogue/pipe-spec';
import { joukowskyHeadRise } from '../surge/joukowsky';
import { pressurePaToHeadM } from '../units';
import type { ProfileGrid } from './grid';
import type { StretchResult } from './result-types';
import type { StretchHydraulics } from './stretch-hydraulics';
import type { LineStretch } from './types';

/**
 * Allowable pressure head of a pipe: its rating derated for the water temperature, divided by the
 * safety factor, as head of water at that temperature, m.
 */
export function allowableHeadM(pipe: PipeSpec, temperatureC: number, safetyFactor: number): number {
  return pressurePaToHeadM(deratedPressureRatingPa(pipe, temperatureC) / safetyFactor, temperatureC);
}

/**
 * Per-stretch lengths, losses, ratings, surge and highest static pressure. The highest static
 * pressure counts the head ARRIVING at a break-pressure tank (value + drop at the point), which is
 * the highest the pipe above the tank sees; the tank's reset only acts downstream of it
 * (profile-and-checks.md §3.1).
 */
export function stretchResults(
  stretches: readonly LineStretch[],
  pipes: readonly PipeSpec[],
  grid: ProfileGrid,
  hydraulics: StretchHydraulics,
  staticPressureHeadM: Float64Array,
  temperatureC: number,
  safetyFactor: number,
  staticDropAtPointM: Float64Array | null = null,
): StretchResult[] {
  const count = stretches.length;
  const slopeLengthM = new Float64Array(count);
  const maxStatic = new Float64Array(count).fill(-Infinity);
  for (let j = 0; j < grid.pieceStretch.length; j++) {
    const s = grid.pieceStretch[j];
    slopeLengthM[s] += grid.pieceSlopeLengthM[j];
    const arriving = staticPressureHeadM[j + 1] + (staticDropAtPointM === null ? 0 : staticDropAtPointM[j + 1]);
    const high = Math.max(staticPressureHeadM[j], arriving);
    if (high > maxStatic[s]) maxStatic[s] = high;
  }
  return stretches.map((stretch, s) => ({
    index: s,
    pipe: pipes[s],
    fromM: stretch.fromM,
    toM: stretch.toM,
    slopeLengthM: slopeLengthM[s],
    velocityMs: hydraulics.velocityMs[s],
    frictionLossM: hydraulics.frictionGradient[s] * slopeLengthM[s],
    allowableHeadM: allowableHeadM(pipes[s], temperatureC, safetyFactor),
    surgeHeadM: joukowskyHeadRise({ waveSpeedMs: pipes[s].waveSpeedMs, velocityChangeMs: hydraulics.velocityMs[s] }),
    maxStaticPressureHeadM: maxStatic[s],
  }));
}
