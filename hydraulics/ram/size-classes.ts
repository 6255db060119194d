/** A ram size class: its drive-pipe size and the drive flow it is built for. */
export interface RamSizeClass {
  id: string;
  /** Nominal drive-pipe bore, mm. */
  drivePipeNominalMm: number;
  minDriveFlowM3s: number;
  maxDriveFlowM3s: number;
  /** The range as printed, L/min. */
  published: { minLPerMin: number; maxLPerMin: number };
  source: string;
  note: string;
}

const LITRE_PER_MIN_M3S = 1e-3 / 60;
const SOURCE =
  'Water for the World, Technical Note RWS.4.D.5 Designing a Hydraulic Ram Pump (USAID), pipe sizing table';
const NOTE =
  'The stored copy labels the table "Delivery pipe size (mm) vs flow (L/min)"; the flows are drive-flow ranges, so the size is read as the drive pipe. Treat the label as uncertain.';

const ROWS: readonly [number, number, number][] = [
  [30, 6, 36],
  [40, 37, 60],
  [50, 61, 90],
  [80, 91, 234],
  [100, 235, 360],
];

/** Drive-pipe size classes with their usual drive-flow ranges (core.md §4.2). */
export const RAM_SIZE_CLASSES: readonly RamSizeClass[] = ROWS.map(([mm, min, max]) => ({
  id: `drive-${mm}mm`,
  drivePipeNominalMm: mm,
  minDriveFlowM3s: min * LITRE_PER_MIN_M3S,
  maxDriveFlowM3s: max * LITRE_PER_MIN_M3S,
  published: { minLPerMin: min, maxLPerMin: max },
  source: SOURCE,
  note: NOTE,
}));

/** The class whose published range holds a drive flow per pump (gaps of under 1 L/min go up), if any. */
export function suggestRamSizeClass(driveFlowPerPumpM3s: number): RamSizeClass | undefined {
  return RAM_SIZE_CLASSES.find(
    (sizeClass) =>
      driveFlowPerPumpM3s <= sizeClass.maxDriveFlowM3s &&
      driveFlowPerPumpM3s >= sizeClass.minDriveFlowM3s - LITRE_PER_MIN_M3S,
  );
}
