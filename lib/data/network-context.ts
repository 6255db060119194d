import 'server-only';
import { ramOutletsOf } from '../lift/ram-outlets';
import { sourceYieldView } from '../lift/source-yield';
import type { LiftRecords } from '../lift/records';
import type { NetworkBasis, NetworkContext, NetworkLineContext } from '../network/context';
import { loadLiftRecords } from './lift-summary';
import { getLine, stationsOfLine } from './lines';
import { readNetworkRecords } from './network-records';
import { readPriceList } from './price-list';
import { teamOfProject } from './projects';

/** Every line that is a link of the network, with its stations (a line that lost its route is left out). */
async function networkLines(lineIds: string[]): Promise<NetworkLineContext[]> {
  const lines = await Promise.all(
    lineIds.map(async (lineId): Promise<NetworkLineContext | null> => {
      const line = await getLine(lineId);
      if (!line || !line.routeId) return null;
      const stations = await stationsOfLine(line.routeId, line);
      return { id: line.id, name: line.name, routeId: line.routeId, design: line.design, stations };
    }),
  );
  return lines.filter((line): line is NetworkLineContext => line !== null);
}

/**
 * The planned ram outlets, each source's design yield and the team's price list in force, from the project's lift
 * records.
 */
export async function loadNetworkBasis(projectId: string, lift: LiftRecords): Promise<NetworkBasis> {
  const teamId = await teamOfProject(projectId);
  const sourceYieldsM3s: Record<string, number | null> = {};
  for (const source of lift.sources) {
    const view = sourceYieldView(source, lift.yieldReadings, 0);
    sourceYieldsM3s[source.id] = view.design.ok ? view.design.value.designYieldM3s : null;
  }
  return {
    ramOutlets: ramOutletsOf(lift),
    sourceYieldsM3s,
    prices: teamId ? (await readPriceList(teamId)).map(({ pipeId, costPerM }) => ({ pipeId, costPerM })) : [],
  };
}

/** What a network computation of this project reads, loaded now. */
export async function loadNetworkContext(projectId: string): Promise<NetworkContext> {
  const records = await readNetworkRecords(projectId);
  const lineIds = records.links.flatMap((link) => (link.lineId ? [link.lineId] : []));
  const [lift, lines] = await Promise.all([loadLiftRecords(projectId), networkLines(lineIds)]);
  return {
    records,
    lines,
    tanks: lift.tanks,
    demandUses: lift.demandUses,
    ...(await loadNetworkBasis(projectId, lift)),
  };
}
