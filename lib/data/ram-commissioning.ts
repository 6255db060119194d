import 'server-only';
import { planRamPump } from '../../hydraulics/index';
import { models } from '../../models';
import { failedOutcomeRefusal } from '../api/domain-errors';
import { notFound } from '../errors';
import { commissioningOutcome, type CommissioningView } from '../lift/commissioning';
import { ramPlanOptions, tablePlanOf } from '../lift/ram-plan';
import type { CommissioningRecord } from '../lift/records';
import type { CommissioningReadingInput } from '../validations/ram-sites';
import { commissioningRecord, ramSiteRecord } from './lift-records';
import { planContext } from './ram-sites';

/** Logs a commissioning reading; refused (400) when its figures cannot give an efficiency. */
export async function addCommissioningReading(
  projectId: string,
  siteId: string,
  userId: string,
  input: CommissioningReadingInput,
): Promise<{ reading: CommissioningRecord; result: CommissioningView }> {
  const { RamSite, RamCommissioningReading, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const site = await RamSite.findOne({ where: { id: siteId, projectId }, transaction });
    if (!site) throw notFound('No such ram site in this project');
    const record = ramSiteRecord(site);
    const context = await planContext(projectId, record, transaction);
    const plan = tablePlanOf(record, context) ?? planRamPump(ramPlanOptions(record, context));
    const outcome = commissioningOutcome(input, plan);
    if (!outcome.ok) throw failedOutcomeRefusal(outcome);
    const row = await RamCommissioningReading.create(
      { ...input, ramSiteId: siteId, createdBy: userId },
      { transaction },
    );
    return { reading: commissioningRecord(row), result: outcome.value };
  });
}

export async function deleteCommissioningReading(projectId: string, siteId: string, readingId: string): Promise<void> {
  const { RamSite, RamCommissioningReading } = models();
  const site = await RamSite.findOne({ where: { id: siteId, projectId }, attributes: ['id'] });
  const removed = site ? await RamCommissioningReading.destroy({ where: { id: readingId, ramSiteId: siteId } }) : 0;
  if (removed === 0) throw notFound('No such commissioning reading on this ram site');
}
