import type { LineStation } from '../../hydraulics/index';
import type { LineDesign } from '../validations/line-design';

/** Pipe a new line starts with: common 50 mm PE100 PN 16 rural supply pipe (common practice, no source). */
export const STARTING_PIPE_ID = 'pe100-iso4427-sdr11-50mm';

/**
 * A first design for a new line on its stations: source water at the first station's ground,
 * an outlet at the last station, the flow found by gravity, one stretch of the starting pipe and
 * the core's default settings. The designer changes it from there.
 */
export function startingDesign(stations: readonly LineStation[]): LineDesign {
  const first = stations[0];
  const last = stations[stations.length - 1];
  return {
    start: { kind: 'water-level', levelM: first.groundElevationM },
    end: { kind: 'outlet', elevationM: last.groundElevationM },
    flow: { kind: 'find' },
    stretches: [{ fromM: first.chainageM, toM: last.chainageM, pipe: STARTING_PIPE_ID }],
    fittings: [],
    devices: [],
    pipes: [],
    settings: {},
  };
}
