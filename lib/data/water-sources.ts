import 'server-only';
import type { Transaction } from 'sequelize';
import { models } from '../../models';
import { notFound, notInProject } from '../errors';
import type { WaterSourceRecord, YieldReadingRecord } from '../lift/records';
import type { WaterSourceInput, YieldReadingInput } from '../validations/water-sources';
import { sourceRecord, yieldReadingRecord } from './lift-records';

export interface SourceWithReadings extends WaterSourceRecord {
  readings: YieldReadingRecord[];
}

export async function listSources(projectId: string): Promise<SourceWithReadings[]> {
  const { WaterSource, YieldReading } = models();
  const rows = await WaterSource.findAll({ where: { projectId }, order: [['createdAt', 'ASC']] });
  const readings = rows.length
    ? await YieldReading.findAll({ where: { sourceId: rows.map((row) => row.id) }, order: [['measuredOn', 'DESC']] })
    : [];
  return rows.map((row) => ({
    ...sourceRecord(row),
    readings: readings.filter((reading) => reading.sourceId === row.id).map(yieldReadingRecord),
  }));
}

/** A chosen design reading must be one of this source's own readings. */
async function assertDesignReading(
  sourceId: string | null,
  input: WaterSourceInput,
  transaction: Transaction,
): Promise<void> {
  if (input.designReadingId === null) return;
  const found = sourceId
    ? await models().YieldReading.count({ where: { id: input.designReadingId, sourceId }, transaction })
    : 0;
  if (found === 0)
    throw notInProject(
      { designReadingId: ["The design reading is not one of this source's readings"] },
      "That reading is not one of this source's",
    );
}

export async function createSource(
  projectId: string,
  userId: string,
  input: WaterSourceInput,
): Promise<WaterSourceRecord> {
  const { WaterSource, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    await assertDesignReading(null, input, transaction);
    return sourceRecord(await WaterSource.create({ ...input, projectId, createdBy: userId }, { transaction }));
  });
}

export async function updateSource(
  projectId: string,
  sourceId: string,
  input: WaterSourceInput,
): Promise<WaterSourceRecord> {
  const { WaterSource, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const row = await WaterSource.findOne({
      where: { id: sourceId, projectId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!row) throw notFound('No such source in this project');
    await assertDesignReading(sourceId, input, transaction);
    await row.update(input, { transaction });
    return sourceRecord(row);
  });
}

export async function deleteSource(projectId: string, sourceId: string): Promise<void> {
  const removed = await models().WaterSource.destroy({ where: { id: sourceId, projectId } });
  if (removed === 0) throw notFound('No such source in this project');
}

export async function addYieldReading(
  projectId: string,
  sourceId: string,
  userId: string,
  input: YieldReadingInput,
): Promise<YieldReadingRecord> {
  const { WaterSource, YieldReading, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const source = await WaterSource.findOne({ where: { id: sourceId, projectId }, attributes: ['id'], transaction });
    if (!source) throw notFound('No such source in this project');
    return yieldReadingRecord(await YieldReading.create({ ...input, sourceId, createdBy: userId }, { transaction }));
  });
}

export async function deleteYieldReading(projectId: string, sourceId: string, readingId: string): Promise<void> {
  const { WaterSource, YieldReading } = models();
  const source = await WaterSource.findOne({ where: { id: sourceId, projectId }, attributes: ['id'] });
  const removed = source ? await YieldReading.destroy({ where: { id: readingId, sourceId } }) : 0;
  if (removed === 0) throw notFound('No such reading on this source');
}
