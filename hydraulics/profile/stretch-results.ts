import { deratedPressureRatingPa } from '../catalogue/derating';
import type { PipeSpec } from '../catalogue/pipe-spec';
import { joukowskyHeadRise } from '../surge/joukowsky';
import { pressurePaToHeadM } from '../units';
import type { PointDrops } from './grade-lines';
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
  staticDrops: PointDrops | null = null,
): StretchResult[] {
  const count = stretches.length;
  const slopeLengthM = new Float64Array(count);
  const maxStatic = new Float64Array(count).fill(-Infinity);
  const { pieceStretch, pieceSlopeLengthM } = grid;
  // Running sums in locals, stored when the stretch changes: a sum kept in the array itself is
  // a store and a load of one slot at every point, each waiting on the last.
  let s = pieceStretch.length > 0 ? pieceStretch[0] : 0;
  let length = 0;
  let high = -Infinity;
  const dropPoints = staticDrops?.points ?? [];
  let e = 0;
  while (e < dropPoints.length && dropPoints[e] < 1) e++;
  for (let j = 0; j < pieceStretch.length; j++) {
    if (pieceStretch[j] !== s) {
      slopeLengthM[s] += length;
      if (high > maxStatic[s]) maxStatic[s] = high;
      s = pieceStretch[j];
      length = 0;
      high = -Infinity;
    }
    length += pieceSlopeLengthM[j];
    let arriving = staticPressureHeadM[j + 1];
    if (e < dropPoints.length && dropPoints[e] === j + 1) arriving += staticDrops!.staticM[e++];
    const leaving = staticPressureHeadM[j];
    if (leaving > high) high = leaving;
    if (arriving > high) high = arriving;
  }
  if (pieceStretch.length > 0) {
    slopeLengthM[s] += length;
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
