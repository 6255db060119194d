import 'server-only';
import { HydraulicsInputError } from '../../hydraulics/index';
import type { TankStorageView } from '../network/run-result';
import { runInWorker } from '../workers/pool';
import { loadNetworkContext } from './network-context';

export interface ProjectTankStorage {
  tanks: TankStorageView[];
  /** Names of the outlets by node id, for wording the served outlets. */
  outletNames: Record<string, string>;
  /** Why the network could not size storage per tank (a bad network), or null. */
  reason: string | null;
}

/**
 * Storage per tank from the outlets each one serves, computed now on the worker pool. A network that
 * cannot be solved gives the reason, never an error: the Lift & storage page keeps its own figures.
 */
export async function tankStorageOfProject(projectId: string): Promise<ProjectTankStorage> {
  const context = await loadNetworkContext(projectId);
  const outletNames = Object.fromEntries(
    context.records.nodes.filter((n) => n.kind === 'outlet').map((n) => [n.id, n.name]),
  );
  if (!context.records.nodes.some((n) => n.kind === 'tank'))
    return { tanks: [], outletNames, reason: 'No tank is a part of the network yet' };
  try {
    return {
      tanks: await runInWorker('network.tank-storage', context, { timeLimitMs: 60_000 }),
      outletNames,
      reason: null,
    };
  } catch (error) {
    if (error instanceof HydraulicsInputError) return { tanks: [], outletNames, reason: error.message };
    throw error;
  }
}
