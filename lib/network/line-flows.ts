import type { LineFlowPiece, LineStart } from '../../hydraulics/index';
import { lineStartFromRam } from '../lines/ram-start';
import type { NetworkContext } from './context';
import type { LinkPieceResult, SolveRunResult } from './run-result';

/**
 * What the network says about one line: what feeds it (its start head, from the node at its start),
 * its take-offs and the solved flow of each piece. The one resolver of a line's feed: the line's
 * analysis, warnings and report read their start and flow from here whenever the network knows them.
 */
export interface LineNetworkFlows {
  /** The node at the line's start, as the network joins it. */
  feed: { name: string; kind: string } | null;
  /**
   * The line's start from that node (source or tank level, ram outlet head, solved head at a take-off); null when the
   * network cannot say.
   */
  start: LineStart | null;
  /** Where the start comes from, in words. */
  startFrom: string | null;
  takeOffs: { name: string; chainageM: number }[];
  solved: boolean;
  /** Why there are no solved flows (a bad network, a line outside it, water running back up the line). */
  reason: string | null;
  pieces: LinkPieceResult[];
  /** The flow per piece for the line analysis (increasing chainage), or null when the network gives none. */
  schedule: LineFlowPiece[] | null;
}

/** Below this a piece's flow is taken as none rather than as running back up the line, m³/s. */
const STILL_FLOW_M3S = 1e-9;

function startOf(
  context: NetworkContext,
  nodeId: string,
  solve: SolveRunResult | null,
  lineStartGroundM: number,
): { start: LineStart; from: string } | null {
  const node = context.records.nodes.find((n) => n.id === nodeId);
  if (!node) return null;
  const solvedHead = solve?.nodes.find((n) => n.nodeId === nodeId)?.headM ?? null;
  switch (node.kind) {
    case 'source':
      // A source standing for a typed pump (outlet head while delivering, shut-off head against a shut line).
      if (node.data.typedPumpHead)
        return { start: { kind: 'pump', ...node.data.typedPumpHead }, from: `the pump heads typed for ${node.name}` };
      return node.data.waterLevelM == null
        ? null
        : { start: { kind: 'water-level', levelM: node.data.waterLevelM }, from: `the water level of ${node.name}` };
    case 'tank': {
      const tank = context.tanks.find((t) => t.id === node.tankId);
      const floor = tank?.baseElevationM ?? node.elevationM;
      if (!tank || floor === null) return null;
      // The outlets' worst case: the tank at its lowest working level (as the peak-hour solve holds it).
      return {
        start: { kind: 'water-level', levelM: floor + tank.lowLevelM },
        from: `the lowest working level of ${node.name}`,
      };
    }
    case 'break-pressure-tank': {
      const level = node.data.waterLevelM ?? node.elevationM;
      return level === null
        ? null
        : { start: { kind: 'water-level', levelM: level }, from: `the water level of ${node.name}` };
    }
    case 'ram-outlet': {
      const outlet = context.ramOutlets.find((o) => o.ramSiteId === node.ramSiteId);
      return outlet
        ? { start: lineStartFromRam(outlet, lineStartGroundM).start, from: `the ram plan of ${node.name}` }
        : null;
    }
    default: {
      // A line starting at a take-off or an outlet of another line: the solved head there while
      // delivering, and the highest fixed water level of the network with everything shut.
      if (solvedHead === null || !solve) return null;
      const fixed = solve.nodes.filter((n) => {
        const kind = context.records.nodes.find((r) => r.id === n.nodeId)?.kind;
        return (kind === 'source' || kind === 'tank' || kind === 'break-pressure-tank') && n.headM !== null;
      });
      const staticHead = Math.max(solvedHead, ...fixed.map((n) => n.headM!));
      return {
        start: { kind: 'pump', outletHeadM: solvedHead, shutoffHeadM: staticHead },
        from: `the solved head at ${node.name}`,
      };
    }
  }
}

/** The line's share of a network solve: its feed, its take-offs and its flow per piece. */
export function lineNetworkFlows(
  context: NetworkContext,
  lineId: string,
  solve: SolveRunResult | null,
  reason: string | null,
): LineNetworkFlows {
  const { records } = context;
  const link = records.links.find((l) => l.lineId === lineId);
  const feedNode = link ? records.nodes.find((n) => n.id === link.fromNodeId) : undefined;
  const takeOffs = records.nodes
    .filter((n) => n.kind === 'junction' && n.lineId === lineId && n.chainageM !== null)
    .map((n) => ({ name: n.name, chainageM: n.chainageM! }))
    .sort((a, b) => a.chainageM - b.chainageM);
  const pieces =
    link && solve
      ? [...(solve.links.find((l) => l.linkId === link.id)?.pieces ?? [])].sort(
          (a, b) => (a.fromChainageM ?? 0) - (b.fromChainageM ?? 0),
        )
      : [];
  const line = context.lines.find((l) => l.id === lineId);
  const feed = link ? startOf(context, link.fromNodeId, solve, line?.stations[0]?.groundElevationM ?? 0) : null;
  const backwards = pieces.find((p) => p.flowM3s < -STILL_FLOW_M3S);
  const schedule =
    pieces.length > 0 && !backwards && pieces.every((p) => p.fromChainageM !== null)
      ? pieces.map((p) => ({ fromM: p.fromChainageM!, flowM3s: Math.max(0, p.flowM3s) }))
      : null;
  return {
    feed: feedNode ? { name: feedNode.name, kind: feedNode.kind } : null,
    start: feed?.start ?? null,
    startFrom: feed?.from ?? null,
    takeOffs,
    solved: pieces.length > 0,
    reason: !link
      ? 'This line is not a link of the network'
      : backwards
        ? 'In the network solve, water runs back up part of this line; its profile uses its own design flow'
        : reason,
    pieces,
    schedule,
  };
}
