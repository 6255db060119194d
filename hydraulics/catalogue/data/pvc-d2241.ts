/**
 * PVC pressure-rated pipe, SDR series, ASTM D2241 (IPS outside diameters).
 *
 * Outside diameters: ASTM D2241 Table 1 (IPS sizes; ½ in = 0.840 in) (core.md §2.2 [R13]). Average walls
 * (used for the flow diameter) are the standard's minimum wall plus half its wall tolerance: minimum wall
 * OD/SDR, not below 0.060 in; tolerance +12 % of the minimum, not below 0.020 in (ASTM D2241, core.md
 * §2.2 [R32]); tests/hydraulics/catalogue/standard-walls.test.ts checks every stored average against it.
 * Minimum walls are not stored: the builder applies the same rule.
 * SDR 13.5 is listed for ½ in only (availability from memory; no average wall published there).
 */
export const PVC_D2241_SOURCE =
  'ASTM D2241 (PVC1120, HDS 2000 psi); OD per Table 1; average wall = minimum wall + half the wall tolerance';

/** Hydrostatic design stress of PVC1120 / PVC1220 for water at 23 °C, psi (core.md §2.1). */
export const PVC_D2241_HDS_PSI = 2000;

export interface PvcD2241Row {
  /** Nominal pipe size, inches, as printed ("1-1/4"). */
  size: string;
  outsideDiameterIn: number;
  /** Average wall thickness per SDR, inches; a missing SDR is not made in that size. */
  averageWallIn: Readonly<Partial<Record<PvcSdr, number>>>;
}

export type PvcSdr = 13.5 | 17 | 21 | 26 | 32.5 | 41;
export const PVC_D2241_SDRS: readonly PvcSdr[] = [13.5, 17, 21, 26, 32.5, 41];

/** SDRs listed for a size without a published average wall (flow diameter from the minimum wall). */
export const PVC_D2241_MINIMUM_WALL_ONLY: Readonly<Record<string, readonly PvcSdr[]>> = { '1/2': [13.5] };

export const PVC_D2241_ROWS: readonly PvcD2241Row[] = [
  { size: '1/2', outsideDiameterIn: 0.84, averageWallIn: {} },
  { size: '3/4', outsideDiameterIn: 1.05, averageWallIn: { 21: 0.07, 17: 0.072 } },
  { size: '1', outsideDiameterIn: 1.315, averageWallIn: { 26: 0.07, 21: 0.073, 17: 0.087 } },
  { size: '1-1/4', outsideDiameterIn: 1.66, averageWallIn: { 32.5: 0.07, 26: 0.074, 21: 0.089, 17: 0.108 } },
  { size: '1-1/2', outsideDiameterIn: 1.9, averageWallIn: { 32.5: 0.07, 26: 0.083, 21: 0.1, 17: 0.122 } },
  { size: '2', outsideDiameterIn: 2.375, averageWallIn: { 32.5: 0.083, 26: 0.101, 21: 0.123, 17: 0.15 } },
  { size: '2-1/2', outsideDiameterIn: 2.875, averageWallIn: { 32.5: 0.098, 26: 0.12, 21: 0.147, 17: 0.179 } },
  { size: '3', outsideDiameterIn: 3.5, averageWallIn: { 41: 0.095, 32.5: 0.118, 26: 0.145, 21: 0.177, 17: 0.219 } },
  { size: '3-1/2', outsideDiameterIn: 4.0, averageWallIn: { 41: 0.108, 32.5: 0.133, 26: 0.164, 21: 0.202, 17: 0.249 } },
  { size: '4', outsideDiameterIn: 4.5, averageWallIn: { 41: 0.12, 32.5: 0.148, 26: 0.183, 21: 0.227, 17: 0.281 } },
  { size: '5', outsideDiameterIn: 5.563, averageWallIn: { 41: 0.146, 32.5: 0.182, 26: 0.228, 21: 0.281, 17: 0.347 } },
  { size: '6', outsideDiameterIn: 6.625, averageWallIn: { 41: 0.172, 32.5: 0.216, 26: 0.271, 21: 0.335, 17: 0.414 } },
  { size: '8', outsideDiameterIn: 8.625, averageWallIn: { 41: 0.223, 32.5: 0.281, 26: 0.352, 21: 0.435, 17: 0.539 } },
  { size: '10', outsideDiameterIn: 10.75, averageWallIn: { 41: 0.278, 32.5: 0.351, 26: 0.438, 21: 0.542, 17: 0.67 } },
  { size: '12', outsideDiameterIn: 12.75, averageWallIn: { 41: 0.33, 32.5: 0.416, 26: 0.52, 21: 0.643, 17: 0.795 } },
];
