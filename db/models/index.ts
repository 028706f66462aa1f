import type { Sequelize } from 'sequelize';
import { initAuditEvent } from './audit-event';
import { initInvitation } from './invitation';
import { initMembership } from './membership';
import { initTeam } from './team';
import { initUser } from './user';
import { initUserPreference } from './user-preference';

export function initModels(sequelize: Sequelize) {
  const User = initUser(sequelize);
  const Team = initTeam(sequelize);
  const Membership = initMembership(sequelize);
  const Invitation = initInvitation(sequelize);
  const AuditEvent = initAuditEvent(sequelize);
  const UserPreference = initUserPreference(sequelize);

  Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Membership.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
  Invitation.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
  Invitation.belongsTo(User, { foreignKey: 'invitedById', as: 'invitedBy' });

  return { User, Team, Membership, Invitation, AuditEvent, UserPreference };
}

export type Models = ReturnType<typeof initModels>;
