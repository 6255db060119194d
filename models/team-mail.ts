import type { Sequelize } from 'sequelize';
import { AccountToken } from './account-token';
import { Invitation } from './invitation';
import { MailOutbox } from './mail-outbox';
import { NotificationPreference } from './notification-preference';
import { SitePhoto } from './site-photo';
import { Team } from './team';

/** Account tokens, invitations, the mail outbox, notification preferences and site photos. */
export function initialiseTeamMailModels(sequelize: Sequelize): void {
  for (const model of [AccountToken, Invitation, MailOutbox, NotificationPreference, SitePhoto])
    model.initialise(sequelize);
  Invitation.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
}

export { AccountToken, Invitation, MailOutbox, NotificationPreference, SitePhoto };
