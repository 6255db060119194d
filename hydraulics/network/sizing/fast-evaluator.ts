import { pipeAreaM2 } from '../../friction/pipe-flow';
import type { CompiledNetwork } from '../compile-network';
import { GradientSolver } from '../gradient-method';
import { LINEAR_BELOW_VELOCITY_MS, minorLossCoefficient } from '../link-loss';
import { ratingHolds, requiredPressureHeadM } from './design-check';
import type { SizingContext } from './sizing-context';
import { candidateLaw } from './tree-program';

/** Cost and verdict of a design, without building the full solution record. */
export interface QuickVerdict {
  feasible: boolean;
  cost: number;
  worstShortfallM: number;
  /** Flow per compiled link, m³/s. */
  flowM3s: Float64Array;
  /** Head loss per metre per compiled link, m/m (0 for links not sized). */
  slope: Float64Array;
}

/**
 * Checks designs quickly for the looped search: the network is compiled and its solver ordered
 * once; each design only swaps the sized links' friction laws and solves again from the last flows.
 */
export function fastEvaluator(context: SizingContext): (design: Int32Array) => QuickVerdict {
  const base = context.net;
  const net: CompiledNetwork = {
    ...base,
    laws: [...base.laws],
    minor: base.minor.slice(),
    diameterM: base.diameterM.slice(),
    linearBelowM3s: base.linearBelowM3s.slice(),
  };
  const solver = new GradientSolver(net, context.topology);
  const laws = context.candidates.map((candidate) => candidateLaw(net, candidate));
  const needs = Array.from({ length: net.nodeCount }, (_, v) => requiredPressureHeadM(net, v, context.rules));
  let warmFlows: Float64Array | undefined;
  return (design) => {
    let cost = 0;
    let ratingsHold = true;
    context.sized.forEach((k, i) => {
      const candidate = context.candidates[design[i]];
      const lengthM = net.lengthM[k];
      const law = laws[design[i]];
      net.laws[k] =
        law.kind === 'hazen-williams' ? { ...law, resistance: law.resistance * lengthM } : { ...law, lengthM };
      net.minor[k] = minorLossCoefficient(net.minorK[k], candidate.pipe.insideDiameterM);
      net.diameterM[k] = candidate.pipe.insideDiameterM;
      net.linearBelowM3s[k] = LINEAR_BELOW_VELOCITY_MS * pipeAreaM2(candidate.pipe.insideDiameterM);
      cost += candidate.costPerM * lengthM;
      if (!ratingHolds(candidate.pipe, context.staticByLink.get(net.linkIds[k]) ?? 0, net.settings.waterTemperatureC))
        ratingsHold = false;
    });
    const result = solver.solve(warmFlows);
    if (result.converged) warmFlows = result.flowM3s;
    let feasible = result.converged && ratingsHold;
    let worstShortfallM = 0;
    for (let v = 0; v < net.nodes.length; v++) {
      const need = needs[v];
      if (need === undefined || context.topology.isolated[v]) continue;
      const shortfall = net.elevationM[v] + need - result.headM[v];
      if (shortfall > 1e-6) {
        feasible = false;
        worstShortfallM = Math.max(worstShortfallM, shortfall);
      }
    }
    const slope = new Float64Array(net.linkCount);
    context.sized.forEach((k, i) => {
      const velocity = Math.abs(result.flowM3s[k]) / pipeAreaM2(net.diameterM[k]);
      if (velocity > context.rules.velocityMaxMs * (1 + 1e-9)) feasible = false;
      if (context.rules.velocityMinMs > 0 && velocity > 0 && velocity < context.rules.velocityMinMs * (1 - 1e-9))
        feasible = false;
      slope[k] = Math.abs(result.headM[net.from[k]] - result.headM[net.to[k]]) / Math.max(net.lengthM[k], 1e-9);
      void i;
    });
    return { feasible, cost, worstShortfallM, flowM3s: result.flowM3s, slope };
  };
}
