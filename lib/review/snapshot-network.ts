import type { NetworkContext } from '../network/context';
import { lineSummaryOf, type NetworkLineSummary, type NetworkView } from '../network/view';
import type { DesignSnapshot } from './snapshot-types';

/**
 * The network computation's input rebuilt from a revision alone: its records, its lines' frozen
 * designs and stations, its tanks and demand, and the frozen basis (ram outlets, yields, prices).
 * The same snapshot gives the same context, so a solve of it is repeatable. Null when the revision
 * has no network or was made before the basis was frozen.
 */
export function networkContextOfSnapshot(snapshot: DesignSnapshot): NetworkContext | null {
  const { network, networkBasis } = snapshot;
  if (!network || !networkBasis || network.nodes.length === 0) return null;
  const linked = new Set(network.links.flatMap((link) => (link.lineId ? [link.lineId] : [])));
  return {
    records: network,
    lines: snapshot.lines
      .filter((line) => linked.has(line.id) && line.routeId !== null && line.stations.length > 0)
      .map((line) => ({
        id: line.id,
        name: line.name,
        routeId: line.routeId,
        design: line.design,
        stations: line.stations,
      })),
    tanks: snapshot.lift.tanks,
    demandUses: snapshot.lift.demandUses,
    ...networkBasis,
  };
}

/**
 * What the schematic draws for a revision: its frozen network records and its lines' courses, with
 * no runs (a revision's solve is the frozen one). Null when the revision has no network.
 */
export function snapshotNetworkView(snapshot: DesignSnapshot): NetworkView | null {
  const network = snapshot.network;
  if (!network || network.nodes.length === 0) return null;
  const linked = new Set(network.links.flatMap((link) => (link.lineId ? [link.lineId] : [])));
  return {
    projectId: network.projectId,
    unitSystem: snapshot.project.unitSystem,
    records: network,
    lines: snapshot.lines
      .filter((line) => linked.has(line.id))
      .map((line) => lineSummaryOf(line, line.stations))
      .filter((line): line is NetworkLineSummary => line !== null),
    tanks: snapshot.lift.tanks,
    ramSites: snapshot.lift.ramSites.map(({ id, name }) => ({ id, name })),
    waterSources: snapshot.lift.sources.map(({ id, name }) => ({ id, name })),
    demandUses: [],
    runs: { solve: null, day: null, size: null },
  };
}
