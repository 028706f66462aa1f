import type { Sequelize } from 'sequelize';
import { initAuditEvent } from './audit-event';
import { initComment } from './comment';
import { initDecision } from './decision';
import { initDriverReaction } from './driver-reaction';
import { initFit } from './fit';
import { initFitDataSet } from './fit-data-set';
import { initInvitation } from './invitation';
import { initMembership } from './membership';
import { initNotification } from './notification';
import { initPasswordResetToken } from './password-reset-token';
import { initRevokedSession } from './revoked-session';
import { initRoute } from './route';
import { initRouteReviewer } from './route-reviewer';
import { initRouteRevision } from './route-revision';
import { initRouteTransition } from './route-transition';
import { initStep } from './step';
import { initStepFlag } from './step-flag';
import { initStepLink } from './step-link';
import { initSpeciesImport } from './species-import';
import { initTeamSpecies } from './team-species';
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
  const Route = initRoute(sequelize);
  const Step = initStep(sequelize);
  const StepLink = initStepLink(sequelize);
  const DriverReaction = initDriverReaction(sequelize);
  const Comment = initComment(sequelize);
  const StepFlag = initStepFlag(sequelize);
  const Notification = initNotification(sequelize);
  const RouteRevision = initRouteRevision(sequelize);
  const RouteTransition = initRouteTransition(sequelize);
  const RouteReviewer = initRouteReviewer(sequelize);
  const Decision = initDecision(sequelize);
  const FitDataSet = initFitDataSet(sequelize);
  const Fit = initFit(sequelize);
  const PasswordResetToken = initPasswordResetToken(sequelize);
  const RevokedSession = initRevokedSession(sequelize);
  const SpeciesImport = initSpeciesImport(sequelize);
  const TeamSpecies = initTeamSpecies(sequelize);

  Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Membership.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
  Invitation.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
  Invitation.belongsTo(User, { foreignKey: 'invitedById', as: 'invitedBy' });

  Route.belongsTo(User, { foreignKey: 'updatedById', as: 'updatedBy' });
  Route.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
  Route.hasMany(Step, { foreignKey: 'routeId', as: 'steps' });
  Route.hasMany(StepLink, { foreignKey: 'routeId', as: 'links' });

  Comment.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
  Comment.belongsTo(User, { foreignKey: 'resolvedById', as: 'resolvedBy' });
  StepFlag.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
  StepFlag.belongsTo(User, { foreignKey: 'clearedById', as: 'clearedBy' });
  Notification.belongsTo(User, { foreignKey: 'actorId', as: 'actor' });
  Route.belongsTo(User, { foreignKey: 'deletedById', as: 'deletedBy' });
  RouteRevision.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
  RouteTransition.belongsTo(User, { foreignKey: 'actorId', as: 'actor' });
  RouteTransition.hasMany(RouteReviewer, { foreignKey: 'transitionId', as: 'reviewers' });
  RouteReviewer.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Decision.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
  SpeciesImport.belongsTo(User, { foreignKey: 'importedById', as: 'importedBy' });
  TeamSpecies.belongsTo(User, { foreignKey: 'updatedById', as: 'updatedBy' });

  Fit.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
  FitDataSet.belongsTo(User, { foreignKey: 'updatedById', as: 'updatedBy' });

  return { FitDataSet, Fit, User, PasswordResetToken, RevokedSession, Team, Membership, Invitation, AuditEvent, UserPreference, Route, Step, StepLink, DriverReaction, RouteRevision, RouteTransition, RouteReviewer, Comment, StepFlag, Notification, Decision, SpeciesImport, TeamSpecies };
}

export type Models = ReturnType<typeof initModels>;
