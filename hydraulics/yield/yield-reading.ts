import type { FlowMeasurement } from './bucket-flow';

/** Season a reading was taken in; the design yield is read from dry-season figures. */
export type YieldSeason = 'dry' | 'wet' | 'unspecified';

/** One dated flow measurement of a source. */
export interface YieldReading {
  /** `YYYY-MM-DD`. */
  date: string;
  season: YieldSeason;
  measurement: FlowMeasurement;
  note?: string;
}
