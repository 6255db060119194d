import { frictionLossM, minorLossCoefficient, type LinkLaw } from '../link-loss';
import type { CompiledNetwork } from '../compile-network';
import type { SizingCandidate } from './types';
import type { TreeFlows } from './tree-flows';

/** Per sized link: the candidates it may take and each one's head loss at the design flow. */
export interface LinkChoices {
  link: number;
  /** Indices into the candidate list, cheapest first. */
  allowed: number[];
  /** Friction loss per metre of each allowed candidate at the link's flow, m/m. */
  lossPerM: number[];
  /** Minor loss of each allowed candidate at the link's flow, m. */
  minorLossM: number[];
}

/** A program in CPLEX LP text with the pieces needed to read its answer back. */
export interface TreeProgram {
  text: string;
  /** Column name of candidate `allowed[c]` on `choices[i]`. */
  column: (i: number, c: number) => string;
  /** Constraints that can never hold whatever is chosen (a fixed head below a need): names the node. */
  impossible: string[];
}

function fmt(value: number): string {
  return Number.isInteger(value) ? String(value) : value.toPrecision(15);
}

/** Friction law of a candidate on a link, with the network's constants, per metre of pipe. */
export function candidateLaw(net: CompiledNetwork, candidate: SizingCandidate): LinkLaw {
  const { settings } = net;
  const pipe = candidate.pipe;
  if (settings.frictionMethod === 'darcy-weisbach') {
    return {
      kind: 'darcy-weisbach',
      lengthM: 1,
      diameterM: pipe.insideDiameterM,
      relativeRoughness: (pipe.roughnessM ?? 0) / pipe.insideDiameterM,
      kinematicViscosityM2s: net.laws.find((law) => law.kind === 'darcy-weisbach')?.kinematicViscosityM2s ?? 1.004e-6,
    };
  }
  const a = settings.hazenWilliamsFlowExponent;
  return {
    kind: 'hazen-williams',
    resistance:
      settings.hazenWilliamsConstant /
      ((pipe.hazenWilliamsC as number) ** a * pipe.insideDiameterM ** settings.hazenWilliamsDiameterExponent),
    exponent: a,
  };
}

/** Loss per metre and minor loss of each allowed candidate at the link's design flow. */
export function lossesOf(
  net: CompiledNetwork,
  link: number,
  allowed: number[],
  candidates: readonly SizingCandidate[],
  flowM3s: number,
  minorK: number,
) {
  const q = Math.abs(flowM3s);
  return {
    lossPerM: allowed.map((c) => frictionLossM(candidateLaw(net, candidates[c]), q)),
    minorLossM: allowed.map((c) => minorLossCoefficient(minorK, candidates[c].pipe.insideDiameterM) * q * q),
  };
}

/**
 * The least-cost program of a branched network (Karmeli, Gadish & Meyers 1968): with the flows fixed
 * by continuity, head at each node is its parent's head less the link's loss, and the loss is
 * linear in the lengths of the candidates laid on the link. Variables: the head `h<v>` of every node
 * whose head is not fixed, and per link either the length `x<i>_<c>` of each candidate (split pipe,
 * an LP) or a 0/1 choice `y<i>_<c>` (one pipe per link, a MIP). Rows: one head balance per link, one
 * length (or choice) total per link; bounds hold each node at or above its elevation plus its need.
 * A PRV or break-pressure tank sets the head below it and needs its own setting above it.
 */
export function treeProgram(
  net: CompiledNetwork,
  tree: TreeFlows,
  choices: readonly LinkChoices[],
  candidates: readonly SizingCandidate[],
  requiredHeadM: (node: number) => number | undefined,
  onePipePerLink: boolean,
): TreeProgram {
  const choiceOf = new Map(choices.map((choice, i) => [choice.link, i]));
  const prefix = onePipePerLink ? 'y' : 'x';
  const column = (i: number, c: number): string => `${prefix}${i}_${c}`;
  const fixedHead = new Float64Array(net.nodeCount).fill(Number.NaN);
  for (let v = 0; v < net.nodeCount; v++) fixedHead[v] = net.fixedHeadM[v];
  const floors = new Map<number, number>();
  const raiseFloor = (node: number, headM: number): void => {
    floors.set(node, Math.max(floors.get(node) ?? -Infinity, headM));
  };
  for (const v of tree.order) {
    const k = tree.parentLink[v];
    if (k >= 0 && net.status[k] === 'prv' && Math.abs(tree.flowM3s[k]) > 0) {
      fixedHead[v] = net.setHeadM[k];
      raiseFloor(tree.parent[v], net.setHeadM[k]);
    }
    const need = requiredHeadM(v);
    if (need !== undefined) raiseFloor(v, net.elevationM[v] + need);
  }
  const impossible: string[] = [];
  const objective: string[] = [];
  const rows: string[] = [];
  const bounds: string[] = [];
  const integers: string[] = [];
  const head = (v: number): string => `h${v}`;
  for (const v of tree.order) {
    const k = tree.parentLink[v];
    if (k < 0 || net.status[k] === 'prv') continue;
    const u = tree.parent[v];
    // Loss from parent to child: + when the flow runs parent -> child.
    const direction = (net.from[k] === u ? 1 : -1) * Math.sign(tree.flowM3s[k]);
    const terms: string[] = [];
    let constant = 0;
    const i = choiceOf.get(k);
    if (i !== undefined) {
      const choice = choices[i];
      const length = net.lengthM[k];
      const extraMinor = onePipePerLink ? 0 : Math.max(0, ...choice.minorLossM);
      choice.allowed.forEach((c, j) => {
        const coefficient = onePipePerLink ? choice.lossPerM[j] * length + choice.minorLossM[j] : choice.lossPerM[j];
        if (direction !== 0 && coefficient !== 0)
          terms.push(`${direction > 0 ? '+' : '-'} ${fmt(coefficient)} ${column(i, c)}`);
        objective.push(`+ ${fmt(candidates[c].costPerM * (onePipePerLink ? length : 1))} ${column(i, c)}`);
        if (onePipePerLink) integers.push(column(i, c));
        else bounds.push(`0 <= ${column(i, c)} <= ${fmt(length)}`);
      });
      constant += direction * extraMinor;
      rows.push(
        ` n${i}: ${choice.allowed.map((c) => `+ ${column(i, c)}`).join(' ')} = ${onePipePerLink ? 1 : fmt(length)}`,
      );
    }
    // h_v - h_u + direction·loss = 0, with fixed heads moved to the right-hand side.
    let rhs = -constant;
    const left: string[] = [...terms];
    if (Number.isNaN(fixedHead[v])) left.push(`+ ${head(v)}`);
    else rhs -= fixedHead[v];
    if (Number.isNaN(fixedHead[u])) left.push(`- ${head(u)}`);
    else rhs += fixedHead[u];
    if (left.length === 0) {
      if (Math.abs(rhs) > 1e-9) impossible.push(net.nodeIds[v]);
      continue;
    }
    rows.push(` b${v}: ${left.join(' ')} = ${fmt(rhs)}`);
  }
  for (const v of tree.order) {
    const floor = floors.get(v);
    if (!Number.isNaN(fixedHead[v])) {
      if (floor !== undefined && fixedHead[v] < floor - 1e-9) impossible.push(net.nodeIds[v]);
      continue;
    }
    if (tree.parentLink[v] < 0) continue;
    bounds.push(floor === undefined ? `${head(v)} free` : `${head(v)} >= ${fmt(floor)}`);
  }
  const text = [
    'Minimize',
    ` cost: ${objective.length > 0 ? objective.join('\n  ') : '0 h0'}`,
    'Subject To',
    ...rows,
    'Bounds',
    ...bounds,
    ...(integers.length > 0 ? ['Binary', ...integers.map((name) => ` ${name}`)] : []),
    'End',
  ].join('\n');
  return { text, column, impossible };
}
