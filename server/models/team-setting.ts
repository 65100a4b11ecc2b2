import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { StudyDefaults } from '../../src/core/study';
import type { Team } from './team';
import type { User } from './user';

/** A team's defaults for the studies it starts (src/core/study/study-defaults.ts); one row per team. */
export class TeamSetting extends Model<InferAttributes<TeamSetting>, InferCreationAttributes<TeamSetting>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team['id']>;
  declare settings: StudyDefaults;
  /** Bumped on every change. */
  declare version: CreationOptional<number>;
  declare updatedById: ForeignKey<User['id']> | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare updatedBy?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    TeamSetting.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        settings: { type: DataTypes.JSON, allowNull: false },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
      },
      { sequelize, tableName: 'team_settings', modelName: 'TeamSetting' },
    );
  }
}
