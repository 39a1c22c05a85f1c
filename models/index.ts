// Every model, and every association in one place.
import { AuditEvent } from './audit-event';
import { BillingEvent } from './billing-event';
import { Invitation } from './invitation';
import { Membership } from './membership';
import { PasswordReset } from './password-reset';
import { Project } from './project';
import { Session } from './session';
import { SignInThrottle } from './sign-in-throttle';
import { Team } from './team';
import { TeamBilling } from './team-billing';
import { User } from './user';

User.hasMany(Membership, { foreignKey: 'userId', as: 'memberships' });
Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
Team.hasMany(Membership, { foreignKey: 'teamId', as: 'memberships' });
Membership.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
User.hasMany(Session, { foreignKey: 'userId', as: 'sessions' });
Session.belongsTo(User, { foreignKey: 'userId', as: 'user' });
Team.hasMany(Project, { foreignKey: 'teamId', as: 'projects' });
Project.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
Project.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
Team.hasMany(Invitation, { foreignKey: 'teamId', as: 'invitations' });
Invitation.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
Invitation.belongsTo(User, { foreignKey: 'invitedById', as: 'invitedBy' });
User.hasMany(PasswordReset, { foreignKey: 'userId', as: 'passwordResets' });
PasswordReset.belongsTo(User, { foreignKey: 'userId', as: 'user' });
Team.hasOne(TeamBilling, { foreignKey: 'teamId', as: 'billing' });
TeamBilling.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
BillingEvent.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
Team.hasMany(AuditEvent, { foreignKey: 'teamId', as: 'auditEvents' });
AuditEvent.belongsTo(User, { foreignKey: 'actorId', as: 'actor' });

export { AuditEvent, BillingEvent, Invitation, Membership, PasswordReset, Project, Session, SignInThrottle, Team, TeamBilling, User };
