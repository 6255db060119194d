import { db } from '../lib/db';
import { Activity } from './activity';
import { Attachment } from './attachment';
import { Comment } from './comment';
import { Line } from './line';
import {
  DemandUse,
  initialiseLiftModels,
  RamCommissioningReading,
  RamSite,
  SeasonalTaskRow,
  Tank,
  WaterSource,
  YieldReadingRow,
} from './lift';
import { Membership } from './membership';
import { initialiseNetworkModels, NetworkJob, NetworkLink, NetworkNode, PriceListItem } from './network';
import { Project } from './project';
import { Revision } from './revision';
import { Route } from './route';
import { RoutePoint } from './route-point';
import {
  AccountToken,
  initialiseTeamMailModels,
  Invitation,
  MailOutbox,
  NotificationPreference,
  SitePhoto,
} from './team-mail';
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
    Attachment.initialise(sequelize);
    Route.initialise(sequelize);
    RoutePoint.initialise(sequelize);
    Line.initialise(sequelize);
    initialiseLiftModels(sequelize);
    Revision.initialise(sequelize);
    Comment.initialise(sequelize);
    Activity.initialise(sequelize);
    initialiseNetworkModels(sequelize);
    initialiseTeamMailModels(sequelize);

    Team.hasMany(Membership, { foreignKey: 'teamId', as: 'memberships' });
    Membership.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
    User.hasMany(Membership, { foreignKey: 'userId', as: 'memberships' });
    Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
    Team.hasMany(Project, { foreignKey: 'teamId', as: 'projects' });
    Project.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
    Project.hasMany(Route, { foreignKey: 'projectId', as: 'routes' });
    Route.belongsTo(Project, { foreignKey: 'projectId', as: 'project' });
    Route.hasMany(RoutePoint, { foreignKey: 'routeId', as: 'points' });
    Project.hasMany(Attachment, { foreignKey: 'projectId', as: 'attachments' });
    Route.belongsTo(Attachment, { foreignKey: 'sourceAttachmentId', as: 'sourceAttachment' });
    Project.hasMany(Line, { foreignKey: 'projectId', as: 'lines' });
    Line.belongsTo(Project, { foreignKey: 'projectId', as: 'project' });
    Line.belongsTo(Route, { foreignKey: 'routeId', as: 'route' });
    ready = true;
  }
  return {
    User,
    Team,
    Membership,
    Project,
    Attachment,
    Route,
    RoutePoint,
    Line,
    Revision,
    Comment,
    Activity,
    WaterSource,
    YieldReading: YieldReadingRow,
    Tank,
    RamSite,
    RamCommissioningReading,
    DemandUse,
    SeasonalTask: SeasonalTaskRow,
    NetworkNode,
    NetworkLink,
    PriceListItem,
    NetworkJob,
    AccountToken,
    Invitation,
    MailOutbox,
    NotificationPreference,
    SitePhoto,
    sequelize: db(),
  };
}

export { Activity, Attachment, Comment, Line, Revision, Membership, Project, Route, RoutePoint, Team, User };
export { DemandUse, RamCommissioningReading, RamSite, SeasonalTaskRow, Tank, WaterSource, YieldReadingRow };
export { NetworkJob, NetworkLink, NetworkNode, PriceListItem };
export { AccountToken, Invitation, MailOutbox, NotificationPreference, SitePhoto };
