// Every model, and every association in one place.
import { Membership } from './membership';
import { Project } from './project';
import { Session } from './session';
import { SignInThrottle } from './sign-in-throttle';
import { Team } from './team';
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

export { Membership, Project, Session, SignInThrottle, Team, User };
