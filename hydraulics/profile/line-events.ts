import type { PointEvents } from './grade-lines';
import { pointIndexAt, type ProfileGrid } from './grid';
import type { LineInput } from './types';

/** A break-pressure tank placed on the line. */
export interface PlacedTank {
  chainageM: number;
  /** Water level, m above datum. */
  waterLevelM: number | undefined;
}

/** Break-pressure tanks of the input, in chainage order (level filled in once the grid exists). */
export function tanksOf(input: LineInput): PlacedTank[] {
  return (input.devices ?? [])
    .filter((device) => device.kind === 'break-pressure-tank')
    .map((device) => ({ chainageM: device.chainageM, waterLevelM: device.waterLevelM }))
    .sort((a, b) => a.chainageM - b.chainageM);
}

/** Chainages that must be profile points: inner stretch ends, fittings and tanks. */
export function eventChainages(input: LineInput, tanks: readonly PlacedTank[]): number[] {
  const out: number[] = [];
  for (let s = 0; s < input.stretches.length - 1; s++) out.push(input.stretches[s].toM);
  for (const fitting of input.fittings ?? []) out.push(fitting.chainageM);
  for (const tank of tanks) out.push(tank.chainageM);
  // Flow changes (take-offs) are profile points, so no piece of the grid straddles two flows.
  if (input.flow.kind === 'schedule') {
    const first = input.stations[0].chainageM;
    const last = input.stations[input.stations.length - 1].chainageM;
    for (const piece of input.flow.pieces) if (piece.fromM > first && piece.fromM < last) out.push(piece.fromM);
  }
  return out;
}

/**
 * Dense per-point K and tank levels. A tank without a stated level gets the ground elevation at
 * its chainage (a tank standing on the ground). Returns the tanks with their levels filled in.
 */
export function pointEvents(
  grid: ProfileGrid,
  input: LineInput,
  tanks: readonly PlacedTank[],
): { events: PointEvents; tanks: { chainageM: number; waterLevelM: number }[] } {
  const n = grid.chainageM.length;
  const kAtPoint = new Float64Array(n);
  const tankLevelAtPoint = new Float64Array(n).fill(Number.NaN);
  for (const fitting of input.fittings ?? []) kAtPoint[pointIndexAt(grid.chainageM, fitting.chainageM)] += fitting.k;
  const placed = tanks.map((tank) => {
    const point = pointIndexAt(grid.chainageM, tank.chainageM);
    const waterLevelM = tank.waterLevelM ?? grid.groundElevationM[point];
    // Two tanks at one point: the lower level governs, as it would on site.
    const existing = tankLevelAtPoint[point];
    tankLevelAtPoint[point] = existing === existing ? Math.min(existing, waterLevelM) : waterLevelM;
    return { chainageM: tank.chainageM, waterLevelM };
  });
  return { events: { kAtPoint, tankLevelAtPoint }, tanks: placed };
}
