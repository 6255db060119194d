import 'server-only';
import { models } from '../../models';
import { buildLiftSummary, type LiftSummary } from '../lift/summary';
import type { LiftRecords } from '../lift/records';
import {
  commissioningRecord,
  demandUseRecord,
  ramSiteRecord,
  seasonalTaskRecord,
  sourceRecord,
  tankRecord,
  yieldReadingRecord,
} from './lift-records';

/** Every lift and storage row of a project, as plain records. */
export async function loadLiftRecords(projectId: string): Promise<LiftRecords> {
  const m = models();
  const where = { projectId };
  const [sources, ramSites, tanks, demandUses, seasonalTasks, routes] = await Promise.all([
    m.WaterSource.findAll({ where, order: [['createdAt', 'ASC']] }),
    m.RamSite.findAll({ where, order: [['createdAt', 'ASC']] }),
    m.Tank.findAll({ where, order: [['createdAt', 'ASC']] }),
    m.DemandUse.findAll({
      where,
      order: [
        ['position', 'ASC'],
        ['createdAt', 'ASC'],
      ],
    }),
    m.SeasonalTask.findAll({ where, order: [['dueOn', 'ASC']] }),
    m.Route.findAll({ where, attributes: ['id', 'name', 'lengthM'], order: [['name', 'ASC']] }),
  ]);
  const [yieldReadings, commissioning] = await Promise.all([
    sources.length ? m.YieldReading.findAll({ where: { sourceId: sources.map((row) => row.id) } }) : [],
    ramSites.length ? m.RamCommissioningReading.findAll({ where: { ramSiteId: ramSites.map((row) => row.id) } }) : [],
  ]);
  return {
    sources: sources.map(sourceRecord),
    yieldReadings: yieldReadings.map(yieldReadingRecord),
    ramSites: ramSites.map(ramSiteRecord),
    commissioning: commissioning.map(commissioningRecord),
    tanks: tanks.map(tankRecord),
    demandUses: demandUses.map(demandUseRecord),
    seasonalTasks: seasonalTasks.map(seasonalTaskRecord),
    routes: routes.map((route) => ({ id: route.id, name: route.name, lengthM: route.lengthM })),
  };
}

/** The lift and storage page's data: plans, yields, demand, storage and tasks, computed now. */
export async function getLiftSummary(projectId: string): Promise<LiftSummary> {
  return buildLiftSummary(await loadLiftRecords(projectId));
}
