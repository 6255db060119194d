import { HydraulicsInputError, type LineInput, type LineStation, type PipeSpec } from '../../../hydraulics/index';

/** A custom pipe with round numbers (invented test data, not a catalogue entry). */
export function testPipe(overrides: Partial<PipeSpec> = {}): PipeSpec {
  return {
    id: 'test-100mm',
    label: 'test pipe 100 mm',
    material: 'custom',
    nominalSize: '100 mm',
    outsideDiameterM: 0.11,
    insideDiameterM: 0.1,
    wallM: 0.005,
    pressureRatingPa: 2e6,
    hazenWilliamsC: 150,
    roughnessM: 1.5e-6,
    waveSpeedMs: 400,
    source: 'invented test pipe',
    ...overrides,
  };
}

/** Stations at the given chainages and ground elevations. */
export function stationsOf(points: readonly (readonly [number, number])[], coverM?: number): LineStation[] {
  return points.map(([chainageM, groundElevationM]) =>
    coverM === undefined ? { chainageM, groundElevationM } : { chainageM, groundElevationM, coverM },
  );
}

/**
 * A one-pipe line from a water level to free discharge at a design flow, the pipe laid on the ground (cover 0) so heads
 * read straight from the levels.
 */
export function simpleLine(
  points: readonly (readonly [number, number])[],
  levelM: number,
  flowM3s: number,
  pipe: PipeSpec = testPipe(),
): LineInput {
  const stations = stationsOf(points, 0);
  return {
    stations,
    stretches: [{ fromM: stations[0].chainageM, toM: stations[stations.length - 1].chainageM, pipe }],
    start: { kind: 'water-level', levelM },
    end: { kind: 'free-discharge' },
    flow: { kind: 'design', flowM3s },
  };
}

/** Runs `fn`, expects a HydraulicsInputError, and returns it for field/index assertions. */
export function inputErrorOf(fn: () => unknown): HydraulicsInputError {
  try {
    fn();
  } catch (error) {
    if (error instanceof HydraulicsInputError) return error;
    throw error;
  }
  throw new Error('expected a HydraulicsInputError, but nothing was thrown');
}
