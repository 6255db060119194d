import { db } from '../lib/db';
import { Membership } from './membership';
import { Project } from './project';
import { Team } from './team';
import { User } from './user';

let ready = false;

/** Initialises every model on the one Sequelize instance and wires the associations, once. */
export function models() {
  if (!ready) {
    const sequelize = db();
    User.initialise(sequelize);
    Team.initialise(sequelize);
    Membership.initialise(sequelize);
    Project.initialise(sequelize);

    Team.hasMany(Membership, { foreignKey: 'teamId', as: 'memberships' });
    Membership.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
    User.hasMany(Membership, { foreignKey: 'userId', as: 'memberships' });
    Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
    Team.hasMany(Project, { foreignKey: 'teamId', as: 'projects' });
    Project.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
    ready = true;
  }
  return { User, Team, Membership, Project, sequelize: db() };
}

export { Membership, Project, Team, User };
