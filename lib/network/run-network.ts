import { solveNetwork } from '../../hydraulics/index';
import type { NetworkContext } from './context';
import { buildNetworkInput } from './network-input';
import type { SolveRunResult } from './run-result';
import { explainCoreError, solveRunResult } from './solve-result';

/** One steady solve of the network at the peak hour (every outlet drawing its peak, tanks at their lowest working level). */
export function solveNetworkRun(context: NetworkContext): SolveRunResult {
  const built = buildNetworkInput(context);
  try {
    return solveRunResult(built, solveNetwork(built.input));
  } catch (error) {
    throw explainCoreError(built, context.records, error);
  }
}
