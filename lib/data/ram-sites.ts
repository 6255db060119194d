import 'server-only';
import type { Transaction } from 'sequelize';
import { planRamPump, type RamPlanResult } from '../../hydraulics/index';
import { models } from '../../models';
import { notFound } from '../errors';
import type { PumpOutletHead } from '../lift/pump-outlet';
import { ramPlanOptions } from '../lift/ram-plan';
import type { RamSiteRecord, RouteOption } from '../lift/records';
import type { RamSiteInput } from '../validations/ram-sites';
import { ramOutletsOf } from '../lift/ram-outlets';
import { assertReferences } from './lift-ownership';
import { ramSiteRecord, tankRecord } from './lift-records';

export async function planContext(projectId: string, input: RamSiteInput, transaction: Transaction) {
  const { Route, Tank } = models();
  const route = input.deliveryPipe.routeId
    ? await Route.findOne({ where: { id: input.deliveryPipe.routeId, projectId }, transaction })
    : null;
  const tank = input.tankId ? await Tank.findOne({ where: { id: input.tankId, projectId }, transaction }) : null;
  const routes: RouteOption[] = route ? [{ id: route.id, name: route.name, lengthM: route.lengthM }] : [];
  return { routes, tankVolumeM3: tank?.volumeM3 ?? null, routeLengthM: route?.lengthM ?? null };
}

function rowFields(input: RamSiteInput, deliveryLengthM: number) {
  const { drivePipe, deliveryPipe } = input;
  return {
    name: input.name,
    sourceId: input.sourceId,
    tankId: input.tankId,
    driveFlowM3s: input.driveFlowM3s,
    fallM: input.fallM,
    driveLengthM: drivePipe.lengthM,
    driveInsideDiameterM: drivePipe.insideDiameterM,
    driveMaterial: drivePipe.material,
    driveRigid: drivePipe.rigid,
    liftM: input.liftM,
    pumpElevationM: input.pumpElevationM,
    deliveryLengthM,
    deliveryRouteId: deliveryPipe.routeId,
    deliveryPipeId: deliveryPipe.pipeId,
    deliveryInsideDiameterM: deliveryPipe.pipeId ? null : deliveryPipe.insideDiameterM,
    deliveryHazenC: deliveryPipe.pipeId ? null : deliveryPipe.hazenWilliamsC,
    deliveryRatingPa: deliveryPipe.pipeId ? null : deliveryPipe.pressureRatingPa,
    sizeClassId: input.sizeClassId,
    pumpCount: input.pumpCount,
    measuredEfficiency: input.measuredEfficiency,
    efficiencyTableId: input.efficiencyTableId,
    notes: input.notes,
  };
}

/** Checks references and plans the site before anything is written; a bad input throws a 400. */
async function preparedFields(projectId: string, input: RamSiteInput, transaction: Transaction) {
  await assertReferences(
    projectId,
    [
      { field: 'sourceId', model: 'WaterSource', id: input.sourceId, label: 'The source' },
      { field: 'tankId', model: 'Tank', id: input.tankId, label: 'The tank' },
      { field: 'deliveryPipe.routeId', model: 'Route', id: input.deliveryPipe.routeId, label: 'The delivery route' },
    ],
    transaction,
  );
  const context = await planContext(projectId, input, transaction);
  const plan = planRamPump(ramPlanOptions(input, context));
  return { fields: rowFields(input, context.routeLengthM ?? input.deliveryPipe.lengthM ?? 0), plan };
}

export interface SavedRamSite {
  ramSite: RamSiteRecord;
  plan: RamPlanResult;
}

export async function listRamSites(projectId: string): Promise<RamSiteRecord[]> {
  const rows = await models().RamSite.findAll({ where: { projectId }, order: [['createdAt', 'ASC']] });
  return rows.map(ramSiteRecord);
}

export async function createRamSite(projectId: string, userId: string, input: RamSiteInput): Promise<SavedRamSite> {
  const { RamSite, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const { fields, plan } = await preparedFields(projectId, input, transaction);
    const row = await RamSite.create({ ...fields, projectId, createdBy: userId }, { transaction });
    return { ramSite: ramSiteRecord(row), plan };
  });
}

export async function updateRamSite(projectId: string, siteId: string, input: RamSiteInput): Promise<SavedRamSite> {
  const { RamSite, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const row = await RamSite.findOne({ where: { id: siteId, projectId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!row) throw notFound('No such ram site in this project');
    const { fields, plan } = await preparedFields(projectId, input, transaction);
    await row.update(fields, { transaction });
    return { ramSite: ramSiteRecord(row), plan };
  });
}

export async function deleteRamSite(projectId: string, siteId: string): Promise<void> {
  const removed = await models().RamSite.destroy({ where: { id: siteId, projectId } });
  if (removed === 0) throw notFound('No such ram site in this project');
}

export type { PumpOutletHead };

/**
 * The pump outlet head of each plannable ram site of a project, for the line designer and the
 * network's ram-outlet nodes: plans the ram sites only (their tanks and routes), not the whole
 * lift summary. A delivery line that starts at a pump outlet takes `workingHeadM` above the pump.
 */
export async function pumpOutletHeadForProject(projectId: string): Promise<PumpOutletHead[]> {
  const m = models();
  const where = { projectId };
  const [ramSites, tanks, routes] = await Promise.all([
    m.RamSite.findAll({ where, order: [['createdAt', 'ASC']] }),
    m.Tank.findAll({ where, order: [['createdAt', 'ASC']] }),
    m.Route.findAll({ where, attributes: ['id', 'name', 'lengthM'] }),
  ]);
  return ramOutletsOf({
    ramSites: ramSites.map(ramSiteRecord),
    tanks: tanks.map(tankRecord),
    routes: routes.map((route) => ({ id: route.id, name: route.name, lengthM: route.lengthM })),
  });
}
