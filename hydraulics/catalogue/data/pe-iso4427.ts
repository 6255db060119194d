/**
 * Metric polyethylene pressure pipe, ISO 4427-2 / EN 12201-2.
 *
 * Minimum wall thickness e (mm) by outside diameter and SDR, as in the standards' wall tables (ISO 4427-2 /
 * EN 12201-2, walls from the ISO 4065 thickness table) (core.md §2.4 [R32]). Stored, not recomputed: ISO 4065
 * takes S from the exact Renard series, so the nominal OD/SDR rounded up gives different numbers (110 mm
 * SDR 17: 6.6 mm in the table, 6.5 mm from 110/17); tests/hydraulics/catalogue/standard-walls.test.ts checks
 * every wall against the ISO 4065 rule. `null` = not listed.
 * The walls depend only on OD and SDR (pipe series S), so PE80 uses the same table (from memory).
 */
export const PE_ISO4427_SOURCE = 'ISO 4427-2 / EN 12201-2 wall table (walls per ISO 4065)';

export type IsoSdr = 17 | 13.6 | 11 | 9 | 7.4;
export const PE_ISO4427_SDRS: readonly IsoSdr[] = [17, 13.6, 11, 9, 7.4];

/** Design stress σ = MRS / C, MPa: PE100 10/1.25 = 8.0 (piping-world [R12]); PE80 6.3 (R20 value, from memory). */
export const PE_ISO4427_DESIGN_STRESS_MPA = { pe100: 8.0, pe80: 6.3 } as const;

export interface PeIso4427Row {
  outsideDiameterMm: number;
  /** How far the mean outside diameter may exceed the nominal one, mm (grade B, from memory, core.md §2.4). */
  outsideToleranceMm: number;
  /** Walls in the order of {@link PE_ISO4427_SDRS}: SDR 17, 13.6, 11, 9, 7.4. */
  wallMm: readonly [number | null, number | null, number | null, number | null, number | null];
}

export const PE_ISO4427_ROWS: readonly PeIso4427Row[] = [
  { outsideDiameterMm: 20, outsideToleranceMm: 0.3, wallMm: [null, null, 2.0, 2.3, 3.0] },
  { outsideDiameterMm: 25, outsideToleranceMm: 0.3, wallMm: [null, 2.0, 2.3, 3.0, 3.5] },
  { outsideDiameterMm: 32, outsideToleranceMm: 0.3, wallMm: [2.0, 2.4, 3.0, 3.6, 4.4] },
  { outsideDiameterMm: 40, outsideToleranceMm: 0.4, wallMm: [2.4, 3.0, 3.7, 4.5, 5.5] },
  { outsideDiameterMm: 50, outsideToleranceMm: 0.4, wallMm: [3.0, 3.7, 4.6, 5.6, 6.9] },
  { outsideDiameterMm: 63, outsideToleranceMm: 0.4, wallMm: [3.8, 4.7, 5.8, 7.1, 8.6] },
  { outsideDiameterMm: 75, outsideToleranceMm: 0.5, wallMm: [4.5, 5.6, 6.8, 8.4, 10.3] },
  { outsideDiameterMm: 90, outsideToleranceMm: 0.6, wallMm: [5.4, 6.7, 8.2, 10.1, 12.3] },
  { outsideDiameterMm: 110, outsideToleranceMm: 0.7, wallMm: [6.6, 8.1, 10.0, 12.3, 15.1] },
  { outsideDiameterMm: 125, outsideToleranceMm: 0.8, wallMm: [7.4, 9.2, 11.4, 14.0, 17.1] },
  { outsideDiameterMm: 160, outsideToleranceMm: 1.0, wallMm: [9.5, 11.8, 14.6, 17.9, 21.9] },
];

/**
 * Tolerance on the wall at any point, mm: 0.1·e + 0.1 rounded up to the next 0.1 mm (grade V, from
 * memory, core.md §2.4; the same rule as "max wall = 1.1 × min wall + 0.1" [R30]).
 */
export function isoWallToleranceMm(minimumWallMm: number): number {
  // Work in tenths of a millimetre so 0.1·e + 0.1 rounds up exactly (no floating-point creep past a step).
  return Math.ceil(Math.round((0.1 * minimumWallMm + 0.1) * 1e6) / 1e5) / 10;
}

/**
 * Bore of a pipe as made, mm: the mean outside diameter less twice the mean wall, each taken halfway
 * through its tolerance band (core.md §2.7). The minimum wall alone would overstate the bore.
 */
export function isoMeanBoreMm(outsideDiameterMm: number, outsideToleranceMm: number, minimumWallMm: number): number {
  const meanOutsideMm = outsideDiameterMm + outsideToleranceMm / 2;
  const meanWallMm = minimumWallMm + isoWallToleranceMm(minimumWallMm) / 2;
  return meanOutsideMm - 2 * meanWallMm;
}
