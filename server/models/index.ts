import type { Sequelize } from 'sequelize';
import { Membership } from './membership';
import { Study } from './study';
import { Team } from './team';
import { User } from './user';

export type Models = { User: typeof User; Team: typeof Team; Membership: typeof Membership; Study: typeof Study };

export function initModels(sequelize: Sequelize): Models {
  for (const model of [User, Team, Membership, Study]) model.initModel(sequelize);

  User.hasMany(Membership, { foreignKey: { name: 'userId', field: 'user_id', allowNull: false }, as: 'memberships' });
  Membership.belongsTo(User, { foreignKey: { name: 'userId', field: 'user_id', allowNull: false }, as: 'user' });
  Team.hasMany(Membership, { foreignKey: { name: 'teamId', field: 'team_id', allowNull: false }, as: 'memberships' });
  Membership.belongsTo(Team, { foreignKey: { name: 'teamId', field: 'team_id', allowNull: false }, as: 'team' });
  Team.hasMany(Study, { foreignKey: { name: 'teamId', field: 'team_id', allowNull: false }, as: 'studies' });
  Study.belongsTo(Team, { foreignKey: { name: 'teamId', field: 'team_id', allowNull: false }, as: 'team' });
  Study.belongsTo(User, { foreignKey: { name: 'authorId', field: 'author_id', allowNull: false }, as: 'author' });

  return { User, Team, Membership, Study };
}

export { Membership, Study, Team, User };
export type { Role } from './membership';
