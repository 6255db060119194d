import 'server-only';
import { dailyDemand } from '../../hydraulics/index';
import { models } from '../../models';
import type { NetworkJob } from '../../models/network-job';
import { toWaterUse } from '../lift/demand';
import { outcomeOf } from '../lift/outcome';
import type { NetworkJobView, NetworkRunKind } from '../network/jobs';
import type { NetworkRunResult } from '../network/run-result';
import { lineSummaryOf, type NetworkLineSummary, type NetworkView } from '../network/view';
import { loadLiftRecords } from './lift-summary';
import { getLine, stationsOfLine } from './lines';
import { readNetworkRecords } from './network-records';

export function networkJobView(row: NetworkJob): NetworkJobView {
  return {
    id: row.id,
    kind: row.kind,
    status: row.status,
    progress: row.progress,
    stage: row.stage,
    result: (row.result ?? null) as NetworkRunResult | null,
    error: row.error ?? null,
    createdAt: row.createdAt.toISOString(),
    finishedAt: row.finishedAt ? row.finishedAt.toISOString() : null,
  };
}

async function lineSummary(lineId: string): Promise<NetworkLineSummary | null> {
  const line = await getLine(lineId);
  if (!line || !line.routeId) return null;
  return lineSummaryOf(line, await stationsOfLine(line.routeId, line));
}

/** The latest run of each kind of a project. */
export async function latestRuns(projectId: string): Promise<NetworkView['runs']> {
  const kinds: NetworkRunKind[] = ['solve', 'day', 'size'];
  const rows = await Promise.all(
    kinds.map((kind) => models().NetworkJob.findOne({ where: { projectId, kind }, order: [['createdAt', 'DESC']] })),
  );
  return {
    solve: rows[0] ? networkJobView(rows[0]) : null,
    day: rows[1] ? networkJobView(rows[1]) : null,
    size: rows[2] ? networkJobView(rows[2]) : null,
  };
}

/** The network page's data: records, what the pickers offer, each line's course and the latest runs. */
export async function networkView(projectId: string): Promise<NetworkView> {
  const project = await models().Project.findByPk(projectId, { attributes: ['unitSystem'] });
  const records = await readNetworkRecords(projectId);
  const lineIds = records.links.flatMap((link) => (link.lineId ? [link.lineId] : []));
  const [lift, lines, runs] = await Promise.all([
    loadLiftRecords(projectId),
    Promise.all(lineIds.map(lineSummary)),
    latestRuns(projectId),
  ]);
  const outletOf = new Map(records.demandUseTies.map((tie) => [tie.demandUseId, tie.outletNodeId]));
  return {
    projectId,
    unitSystem: project?.unitSystem ?? 'metric',
    records,
    lines: lines.filter((line): line is NetworkLineSummary => line !== null),
    tanks: lift.tanks,
    ramSites: lift.ramSites.map(({ id, name }) => ({ id, name })),
    waterSources: lift.sources.map(({ id, name }) => ({ id, name })),
    demandUses: lift.demandUses.map((use) => {
      const demand = outcomeOf(() => dailyDemand({ uses: [toWaterUse(use)] }));
      return {
        id: use.id,
        label: use.label || use.kind,
        kind: use.kind,
        outletNodeId: outletOf.get(use.id) ?? null,
        dailyM3: demand.ok ? demand.value.dailyVolumeM3 : null,
        peakM3s: demand.ok ? demand.value.peakFlowM3s : null,
      };
    }),
    runs,
  };
}
