import type { LivestockSeason } from './figures';

/** How a use's daily volume is spread over the day. */
export type UseDelivery =
  /** 24 hourly fractions summing to 1 (index 0 = 00:00-01:00). */
  | { kind: 'pattern'; hourlyFractions: readonly number[] }
  /** Peak flow = factor x mean daily flow; the hourly shape is unknown (taken as even). */
  | { kind: 'peak-factor'; peakFactor: number }
  /** Daily volume delivered evenly over a number of hours, e.g. a trough refilled in 4 h. */
  | { kind: 'delivery-hours'; hours: number; startHour?: number };

interface UseBase {
  /** Caller's label, echoed in the result. */
  label?: string;
  delivery: UseDelivery;
}

/** People x a per-person figure: give the figure directly or name one from the figures set. */
export interface PeopleUse extends UseBase {
  kind: 'people';
  count: number;
  perPersonM3PerDay?: number;
  figureId?: string;
}

/** Livestock by kind and count; winter or summer need. */
export interface LivestockUse extends UseBase {
  kind: 'livestock';
  count: number;
  season: LivestockSeason;
  perHeadM3PerDay?: number;
  figureId?: string;
}

/** Garden or crop area x depth of water per day. */
export interface GardenUse extends UseBase {
  kind: 'garden';
  areaM2: number;
  depthMPerDay?: number;
  figureId?: string;
}

/** Any other use given as a daily volume. */
export interface FixedUse extends UseBase {
  kind: 'fixed';
  volumeM3PerDay: number;
}

export type WaterUse = PeopleUse | LivestockUse | GardenUse | FixedUse;

/** Daily volume and peak flow of one use. */
export interface UseDemandResult {
  kind: WaterUse['kind'];
  label: string;
  /** The per-unit figure used (m³/person/day, m³/head/day, m depth/day, or m³/day for a fixed use). */
  unitFigure: number;
  /** Where the figure came from: the figure's source, or "entered". */
  figureSource: string;
  dailyVolumeM3: number;
  peakFlowM3s: number;
  /** Volume per hour of the day, m³ (an even spread when only a peak factor is known). */
  hourlyVolumeM3: number[];
  /** True when the hourly shape was not given (peak factor), so the profile is nominal. */
  hourlyShapeNominal: boolean;
}
