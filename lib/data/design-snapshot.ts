import 'server-only';
import type { Transaction } from 'sequelize';
import { models } from '../../models';
import { AppError } from '../errors';
import { lineNetworkFlows } from '../network/line-flows';
import { networkContextOfSnapshot } from '../review/snapshot-network';
import type { DesignSnapshot, FrozenNetworkSolve, SnapshotLine } from '../review/snapshot-types';
import { runInWorker } from '../workers/pool';
import { lineSiteContext } from './line-context';
import { getLine, stationsOfLine } from './lines';
import { loadLiftRecords } from './lift-summary';
import { loadNetworkBasis } from './network-context';
import { readNetworkRecords } from './network-records';

type GatheredPart = Exclude<keyof DesignSnapshot, 'format' | 'networkSolve'>;
type PartGatherer<K extends keyof DesignSnapshot> = (
  projectId: string,
  transaction: Transaction,
) => Promise<DesignSnapshot[K]>;

async function projectPart(projectId: string, transaction: Transaction): Promise<DesignSnapshot['project']> {
  const p = await models().Project.findByPk(projectId, { transaction });
  if (!p) throw new Error(`project ${projectId} vanished while taking a snapshot`);
  return {
    name: p.name,
    description: p.description,
    unitSystem: p.unitSystem,
    siteNotes: p.siteNotes,
    frostDepthM: p.frostDepthM ?? null,
  };
}

async function linesPart(projectId: string, transaction: Transaction): Promise<SnapshotLine[]> {
  const rows = await models().Line.findAll({
    where: { projectId },
    attributes: ['id'],
    order: [['name', 'ASC']],
    transaction,
  });
  const context = await lineSiteContext(projectId);
  const out: SnapshotLine[] = [];
  for (const row of rows) {
    const line = await getLine(row.id);
    if (!line) continue;
    let stations: SnapshotLine['stations'] = [];
    let problem: string | null = null;
    if (!line.routeId) problem = 'The line had lost its route';
    else {
      try {
        stations = await stationsOfLine(line.routeId, line);
      } catch (error) {
        problem = error instanceof Error ? error.message : 'The route could not give stations';
      }
    }
    out.push({
      id: line.id,
      name: line.name,
      notes: line.notes,
      routeId: line.routeId,
      routeName: line.routeName,
      fromChainageM: line.fromChainageM,
      toChainageM: line.toChainageM,
      design: line.design,
      stations,
      context,
      problem,
    });
  }
  return out;
}

async function liftPart(projectId: string): Promise<DesignSnapshot['lift']> {
  const { sources, yieldReadings, ramSites, tanks, demandUses } = await loadLiftRecords(projectId);
  return { sources, yieldReadings, ramSites, tanks, demandUses };
}

/**
 * The design parts a revision freezes, one gatherer each. To freeze another part of the design
 * (the network), add its gatherer here and its key to DesignSnapshot: nothing else changes.
 */
const DESIGN_PARTS: { [K in GatheredPart]-?: PartGatherer<K> } = {
  project: projectPart,
  lines: linesPart,
  lift: liftPart,
  network: (projectId, transaction) => readNetworkRecords(projectId, transaction),
  networkBasis: async (projectId) => loadNetworkBasis(projectId, await loadLiftRecords(projectId)),
};

/** A solve this long is stopped and the revision records that it did not finish. */
const FROZEN_SOLVE_LIMIT_MS = 60_000;

/**
 * Solves the snapshot's own network at the peak hour on a worker thread, so the revision keeps its
 * outlet pressures as they were. A network that does not build or solve is recorded with the reason;
 * a busy server is an error (the revision is not made, rather than made without its solve).
 */
export async function solveFrozenNetwork(snapshot: DesignSnapshot): Promise<FrozenNetworkSolve | null> {
  const context = networkContextOfSnapshot(snapshot);
  if (!context) return null;
  try {
    return { ok: true, result: await runInWorker('network.solve', context, { timeLimitMs: FROZEN_SOLVE_LIMIT_MS }) };
  } catch (error) {
    if (error instanceof AppError && error.code === 'service_unavailable') throw error;
    // A network that cannot be built or does not solve (HydraulicsInputError naming the part, a time-out) is recorded,
    // not fatal.
    if (error instanceof Error) return { ok: false, problem: error.message };
    throw error;
  }
}

/** The whole project's design as it is now, read inside `transaction`, with its network solved as it stands. */
export async function takeDesignSnapshot(projectId: string, transaction: Transaction): Promise<DesignSnapshot> {
  const [project, lines, lift, network, networkBasis] = await Promise.all([
    DESIGN_PARTS.project(projectId, transaction),
    DESIGN_PARTS.lines(projectId, transaction),
    DESIGN_PARTS.lift(projectId, transaction),
    DESIGN_PARTS.network(projectId, transaction),
    DESIGN_PARTS.networkBasis(projectId, transaction),
  ]);
  const snapshot: DesignSnapshot = { format: 1, project, lines, lift, network, networkBasis };
  const networkSolve = await solveFrozenNetwork(snapshot);
  return { ...snapshot, lines: withFrozenFeeds(snapshot, networkSolve), networkSolve };
}

/**
 * Each line with the network's word on it as the revision froze it (its feed and the flow of each
 * piece, from the frozen solve), so the revision's line analyses read the same whatever the network
 * does later. A network that did not solve is frozen with its reason, as the line page shows it.
 */
function withFrozenFeeds(snapshot: DesignSnapshot, solve: FrozenNetworkSolve | null): SnapshotLine[] {
  const context = networkContextOfSnapshot(snapshot);
  if (!context || !solve) return snapshot.lines;
  return snapshot.lines.map((line) => ({
    ...line,
    context: {
      ...line.context,
      network: lineNetworkFlows(context, line.id, solve.ok ? solve.result : null, solve.ok ? null : solve.problem),
    },
  }));
}
