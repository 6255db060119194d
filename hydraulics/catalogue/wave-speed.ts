import { assertPositive } from '../input-guards';

/** Bulk modulus of water, Pa (≈2.19-2.2 GPa, from memory, core.md §5 [M]). */
export const WATER_BULK_MODULUS_PA = 2.19e9;
/** Water density used for wave speeds, kg/m³ (20 °C). */
const WAVE_DENSITY_KGM3 = 998.2;

/** Options for {@link kortewegWaveSpeedMs}. */
export interface WaveSpeedOptions {
  insideDiameterM: number;
  wallM: number;
  /** Elastic modulus of the pipe wall, Pa. */
  elasticModulusPa: number;
  /** @default 2.19e9 Pa */
  bulkModulusPa?: number;
  /** @default 998.2 kg/m³ */
  densityKgM3?: number;
  /**
   * Pipe support factor c₁ (1 = expansion joints throughout; 1 − ν² anchored throughout, Wylie &
   * Streeter 1993, from memory). @default 1, the form used by the AWWA/Uni-Bell/PPI plastic-pipe
   * formula a = 4660/√(1 + K(DR − 2)/E) ft/s (core.md §5).
   */
  supportFactor?: number;
}

/**
 * Pressure-wave speed in a water-filled elastic pipe, m/s (Korteweg thin-wall formula,
 * core.md §5): a = √(K/ρ) / √(1 + c₁ (K/E)(D/e)), with D the inside diameter, so that for
 * OD-based DR pipe D/e = DR − 2 (quickpipes PEX surge note [R14]).
 */
export function kortewegWaveSpeedMs({
  insideDiameterM,
  wallM,
  elasticModulusPa,
  bulkModulusPa = WATER_BULK_MODULUS_PA,
  densityKgM3 = WAVE_DENSITY_KGM3,
  supportFactor = 1,
}: WaveSpeedOptions): number {
  assertPositive(insideDiameterM, 'insideDiameterM');
  assertPositive(wallM, 'wallM');
  assertPositive(elasticModulusPa, 'elasticModulusPa');
  assertPositive(bulkModulusPa, 'bulkModulusPa');
  assertPositive(densityKgM3, 'densityKgM3');
  assertPositive(supportFactor, 'supportFactor');
  const soundSpeed = Math.sqrt(bulkModulusPa / densityKgM3);
  return soundSpeed / Math.sqrt(1 + supportFactor * (bulkModulusPa / elasticModulusPa) * (insideDiameterM / wallM));
}
