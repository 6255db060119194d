import { checkDesign, withPipes, type DesignCheck } from './design-check';
import { designCost, designPipes, type SizingContext } from './sizing-context';

/** A one-pipe-per-link design with its cost and verdict. */
export interface EvaluatedDesign {
  design: Int32Array;
  cost: number;
  check: DesignCheck;
}

/** Solves and checks a one-pipe-per-link design. */
export function evaluateDesign(context: SizingContext, design: Int32Array): EvaluatedDesign {
  const pipes = designPipes(context, design);
  const check = checkDesign(withPipes(context.input, pipes), context.net, context.staticByLink, pipes, context.rules);
  return { design, cost: designCost(context, design), check };
}

/** The cheapest single candidate that makes the whole network feasible, if any. */
export function cheapestSingleSize(context: SizingContext): EvaluatedDesign | undefined {
  for (let c = 0; c < context.candidates.length; c++) {
    if (!context.ratedByLink.every((rated) => rated.includes(c))) continue;
    const evaluated = evaluateDesign(context, new Int32Array(context.sized.length).fill(c));
    if (evaluated.check.feasible) return evaluated;
  }
  return undefined;
}
