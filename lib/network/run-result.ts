/**
 * What a network run leaves behind, keyed by the stored records' ids (a line split at its
 * take-offs reports each piece by chainage). SI; the page words and converts it.
 */

/** A finding of a run, on a node or link of the records (or on the whole network). */
export interface NetworkRunWarning {
  code: string;
  severity: 'danger' | 'warning' | 'info';
  message: string;
  nodeId?: string;
  linkId?: string;
  /** The line the finding is on, with its chainage, when it came from a line's profile. */
  lineId?: string;
  chainageM?: number;
}

/** One piece of a link: a whole pipe or valve, or a line between take-offs (and pipe changes). */
export interface LinkPieceResult {
  fromChainageM: number | null;
  toChainageM: number | null;
  pipeId: string;
  pipeLabel: string;
  insideDiameterM: number;
  flowM3s: number;
  velocityMs: number;
  headLossM: number;
}

export interface LinkResult {
  linkId: string;
  /** Flow into the link at its start, m³/s, positive from its start node to its end node. */
  flowM3s: number;
  pieces: LinkPieceResult[];
}

export interface NodeResult {
  nodeId: string;
  elevationM: number;
  headM: number | null;
  pressureHeadM: number | null;
  /** Water drawn at the node (positive) or put in (negative), m³/s. */
  demandM3s: number;
  minPressureHeadM: number | null;
}

/** The friction law a run was solved with (absent on runs stored before it was recorded). */
export interface RunFriction {
  method: 'darcy-weisbach' | 'hazen-williams';
  freeSurfaceLosses: boolean;
}

export interface SolveRunResult {
  kind: 'solve';
  friction?: RunFriction;
  converged: boolean;
  iterations: number;
  nodes: NodeResult[];
  links: LinkResult[];
  warnings: NetworkRunWarning[];
}

export interface DayRunResult {
  kind: 'day';
  friction?: RunFriction;
  /** Start of each time step, hours from midnight. */
  hours: number[];
  tanks: { nodeId: string; levelsM: number[]; floorM: number; overflowM: number; storageNeededM3: number | null }[];
  sources: { nodeId: string; drawM3s: number[]; yieldM3s: number | null }[];
  /** Pressure head at each outlet in every step, and the lowest it saw against what it wants. */
  outlets: {
    nodeId: string;
    pressureHeadsM: (number | null)[];
    minPressureHeadM: number | null;
    lowest: { pressureHeadM: number; hour: number } | null;
  }[];
  warnings: NetworkRunWarning[];
}

export interface SizeRunResult {
  kind: 'size';
  feasible: boolean;
  cost: number | null;
  /** Cost with one pipe everywhere: the cheapest single pipe that meets every limit, when one does. */
  uniform: { pipeId: string; pipeLabel: string; cost: number; feasible: boolean } | null;
  /** The solve with the chosen pipes. */
  solution: SolveRunResult | null;
  warnings: NetworkRunWarning[];
}

/** Storage for one tank of the network, sized from the outlets it serves (keyed by the records). */
export interface TankStorageView {
  nodeId: string;
  /** The tank record (Lift & storage) the node stands for. */
  tankId: string | null;
  servedOutlets: { nodeId: string; share: number; demandM3s: number }[];
  /** What its outlets draw from it over a day, m³. */
  dailyDemandM3: number;
  demandHourlyM3: number[];
  supplyM3s: number;
  cycleStorageM3: number | null;
  reserveStorageM3: number | null;
  totalStorageM3: number | null;
  fillTimeFromEmptyS: number | null;
  /** Why it could not be sized, when it could not. */
  problem: string | null;
}

export type NetworkRunResult = SolveRunResult | DayRunResult | SizeRunResult;
