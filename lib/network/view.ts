import type { TankRecord } from '../lift/records';
import type { UnitSystem } from '../units';
import type { NetworkJobView } from './jobs';
import type { NetworkRecords } from './records';

/** A line as the network page draws it: its chainage window and a thinned plan of its route (WGS84). */
export interface NetworkLineSummary {
  id: string;
  name: string;
  fromChainageM: number;
  toChainageM: number;
  /** Thinned stations with positions (chainage, ground) for the schematic and for placing a take-off. */
  plan: { chainageM: number; groundM: number; latitudeDeg: number | null; longitudeDeg: number | null }[];
}

/** One demand use with what it draws, for the outlet demand editor. */
export interface NetworkDemandUse {
  id: string;
  label: string;
  kind: string;
  outletNodeId: string | null;
  dailyM3: number | null;
  peakM3s: number | null;
}

/** Everything the network page shows, computed now (no solve: runs are their own jobs). */
export interface NetworkView {
  projectId: string;
  unitSystem: UnitSystem;
  records: NetworkRecords;
  lines: NetworkLineSummary[];
  /** The tank records (Lift & storage) a tank node stands for: size, levels, floor. */
  tanks: TankRecord[];
  ramSites: { id: string; name: string }[];
  waterSources: { id: string; name: string }[];
  demandUses: NetworkDemandUse[];
  /** The latest run of each kind. */
  runs: { solve: NetworkJobView | null; day: NetworkJobView | null; size: NetworkJobView | null };
}
