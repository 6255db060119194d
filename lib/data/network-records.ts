import 'server-only';
import type { Transaction } from 'sequelize';
import { models } from '../../models';
import type { NetworkLink } from '../../models/network-link';
import type { NetworkNode } from '../../models/network-node';
import type { NetworkLinkRecord, NetworkNodeRecord, NetworkRecords } from '../network/records';
import type { NetworkLinkInput, NetworkNodeInput } from '../validations/network';

/** Model rows -> plain records (the API shapes), never ORM instances. */
export const networkNodeRecord = (row: NetworkNode): NetworkNodeRecord => ({
  id: row.id,
  kind: row.kind,
  name: row.name,
  elevationM: row.elevationM,
  waterSourceId: row.waterSourceId,
  ramSiteId: row.ramSiteId,
  tankId: row.tankId,
  lineId: row.lineId,
  chainageM: row.chainageM,
  eastM: row.eastM,
  northM: row.northM,
  data: (row.data ?? {}) as NetworkNodeInput['data'],
  notes: row.notes,
});

export const networkLinkRecord = (row: NetworkLink): NetworkLinkRecord => ({
  id: row.id,
  kind: row.kind,
  name: row.name,
  fromNodeId: row.fromNodeId,
  toNodeId: row.toNodeId,
  lineId: row.lineId,
  data: (row.data ?? {}) as NetworkLinkInput['data'],
});

/**
 * The whole network of a project as plain objects, in a stable order (creation, then id): nodes,
 * links and which outlet each demand use is tied to. Pass a transaction to read it consistently
 * with other reads (a revision snapshot).
 */
export async function readNetworkRecords(projectId: string, transaction?: Transaction): Promise<NetworkRecords> {
  const { NetworkNode, NetworkLink, DemandUse } = models();
  const order: [string, string][] = [
    ['createdAt', 'ASC'],
    ['id', 'ASC'],
  ];
  const [nodes, links, uses] = await Promise.all([
    NetworkNode.findAll({ where: { projectId }, order, transaction }),
    NetworkLink.findAll({ where: { projectId }, order, transaction }),
    DemandUse.findAll({
      where: { projectId },
      attributes: ['id', 'outletNodeId'],
      order: [
        ['position', 'ASC'],
        ['id', 'ASC'],
      ],
      transaction,
    }),
  ]);
  return {
    projectId,
    nodes: nodes.map(networkNodeRecord),
    links: links.map(networkLinkRecord),
    demandUseTies: uses
      .filter((use) => use.outletNodeId !== null)
      .map((use) => ({ demandUseId: use.id, outletNodeId: use.outletNodeId! })),
  };
}
