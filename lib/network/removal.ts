import type { NetworkView } from './view';

/** What removing a part of the network takes with it, in the words the confirm dialog shows. */
export interface NodeRemoval {
  name: string;
  /** The joins (pipes, valves) that end at the part: they go with it. */
  joins: string[];
  /** Demand uses tied to the part: they stay on the Lift & storage page, tied to nothing. */
  untiedUses: string[];
  /** The line whose link ends at the part: it cannot go while the line ends there. */
  lineEnd: string | null;
}

/** A node's removal as the server will carry it out (its joins cascade, its uses are untied). */
export function nodeRemoval(view: Pick<NetworkView, 'records' | 'demandUses'>, nodeId: string): NodeRemoval {
  const node = view.records.nodes.find((n) => n.id === nodeId);
  const ending = view.records.links.filter((l) => l.fromNodeId === nodeId || l.toNodeId === nodeId);
  const tied = new Set(view.records.demandUseTies.filter((t) => t.outletNodeId === nodeId).map((t) => t.demandUseId));
  return {
    name: node?.name ?? 'this part',
    joins: ending.filter((l) => l.kind !== 'line').map((l) => l.name),
    untiedUses: view.demandUses.filter((u) => tied.has(u.id)).map((u) => u.label),
    lineEnd: ending.find((l) => l.kind === 'line')?.name ?? null,
  };
}
