/**
 * Polyethylene controlled-inside-diameter pipe, SIDR series, ASTM D2239.
 *
 * The inside diameters are the Schedule 40 IDs, the same for every SIDR of a size (engineerfix,
 * Qualpol [R13]); the Schedule 40 ID values are from memory, confirmed for 1-2 in by a Sch 40 table
 * (core.md §2.3). Minimum wall = ID / SIDR with a 0.060 in floor (floor from memory), applied by
 * the builder.
 */
export const PE_D2239_SOURCE = 'ASTM D2239 (PE3408, HDS 800 psi); Schedule 40 inside diameters';

/**
 * Hydrostatic design stress, psi. PE3408/PE3608 (800 psi) is the conservative choice: it gives the
 * published SIDR 15 = 100 psi and SIDR 19 = 80 psi (Qualpol [R13]); PE4710 (1000 psi) would rate
 * the same pipe 25 % higher, and the grade of a pipe in the field is often unknown.
 */
export const PE_D2239_HDS_PSI = 800;

export type PeSidr = 7 | 9 | 11.5 | 15 | 19;
export const PE_D2239_SIDRS: readonly PeSidr[] = [7, 9, 11.5, 15, 19];

export interface PeD2239Row {
  size: string;
  insideDiameterIn: number;
}

export const PE_D2239_ROWS: readonly PeD2239Row[] = [
  { size: '1/2', insideDiameterIn: 0.622 },
  { size: '3/4', insideDiameterIn: 0.824 },
  { size: '1', insideDiameterIn: 1.049 },
  { size: '1-1/4', insideDiameterIn: 1.38 },
  { size: '1-1/2', insideDiameterIn: 1.61 },
  { size: '2', insideDiameterIn: 2.067 },
  { size: '2-1/2', insideDiameterIn: 2.469 },
  { size: '3', insideDiameterIn: 3.068 },
  { size: '4', insideDiameterIn: 4.026 },
  { size: '6', insideDiameterIn: 6.065 },
];
