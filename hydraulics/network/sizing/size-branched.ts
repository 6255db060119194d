import type { NetworkInput, NetworkLink, NetworkNode, NetworkPipe, NetworkWarning } from '../types';
import { requiredPressureHeadM, velocityHolds } from './design-check';
import { loadHighs } from './highs-solver';
import type { SizingContext } from './sizing-context';
import { lossesOf, treeProgram, type LinkChoices } from './tree-program';
import type { TreeFlows } from './tree-flows';

/** What the program decided for a branched network. */
export interface BranchedOutcome {
  solved: boolean;
  provenOptimal: boolean;
  /** Candidate per sized link (the longest piece when split). */
  design: Int32Array;
  /** Pieces per sized link (one piece when not split), upstream (largest) first. */
  pieces: { candidate: number; lengthM: number }[][];
  warnings: NetworkWarning[];
}

/** Allowed candidates of each sized link at the tree's flows; warnings for links nothing fits. */
export function linkChoices(
  context: SizingContext,
  flowOf: (link: number) => number,
  warnings: NetworkWarning[],
): LinkChoices[] | undefined {
  const { net, candidates, rules } = context;
  let ok = true;
  const choices = context.sized.map((k, i) => {
    const flow = flowOf(k);
    const id = net.linkIds[k];
    if ((net.status[k] === 'check-valve' || net.status[k] === 'float-valve') && flow < 0) {
      ok = false;
      warnings.push({
        code: 'flow-against-valve',
        severity: 'danger',
        message: `The demand below "${id}" must flow back through its ${net.status[k]}: no pipe size can serve it.`,
        values: { flowM3s: flow },
        elementId: id,
      });
    }
    const allowed = context.ratedByLink[i].filter((c) => velocityHolds(candidates[c].pipe, flow, rules));
    if (allowed.length === 0) {
      ok = false;
      warnings.push({
        code: 'no-candidate-fits',
        severity: 'danger',
        message: `No candidate pipe suits "${id}": at ${(Math.abs(flow) * 1000).toFixed(2)} L/s each is too small for the velocity limit, outside the velocity band, or rated below the ${(context.staticByLink.get(id) ?? 0).toFixed(1)} m of static head there.`,
        values: { flowM3s: flow, staticPressureHeadM: context.staticByLink.get(id) ?? 0 },
        elementId: id,
      });
    }
    return { link: k, allowed, ...lossesOf(net, k, allowed, candidates, flow, net.minorK[k]) };
  });
  return ok ? choices : undefined;
}

function headNotEnough(nodeIds: string[]): NetworkWarning {
  return {
    code: 'head-not-enough',
    severity: 'danger',
    message: `No pipe size helps at ${nodeIds.map((id) => `"${id}"`).join(', ')}: the water level feeding ${nodeIds.length === 1 ? 'it' : 'them'} is below the head needed even with no friction at all.`,
    values: { nodeIds },
  };
}

/**
 * Least-cost sizing of a branched network solved exactly with HiGHS: an LP over lengths when links
 * may be split, a MIP over one choice per link otherwise (see `treeProgram`).
 */
export async function sizeBranched(
  context: SizingContext,
  tree: TreeFlows,
  onePipePerLink: boolean,
): Promise<BranchedOutcome> {
  const warnings: NetworkWarning[] = [];
  const empty: BranchedOutcome = {
    solved: false,
    provenOptimal: false,
    design: new Int32Array(context.sized.length),
    pieces: [],
    warnings,
  };
  const choices = linkChoices(context, (k) => tree.flowM3s[k], warnings);
  if (!choices) return empty;
  const short = context.net.nodes
    .map((node, v) => ({ node, need: requiredPressureHeadM(context.net, v, context.rules) }))
    .filter(({ node, need }, v) => need !== undefined && !(context.staticHeadM[v] >= node.elevationM + need))
    .map(({ node }) => node.id);
  if (short.length > 0) {
    warnings.push(headNotEnough(short));
    return empty;
  }
  const program = treeProgram(
    context.net,
    tree,
    choices,
    context.candidates,
    (v) => requiredPressureHeadM(context.net, v, context.rules),
    onePipePerLink,
  );
  if (program.impossible.length > 0) {
    warnings.push(headNotEnough(program.impossible));
    return empty;
  }
  const highs = await loadHighs();
  const timeLimit = Math.max(0.5, (context.deadline - Date.now()) / 1000);
  const result = highs.solve(program.text, {
    output_flag: false,
    time_limit: timeLimit,
    mip_rel_gap: 0,
    mip_abs_gap: 0,
  });
  const hasSolution =
    result.Status === 'Optimal' || (result.Status === 'Time limit reached' && Object.keys(result.Columns).length > 0);
  if (!hasSolution) {
    warnings.push({
      code: result.Status === 'Infeasible' ? 'no-feasible-design' : 'sizing-stopped',
      severity: 'danger',
      message:
        result.Status === 'Infeasible'
          ? 'No mix of the candidate pipes gives every outlet its residual pressure within the velocity band: add larger candidates, lower the residual wanted, or raise the source.'
          : `The sizing program stopped without a design (${result.Status}).`,
      values: { status: result.Status },
    });
    return empty;
  }
  const design = new Int32Array(context.sized.length);
  const pieces = choices.map((choice, i) => {
    const laid = choice.allowed
      .map((c) => ({ candidate: c, value: result.Columns[program.column(i, c)]?.Primal ?? 0 }))
      .filter((entry) => entry.value > (onePipePerLink ? 0.5 : 1e-6))
      .map((entry) => ({
        candidate: entry.candidate,
        lengthM: onePipePerLink ? context.net.lengthM[choice.link] : entry.value,
      }))
      .sort(
        (a, b) =>
          context.candidates[b.candidate].pipe.insideDiameterM - context.candidates[a.candidate].pipe.insideDiameterM,
      );
    const used = laid.length > 0 ? laid : [{ candidate: choice.allowed[0], lengthM: context.net.lengthM[choice.link] }];
    design[i] = used.reduce((best, piece) => (piece.lengthM > best.lengthM ? piece : best)).candidate;
    return used;
  });
  return { solved: true, provenOptimal: result.Status === 'Optimal', design, pieces, warnings };
}

/**
 * The network with split links laid as consecutive pieces (largest first from the upstream end):
 * the first piece keeps the link's id, the rest are `<id>~2`, `<id>~3`, … joined at nodes
 * `<id>~1`, `<id>~2`, … whose elevations are taken on a straight grade between the link's ends.
 */
export function splitInput(
  context: SizingContext,
  pieces: BranchedOutcome['pieces'],
  flowOf: (link: number) => number,
) {
  const { input, net, candidates } = context;
  const nodes: NetworkNode[] = [...input.nodes];
  const links: NetworkLink[] = [...input.links];
  const sizedPipes = new Map<string, NetworkPipe>();
  context.sized.forEach((k, i) => {
    const link = input.links[k];
    const laid = pieces[i];
    if (laid.length === 1) {
      links[k] = { ...link, pipe: candidates[laid[0].candidate].pipe };
      sizedPipes.set(link.id, candidates[laid[0].candidate].pipe);
      return;
    }
    const forward = flowOf(k) >= 0;
    const start = forward ? link.from : link.to;
    const end = forward ? link.to : link.from;
    const startElevation = net.elevationM[net.nodeIndex.get(start) as number];
    const endElevation = net.elevationM[net.nodeIndex.get(end) as number];
    let done = 0;
    let previous = start;
    laid.forEach((piece, n) => {
      const last = n === laid.length - 1;
      done += piece.lengthM;
      const next = last ? end : `${link.id}~${n + 1}`;
      if (!last)
        nodes.push({
          id: next,
          kind: 'junction',
          elevationM: startElevation + ((endElevation - startElevation) * done) / link.lengthM,
        });
      const id = n === 0 ? link.id : `${link.id}~${n + 1}`;
      const pipe = candidates[piece.candidate].pipe;
      const laidLink: NetworkLink = {
        ...link,
        id,
        lengthM: piece.lengthM,
        pipe,
        from: forward ? previous : next,
        to: forward ? next : previous,
        minorK: n === 0 ? link.minorK : 0,
      };
      if (n === 0) links[k] = laidLink;
      else links.push(laidLink);
      sizedPipes.set(id, pipe);
      previous = next;
    });
  });
  const designInput: NetworkInput = { ...input, nodes, links };
  return { designInput, sizedPipes };
}
