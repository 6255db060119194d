/** What the delivered-flow solver needs: the delivered flow for a given delivery head. */
export interface DeliverySolveOptions {
  /** Total delivered flow the pumps give against a delivery head, m³/s (falls as the head rises). */
  deliveredAtHeadM3s: (deliveryHeadM: number) => number;
  liftM: number;
  frictionM: (flowM3s: number) => number;
}

export interface DeliverySolveResult {
  deliveredFlowM3s: number;
  deliveryFrictionM: number;
  iterations: number;
}

const RELATIVE_TOLERANCE = 1e-10;
const MAX_ITERATIONS = 200;

/**
 * The delivered flow sets the delivery-pipe friction and the friction sets the flow, so solve
 * q = f(lift + friction(q)). f falls as q rises, so the root is single and bisection between 0 and
 * the frictionless flow always finds it (plain substitution can oscillate on long, thin pipes).
 */
export function solveDeliveredFlow({
  deliveredAtHeadM3s,
  liftM,
  frictionM,
}: DeliverySolveOptions): DeliverySolveResult {
  const frictionless = deliveredAtHeadM3s(liftM);
  if (frictionless <= 0) return { deliveredFlowM3s: 0, deliveryFrictionM: 0, iterations: 0 };
  let low = 0;
  let high = frictionless;
  let iterations = 0;
  while (high - low > RELATIVE_TOLERANCE * frictionless && iterations < MAX_ITERATIONS) {
    iterations += 1;
    const mid = 0.5 * (low + high);
    if (deliveredAtHeadM3s(liftM + frictionM(mid)) > mid) low = mid;
    else high = mid;
  }
  const deliveredFlowM3s = 0.5 * (low + high);
  return { deliveredFlowM3s, deliveryFrictionM: frictionM(deliveredFlowM3s), iterations };
}
