import 'server-only';
import { models } from '../../models';
import { notFound } from '../errors';
import type { TankRecord } from '../lift/records';
import type { TankInput } from '../validations/tanks';
import { assertReferences } from './lift-ownership';
import { tankRecord } from './lift-records';

export async function listTanks(projectId: string): Promise<TankRecord[]> {
  const rows = await models().Tank.findAll({ where: { projectId }, order: [['createdAt', 'ASC']] });
  return rows.map(tankRecord);
}

const sourceReference = (input: TankInput) => [
  { field: 'supplySourceId', model: 'WaterSource' as const, id: input.supplySourceId, label: 'The supply source' },
];

export async function createTank(projectId: string, userId: string, input: TankInput): Promise<TankRecord> {
  const { Tank, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    await assertReferences(projectId, sourceReference(input), transaction);
    return tankRecord(await Tank.create({ ...input, projectId, createdBy: userId }, { transaction }));
  });
}

export async function updateTank(projectId: string, tankId: string, input: TankInput): Promise<TankRecord> {
  const { Tank, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const row = await Tank.findOne({ where: { id: tankId, projectId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!row) throw notFound('No such tank in this project');
    await assertReferences(projectId, sourceReference(input), transaction);
    await row.update(input, { transaction });
    return tankRecord(row);
  });
}

export async function deleteTank(projectId: string, tankId: string): Promise<void> {
  const removed = await models().Tank.destroy({ where: { id: tankId, projectId } });
  if (removed === 0) throw notFound('No such tank in this project');
}
