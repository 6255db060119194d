import { HydraulicsInputError } from '../../errors';
import { assertNonNegative } from '../../input-guards';
import type { NetworkInput, NetworkLink, NetworkNode } from '../types';

/** Id of the node that stands for a filling tank's inlet in the sizing network. */
export function tankFillNodeId(tankId: string): string {
  return `${tankId}#fill`;
}

/**
 * The network as the sizing must see it when tanks have to be filled. A tank is a fixed level to the
 * outlets below it, but the trunk that feeds it must carry the water those outlets use in a day
 * within the tank's fill window: held at a fixed level the tank asks nothing of its trunk, and the
 * cheapest pipe wins. So each tank with a fill flow gets its inlet as an outlet of its own at the
 * overflow level (inlets discharge above the overflow) drawing that flow with no residual beyond it,
 * and every link laid into the tank (`to` = the tank) ends there. The tank keeps feeding the links
 * laid from it at its level. A float valve on the inlet stands open while the tank fills.
 */
export function withTankFills(input: NetworkInput, fills: Readonly<Record<string, number>> | undefined): NetworkInput {
  const entries = Object.entries(fills ?? {}).filter(([, flow]) => flow !== 0);
  if (entries.length === 0) return input;
  const byId = new Map(input.nodes.map((node) => [node.id, node]));
  const filled = new Set<string>();
  const extra: NetworkNode[] = [];
  for (const [tankId, flowM3s] of entries) {
    assertNonNegative(flowM3s, `tankFillFlowsM3s.${tankId}`);
    const tank = byId.get(tankId);
    if (!tank || tank.kind !== 'tank')
      throw new HydraulicsInputError(`tankFillFlowsM3s.${tankId}`, `"${tankId}" is not a tank of the network`);
    if (!input.links.some((link) => link.to === tankId)) {
      throw new HydraulicsInputError(
        `tankFillFlowsM3s.${tankId}`,
        `the tank "${tankId}" must be filled but no link is laid into it`,
      );
    }
    filled.add(tankId);
    const inletLevelM = tank.tank?.overflowLevelM ?? tank.waterLevelM ?? tank.elevationM;
    extra.push({
      id: tankFillNodeId(tankId),
      kind: 'outlet',
      elevationM: inletLevelM,
      demandM3s: flowM3s,
      minPressureHeadM: 0,
    });
  }
  const links = input.links.map((link): NetworkLink => {
    if (!filled.has(link.to)) return link;
    return {
      ...link,
      to: tankFillNodeId(link.to),
      ...(link.status === 'float-valve' ? { status: 'open' as const } : {}),
    };
  });
  return { ...input, nodes: [...input.nodes, ...extra], links };
}
