import { assertPositive } from '../demand/guards';

/** A published table of ram efficiency against the ratio of delivery head to fall. */
export interface RamEfficiencyTable {
  source: string;
  /** Points in rising ratio; efficiency as a fraction (D'Aubuisson: q·h / (Q·H)). */
  points: readonly { liftToFallRatio: number; efficiency: number }[];
  note?: string;
}

/** Efficiency against lift/fall (core.md §4.1). */
export const RAM_EFFICIENCY_TABLE: RamEfficiencyTable = {
  source: 'Building Trades Pocketbook (International Textbook Co., c.1905), "The Hydraulic Ram"',
  points: [
    { liftToFallRatio: 4, efficiency: 0.72 },
    { liftToFallRatio: 6, efficiency: 0.61 },
    { liftToFallRatio: 8, efficiency: 0.52 },
    { liftToFallRatio: 10, efficiency: 0.44 },
    { liftToFallRatio: 12, efficiency: 0.37 },
    { liftToFallRatio: 14, efficiency: 0.31 },
    { liftToFallRatio: 16, efficiency: 0.25 },
    { liftToFallRatio: 18, efficiency: 0.19 },
    { liftToFallRatio: 20, efficiency: 0.14 },
    { liftToFallRatio: 22, efficiency: 0.09 },
    { liftToFallRatio: 24, efficiency: 0.04 },
    { liftToFallRatio: 26, efficiency: 0 },
  ],
  note: 'The stored copy prints 10 % at ratio 16, an OCR error for 25 % (the run of the table fixes it).',
};

export interface RamEfficiencyLookup {
  efficiency: number;
  /** `below-table`: ratio under the first point, first efficiency used (not extrapolated up). */
  position: 'in-table' | 'below-table' | 'beyond-table';
}

/** Efficiency at a lift-to-fall ratio, linearly interpolated; 0 at and beyond the table's end. */
export function ramEfficiencyForRatio(liftToFallRatio: number, table: RamEfficiencyTable = RAM_EFFICIENCY_TABLE): RamEfficiencyLookup {
  assertPositive(liftToFallRatio, 'liftToFallRatio');
  const { points } = table;
  const first = points[0];
  const last = points[points.length - 1];
  if (liftToFallRatio < first.liftToFallRatio) return { efficiency: first.efficiency, position: 'below-table' };
  if (liftToFallRatio >= last.liftToFallRatio) return { efficiency: last.efficiency, position: 'beyond-table' };
  const upperIndex = points.findIndex((point) => point.liftToFallRatio > liftToFallRatio);
  const lower = points[upperIndex - 1];
  const upper = points[upperIndex];
  const share = (liftToFallRatio - lower.liftToFallRatio) / (upper.liftToFallRatio - lower.liftToFallRatio);
  return { efficiency: lower.efficiency + share * (upper.efficiency - lower.efficiency), position: 'in-table' };
}
