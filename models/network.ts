import type { Sequelize } from 'sequelize';
import { DemandUse } from './demand-use';
import { Line } from './line';
import { NetworkJob } from './network-job';
import { NetworkLink } from './network-link';
import { NetworkNode } from './network-node';
import { PriceListItem } from './price-list-item';
import { Project } from './project';
import { Team } from './team';

/** Network nodes and links, the team price list and network jobs. */
export function initialiseNetworkModels(sequelize: Sequelize): void {
  for (const model of [NetworkNode, NetworkLink, PriceListItem, NetworkJob]) model.initialise(sequelize);
  Project.hasMany(NetworkNode, { foreignKey: 'projectId', as: 'networkNodes' });
  Project.hasMany(NetworkLink, { foreignKey: 'projectId', as: 'networkLinks' });
  NetworkLink.belongsTo(NetworkNode, { foreignKey: 'fromNodeId', as: 'fromNode' });
  NetworkLink.belongsTo(NetworkNode, { foreignKey: 'toNodeId', as: 'toNode' });
  NetworkLink.belongsTo(Line, { foreignKey: 'lineId', as: 'line' });
  NetworkNode.hasMany(DemandUse, { foreignKey: 'outletNodeId', as: 'demandUses' });
  Team.hasMany(PriceListItem, { foreignKey: 'teamId', as: 'priceList' });
  Project.hasMany(NetworkJob, { foreignKey: 'projectId', as: 'networkJobs' });
}

export { NetworkJob, NetworkLink, NetworkNode, PriceListItem };
