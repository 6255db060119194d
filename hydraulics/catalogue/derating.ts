import { assertFiniteNumber, assertInRange } from '../input-guards';
import { assertPipeSpec } from './guard';
import type { PipeSpec } from './pipe-spec';

/**
 * Temperature derating of plastic pipe pressure ratings (core.md §2.1, §2.6).
 *
 * PVC: factors vs water temperature, ASTM D2241 appendix / PPFA, as listed by homesteady.com
 * "ASTM D2241 PVC pipe specifications" [R13]: 73 °F 1.00 … 140 °F 0.22 (the 140 °F value is
 * published there; the others are from memory [M]). Linear between points.
 *
 * PE: the factors of its own standard, EN 12201-1 Annex A / ISO 13761 (from memory [M]): 20 °C 1.00,
 * 30 °C 0.87, 40 °C 0.74, linear between, and no factor given above 40 °C. They are milder than the
 * PVC table and harsher than the AS/NZS 4130 re-rating table [R31], so the more cautious published
 * PE figures are used.
 *
 * Each table starts at its rating temperature (PVC 23 °C = 73 °F; PE 20 °C). A pipe rated at another
 * temperature (an ISO 20 °C PVC custom pipe, an ASTM 23 °C PE pipe) enters its table that many kelvin
 * further along, so derating starts at its own reference temperature.
 *
 * The temperature is that of the pipe wall, which may exceed the water's (pipe lying in the sun),
 * so it is accepted up to the end of each table (PVC 140 °F ≈ 60 °C, PE 40 °C) rather than stopping
 * at the 0-40 °C of the water-property correlations.
 */

const PVC_DERATING_BY_F: readonly (readonly [number, number])[] = [
  [73, 1.0],
  [80, 0.88],
  [90, 0.75],
  [100, 0.62],
  [110, 0.5],
  [120, 0.4],
  [130, 0.3],
  [140, 0.22],
];

/** ASTM rates at 23 °C (73.4 °F); the table's first point, printed as 73 °F, stands for it. */
const ASTM_REFERENCE_C = 23;
const ISO_REFERENCE_C = 20;
/** The same table with each point placed in °C relative to the 23 °C anchor. */
const PVC_DERATING_BY_C = PVC_DERATING_BY_F.map(([f, factor]) => [ASTM_REFERENCE_C + (f - 73) / 1.8, factor] as const);

/** PE factors of EN 12201-1 Annex A / ISO 13761, rated at 20 °C (from memory, core.md §2.6). */
const PE_DERATING_BY_C: readonly (readonly [number, number])[] = [
  [20, 1.0],
  [30, 0.87],
  [40, 0.74],
];

/** Which derating table a pipe material follows. */
export type DeratingTable = 'pvc' | 'pe';

const TABLES: Record<DeratingTable, { pointsC: readonly (readonly [number, number])[]; referenceC: number }> = {
  pvc: { pointsC: PVC_DERATING_BY_C, referenceC: ASTM_REFERENCE_C },
  pe: { pointsC: PE_DERATING_BY_C, referenceC: ISO_REFERENCE_C },
};

/** Rating temperature of a spec: 23 °C when its source names ASTM, otherwise 20 °C (the safer choice). */
export function ratingReferenceTemperatureC(spec: Pick<PipeSpec, 'source'>): number {
  return /\bASTM\b/.test(spec.source) ? ASTM_REFERENCE_C : ISO_REFERENCE_C;
}

/** Options for {@link plasticDeratingFactor}. */
export interface PlasticDeratingOptions {
  /**
   * Pipe wall temperature, °C, from 0 to the end of the table (PVC ≈60 °C for an ASTM rating; PE 40 °C for an ISO
   * rating).
   */
  temperatureC: number;
  /** Temperature the rating was printed for, °C. @default the table's own (PVC 23, PE 20) */
  referenceTemperatureC?: number;
  /** @default 'pvc' */
  table?: DeratingTable;
}

/** Fraction (0-1] of the printed rating a plastic pipe keeps at `temperatureC`. */
export function plasticDeratingFactor({
  temperatureC,
  referenceTemperatureC,
  table = 'pvc',
}: PlasticDeratingOptions): number {
  const { pointsC, referenceC } = TABLES[table];
  const reference = referenceTemperatureC ?? referenceC;
  assertInRange(reference, 'referenceTemperatureC', 0, ASTM_REFERENCE_C, '°C');
  const shiftC = referenceC - reference;
  const endC = pointsC[pointsC.length - 1][0];
  assertInRange(
    temperatureC,
    'temperatureC',
    0,
    endC - shiftC,
    '°C (the end of the derating table for this pipe and rating temperature)',
  );
  const equivalentC = temperatureC + shiftC;
  if (equivalentC <= pointsC[0][0]) return 1;
  for (let i = 1; i < pointsC.length; i += 1) {
    const [cHigh, factorHigh] = pointsC[i];
    if (equivalentC <= cHigh) {
      const [cLow, factorLow] = pointsC[i - 1];
      return factorLow + ((equivalentC - cLow) / (cHigh - cLow)) * (factorHigh - factorLow);
    }
  }
  return pointsC[pointsC.length - 1][1];
}

/**
 * Pressure rating of `spec` at pipe-wall temperature `temperatureC` (0 to the end of its table), Pa. Steel keeps its
 * rating over that range; PVC, PE and custom pipes (material unknown, so treated as plastic) are derated.
 * Caution: ratings are for water at steady pressure; surge, fittings and local codes may govern.
 */
export function deratedPressureRatingPa(spec: PipeSpec, temperatureC: number): number {
  assertPipeSpec(spec, 'pipe');
  assertFiniteNumber(temperatureC, 'temperatureC');
  if (spec.material === 'steel') return spec.pressureRatingPa;
  // PE follows its own standard's factors; PVC and pipes of unknown plastic the harsher PVC table.
  const table: DeratingTable = spec.material === 'pe' ? 'pe' : 'pvc';
  const factor = plasticDeratingFactor({
    temperatureC,
    referenceTemperatureC: ratingReferenceTemperatureC(spec),
    table,
  });
  return spec.pressureRatingPa * factor;
}
