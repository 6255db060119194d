import type { LineStation } from '../../hydraulics/index';
import { unitDefaults, type UnitSystem } from '../units/index';
import type { LineDesign } from '../validations/line-design';

/**
 * A first design for a new line on its stations: source water at the first station's ground,
 * an outlet at the last station, the flow found by gravity, one stretch of the project's starting pipe
 * (ISO in a metric project, ASTM in a US one) and the core's default settings, with the cover in round
 * feet for a US project (profile-and-checks.md §7.1). The designer changes it from there.
 */
export function startingDesign(stations: readonly LineStation[], system: UnitSystem = 'metric'): LineDesign {
  const defaults = unitDefaults(system);
  const first = stations[0];
  const last = stations[stations.length - 1];
  return {
    start: { kind: 'water-level', levelM: first.groundElevationM },
    end: { kind: 'outlet', elevationM: last.groundElevationM },
    flow: { kind: 'find' },
    stretches: [{ fromM: first.chainageM, toM: last.chainageM, pipe: defaults.linePipeId }],
    fittings: [],
    devices: [],
    pipes: [],
    settings: system === 'metric' ? {} : { defaultCoverM: defaults.coverM },
  };
}
