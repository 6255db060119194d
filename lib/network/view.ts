import type { LineRouteStation } from '../lines/route-stations';
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

/** Stations kept per line for the schematic: enough to draw its course, never the whole survey. */
const PLAN_POINTS = 120;

/** A line's chainage window and thinned plan, from its stations (null when it has none). */
export function lineSummaryOf(
  line: { id: string; name: string },
  stations: readonly LineRouteStation[],
): NetworkLineSummary | null {
  if (stations.length === 0) return null;
  const step = Math.max(1, Math.ceil(stations.length / PLAN_POINTS));
  const kept = stations.filter((_, index) => index % step === 0 || index === stations.length - 1);
  return {
    id: line.id,
    name: line.name,
    fromChainageM: stations[0].chainageM,
    toChainageM: stations[stations.length - 1].chainageM,
    plan: kept.map((s) => ({
      chainageM: s.chainageM,
      groundM: s.groundElevationM,
      latitudeDeg: s.latitudeDeg ?? null,
      longitudeDeg: s.longitudeDeg ?? null,
    })),
  };
}
