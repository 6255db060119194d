import type { NetworkRecords } from './records';
import type { LinkPieceResult, SolveRunResult } from './run-result';

/** What the network says about one line: what feeds it, its take-offs and the solved flow of each piece. */
export interface LineNetworkFlows {
  /** The node at the line's start, as the network joins it. */
  feed: { name: string; kind: string } | null;
  takeOffs: { name: string; chainageM: number }[];
  solved: boolean;
  /** Why there are no solved flows (a bad network, a line outside it). */
  reason: string | null;
  pieces: LinkPieceResult[];
}

/** The line's share of a network solve. */
export function lineNetworkFlows(records: NetworkRecords, lineId: string, solve: SolveRunResult | null, reason: string | null): LineNetworkFlows {
  const link = records.links.find((l) => l.lineId === lineId);
  const feedNode = link ? records.nodes.find((n) => n.id === link.fromNodeId) : undefined;
  const takeOffs = records.nodes
    .filter((n) => n.kind === 'junction' && n.lineId === lineId && n.chainageM !== null)
    .map((n) => ({ name: n.name, chainageM: n.chainageM! }))
    .sort((a, b) => a.chainageM - b.chainageM);
  const pieces = link && solve ? solve.links.find((l) => l.linkId === link.id)?.pieces ?? [] : [];
  return {
    feed: feedNode ? { name: feedNode.name, kind: feedNode.kind } : null,
    takeOffs,
    solved: pieces.length > 0,
    reason: link ? reason : 'This line is not a link of the network',
    pieces,
  };
}
