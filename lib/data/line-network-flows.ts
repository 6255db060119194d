import 'server-only';
import { HydraulicsInputError } from '../../hydraulics/index';
import { notFound } from '../errors';
import { lineNetworkFlows, type LineNetworkFlows } from '../network/line-flows';
import { runInWorker } from '../workers/pool';
import { getLine } from './lines';
import { loadNetworkContext } from './network-context';

/**
 * The network's flows along one line, solved now on the worker pool (the line page reads them
 * beside its profile). A network that cannot be solved gives the reason, never an error: the line
 * page keeps working on its own design flow.
 */
export async function networkFlowsOfLine(lineId: string): Promise<LineNetworkFlows> {
  const line = await getLine(lineId);
  if (!line) throw notFound();
  const context = await loadNetworkContext(line.projectId);
  try {
    const solve = await runInWorker('network.solve', context, { timeLimitMs: 30_000 });
    return lineNetworkFlows(context, lineId, solve, null);
  } catch (error) {
    if (error instanceof HydraulicsInputError) return lineNetworkFlows(context, lineId, null, error.message);
    throw error;
  }
}
