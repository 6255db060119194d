import type { Sequelize } from 'sequelize';
import { DemandUse } from './demand-use';
import { Project } from './project';
import { RamCommissioningReading } from './ram-commissioning-reading';
import { RamSite } from './ram-site';
import { SeasonalTaskRow } from './seasonal-task';
import { Tank } from './tank';
import { WaterSource } from './water-source';
import { YieldReadingRow } from './yield-reading';

/** Sources, yield readings, tanks, ram sites, commissioning readings, demand uses, seasonal tasks. */
export function initialiseLiftModels(sequelize: Sequelize): void {
  for (const model of [
    WaterSource,
    YieldReadingRow,
    Tank,
    RamSite,
    RamCommissioningReading,
    DemandUse,
    SeasonalTaskRow,
  ])
    model.initialise(sequelize);
  Project.hasMany(WaterSource, { foreignKey: 'projectId', as: 'waterSources' });
  WaterSource.hasMany(YieldReadingRow, { foreignKey: 'sourceId', as: 'readings' });
  Project.hasMany(Tank, { foreignKey: 'projectId', as: 'tanks' });
  Project.hasMany(RamSite, { foreignKey: 'projectId', as: 'ramSites' });
  RamSite.hasMany(RamCommissioningReading, { foreignKey: 'ramSiteId', as: 'commissioningReadings' });
  Project.hasMany(DemandUse, { foreignKey: 'projectId', as: 'demandUses' });
  Project.hasMany(SeasonalTaskRow, { foreignKey: 'projectId', as: 'seasonalTasks' });
}

export { DemandUse, RamCommissioningReading, RamSite, SeasonalTaskRow, Tank, WaterSource, YieldReadingRow };
