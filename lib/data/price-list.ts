import 'server-only';
import { findPipe } from '../../hydraulics/index';
import { models } from '../../models';
import { AppError } from '../errors';
import type { PriceListInput } from '../validations/network';

export interface PriceListItemRecord {
  pipeId: string;
  costPerM: number;
  notes: string;
}

export async function readPriceList(teamId: string): Promise<PriceListItemRecord[]> {
  const rows = await models().PriceListItem.findAll({ where: { teamId }, order: [['pipeId', 'ASC']] });
  return rows.map((row) => ({ pipeId: row.pipeId, costPerM: row.costPerM, notes: row.notes }));
}

/** Replaces a team's price list whole: every pipe must be in the catalogue and priced once. */
export async function replacePriceList(teamId: string, input: PriceListInput): Promise<PriceListItemRecord[]> {
  const fields: Record<string, string[]> = {};
  const seen = new Set<string>();
  input.items.forEach((item, index) => {
    if (!findPipe(item.pipeId)) fields[`items.${index}.pipeId`] = [`"${item.pipeId}" is not a pipe of the catalogue`];
    if (seen.has(item.pipeId)) fields[`items.${index}.pipeId`] = ['This pipe is priced twice'];
    seen.add(item.pipeId);
  });
  if (Object.keys(fields).length > 0) throw new AppError('bad_request', 'Some prices are not valid', fields);
  const { PriceListItem, sequelize } = models();
  await sequelize.transaction(async (transaction) => {
    await PriceListItem.destroy({ where: { teamId }, transaction });
    await PriceListItem.bulkCreate(
      input.items.map((item) => ({ ...item, teamId })),
      { transaction },
    );
  });
  return readPriceList(teamId);
}
