import type { LineInput, LineStation } from '../../hydraulics/index';
import type { LineDesign } from '../validations/line-design';

/** The engineering core's input for a saved design on its stations (map positions dropped). */
export function lineInputOf(design: LineDesign, stations: readonly LineStation[]): LineInput {
  return {
    stations: stations.map((s) => (s.coverM === undefined ? { chainageM: s.chainageM, groundElevationM: s.groundElevationM } : { chainageM: s.chainageM, groundElevationM: s.groundElevationM, coverM: s.coverM })),
    stretches: design.stretches,
    fittings: design.fittings,
    devices: design.devices,
    pipes: design.pipes,
    start: design.start,
    end: design.end,
    flow: design.flow,
    settings: design.settings,
  };
}

/** The design parts a one-click fix may change, taken back from a fixed core input. */
export function designWithInput(design: LineDesign, input: LineInput): LineDesign {
  return { ...design, stretches: [...input.stretches], devices: [...(input.devices ?? [])] };
}
