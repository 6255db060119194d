/**
 * Steel pipe, Schedule 40, ASME B36.10M (core.md §2.5: from memory, inside diameters confirmed
 * for 1-2 in by a Schedule 40 table [R13]).
 */
export const STEEL_SCH40_SOURCE = 'ASME B36.10M Schedule 40 (dimensions from memory; ID confirmed 1-2 in)';

/**
 * Allowable stress for the pressure rating, psi: ASTM A53 Grade B basic allowable stress 20 ksi
 * (ASME B31.3 Table A-1, from memory). See the builder for the thread and mill-tolerance allowances.
 */
export const STEEL_ALLOWABLE_STRESS_PSI = 20_000;

export interface SteelSch40Row {
  size: string;
  outsideDiameterIn: number;
  wallIn: number;
  insideDiameterIn: number;
  /** NPT thread height for the size, inches (0.8 × pitch; 14, 11.5 and 8 threads per inch; from memory). */
  threadDepthIn: number;
}

export const STEEL_SCH40_ROWS: readonly SteelSch40Row[] = [
  { size: '1/2', outsideDiameterIn: 0.84, wallIn: 0.109, insideDiameterIn: 0.622, threadDepthIn: 0.0571 },
  { size: '3/4', outsideDiameterIn: 1.05, wallIn: 0.113, insideDiameterIn: 0.824, threadDepthIn: 0.0571 },
  { size: '1', outsideDiameterIn: 1.315, wallIn: 0.133, insideDiameterIn: 1.049, threadDepthIn: 0.0696 },
  { size: '1-1/4', outsideDiameterIn: 1.66, wallIn: 0.14, insideDiameterIn: 1.38, threadDepthIn: 0.0696 },
  { size: '1-1/2', outsideDiameterIn: 1.9, wallIn: 0.145, insideDiameterIn: 1.61, threadDepthIn: 0.0696 },
  { size: '2', outsideDiameterIn: 2.375, wallIn: 0.154, insideDiameterIn: 2.067, threadDepthIn: 0.0696 },
  { size: '2-1/2', outsideDiameterIn: 2.875, wallIn: 0.203, insideDiameterIn: 2.469, threadDepthIn: 0.1 },
  { size: '3', outsideDiameterIn: 3.5, wallIn: 0.216, insideDiameterIn: 3.068, threadDepthIn: 0.1 },
  { size: '4', outsideDiameterIn: 4.5, wallIn: 0.237, insideDiameterIn: 4.026, threadDepthIn: 0.1 },
  { size: '6', outsideDiameterIn: 6.625, wallIn: 0.28, insideDiameterIn: 6.065, threadDepthIn: 0.1 },
];
