import { pipeAreaM2 } from '../friction/pipe-flow';
import type { CompiledNetwork } from './compile-network';
import { CLOSED_LINK_RESISTANCE, lossAndGradientInto, type LossAndGradient } from './link-loss';
import { SparseCholesky } from './sparse/cholesky';
import { isShut, type NetworkTopology } from './topology';

/** Link state during the solve. */
export const LinkState = {
  Open: 0,
  /** Shut by the valve logic (check valve against flow, PRV with back pressure, float shut). */
  Closed: 1,
  /** PRV holding its set head downstream. */
  Active: 2,
  /** Shut by the input (closed valve, float on a full tank) or inside an isolated part: no flow. */
  Shut: 3,
} as const;
export type LinkState = (typeof LinkState)[keyof typeof LinkState];

/** Head a PRV must beat, and flow it must pass, before its state changes (m, m³/s). */
const STATE_HEAD_TOLERANCE_M = 1e-7;
const STATE_FLOW_TOLERANCE_M3S = 1e-12;
/** Weight that pins the head of a node below an active PRV (as the gradient method usually does). */
const PINNED_HEAD_WEIGHT = 1e12;
/** Valve states are re-examined at most this many times before the run gives up. */
const MAX_STATE_ROUNDS = 40;
/** Flow change per link that is rounding noise, not progress, m³/s (far below the 1e-9 continuity aim). */
const STILL_FLOW_M3S = 1e-13;
/**
 * Heads are known only to a few units in the last place of the largest head; through a link's
 * conductance p (m³/s per m) that noise moves its flow by p × that much every step. A wide pipe
 * carrying next to nothing has a large p, so its flow cannot settle finer than this, however
 * long the iteration runs (a 187 mm pipe at 4 mL/s under 200 m of head: ~1e-11 m³/s).
 */
const HEAD_NOISE_ULPS = 64;
/** Starting velocity for every link, m/s: a typical design velocity. */
const START_VELOCITY_MS = 0.3;

/** Raw result of the gradient method, in the compiled numbering. */
export interface GradientResult {
  converged: boolean;
  statesSettled: boolean;
  iterations: number;
  flowM3s: Float64Array;
  headM: Float64Array;
  states: Uint8Array;
  maxContinuityErrorM3s: number;
  maxHeadBalanceErrorM: number;
  /** Σ|ΔQ| / Σ|Q| of the last iteration. */
  lastRelativeChange: number;
}

/** Working arrays of one step. */
interface StepArrays {
  flow: Float64Array;
  head: Float64Array;
  states: Uint8Array;
  p: Float64Array;
  y: Float64Array;
  diagonal: Float64Array;
  edgeValue: Float64Array;
  rhs: Float64Array;
}

/** The symmetric positive definite system of one step, for benchmarks and checks. */
export interface HeadSystem {
  size: number;
  diagonal: Float64Array;
  edgeA: Int32Array;
  edgeB: Int32Array;
  edgeValue: Float64Array;
  rhs: Float64Array;
}

/** Reusable solver state for one network structure (a day run solves the same structure 24 times). */
export class GradientSolver {
  private readonly unknownOf: Int32Array;
  private readonly cholesky: SparseCholesky;
  private readonly edgeOfLink: Int32Array;
  private readonly edgeA: Int32Array;
  private readonly edgeB: Int32Array;
  private readonly incidentStart: Int32Array;
  private readonly incidentLink: Int32Array;
  /** Where each link's loss and slope are written in the loops (no object per link per step). */
  private readonly scratch: LossAndGradient = { lossM: 0, gradient: 0 };

  constructor(
    private readonly net: CompiledNetwork,
    private readonly topology: NetworkTopology,
  ) {
    const { nodeCount, linkCount, from, to, fixedHeadM } = net;
    this.unknownOf = new Int32Array(nodeCount).fill(-1);
    let unknowns = 0;
    for (let v = 0; v < nodeCount; v++) {
      if (Number.isNaN(fixedHeadM[v]) && !topology.isolated[v]) this.unknownOf[v] = unknowns++;
    }
    this.edgeOfLink = new Int32Array(linkCount).fill(-1);
    const edgeA: number[] = [];
    const edgeB: number[] = [];
    for (let k = 0; k < linkCount; k++) {
      const a = this.unknownOf[from[k]];
      const b = this.unknownOf[to[k]];
      if (a >= 0 && b >= 0 && !isShut(net, k)) {
        this.edgeOfLink[k] = edgeA.length;
        edgeA.push(a);
        edgeB.push(b);
      }
    }
    this.edgeA = Int32Array.from(edgeA);
    this.edgeB = Int32Array.from(edgeB);
    this.cholesky = new SparseCholesky(unknowns, this.edgeA, this.edgeB);
    const count = new Int32Array(nodeCount + 1);
    for (let k = 0; k < linkCount; k++) {
      count[from[k] + 1]++;
      count[to[k] + 1]++;
    }
    for (let v = 0; v < nodeCount; v++) count[v + 1] += count[v];
    this.incidentStart = count.slice();
    this.incidentLink = new Int32Array(2 * linkCount);
    const fill = count.slice(0, nodeCount);
    for (let k = 0; k < linkCount; k++) {
      this.incidentLink[fill[from[k]]++] = k;
      this.incidentLink[fill[to[k]]++] = k;
    }
  }

  /** Entries of the Cholesky factor below the diagonal (fill). */
  get factorNonZeros(): number {
    return this.cholesky.factorNonZeros;
  }

  /** Initial states: shut links shut, PRVs active, the rest open. */
  initialStates(): Uint8Array {
    const { net, topology } = this;
    const states = new Uint8Array(net.linkCount);
    for (let k = 0; k < net.linkCount; k++) {
      if (isShut(net, k) || topology.isolated[net.from[k]] || topology.isolated[net.to[k]]) states[k] = LinkState.Shut;
      else states[k] = net.status[k] === 'prv' ? LinkState.Active : LinkState.Open;
    }
    return states;
  }

  /** Initial flows: every open link at a typical velocity from -> to. */
  initialFlows(): Float64Array {
    const flows = new Float64Array(this.net.linkCount);
    for (let k = 0; k < this.net.linkCount; k++) flows[k] = START_VELOCITY_MS * pipeAreaM2(this.net.diameterM[k]);
    return flows;
  }

  /**
   * Solves for flows and heads by the global gradient method (Todini & Pilati 1988): each
   * iteration linearises every link's loss about its flow, solves the symmetric positive definite
   * system for the heads, and updates the flows so continuity holds at every node. Valve states
   * are re-examined after each converged round until none changes.
   */
  solve(startFlows?: Float64Array, startStates?: Uint8Array): GradientResult {
    const { net } = this;
    const { linkCount, nodeCount, from, to, fixedHeadM, settings } = net;
    const unknownOf = this.unknownOf;
    const states = startStates ? startStates.slice() : this.initialStates();
    const flow = startFlows ? startFlows.slice() : this.initialFlows();
    for (let k = 0; k < linkCount; k++) if (states[k] === LinkState.Shut) flow[k] = 0;
    const head = Float64Array.from(fixedHeadM, (h) => (Number.isNaN(h) ? 0 : h));
    const unknownCount = this.cholesky.size;
    const diagonal = new Float64Array(unknownCount);
    const rhs = new Float64Array(unknownCount);
    const solved = new Float64Array(unknownCount);
    const edgeValue = new Float64Array(this.edgeA.length);
    const p = new Float64Array(linkCount);
    const y = new Float64Array(linkCount);
    let iterations = 0;
    let converged = false;
    let statesSettled = false;
    let relativeChange = Infinity;
    for (let round = 0; round < MAX_STATE_ROUNDS && iterations < settings.maxIterations; round++) {
      converged = false;
      while (iterations < settings.maxIterations) {
        iterations++;
        this.assemble({ flow, head, states, p, y, diagonal, edgeValue, rhs });
        this.cholesky.factor(diagonal, edgeValue);
        this.cholesky.solve(rhs, solved);
        for (let v = 0; v < nodeCount; v++) {
          const u = unknownOf[v];
          if (u >= 0) head[v] = solved[u];
        }
        let changeSum = 0;
        let flowSum = 0;
        let noiseSum = 0;
        let largestHead = 0;
        for (let v = 0; v < nodeCount; v++) largestHead = Math.max(largestHead, Math.abs(head[v]));
        const headNoiseM = HEAD_NOISE_ULPS * Number.EPSILON * largestHead;
        for (let k = 0; k < linkCount; k++) {
          const state = states[k];
          if (state === LinkState.Shut || state === LinkState.Active) continue;
          const updated = flow[k] - y[k] + p[k] * (head[from[k]] - head[to[k]]);
          noiseSum += p[k] * headNoiseM;
          changeSum += Math.abs(updated - flow[k]);
          flowSum += Math.abs(updated);
          flow[k] = updated;
        }
        for (let k = 0; k < linkCount; k++) {
          if (states[k] !== LinkState.Active) continue;
          const updated = this.drawBelow(to[k], k, flow);
          changeSum += Math.abs(updated - flow[k]);
          flowSum += Math.abs(updated);
          flow[k] = updated;
        }
        relativeChange = flowSum > 0 ? changeSum / flowSum : 0;
        // A still network (no demand anywhere) has no scale for a relative change: an absolute floor.
        const settled = changeSum <= settings.flowTolerance * flowSum + STILL_FLOW_M3S * linkCount + noiseSum;
        if (settled && this.maxHeadBalanceError(flow, head, states) < settings.headTolerance) {
          converged = true;
          break;
        }
      }
      if (!converged) break;
      if (!this.updateStates(flow, head, states)) {
        statesSettled = true;
        break;
      }
    }
    return {
      converged: converged && statesSettled,
      statesSettled,
      iterations,
      flowM3s: flow,
      headM: head,
      states,
      maxContinuityErrorM3s: this.maxContinuityError(flow),
      maxHeadBalanceErrorM: this.maxHeadBalanceError(flow, head, states),
      lastRelativeChange: relativeChange,
    };
  }

  /** The head system of the first step from the starting flows (what each iteration factorises). */
  headSystem(): HeadSystem {
    const size = this.cholesky.size;
    const edges = this.edgeA.length;
    const arrays: StepArrays = {
      flow: this.initialFlows(),
      head: Float64Array.from(this.net.fixedHeadM, (h) => (Number.isNaN(h) ? 0 : h)),
      states: this.initialStates(),
      p: new Float64Array(this.net.linkCount),
      y: new Float64Array(this.net.linkCount),
      diagonal: new Float64Array(size),
      edgeValue: new Float64Array(edges),
      rhs: new Float64Array(size),
    };
    this.assemble(arrays);
    return {
      size,
      diagonal: arrays.diagonal,
      edgeA: this.edgeA,
      edgeB: this.edgeB,
      edgeValue: arrays.edgeValue,
      rhs: arrays.rhs,
    };
  }

  /** Solves one head system with this solver's factorisation (for benchmarks and checks). */
  solveHeadSystem(system: HeadSystem): Float64Array {
    this.cholesky.factor(system.diagonal, system.edgeValue);
    return this.cholesky.solve(system.rhs);
  }

  /** Builds the linear system for the heads about the current flows (one gradient-method step). */
  private assemble({ flow, head, states, p, y, diagonal, edgeValue, rhs }: StepArrays): void {
    const { linkCount, nodeCount, from, to, netDemandM3s, laws, minor, setHeadM, linearBelowM3s } = this.net;
    const unknownOf = this.unknownOf;
    diagonal.fill(0);
    edgeValue.fill(0);
    for (let v = 0; v < nodeCount; v++) {
      const u = unknownOf[v];
      if (u >= 0) rhs[u] = -netDemandM3s[v];
    }
    for (let k = 0; k < linkCount; k++) {
      const state = states[k];
      if (state === LinkState.Shut) continue;
      const i = from[k];
      const j = to[k];
      const ui = unknownOf[i];
      const uj = unknownOf[j];
      if (state === LinkState.Active) {
        // The PRV's flow is carried as a known draw at its upstream node; its downstream head is pinned.
        if (ui >= 0) rhs[ui] -= flow[k];
        if (uj >= 0) {
          diagonal[uj] += PINNED_HEAD_WEIGHT;
          rhs[uj] += PINNED_HEAD_WEIGHT * setHeadM[k];
        }
        p[k] = 0;
        y[k] = 0;
        continue;
      }
      if (state === LinkState.Closed) {
        p[k] = 1 / CLOSED_LINK_RESISTANCE;
        y[k] = flow[k];
      } else {
        const { lossM, gradient } = lossAndGradientInto(this.scratch, laws[k], minor[k], flow[k], linearBelowM3s[k]);
        p[k] = 1 / gradient;
        y[k] = lossM / gradient;
      }
      const carried = flow[k] - y[k];
      if (ui >= 0) {
        rhs[ui] -= carried;
        diagonal[ui] += p[k];
        if (uj < 0) rhs[ui] += p[k] * head[j];
      }
      if (uj >= 0) {
        rhs[uj] += carried;
        diagonal[uj] += p[k];
        if (ui < 0) rhs[uj] += p[k] * head[i];
      }
      const e = this.edgeOfLink[k];
      if (e >= 0) edgeValue[e] -= p[k];
    }
  }

  /** Flow node `node` needs through link `via` so that continuity holds there. */
  private drawBelow(node: number, via: number, flow: Float64Array): number {
    const { from } = this.net;
    let need = this.net.netDemandM3s[node];
    for (let t = this.incidentStart[node]; t < this.incidentStart[node + 1]; t++) {
      const k = this.incidentLink[t];
      if (k === via) continue;
      need += from[k] === node ? flow[k] : -flow[k];
    }
    return need;
  }

  private maxContinuityError(flow: Float64Array): number {
    const { nodeCount, fixedHeadM } = this.net;
    let worst = 0;
    for (let v = 0; v < nodeCount; v++) {
      if (!Number.isNaN(fixedHeadM[v]) || this.topology.isolated[v]) continue;
      worst = Math.max(worst, Math.abs(this.drawBelow(v, -1, flow)));
    }
    return worst;
  }

  private maxHeadBalanceError(flow: Float64Array, head: Float64Array, states: Uint8Array): number {
    const { linkCount, laws, minor, from, to, linearBelowM3s } = this.net;
    let worst = 0;
    for (let k = 0; k < linkCount; k++) {
      if (states[k] !== LinkState.Open) continue;
      const { lossM } = lossAndGradientInto(this.scratch, laws[k], minor[k], flow[k], linearBelowM3s[k]);
      worst = Math.max(worst, Math.abs(lossM - (head[from[k]] - head[to[k]])));
    }
    return worst;
  }

  /** Re-examines check valves, float valves and PRVs; returns true when any state changed. */
  private updateStates(flow: Float64Array, head: Float64Array, states: Uint8Array): boolean {
    const { linkCount, status, from, to, setHeadM } = this.net;
    let changed = false;
    const set = (k: number, state: LinkState): void => {
      if (states[k] !== state) {
        states[k] = state;
        changed = true;
      }
    };
    for (let k = 0; k < linkCount; k++) {
      const state = states[k];
      if (state === LinkState.Shut) continue;
      const rise = head[from[k]] - head[to[k]];
      const kind = status[k];
      if (kind === 'check-valve' || kind === 'float-valve') {
        if (state === LinkState.Open && flow[k] < -STATE_FLOW_TOLERANCE_M3S) set(k, LinkState.Closed);
        else if (state === LinkState.Closed && rise > STATE_HEAD_TOLERANCE_M) set(k, LinkState.Open);
      } else if (kind === 'prv') {
        const upstream = head[from[k]];
        const downstream = head[to[k]];
        const target = setHeadM[k];
        if (state === LinkState.Active) {
          if (flow[k] < -STATE_FLOW_TOLERANCE_M3S) set(k, LinkState.Closed);
          else if (upstream < target - STATE_HEAD_TOLERANCE_M) set(k, LinkState.Open);
        } else if (state === LinkState.Open) {
          if (flow[k] < -STATE_FLOW_TOLERANCE_M3S) set(k, LinkState.Closed);
          else if (downstream > target + STATE_HEAD_TOLERANCE_M) set(k, LinkState.Active);
        } else if (rise > STATE_HEAD_TOLERANCE_M && downstream < target - STATE_HEAD_TOLERANCE_M) {
          set(k, upstream >= target ? LinkState.Active : LinkState.Open);
        }
      }
    }
    return changed;
  }
}
