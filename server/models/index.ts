import type { Sequelize } from 'sequelize';
import { AuthAttempt } from './auth-attempt';
import { AuditEvent } from './audit-event';
import { Comment } from './comment';
import { Heatsink } from './heatsink';
import { InterfaceMaterial } from './interface-material';
import { Invitation } from './invitation';
import { MailMessage } from './mail-message';
import { Membership } from './membership';
import { Part } from './part';
import { PasswordReset } from './password-reset';
import { Review } from './review';
import { Revision } from './revision';
import { Study } from './study';
import { Team } from './team';
import { TeamSetting } from './team-setting';
import { User } from './user';

const ALL = { User, Team, Membership, Study, Revision, Review, Comment, Invitation, PasswordReset, MailMessage, AuditEvent, Heatsink, InterfaceMaterial, Part, TeamSetting, AuthAttempt };
export type Models = typeof ALL;

const fk = (name: string, field: string, allowNull = false) => ({ foreignKey: { name, field, allowNull } });

export function initModels(sequelize: Sequelize): Models {
  for (const model of Object.values(ALL)) model.initModel(sequelize);

  User.hasMany(Membership, { ...fk('userId', 'user_id'), as: 'memberships' });
  Membership.belongsTo(User, { ...fk('userId', 'user_id'), as: 'user' });
  Team.hasMany(Membership, { ...fk('teamId', 'team_id'), as: 'memberships' });
  Membership.belongsTo(Team, { ...fk('teamId', 'team_id'), as: 'team' });

  Team.hasMany(Study, { ...fk('teamId', 'team_id'), as: 'studies' });
  Study.belongsTo(Team, { ...fk('teamId', 'team_id'), as: 'team' });
  Study.belongsTo(User, { ...fk('authorId', 'author_id'), as: 'author' });

  Study.hasMany(Revision, { ...fk('studyId', 'study_id'), as: 'revisions' });
  Revision.belongsTo(User, { ...fk('authorId', 'author_id', true), as: 'author' });
  Study.hasMany(Review, { ...fk('studyId', 'study_id'), as: 'reviews' });
  Review.belongsTo(User, { ...fk('reviewerId', 'reviewer_id', true), as: 'reviewer' });
  Study.hasMany(Comment, { ...fk('studyId', 'study_id'), as: 'comments' });
  Comment.belongsTo(User, { ...fk('authorId', 'author_id', true), as: 'author' });

  Team.hasMany(Invitation, { ...fk('teamId', 'team_id'), as: 'invitations' });
  Invitation.belongsTo(Team, { ...fk('teamId', 'team_id'), as: 'team' });
  Invitation.belongsTo(User, { ...fk('invitedById', 'invited_by_id', true), as: 'invitedBy' });
  PasswordReset.belongsTo(User, { ...fk('userId', 'user_id'), as: 'user' });
  Team.hasMany(AuditEvent, { ...fk('teamId', 'team_id'), as: 'auditEvents' });
  AuditEvent.belongsTo(User, { ...fk('actorId', 'actor_id', true), as: 'actor' });
  Team.hasMany(Heatsink, { ...fk('teamId', 'team_id'), as: 'heatsinks' });
  Team.hasMany(InterfaceMaterial, { ...fk('teamId', 'team_id'), as: 'interfaceMaterials' });
  Team.hasMany(Part, { ...fk('teamId', 'team_id'), as: 'parts' });
  Team.hasOne(TeamSetting, { ...fk('teamId', 'team_id'), as: 'settings' });
  TeamSetting.belongsTo(User, { ...fk('updatedById', 'updated_by_id', true), as: 'updatedBy' });

  return ALL;
}

export { AuditEvent, AuthAttempt, Comment, Heatsink, InterfaceMaterial, Invitation, MailMessage, Membership, Part, PasswordReset, Review, Revision, Study, Team, TeamSetting, User };
export type { Role } from './membership';
export type { CommentAnchor } from './comment';
export type { ReviewDecision } from './review';
