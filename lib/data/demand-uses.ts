import 'server-only';
// The engine's name starts with "use"; renamed so the hooks lint rule does not mistake it for a React hook.
import { useDemand as demandOfOneUse } from '../../hydraulics/index';
import { models } from '../../models';
import { notFound } from '../errors';
import { toWaterUse } from '../lift/demand';
import type { DemandUseRecord } from '../lift/records';
import type { DemandUseInput } from '../validations/demand-uses';
import { demandUseRecord } from './lift-records';

export async function listDemandUses(projectId: string): Promise<DemandUseRecord[]> {
  const rows = await models().DemandUse.findAll({
    where: { projectId },
    order: [
      ['position', 'ASC'],
      ['createdAt', 'ASC'],
    ],
  });
  return rows.map(demandUseRecord);
}

/** A use the demand engine would refuse is refused here (400) before it is stored. */
function assertComputable(input: DemandUseInput): void {
  demandOfOneUse({ use: toWaterUse(input) });
}

export async function createDemandUse(projectId: string, input: DemandUseInput): Promise<DemandUseRecord> {
  assertComputable(input);
  const { DemandUse, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const last =
      (await DemandUse.max<number | null, InstanceType<typeof DemandUse>>('position', {
        where: { projectId },
        transaction,
      })) ?? -1;
    return demandUseRecord(await DemandUse.create({ ...input, projectId, position: last + 1 }, { transaction }));
  });
}

export async function updateDemandUse(
  projectId: string,
  useId: string,
  input: DemandUseInput,
): Promise<DemandUseRecord> {
  assertComputable(input);
  const { DemandUse, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const row = await DemandUse.findOne({
      where: { id: useId, projectId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!row) throw notFound('No such use in this project');
    await row.update(input, { transaction });
    return demandUseRecord(row);
  });
}

export async function deleteDemandUse(projectId: string, useId: string): Promise<void> {
  const removed = await models().DemandUse.destroy({ where: { id: useId, projectId } });
  if (removed === 0) throw notFound('No such use in this project');
}
