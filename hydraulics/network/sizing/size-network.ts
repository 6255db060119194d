import { solveNetwork } from '../solve-network';
import type { NetworkWarning } from '../types';
import { checkDesign, withPipes } from './design-check';
import { cheapestSingleSize } from './evaluate-design';
import { loadHighs } from './highs-solver';
import { searchLooped } from './looped-search';
import { sizeBranched, splitInput } from './size-branched';
import { designPipes, sizingContext, type SizingContext } from './sizing-context';
import { withTankFills } from './tank-fill';
import { treeFlows } from './tree-flows';
import type { SizedPiece, SizingOptions, SizingResult } from './types';

function singleSizeOf(context: SizingContext): SizingResult['singleSize'] {
  const single = cheapestSingleSize(context);
  return single
    ? { feasible: true, pipeId: context.candidates[single.design[0]].pipe.id, cost: single.cost }
    : { feasible: false };
}

function infeasible(context: SizingContext, method: SizingResult['method'], warnings: NetworkWarning[]): SizingResult {
  const largest = Int32Array.from(context.ratedByLink, (rated) =>
    rated.length > 0 ? rated[rated.length - 1] : context.candidates.length - 1,
  );
  const pipes = designPipes(context, largest);
  return {
    feasible: false,
    cost: 0,
    pipeByLink: Object.fromEntries([...pipes].map(([id, pipe]) => [id, pipe.id])),
    solution: solveNetwork(withPipes(context.input, pipes)),
    method,
    provenOptimal: false,
    singleSize: singleSizeOf(context),
    warnings,
  };
}

/**
 * Least-cost pipe sizes: every junction and outlet gets its residual pressure (its own
 * `minPressureHeadM` or the option's), velocities stay in the band and each pipe's rating covers the
 * static pressure on its link, at the least material cost from the candidate list.
 * - Branched networks (each part a tree fed by one source or tank): flows follow from continuity and
 *   the problem is solved exactly with HiGHS (Karmeli, Gadish & Meyers 1968): a MIP with one pipe per
 *   link, or an LP over lengths when links may be split.
 * - Looped networks: the best feasible design found within `timeLimitS` by a spanning-tree MIP and a
 *   local search checked by the network solver at every step (see `searchLooped`).
 * A tank given a fill flow in `tankFillFlowsM3s` has the links laid into it sized to fill it (see
 * `withTankFills`); otherwise a tank is a fixed level only.
 * Also returns the cheapest single size for comparison. Throws `HydraulicsInputError` for bad input.
 */
export async function sizeNetwork(
  input: Parameters<typeof solveNetwork>[0],
  options: SizingOptions,
): Promise<SizingResult> {
  // Loading the WebAssembly solver is not part of the search's time budget.
  await loadHighs();
  const context = sizingContext(withTankFills(input, options.tankFillFlowsM3s), options);
  const onePipePerLink = options.onePipePerLink ?? true;
  const tree = treeFlows(context.net, context.topology);
  if (!tree) {
    const warnings: NetworkWarning[] = [];
    if (!onePipePerLink) {
      warnings.push({
        code: 'split-pipe-branched-only',
        severity: 'info',
        message:
          'Links are split between sizes only in branched networks; this network has loops, so each link gets one size.',
        values: {},
      });
    }
    const outcome = await searchLooped(context);
    warnings.push(...outcome.warnings);
    if (!outcome.best) return infeasible(context, 'looped-search', warnings);
    const best = outcome.best;
    return {
      feasible: true,
      cost: best.cost,
      pipeByLink: Object.fromEntries([...designPipes(context, best.design)].map(([id, pipe]) => [id, pipe.id])),
      solution: best.check.solution,
      method: 'looped-search',
      provenOptimal: false,
      singleSize: singleSizeOf(context),
      warnings: [
        ...warnings,
        {
          code: 'looped-best-found',
          severity: 'info',
          message: `Best design found in the time allowed (${outcome.evaluations} designs checked by the solver); a cheaper one may exist.`,
          values: { evaluations: outcome.evaluations },
        },
      ],
    };
  }
  const method = onePipePerLink ? 'branched-mip' : 'branched-lp';
  const outcome = await sizeBranched(context, tree, onePipePerLink);
  if (!outcome.solved) return infeasible(context, method, outcome.warnings);
  const { designInput, sizedPipes } = splitInput(context, outcome.pieces, (k) => tree.flowM3s[k]);
  const check = checkDesign(designInput, context.net, context.staticByLink, sizedPipes, context.rules);
  const warnings = [...outcome.warnings];
  if (!check.feasible) {
    warnings.push({
      code: 'design-check-failed',
      severity: 'danger',
      message: `The solver finds the sized design short by up to ${check.worstShortfallM.toFixed(3)} m of pressure: treat it as not feasible.`,
      values: { worstShortfallM: check.worstShortfallM },
    });
  }
  let cost = 0;
  const piecesByLink: Record<string, SizedPiece[]> = {};
  const pipeByLink: Record<string, string> = {};
  context.sized.forEach((k, i) => {
    const id = context.net.linkIds[k];
    pipeByLink[id] = context.candidates[outcome.design[i]].pipe.id;
    piecesByLink[id] = outcome.pieces[i].map((piece) => ({
      pipeId: context.candidates[piece.candidate].pipe.id,
      lengthM: piece.lengthM,
    }));
    for (const piece of outcome.pieces[i]) cost += context.candidates[piece.candidate].costPerM * piece.lengthM;
  });
  return {
    feasible: check.feasible,
    cost,
    pipeByLink,
    ...(onePipePerLink ? {} : { piecesByLink }),
    solution: check.solution,
    method,
    provenOptimal: outcome.provenOptimal && check.feasible,
    singleSize: singleSizeOf(context),
    warnings,
  };
}
