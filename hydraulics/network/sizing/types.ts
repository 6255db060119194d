import type { NetworkPipe, NetworkSolution, NetworkWarning } from '../types';

/** One pipe the sizing may choose, with its installed cost. */
export interface SizingCandidate {
  /** The pipe (its `id` is what `pipeByLink` returns). */
  pipe: NetworkPipe;
  /** Material cost per metre laid, in the caller's currency. */
  costPerM: number;
}

/** What the least-cost sizing must respect. */
export interface SizingOptions {
  candidates: readonly SizingCandidate[];
  /** Residual pressure head every junction and outlet needs when the node gives none, m. @default 0 */
  minPressureHeadM?: number;
  /**
   * One pipe over the whole of each link (a binary choice per link: a MIP on branched networks, a
   * search on looped ones). With false a branched link may change size along its length (the LP of
   * Karmeli, Gadish & Meyers 1968). @default true
   */
  onePipePerLink?: boolean;
  /** Wall-clock budget for the search on looped networks (and for the MIP), s. @default 10 */
  timeLimitS?: number;
  /** Highest velocity allowed at the design flow, m/s. @default 3 (Jordan p.53, as the line checks) */
  velocityMaxMs?: number;
  /** Lowest velocity allowed in a pipe that carries flow, m/s. @default 0 (no floor: loops need small pipes) */
  velocityMinMs?: number;
  /**
   * Flow each tank must take in while it fills, m³/s, by tank node id: the daily demand of the outlets
   * it serves over its fill window. The links laid into the tank are sized to deliver it at the
   * tank's overflow level (see `withTankFills`). @default none (a tank is only a fixed level)
   */
  tankFillFlowsM3s?: Readonly<Record<string, number>>;
}

/** A length of one candidate on a link (split-pipe designs). */
export interface SizedPiece {
  pipeId: string;
  lengthM: number;
}

/** The least-cost design found. */
export interface SizingResult {
  /** True when every outlet gets its residual, velocities are in band and ratings hold. */
  feasible: boolean;
  /** Material cost of the design (0 when none is feasible). */
  cost: number;
  /** Chosen pipe per sized link (the longest piece when a link is split). */
  pipeByLink: Record<string, string>;
  /** Pieces per link when `onePipePerLink` is false, upstream piece first. */
  piecesByLink?: Record<string, SizedPiece[]>;
  /**
   * The network solved with the chosen pipes (the check of the design); a filled tank's inlet is the node `<tank
   * id>#fill`.
   */
  solution: NetworkSolution;
  /** How the design was found. */
  method: 'branched-mip' | 'branched-lp' | 'looped-search';
  /** True when the design is proven least-cost for the model (branched networks solved to optimality). */
  provenOptimal: boolean;
  /** The same network with one size everywhere: the cheapest single candidate that is feasible. */
  singleSize: { feasible: boolean; pipeId?: string; cost?: number };
  warnings: NetworkWarning[];
}
