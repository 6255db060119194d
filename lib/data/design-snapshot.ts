import 'server-only';
import type { Transaction } from 'sequelize';
import { models } from '../../models';
import type { DesignSnapshot, SnapshotLine } from '../review/snapshot-types';
import { lineSiteContext } from './line-context';
import { getLine, stationsOfLine } from './lines';
import { loadLiftRecords } from './lift-summary';
import { readNetworkRecords } from './network-records';

type PartGatherer<K extends keyof DesignSnapshot> = (projectId: string, transaction: Transaction) => Promise<DesignSnapshot[K]>;

async function projectPart(projectId: string, transaction: Transaction): Promise<DesignSnapshot['project']> {
  const p = await models().Project.findByPk(projectId, { transaction });
  if (!p) throw new Error(`project ${projectId} vanished while taking a snapshot`);
  return { name: p.name, description: p.description, unitSystem: p.unitSystem, siteNotes: p.siteNotes, frostDepthM: p.frostDepthM ?? null };
}

async function linesPart(projectId: string, transaction: Transaction): Promise<SnapshotLine[]> {
  const rows = await models().Line.findAll({ where: { projectId }, attributes: ['id'], order: [['name', 'ASC']], transaction });
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
      id: line.id, name: line.name, notes: line.notes, routeId: line.routeId, routeName: line.routeName,
      fromChainageM: line.fromChainageM, toChainageM: line.toChainageM, design: line.design, stations, context, problem,
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
const DESIGN_PARTS: { [K in Exclude<keyof DesignSnapshot, 'format'>]-?: PartGatherer<K> } = {
  project: projectPart,
  lines: linesPart,
  lift: liftPart,
  network: (projectId, transaction) => readNetworkRecords(projectId, transaction),
};

/** The whole project's design as it is now, read inside `transaction`. */
export async function takeDesignSnapshot(projectId: string, transaction: Transaction): Promise<DesignSnapshot> {
  const [project, lines, lift, network] = await Promise.all([
    DESIGN_PARTS.project(projectId, transaction),
    DESIGN_PARTS.lines(projectId, transaction),
    DESIGN_PARTS.lift(projectId, transaction),
    DESIGN_PARTS.network(projectId, transaction),
  ]);
  return { format: 1, project, lines, lift, network };
}
