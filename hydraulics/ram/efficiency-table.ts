import { assertPositive } from '../input-guards';

/** A published table of ram efficiency against the ratio of delivery head to fall. */
export interface RamEfficiencyTable {
  /** Stable id a ram site stores to say which table it uses. */
  id: RamEfficiencyTableId;
  /** Short name for the screen. */
  label: string;
  source: string;
  /** Points in rising ratio; efficiency as a fraction (D'Aubuisson: q·h / (Q·H)). */
  points: readonly { liftToFallRatio: number; efficiency: number }[];
  note?: string;
}

/** Efficiency against lift/fall (core.md §4.1). */
export const RAM_EFFICIENCY_TABLE: RamEfficiencyTable = {
  id: 'trade-pocketbook',
  label: 'Old trade rule (lift/fall 4 to 26)',
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

/**
 * Efficiency of Blake rams from their tested delivery at a 1 m fall, lifts 5 to 40 m (Water for the
 * World RWS.4.D.5 Table 1 [R24], core.md §4.1): e = D·L / (1440·F) with D litres a day per L/min
 * supplied. The printed row wanders (0.50, 0.40, 0.45, 0.34, 0.40, 0.41, 0.35), so each point is the
 * lowest efficiency at that ratio or below (a running minimum): the safe reading of a tested ram that
 * still works at 40:1.
 */
const BLAKE_ONE_METRE_ROW: readonly (readonly [number, number])[] = [
  [5, 144],
  [7.5, 77],
  [10, 65],
  [15, 33],
  [20, 29],
  [30, 19.5],
  [40, 12.5],
];

function runningMinimum(points: readonly { liftToFallRatio: number; efficiency: number }[]) {
  let lowest = Infinity;
  return points.map((point) => {
    lowest = Math.min(lowest, point.efficiency);
    return { liftToFallRatio: point.liftToFallRatio, efficiency: lowest };
  });
}

export const BLAKE_RAM_EFFICIENCY_TABLE: RamEfficiencyTable = {
  id: 'tested-blake-rams',
  label: 'Tested rams (lift/fall 5 to 40)',
  source:
    'Water for the World, Technical Note RWS.4.D.5, Table 1 (Blake rams, 1 m fall), efficiency D·L/(1440·F), lowest so far',
  points: runningMinimum(
    BLAKE_ONE_METRE_ROW.map(([liftM, litresPerDayPerLMin]) => ({
      liftToFallRatio: liftM / 1,
      efficiency: (litresPerDayPerLMin * liftM) / (1440 * 1),
    })),
  ),
  note: 'Read from the 1 m fall row, the only row whose columns are certain in the copy seen.',
};

export type RamEfficiencyTableId = 'trade-pocketbook' | 'tested-blake-rams';

/** The tables a ram site may use, by id; the first is the default. */
export const RAM_EFFICIENCY_TABLES: Readonly<Record<RamEfficiencyTableId, RamEfficiencyTable>> = {
  'trade-pocketbook': RAM_EFFICIENCY_TABLE,
  'tested-blake-rams': BLAKE_RAM_EFFICIENCY_TABLE,
};

export interface RamEfficiencyLookup {
  efficiency: number;
  /** `below-table`: ratio under the first point, first efficiency used (not extrapolated up). */
  position: 'in-table' | 'below-table' | 'beyond-table';
}

/**
 * Efficiency at a lift-to-fall ratio, linearly interpolated. Beyond the table's end its last
 * efficiency is held (not extrapolated) and the position says so, for a warning.
 */
export function ramEfficiencyForRatio(
  liftToFallRatio: number,
  table: RamEfficiencyTable = RAM_EFFICIENCY_TABLE,
): RamEfficiencyLookup {
  assertPositive(liftToFallRatio, 'liftToFallRatio');
  const { points } = table;
  const first = points[0];
  const last = points[points.length - 1];
  if (liftToFallRatio < first.liftToFallRatio) return { efficiency: first.efficiency, position: 'below-table' };
  if (liftToFallRatio > last.liftToFallRatio) return { efficiency: last.efficiency, position: 'beyond-table' };
  if (liftToFallRatio === last.liftToFallRatio) return { efficiency: last.efficiency, position: 'in-table' };
  const upperIndex = points.findIndex((point) => point.liftToFallRatio > liftToFallRatio);
  const lower = points[upperIndex - 1];
  const upper = points[upperIndex];
  const share = (liftToFallRatio - lower.liftToFallRatio) / (upper.liftToFallRatio - lower.liftToFallRatio);
  return { efficiency: lower.efficiency + share * (upper.efficiency - lower.efficiency), position: 'in-table' };
}
