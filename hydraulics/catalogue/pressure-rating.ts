import { HydraulicsInputError } from '../errors';
import { assertPositive } from '../input-guards';

/** Options for {@link pressureRatingFromSdr}. */
export interface SdrRatingOptions {
  /** Standard dimension ratio, outside diameter / minimum wall (> 1). */
  sdr: number;
  /** Hydrostatic design stress (ASTM HDS, or ISO design stress σ = MRS / C), Pa. */
  designStressPa: number;
}

/** Options for {@link pressureRatingFromSidr}. */
export interface SidrRatingOptions {
  /** Inside-diameter dimension ratio, inside diameter / minimum wall (> 0). */
  sidr: number;
  designStressPa: number;
}

/**
 * Pressure rating of OD-controlled plastic pipe, Pa: P = 2S / (SDR − 1)
 * (ISO 161-1 / ASTM "ISO equation"; ISO 4427 writes PN = 20σ / (SDR − 1) in bar with σ in MPa).
 */
export function pressureRatingFromSdr({ sdr, designStressPa }: SdrRatingOptions): number {
  assertPositive(designStressPa, 'designStressPa');
  assertPositive(sdr, 'sdr');
  if (sdr <= 2) throw new HydraulicsInputError('sdr', `must be greater than 2 for a thin-wall rating, got ${sdr}`);
  return (2 * designStressPa) / (sdr - 1);
}

/** Pressure rating of ID-controlled plastic pipe (ASTM D2239), Pa: P = 2S / (SIDR + 1). */
export function pressureRatingFromSidr({ sidr, designStressPa }: SidrRatingOptions): number {
  assertPositive(designStressPa, 'designStressPa');
  assertPositive(sidr, 'sidr');
  return (2 * designStressPa) / (sidr + 1);
}

/** Options for {@link nominalPressureClass}. */
export interface PressureClassOptions {
  /** Rating from the formula, in the unit of `classes` (psi for ASTM, bar for ISO). */
  computed: number;
  /** The standard's printed classes, ascending. */
  classes: readonly number[];
  /**
   * Largest relative amount the printed class may exceed the formula value (@default 0).
   * ISO 4427 / EN 12201 print PN rounded to the nearest class (PE80 SDR 9: 15.75 → PN 16), so
   * their series pass 0.02; ASTM classes never exceed the formula (SDR 13.5: 320 → 315 psi).
   */
  maxRoundUp?: number;
}

/**
 * The printed pressure class a formula rating is sold under: the largest class not above
 * `computed × (1 + maxRoundUp)`. Throws when the formula value is below the smallest class.
 */
export function nominalPressureClass({ computed, classes, maxRoundUp = 0 }: PressureClassOptions): number {
  assertPositive(computed, 'computed');
  const ceiling = computed * (1 + maxRoundUp) * (1 + 1e-9);
  let chosen: number | undefined;
  for (const pressureClass of classes) if (pressureClass <= ceiling) chosen = pressureClass;
  if (chosen === undefined) {
    throw new HydraulicsInputError('computed', `${computed} is below the smallest printed class ${classes[0]}`);
  }
  return chosen;
}

/** ASTM pressure classes for plastic pipe, psi (ASTM D2241 / D2239 printed ratings, R10 series). */
export const ASTM_PRESSURE_CLASSES_PSI = [50, 63, 80, 100, 125, 160, 200, 250, 315, 400] as const;
/** ISO 4427 / EN 12201 nominal pressures, bar. */
export const ISO_PRESSURE_CLASSES_BAR = [3.2, 4, 5, 6, 6.3, 8, 10, 12.5, 16, 20, 25, 32] as const;
