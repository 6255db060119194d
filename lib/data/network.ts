import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { models } from '../../models';
import { AppError, notFound, notInProject } from '../errors';
import type { NetworkLinkRecord, NetworkNodeRecord } from '../network/records';
import type { NetworkLinkInput, NetworkNodeInput } from '../validations/network';
import { assertReferences } from './lift-ownership';
import { networkLinkRecord, networkNodeRecord } from './network-records';

/**
 * Writes to a project's network. Every write runs in one transaction and refuses (404 on the
 * field, as for an id in the address; nothing written) a body naming a record of another project.
 */

async function assertNodeReferences(
  projectId: string,
  input: NetworkNodeInput,
  transaction: Transaction,
): Promise<void> {
  await assertReferences(
    projectId,
    [
      { field: 'waterSourceId', model: 'WaterSource', id: input.waterSourceId, label: 'The water source' },
      { field: 'ramSiteId', model: 'RamSite', id: input.ramSiteId, label: 'The ram site' },
      { field: 'tankId', model: 'Tank', id: input.tankId, label: 'The tank' },
      { field: 'lineId', model: 'Line', id: input.lineId, label: 'The line' },
    ],
    transaction,
  );
  if (input.lineId !== null && input.chainageM !== null) {
    const line = await models().Line.findByPk(input.lineId, {
      attributes: ['fromChainageM', 'toChainageM', 'routeId'],
      transaction,
    });
    const route = line?.routeId
      ? await models().Route.findByPk(line.routeId, { attributes: ['lengthM'], transaction })
      : null;
    const from = line?.fromChainageM ?? 0;
    const to = line?.toChainageM ?? route?.lengthM ?? Number.POSITIVE_INFINITY;
    if (!(input.chainageM > from && input.chainageM < to)) {
      throw new AppError('bad_request', 'The take-off is not on the line', {
        chainageM: [`Place the take-off between chainage ${from} m and ${to} m of the line`],
      });
    }
  }
}

async function assertUnique(
  field: 'ramSiteId' | 'tankId',
  input: NetworkNodeInput,
  projectId: string,
  nodeId: string | null,
  transaction: Transaction,
) {
  const id = input[field];
  if (id === null) return;
  const where = { projectId, [field]: id, ...(nodeId ? { id: { [Op.ne]: nodeId } } : {}) };
  if ((await models().NetworkNode.count({ where, transaction })) > 0) {
    throw new AppError('bad_request', 'That record already has a node', {
      [field]: ['This record is already a node of the network'],
    });
  }
}

export async function createNetworkNode(projectId: string, input: NetworkNodeInput): Promise<NetworkNodeRecord> {
  const { NetworkNode, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    await assertNodeReferences(projectId, input, transaction);
    await assertUnique('ramSiteId', input, projectId, null, transaction);
    await assertUnique('tankId', input, projectId, null, transaction);
    return networkNodeRecord(await NetworkNode.create({ ...input, projectId }, { transaction }));
  });
}

export async function updateNetworkNode(
  projectId: string,
  nodeId: string,
  input: NetworkNodeInput,
): Promise<NetworkNodeRecord> {
  const { NetworkNode, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const row = await NetworkNode.findOne({
      where: { id: nodeId, projectId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!row) throw notFound('No such node in this network');
    await assertNodeReferences(projectId, input, transaction);
    await assertUnique('ramSiteId', input, projectId, nodeId, transaction);
    await assertUnique('tankId', input, projectId, nodeId, transaction);
    await row.update(input, { transaction });
    return networkNodeRecord(row);
  });
}

/** A node at the end of a line's link goes only with the line (or once the link is re-pointed). */
export async function deleteNetworkNode(projectId: string, nodeId: string): Promise<void> {
  const { NetworkNode, NetworkLink, sequelize } = models();
  await sequelize.transaction(async (transaction) => {
    const row = await NetworkNode.findOne({
      where: { id: nodeId, projectId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!row) throw notFound('No such node in this network');
    const lineLink = await NetworkLink.findOne({
      where: { projectId, kind: 'line', [Op.or]: [{ fromNodeId: nodeId }, { toNodeId: nodeId }] },
      transaction,
    });
    if (lineLink)
      throw new AppError(
        'conflict',
        `This node is an end of the line "${lineLink.name}"; join the line to another node first`,
      );
    await row.destroy({ transaction });
  });
}

async function assertLinkReferences(
  projectId: string,
  input: NetworkLinkInput,
  linkId: string | null,
  transaction: Transaction,
): Promise<void> {
  await assertReferences(
    projectId,
    [
      { field: 'fromNodeId', model: 'NetworkNode', id: input.fromNodeId, label: 'The start node' },
      { field: 'toNodeId', model: 'NetworkNode', id: input.toNodeId, label: 'The end node' },
      { field: 'lineId', model: 'Line', id: input.lineId, label: 'The line' },
    ],
    transaction,
  );
  if (input.lineId !== null) {
    const where = { lineId: input.lineId, ...(linkId ? { id: { [Op.ne]: linkId } } : {}) };
    if ((await models().NetworkLink.count({ where, transaction })) > 0) {
      throw new AppError('bad_request', 'That line is already a link', {
        lineId: ['This line is already a link of the network'],
      });
    }
  }
}

export async function createNetworkLink(projectId: string, input: NetworkLinkInput): Promise<NetworkLinkRecord> {
  const { NetworkLink, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    await assertLinkReferences(projectId, input, null, transaction);
    return networkLinkRecord(await NetworkLink.create({ ...input, projectId }, { transaction }));
  });
}

export async function updateNetworkLink(
  projectId: string,
  linkId: string,
  input: NetworkLinkInput,
): Promise<NetworkLinkRecord> {
  const { NetworkLink, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const row = await NetworkLink.findOne({
      where: { id: linkId, projectId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!row) throw notFound('No such link in this network');
    if (row.kind === 'line' && (input.kind !== 'line' || input.lineId !== row.lineId)) {
      throw new AppError('bad_request', "A line's link always follows its line", {
        lineId: ['Join the line to other nodes instead'],
      });
    }
    await assertLinkReferences(projectId, input, linkId, transaction);
    await row.update(input, { transaction });
    return networkLinkRecord(row);
  });
}

/** A line's own link goes with the line; pipes and valves may be removed. */
export async function deleteNetworkLink(projectId: string, linkId: string): Promise<void> {
  const { NetworkLink, sequelize } = models();
  await sequelize.transaction(async (transaction) => {
    const row = await NetworkLink.findOne({
      where: { id: linkId, projectId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!row) throw notFound('No such link in this network');
    if (row.kind === 'line')
      throw new AppError('conflict', "A line's link goes with the line; delete the line on its page");
    await row.destroy({ transaction });
  });
}

/** Ties a demand use to the outlet that serves it (null unties it). */
export async function tieDemandUse(projectId: string, useId: string, outletNodeId: string | null): Promise<void> {
  const { DemandUse, NetworkNode, sequelize } = models();
  await sequelize.transaction(async (transaction) => {
    const use = await DemandUse.findOne({
      where: { id: useId, projectId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!use) throw notFound('No such demand use in this project');
    if (outletNodeId !== null) {
      const outlet = await NetworkNode.findOne({
        where: { id: outletNodeId, projectId },
        attributes: ['kind'],
        transaction,
      });
      if (!outlet)
        throw notInProject(
          { outletNodeId: ['Pick an outlet of this network'] },
          'That node is not part of this network',
        );
      if (outlet.kind !== 'outlet')
        throw new AppError('bad_request', 'Pick an outlet of this network', {
          outletNodeId: ['Pick an outlet of this network'],
        });
    }
    await use.update({ outletNodeId }, { transaction });
  });
}
