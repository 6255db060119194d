import { assertFiniteNumber, assertInRange } from '../input-guards';
import { assertPipeSpec } from './guard';
import type { PipeSpec } from './pipe-spec';

/**
 * Temperature derating of plastic pipe pressure ratings.
 *
 * Factors vs water temperature for PVC, ASTM D2241 appendix / PPFA, as listed by homesteady.com
 * "ASTM D2241 PVC pipe specifications" [R13]: 73 °F 1.00 … 140 °F 0.22 (the 140 °F value is
 * published there; the others are from memory, core.md §2.1 [M]). Linear between points.
 *
 * PE uses the same table: Utah State Univ., Sprinkle & Trickle Irrigation Lectures, Lecture 21 [R13]:
 * "at about 43 °C the PVC rating drops to one-half …, almost the same for PE". ISO 13761 factors for
 * PE100 (0.87 at 30 °C, 0.74 at 40 °C, from memory) are milder, so this choice errs on the safe side.
 *
 * The table is anchored at the ASTM rating temperature (23 °C = 73 °F). A pipe rated at 20 °C (ISO
 * 4427 / EN 12201, and custom pipes whose source does not name ASTM) is entered `23 − 20 = 3 K`
 * further along the table, so derating starts at its own reference temperature.
 *
 * The temperature is that of the pipe wall, which may exceed the water's (pipe lying in the sun),
 * so it is accepted up to the end of the table (140 °F ≈ 60 °C) rather than the 0-40 °C of the
 * water-property correlations.
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
const TABLE_END_C = PVC_DERATING_BY_C[PVC_DERATING_BY_C.length - 1][0];

/** Rating temperature of a spec: 23 °C when its source names ASTM, otherwise 20 °C (the safer choice). */
export function ratingReferenceTemperatureC(spec: Pick<PipeSpec, 'source'>): number {
  return /\bASTM\b/.test(spec.source) ? ASTM_REFERENCE_C : ISO_REFERENCE_C;
}

/** Options for {@link plasticDeratingFactor}. */
export interface PlasticDeratingOptions {
  /** Pipe wall temperature, °C, from 0 to the end of the table (≈60 °C, 140 °F, for an ASTM rating). */
  temperatureC: number;
  /** Temperature the rating was printed for, °C. @default 23 (ASTM) */
  referenceTemperatureC?: number;
}

/** Fraction (0-1] of the printed rating a plastic pipe keeps at `temperatureC`. */
export function plasticDeratingFactor({ temperatureC, referenceTemperatureC = ASTM_REFERENCE_C }: PlasticDeratingOptions): number {
  assertInRange(referenceTemperatureC, 'referenceTemperatureC', 0, ASTM_REFERENCE_C, '°C');
  const shiftC = ASTM_REFERENCE_C - referenceTemperatureC;
  assertInRange(temperatureC, 'temperatureC', 0, TABLE_END_C - shiftC, '°C (the end of the derating table for this rating temperature)');
  const equivalentC = temperatureC + shiftC;
  if (equivalentC <= PVC_DERATING_BY_C[0][0]) return 1;
  for (let i = 1; i < PVC_DERATING_BY_C.length; i += 1) {
    const [cHigh, factorHigh] = PVC_DERATING_BY_C[i];
    if (equivalentC <= cHigh) {
      const [cLow, factorLow] = PVC_DERATING_BY_C[i - 1];
      return factorLow + ((equivalentC - cLow) / (cHigh - cLow)) * (factorHigh - factorLow);
    }
  }
  return PVC_DERATING_BY_C[PVC_DERATING_BY_C.length - 1][1];
}

/**
 * Pressure rating of `spec` at pipe-wall temperature `temperatureC` (0 to ≈60 °C), Pa. Steel keeps its
 * rating over that range; PVC, PE and custom pipes (material unknown, so treated as plastic) are derated.
 * Caution: ratings are for water at steady pressure; surge, fittings and local codes may govern.
 */
export function deratedPressureRatingPa(spec: PipeSpec, temperatureC: number): number {
  assertPipeSpec(spec, 'pipe');
  assertFiniteNumber(temperatureC, 'temperatureC');
  if (spec.material === 'steel') return spec.pressureRatingPa;
  const factor = plasticDeratingFactor({ temperatureC, referenceTemperatureC: ratingReferenceTemperatureC(spec) });
  return spec.pressureRatingPa * factor;
}
