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
 * The event points of the line: fittings' K and tank levels by grid point. A tank without a
 * stated level gets the ground elevation at its chainage (a tank standing on the ground). Returns
 * the tanks with their levels filled in.
 */
export function pointEvents(
  grid: ProfileGrid,
  input: LineInput,
  tanks: readonly PlacedTank[],
): { events: PointEvents; tanks: { chainageM: number; waterLevelM: number }[] } {
  const byPoint = new Map<number, { k: number; tankLevelM: number }>();
  const eventAt = (point: number) => {
    let event = byPoint.get(point);
    if (event === undefined) {
      event = { k: 0, tankLevelM: Number.NaN };
      byPoint.set(point, event);
    }
    return event;
  };
  for (const fitting of input.fittings ?? []) eventAt(pointIndexAt(grid.chainageM, fitting.chainageM)).k += fitting.k;
  const placed = tanks.map((tank) => {
    const point = pointIndexAt(grid.chainageM, tank.chainageM);
    const waterLevelM = tank.waterLevelM ?? grid.groundElevationM[point];
    // Two tanks at one point: the lower level governs, as it would on site.
    const event = eventAt(point);
    event.tankLevelM = event.tankLevelM === event.tankLevelM ? Math.min(event.tankLevelM, waterLevelM) : waterLevelM;
    return { chainageM: tank.chainageM, waterLevelM };
  });
  const points = [...byPoint.keys()].sort((a, b) => a - b);
  return {
    events: {
      points,
      kAt: points.map((point) => byPoint.get(point)!.k),
      tankLevelM: points.map((point) => byPoint.get(point)!.tankLevelM),
    },
    tanks: placed,
  };
}

/** Adds K at a point, making it an event point when it is not one yet. */
export function addKAtPoint(events: PointEvents, point: number, k: number): void {
  let e = 0;
  while (e < events.points.length && events.points[e] < point) e++;
  if (events.points[e] !== point) {
    events.points.splice(e, 0, point);
    events.kAt.splice(e, 0, 0);
    events.tankLevelM.splice(e, 0, Number.NaN);
  }
  events.kAt[e] += k;
}
