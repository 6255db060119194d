import type { PipeSpec } from '../catalogue/pipe-spec';
import type { ProfileGrid } from './grid';
import { stretchHydraulics, type StretchHydraulics } from './stretch-hydraulics';
import type { FrictionMethod, LineFlowPiece } from './types';

/** Flow at a chainage: the last piece starting at or before it (the first piece before them all). */
export function flowAtChainage(pieces: readonly LineFlowPiece[], chainageM: number): number {
  let flow = pieces[0].flowM3s;
  for (const piece of pieces) {
    if (piece.fromM <= chainageM) flow = piece.flowM3s;
    else break;
  }
  return flow;
}

/** Hydraulics per segment (a stretch within one piece of the schedule) and the stretch summaries. */
export interface ScheduledHydraulics {
  /** Segment of each grid piece (used in place of the stretch index for losses). */
  pieceSegment: Int32Array;
  /** Velocity, velocity head and friction gradient per segment. */
  segments: StretchHydraulics;
  /**
   * Per stretch: the velocity of its fastest segment (for the velocity and surge checks) and the
   * friction gradient that gives its total friction loss over its slope length.
   */
  stretches: StretchHydraulics;
  /** Largest flow anywhere on the line, m³/s. */
  maxFlowM3s: number;
}

/**
 * Hydraulics for a line whose flow changes along it (a network's take-offs): every grid piece gets
 * the flow of the schedule piece it lies in, so friction, fitting losses and velocities follow the
 * flow of each piece. The schedule's chainages are grid points, so no grid piece straddles two flows.
 */
export function scheduledHydraulics(
  grid: ProfileGrid,
  pipes: readonly PipeSpec[],
  pieces: readonly LineFlowPiece[],
  method: FrictionMethod,
  temperatureC: number,
): ScheduledHydraulics {
  const count = grid.pieceStretch.length;
  const pieceSegment = new Int32Array(count);
  const keys = new Map<string, number>();
  const segmentStretch: number[] = [];
  const segmentFlow: number[] = [];
  for (let j = 0; j < count; j++) {
    const flow = flowAtChainage(pieces, 0.5 * (grid.chainageM[j] + grid.chainageM[j + 1]));
    const s = grid.pieceStretch[j];
    const key = `${s}:${flow}`;
    let segment = keys.get(key);
    if (segment === undefined) {
      segment = segmentStretch.length;
      keys.set(key, segment);
      segmentStretch.push(s);
      segmentFlow.push(flow);
    }
    pieceSegment[j] = segment;
  }
  const segments: StretchHydraulics = {
    velocityMs: new Float64Array(segmentStretch.length),
    velocityHeadM: new Float64Array(segmentStretch.length),
    frictionGradient: new Float64Array(segmentStretch.length),
  };
  segmentStretch.forEach((s, g) => {
    const one = stretchHydraulics([pipes[s]], segmentFlow[g], method, temperatureC);
    segments.velocityMs[g] = one.velocityMs[0];
    segments.velocityHeadM[g] = one.velocityHeadM[0];
    segments.frictionGradient[g] = one.frictionGradient[0];
  });
  const stretchCount = pipes.length;
  const stretches: StretchHydraulics = {
    velocityMs: new Float64Array(stretchCount),
    velocityHeadM: new Float64Array(stretchCount),
    frictionGradient: new Float64Array(stretchCount),
  };
  const friction = new Float64Array(stretchCount);
  const length = new Float64Array(stretchCount);
  for (let j = 0; j < count; j++) {
    const s = grid.pieceStretch[j];
    const g = pieceSegment[j];
    friction[s] += segments.frictionGradient[g] * grid.pieceSlopeLengthM[j];
    length[s] += grid.pieceSlopeLengthM[j];
    if (Math.abs(segments.velocityMs[g]) > Math.abs(stretches.velocityMs[s])) {
      stretches.velocityMs[s] = segments.velocityMs[g];
      stretches.velocityHeadM[s] = segments.velocityHeadM[g];
    }
  }
  for (let s = 0; s < stretchCount; s++) stretches.frictionGradient[s] = length[s] > 0 ? friction[s] / length[s] : 0;
  return { pieceSegment, segments, stretches, maxFlowM3s: Math.max(0, ...segmentFlow) };
}
