import type { PipeSpec } from '../catalogue/pipe-spec';
import type { FrictionMethod } from '../friction/head-loss';

/** What a node of the network is. */
export type NetworkNodeKind = 'source' | 'tank' | 'junction' | 'outlet' | 'ram-outlet' | 'break-pressure-tank';

/** Storage data of a tank node: the floor is the node's `elevationM`, the water level `waterLevelM`. */
export interface TankStorage {
  /** Water level at which the tank is full (overflow or float valve shut), m above datum. */
  overflowLevelM: number;
  /** Plan area of the water surface, m² (give this or `volumeM3`). */
  areaM2?: number;
  /** Volume between floor and overflow, m³ (area = volume / depth when `areaM2` is not given). */
  volumeM3?: number;
}

/** One node. SI units; elevations and levels in m above the survey datum. */
export interface NetworkNode {
  id: string;
  kind: NetworkNodeKind;
  /** Ground or floor elevation, m (the floor of a tank, the tap of an outlet). */
  elevationM: number;
  /** Free water level of a source, tank or break-pressure tank, m. @default elevationM */
  waterLevelM?: number;
  /** Water drawn here, m³/s (outlets and junctions; a steady draw). @default 0 */
  demandM3s?: number;
  /** Residual pressure head this node needs, m. @default the sizing option or none */
  minPressureHeadM?: number;
  /** Ram outlet: the flow the ram delivers into the network, m³/s (a fixed inflow). */
  inflowM3s?: number;
  /** Source: design yield, m³/s; drawing more is flagged. */
  yieldM3s?: number;
  /** Tank: levels and size, for the day run and storage sizing. */
  tank?: TankStorage;
  /** Outlet: 24 hourly fractions of the day's use (index 0 = 00:00-01:00) for the day run. @default even */
  hourlyFractions?: readonly number[];
}

/** How a link behaves. */
export type NetworkLinkStatus =
  /** An ordinary pipe (or an open isolation valve). */
  | 'open'
  /** A shut isolation valve: no flow. */
  | 'closed'
  /** Flow only from `from` to `to`. */
  | 'check-valve'
  /** Pressure-reducing valve holding `setPressureHeadM` at `to` (flow only from -> to). */
  | 'prv'
  /** Float valve at the inlet of the tank at `to`: flow only into the tank, shut when it is full. */
  | 'float-valve';

/** One link: a pipe (a line or a piece of one between take-offs) with its valve, if any. */
export interface NetworkLink {
  id: string;
  from: string;
  to: string;
  /** Pipe length used for friction, m (the slope length of its route when it has one). */
  lengthM: number;
  /** A catalogue pipe id or a pipe spec (as small as id, inside diameter and C). */
  pipe: string | NetworkPipe;
  /** Sum of minor-loss coefficients K on the link (loss = K v²/2g). @default 0 */
  minorK?: number;
  /** @default 'open' */
  status?: NetworkLinkStatus;
  /** PRV only: pressure head held at the `to` node, m. */
  setPressureHeadM?: number;
  /** Highest static head on the link's route above its pipe, m, when a profile is known (for ratings). */
  maxRouteStaticPressureHeadM?: number;
}

/** A pipe as the network needs it: only the inside diameter and one roughness are required. */
export type NetworkPipe = Pick<PipeSpec, 'id' | 'insideDiameterM'> &
  Partial<Pick<PipeSpec, 'hazenWilliamsC' | 'roughnessM' | 'pressureRatingPa' | 'label'>>;

/** Solver settings; the defaults are the line analysis's own (Darcy-Weisbach, free-surface losses). */
export interface NetworkSettings {
  /** @default 'darcy-weisbach' (Colebrook friction factor), as the line analysis */
  frictionMethod?: FrictionMethod;
  /**
   * Count the loss where water leaves a free surface (source, tank, break-pressure tank) into the
   * link laid from it: the velocity head plus the entrance loss, K = 1 + `entranceLossK`, as the
   * line analysis does. Published network benchmarks leave it out. @default true
   */
  freeSurfaceLosses?: boolean;
  /** Entrance loss coefficient at a free surface. @default 0.5 (sharp-edged, as the line analysis) */
  entranceLossK?: number;
  /**
   * Hazen-Williams constant ω in h = ω L Q^a / (C^a D^b), SI. @default 10.6742 (the exact image of
   * V = 0.849 C R^0.63 S^0.54, the form `hazenWilliamsHeadLoss` uses)
   */
  hazenWilliamsConstant?: number;
  /** @default 1/0.54 = 1.85185 */
  hazenWilliamsFlowExponent?: number;
  /** @default 2.63/0.54 = 4.87037 */
  hazenWilliamsDiameterExponent?: number;
  /** Water temperature for Darcy-Weisbach viscosity, °C. @default 20 */
  waterTemperatureC?: number;
  /** Stop when the largest flow change is below this share of the total flow. @default 1e-9 */
  flowTolerance?: number;
  /** Stop only when every link's head balance is within this, m. @default 1e-6 */
  headTolerance?: number;
  /** @default 100 */
  maxIterations?: number;
}

/** Everything a network solve needs. SI units throughout. */
export interface NetworkInput {
  nodes: readonly NetworkNode[];
  links: readonly NetworkLink[];
  settings?: NetworkSettings;
}

/** A finding as data: a stable code, typed values and plain words. */
export interface NetworkWarning {
  code: string;
  severity: 'danger' | 'warning' | 'info';
  message: string;
  values: Record<string, number | string | boolean | readonly string[]>;
  /** The node or link the finding is about. */
  elementId?: string;
}

/** Final state of a valve link. */
export type ValveState = 'open' | 'closed' | 'active';

/** The steady state of the network. */
export interface NetworkSolution {
  converged: boolean;
  /** The friction law the heads were solved with (say it beside every result). */
  frictionMethod: FrictionMethod;
  /** Whether entrance and velocity-head losses at free surfaces were counted. */
  freeSurfaceLosses: boolean;
  iterations: number;
  /** Flow per link, m³/s, positive from `from` to `to`. */
  flowsM3s: Record<string, number>;
  /** Hydraulic grade per node, m above datum (nodes cut off by closed links are left out). */
  headsM: Record<string, number>;
  /** Head above the node's elevation, m. */
  pressureHeadsM: Record<string, number>;
  /** Velocity per link, m/s (signed like the flow). */
  velocitiesMs: Record<string, number>;
  /** Head loss per link from -> to, m. */
  headLossesM: Record<string, number>;
  /** State of every check valve, PRV and float valve at the end. */
  valveStates: Record<string, ValveState>;
  /** Nodes cut off from every fixed head by closed links (their heads are unknown). */
  isolatedNodeIds: string[];
  /** Largest continuity error at any node, m³/s. */
  maxContinuityErrorM3s: number;
  /** Largest difference between a link's head loss and its end heads, m. */
  maxHeadBalanceErrorM: number;
  warnings: NetworkWarning[];
}
