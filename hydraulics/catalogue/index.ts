import { PE_D2239_SIDRS } from './data/pe-d2239';
import { PE_ISO4427_SDRS } from './data/pe-iso4427';
import { PVC_D2241_SDRS } from './data/pvc-d2241';
import { buildPeD2239Series, buildPeIso4427Series, buildPvcD2241Series, buildSteelSch40Series } from './build-series';
import type { PipeSeries } from './pipe-series';
import type { PipeSpec } from './pipe-spec';

export type { PipeMaterial, PipeSpec } from './pipe-spec';
export type { PipeSeries } from './pipe-series';
export { assertPipeSpec } from './guard';
export {
  pressureRatingFromSdr,
  pressureRatingFromSidr,
  nominalPressureClass,
  ASTM_PRESSURE_CLASSES_PSI,
  ISO_PRESSURE_CLASSES_BAR,
} from './pressure-rating';
export { deratedPressureRatingPa, plasticDeratingFactor, ratingReferenceTemperatureC } from './derating';
export { kortewegWaveSpeedMs, WATER_BULK_MODULUS_PA } from './wave-speed';
export { MATERIAL_GRADES, type MaterialGrade, type MaterialProperties } from './materials';

function frozenSeries(series: PipeSeries): PipeSeries {
  return Object.freeze({ ...series, pipes: Object.freeze(series.pipes.map((pipe) => Object.freeze({ ...pipe }))) });
}

/** Every catalogue series, in a stable order. Entries are frozen: copy before editing (e.g. into a custom pipe). */
export const PIPE_SERIES: readonly PipeSeries[] = Object.freeze(
  [
    ...PVC_D2241_SDRS.map(buildPvcD2241Series),
    ...PE_D2239_SIDRS.map(buildPeD2239Series),
    ...PE_ISO4427_SDRS.map((sdr) => buildPeIso4427Series('pe100', sdr)),
    ...PE_ISO4427_SDRS.map((sdr) => buildPeIso4427Series('pe80', sdr)),
    buildSteelSch40Series(),
  ].map(frozenSeries),
);

/** Every catalogue pipe. */
export const PIPE_CATALOGUE: readonly PipeSpec[] = Object.freeze(PIPE_SERIES.flatMap((series) => series.pipes));

const PIPES_BY_ID: ReadonlyMap<string, PipeSpec> = new Map(PIPE_CATALOGUE.map((pipe) => [pipe.id, pipe]));

/** The catalogue pipe with this id, or undefined. */
export function findPipe(id: string): PipeSpec | undefined {
  return PIPES_BY_ID.get(id);
}

/** Ids of all series, e.g. `pvc-d2241-sdr21`, `pe100-iso4427-sdr11`, `steel-sch40`. */
export const PIPE_SERIES_IDS: readonly string[] = PIPE_SERIES.map((series) => series.id);

/** Pipes of one series, smallest inside diameter first; empty for an unknown series id. */
export function pipesOfSeries(seriesId: string): readonly PipeSpec[] {
  const series = PIPE_SERIES.find((candidate) => candidate.id === seriesId);
  return series ? [...series.pipes].sort((a, b) => a.insideDiameterM - b.insideDiameterM) : [];
}
