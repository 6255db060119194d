import type { LiftRecords } from '../lift/records';
import type { LineSiteContext } from '../lines/ram-start';
import type { NetworkBasis } from '../network/context';
import type { NetworkRecords } from '../network/records';
import type { SolveRunResult } from '../network/run-result';
import type { LineRouteStation } from '../lines/route-stations';
import type { LineDesign } from '../validations/line-design';
import type { UnitSystem } from '../units/index';

/**
 * One line as a revision froze it: its design, the route's cleaned stations it followed, and what its analysis read
 * from the rest of the project.
 */
export interface SnapshotLine {
  id: string;
  name: string;
  notes: string;
  routeId: string | null;
  routeName: string | null;
  fromChainageM: number | null;
  toChainageM: number | null;
  design: LineDesign;
  /**
   * The route's cleaned stations inside the line's window; empty when the route could not give them (see `problem`).
   */
  stations: LineRouteStation[];
  context: LineSiteContext;
  problem: string | null;
}

/**
 * The whole project's design as one revision keeps it. Each top-level key is one design part
 * gathered by lib/data/design-snapshot.ts; a part added there (the network) is one more key here.
 */
export interface DesignSnapshot {
  format: 1;
  project: { name: string; description: string; unitSystem: UnitSystem; siteNotes: string; frostDepthM: number | null };
  lines: SnapshotLine[];
  lift: Pick<LiftRecords, 'sources' | 'yieldReadings' | 'ramSites' | 'tanks' | 'demandUses'>;
  /** The network (nodes, links, which outlet each demand use feeds); absent in revisions made before it existed. */
  network?: NetworkRecords;
  /**
   * What the network's solve read beyond the records (planned ram outlets, design yields, the team's price list in
   * force); absent in older revisions.
   */
  networkBasis?: NetworkBasis;
  /**
   * The network solved at the peak hour from this snapshot when the revision was made (on a worker
   * thread); null when the project had no network; absent in older revisions.
   */
  networkSolve?: FrozenNetworkSolve | null;
}

/** A frozen peak-hour solve, or why there is none (the network did not solve, or could not be built). */
export type FrozenNetworkSolve = { ok: true; result: SolveRunResult } | { ok: false; problem: string };
