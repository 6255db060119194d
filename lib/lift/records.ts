import type { DemandUseInput } from '../validations/demand-uses';
import type { CommissioningReadingInput, RamSiteInput } from '../validations/ram-sites';
import type { SeasonalTaskInput } from '../validations/seasonal-tasks';
import type { TankInput } from '../validations/tanks';
import type { WaterSourceInput, YieldReadingInput } from '../validations/water-sources';

/**
 * Stored lift and storage rows as plain objects: the API input shapes (SI) plus their ids. The
 * server reads them in lib/data; the client receives them inside the lift summary.
 */
export interface WaterSourceRecord extends WaterSourceInput {
  id: string;
}
export interface YieldReadingRecord extends YieldReadingInput {
  id: string;
  sourceId: string;
}
export interface RamSiteRecord extends RamSiteInput {
  id: string;
}
export interface CommissioningRecord extends CommissioningReadingInput {
  id: string;
  ramSiteId: string;
}
export interface TankRecord extends TankInput {
  id: string;
}
export interface DemandUseRecord extends DemandUseInput {
  id: string;
  position: number;
}
export interface SeasonalTaskRecord extends SeasonalTaskInput {
  id: string;
  doneOn: string | null;
  source: string;
}
/** A surveyed route a delivery pipe can follow (its length is read from the survey). */
export interface RouteOption {
  id: string;
  name: string;
  lengthM: number;
}

/** Everything the lift page is computed from. */
export interface LiftRecords {
  sources: WaterSourceRecord[];
  yieldReadings: YieldReadingRecord[];
  ramSites: RamSiteRecord[];
  commissioning: CommissioningRecord[];
  tanks: TankRecord[];
  demandUses: DemandUseRecord[];
  seasonalTasks: SeasonalTaskRecord[];
  routes: RouteOption[];
}

/** A computed result, or the reason it could not be computed (with the field at fault when known). */
export type Outcome<T> = { ok: true; value: T } | { ok: false; error: string; field?: string };
