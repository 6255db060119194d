import type { NetworkContext } from '../network/context';
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
      .map((line) => ({ id: line.id, name: line.name, routeId: line.routeId, design: line.design, stations: line.stations })),
    tanks: snapshot.lift.tanks,
    demandUses: snapshot.lift.demandUses,
    ...networkBasis,
  };
}
