import type { PumpOutletHead } from '../lift/pump-outlet';
import type { DemandUseRecord, TankRecord } from '../lift/records';
import type { LineRouteStation } from '../lines/route-stations';
import type { LineDesign } from '../validations/line-design';
import type { NetworkRecords } from './records';

/** A line of the network with its design and its stations (route chainage kept). */
export interface NetworkLineContext {
  id: string;
  name: string;
  routeId: string | null;
  design: LineDesign;
  stations: LineRouteStation[];
}

/**
 * Everything a network computation reads, as plain data (it crosses into a worker thread): the
 * records, each line with its stations, the tanks, the planned ram outlets, each source's design
 * yield and the demand uses.
 */
export interface NetworkContext {
  records: NetworkRecords;
  lines: NetworkLineContext[];
  tanks: TankRecord[];
  ramOutlets: PumpOutletHead[];
  /** Design yield per water source id, m³/s; null when the yield log gives none. */
  sourceYieldsM3s: Record<string, number | null>;
  demandUses: DemandUseRecord[];
  /** What the team pays per metre of each catalogue pipe. */
  prices: { pipeId: string; costPerM: number }[];
}

/**
 * What a network computation reads beyond the records, the lines and the lift records: a revision freezes exactly this.
 */
export type NetworkBasis = Pick<NetworkContext, 'ramOutlets' | 'sourceYieldsM3s' | 'prices'>;
