import { isShut } from '../topology';
import type { NetworkWarning } from '../types';
import { evaluateDesign, type EvaluatedDesign } from './evaluate-design';
import { fastEvaluator, type QuickVerdict } from './fast-evaluator';
import { requiredPressureHeadM } from './design-check';
import { loadHighs } from './highs-solver';
import { linkChoices } from './size-branched';
import type { SizingContext } from './sizing-context';
import { treeProgram } from './tree-program';
import { treeFlows } from './tree-flows';
import { seededRandom } from './seeded-random';

/** A design with its quick verdict. */
interface Trial extends QuickVerdict {
  design: Int32Array;
}

/** The best design the looped search found. */
export interface LoopedOutcome {
  best: EvaluatedDesign | undefined;
  warnings: NetworkWarning[];
  evaluations: number;
}

/**
 * Spanning tree of the open links, heaviest first by `weight`, never joining two fixed heads (they
 * are one root). Returns the links left out (each closes a loop).
 */
function loopClosers(context: SizingContext, weight: (k: number) => number): Uint8Array {
  const { net, topology } = context;
  const parent = Int32Array.from({ length: net.nodeCount + 1 }, (_, i) => i);
  const root = net.nodeCount;
  const find = (a: number): number => {
    while (parent[a] !== a) a = parent[a] = parent[parent[a]];
    return a;
  };
  for (let v = 0; v < net.nodeCount; v++) if (!Number.isNaN(net.fixedHeadM[v])) parent[find(v)] = root;
  const links: number[] = [];
  for (let k = 0; k < net.linkCount; k++)
    if (!isShut(net, k) && !topology.isolated[net.from[k]] && !topology.isolated[net.to[k]]) links.push(k);
  // Hidden float valves of break-pressure tanks stay in the tree whatever their weight.
  links.sort((a, b) => Number(b >= net.visibleLinkCount) - Number(a >= net.visibleLinkCount) || weight(b) - weight(a));
  const left = new Uint8Array(net.linkCount);
  for (const k of links) {
    const a = find(net.from[k]);
    const b = find(net.to[k]);
    if (a === b) left[k] = 1;
    else parent[a === root ? b : a] = a === root ? root : b;
  }
  return left;
}

/** Sizes the tree exactly (MIP) with the loop closers kept as they are and their flows held fixed. */
async function treeStart(context: SizingContext, current: Trial, left: Uint8Array): Promise<Int32Array | undefined> {
  const { net } = context;
  const extraDemandM3s = new Float64Array(net.nodeCount);
  for (let k = 0; k < net.linkCount; k++) {
    if (!left[k]) continue;
    const q = current.flowM3s[k];
    extraDemandM3s[net.from[k]] += q;
    extraDemandM3s[net.to[k]] -= q;
  }
  const tree = treeFlows(net, context.topology, { links: left, extraDemandM3s });
  if (!tree) return undefined;
  const inTree = context.sized.map((k) => !left[k]);
  const treeSized = {
    ...context,
    sized: context.sized.filter((_, i) => inTree[i]),
    ratedByLink: context.ratedByLink.filter((_, i) => inTree[i]),
  };
  const choices = linkChoices(treeSized, (k) => tree.flowM3s[k], []);
  if (!choices) return undefined;
  const program = treeProgram(
    net,
    tree,
    choices,
    context.candidates,
    (v) => requiredPressureHeadM(net, v, context.rules),
    true,
  );
  if (program.impossible.length > 0) return undefined;
  const highs = await loadHighs();
  const seconds = Math.max(0.2, Math.min(5, (context.deadline - Date.now()) / 1000));
  const result = highs.solve(program.text, { output_flag: false, time_limit: seconds });
  if (result.Status !== 'Optimal') return undefined;
  const design = current.design.slice();
  let t = 0;
  context.sized.forEach((_, i) => {
    if (!inTree[i]) return;
    const choice = choices[t];
    const picked = choice.allowed.find((c, j) => (result.Columns[program.column(t, c)]?.Primal ?? 0) > 0.5 && j >= 0);
    design[i] = picked ?? choice.allowed[0];
    t++;
  });
  return design;
}

/** Steps of each sized link through its rated candidates, as positions in `ratedByLink`. */
function stepOf(context: SizingContext, i: number, candidate: number): number {
  return context.ratedByLink[i].indexOf(candidate);
}

/** Links the repair weighs at each step: the steepest few (each weighing costs one solve). */
const REPAIR_SHORTLIST = 24;

/**
 * Upsizes one link a size at a time until the design is feasible, each time the link that buys the
 * most pressure at the worst node per unit of added cost, among the links losing most head per metre.
 */
function repair(context: SizingContext, start: Trial, evaluate: (design: Int32Array) => Trial, frozen = -1): Trial {
  let current = start;
  const { net } = context;
  const costOfStep = (i: number, design: Int32Array): number => {
    const rated = context.ratedByLink[i];
    const next = rated[stepOf(context, i, design[i]) + 1];
    return (context.candidates[next].costPerM - context.candidates[design[i]].costPerM) * net.lengthM[context.sized[i]];
  };
  for (
    let round = 0;
    !current.feasible && round < context.sized.length * context.candidates.length && Date.now() < context.deadline;
    round++
  ) {
    const shortlist = context.sized
      .map((k, i) => ({ i, slope: current.slope[k] }))
      .filter(({ i }) => i !== frozen && stepOf(context, i, current.design[i]) < context.ratedByLink[i].length - 1)
      .sort((a, b) => b.slope - a.slope)
      .slice(0, REPAIR_SHORTLIST);
    if (shortlist.length === 0) break;
    let pick: Trial | undefined;
    let bestValue = -Infinity;
    for (const { i } of shortlist) {
      const design = current.design.slice();
      const added = Math.max(costOfStep(i, design), 1e-9);
      design[i] = context.ratedByLink[i][stepOf(context, i, design[i]) + 1];
      const trial = evaluate(design);
      const gain = trial.feasible ? current.worstShortfallM + 1 : current.worstShortfallM - trial.worstShortfallM;
      const value = gain / added;
      if (value > bestValue) {
        bestValue = value;
        pick = trial;
      }
    }
    if (!pick) break;
    current = pick;
  }
  return current;
}

/**
 * Local search: drop any one link one or more sizes while the design stays feasible; then drop one
 * link a size and upsize, steepest first, whatever runs short; then trade one or two sizes up on one
 * link for one to three down on another. A move is kept when it saves money and stays feasible;
 * every step is checked by solving the network.
 */
function improve(context: SizingContext, start: Trial, evaluate: (design: Int32Array) => Trial): Trial {
  let best = start;
  const n = context.sized.length;
  const move = (design: Int32Array, i: number, steps: number): boolean => {
    const rated = context.ratedByLink[i];
    const at = stepOf(context, i, design[i]) + steps;
    if (at < 0 || at >= rated.length) return false;
    design[i] = rated[at];
    return true;
  };
  const costOf = (design: Int32Array): number =>
    context.sized.reduce((sum, k, i) => sum + context.candidates[design[i]].costPerM * context.net.lengthM[k], 0);
  const tryDesign = (design: Int32Array): boolean => {
    if (costOf(design) >= best.cost - 1e-9) return false;
    const candidate = evaluate(design);
    if (!candidate.feasible) return false;
    best = candidate;
    return true;
  };
  let improved = true;
  while (improved && Date.now() < context.deadline) {
    improved = false;
    for (let i = 0; i < n && Date.now() < context.deadline; i++) {
      for (let steps = -1; steps >= -3; steps--) {
        const design = best.design.slice();
        if (move(design, i, steps) && tryDesign(design)) improved = true;
      }
    }
    if (improved) continue;
    // Drop one link a size and let the repair upsize whatever then runs short.
    for (let i = 0; i < n && !improved && Date.now() < context.deadline; i++) {
      const design = best.design.slice();
      if (!move(design, i, -1)) continue;
      const repaired = repair(context, evaluate(design), evaluate, i);
      if (repaired.feasible && repaired.cost < best.cost - 1e-9) {
        best = repaired;
        improved = true;
      }
    }
    if (improved) continue;
    for (let up = 0; up < n && !improved && Date.now() < context.deadline; up++) {
      for (let down = 0; down < n && !improved && Date.now() < context.deadline; down++) {
        if (up === down) continue;
        for (let upSteps = 1; upSteps <= 2 && !improved; upSteps++) {
          for (let downSteps = -1; downSteps >= -3 && !improved; downSteps--) {
            const design = best.design.slice();
            if (move(design, up, upSteps) && move(design, down, downSteps) && tryDesign(design)) improved = true;
          }
        }
      }
    }
  }
  return best;
}

/**
 * Least-cost search for a looped network, one pipe per link, within the time limit:
 * 1. every link at its largest rated candidate (if that fails, nothing will);
 * 2. a spanning tree that keeps the links carrying most flow, sized exactly by the MIP with the
 *    loop-closing links held at their current size and flow, repaired by upsizing if the solver
 *    finds it short, then improved by single and paired size changes, each checked by the solver;
 * 3. until the time runs out, each try draws a random spanning tree: a tree not tried before is
 *    sized by the MIP as above; otherwise the best design is kicked (two or three links moved a few
 *    sizes) and repaired and improved the same way (an iterated local search). Small networks thus
 *    try every spanning tree; large ones keep searching. Returns the cheapest feasible design.
 */
export async function searchLooped(context: SizingContext): Promise<LoopedOutcome> {
  const warnings: NetworkWarning[] = [];
  if (context.ratedByLink.some((rated) => rated.length === 0)) {
    const i = context.ratedByLink.findIndex((rated) => rated.length === 0);
    const id = context.net.linkIds[context.sized[i]];
    warnings.push({
      code: 'no-candidate-fits',
      severity: 'danger',
      message: `No candidate pipe is rated for the ${(context.staticByLink.get(id) ?? 0).toFixed(1)} m of static head on "${id}".`,
      values: { staticPressureHeadM: context.staticByLink.get(id) ?? 0 },
      elementId: id,
    });
    return { best: undefined, warnings, evaluations: 0 };
  }
  const quick = fastEvaluator(context);
  const seen = new Map<string, Trial>();
  const evaluate = (design: Int32Array): Trial => {
    const key = design.join(',');
    let found = seen.get(key);
    if (!found) {
      found = { design, ...quick(design) };
      seen.set(key, found);
    }
    return found;
  };
  // The widest bore, not the dearest: a price list may price a small pipe above a large one.
  const widest = (rated: number[]) =>
    rated.reduce(
      (best, c) =>
        context.candidates[c].pipe.insideDiameterM > context.candidates[best].pipe.insideDiameterM ? c : best,
      rated[rated.length - 1],
    );
  const largest = evaluate(Int32Array.from(context.ratedByLink, widest));
  if (!largest.feasible) {
    warnings.push({
      code: 'no-feasible-design',
      severity: 'danger',
      message:
        'Even the largest candidate on every link leaves an outlet short of its residual or a pipe outside the velocity band: add larger candidates, lower the residual wanted, or raise the source.',
      values: { worstShortfallM: largest.worstShortfallM },
    });
    return { best: undefined, warnings, evaluations: seen.size };
  }
  let best: Trial = largest;
  const random = seededRandom(1977);
  const largestFlows = largest.flowM3s.slice();
  const treesTried = new Set<string>();
  for (let attempt = 0; Date.now() < context.deadline && attempt < 5000; attempt++) {
    let current: Trial;
    const weight = attempt === 0 ? (k: number) => Math.abs(largestFlows[k]) : () => random();
    const left = loopClosers(context, weight);
    const treeKey = left.join('');
    if (!treesTried.has(treeKey)) {
      treesTried.add(treeKey);
      // Loop closers start at their smallest rated size; the tree is sized around their flows.
      current = evaluate(
        Int32Array.from(largest.design, (c, i) => (left[context.sized[i]] ? context.ratedByLink[i][0] : c)),
      );
      for (let round = 0; round < 2 && Date.now() < context.deadline; round++) {
        const design = await treeStart(context, current, left);
        if (!design) break;
        current = evaluate(design);
      }
    } else {
      // A kick: two or three links of the best design moved up to three sizes either way.
      const design = best.design.slice();
      const kicks = 2 + Math.floor(random() * 2);
      for (let kick = 0; kick < kicks; kick++) {
        const i = Math.floor(random() * context.sized.length);
        const rated = context.ratedByLink[i];
        const at = Math.min(
          rated.length - 1,
          Math.max(0, stepOf(context, i, design[i]) + Math.floor(random() * 7) - 3),
        );
        design[i] = rated[at];
      }
      current = evaluate(design);
    }
    current = repair(context, current, evaluate);
    if (!current.feasible) continue;
    current = improve(context, current, evaluate);
    if (current.feasible && current.cost < best.cost - 1e-9) best = current;
  }
  return { best: evaluateDesign(context, best.design), warnings, evaluations: seen.size };
}
