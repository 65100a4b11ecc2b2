import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { DefaultSections } from '../../src/core/study';
import { STUDY_STATUSES, type StudyStatus } from '../../src/validation/studies';
import type { Team } from './team';
import type { User } from './user';

export class Study extends Model<InferAttributes<Study>, InferCreationAttributes<Study>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team['id']>;
  declare authorId: ForeignKey<User['id']>;
  declare title: string;
  declare description: CreationOptional<string>;
  declare status: CreationOptional<StudyStatus>;
  /** The study document (docs/study-format.md), stored as JSON text. */
  declare document: CreationOptional<Record<string, unknown> | null>;
  /** The team defaults the study was started with (`defaultSections`), null for studies started from a file or a copy without. */
  declare teamDefaults: CreationOptional<DefaultSections | null>;
  /** Bumped on every save; a save names the version it started from. */
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare author?: NonAttribute<User>;
  declare team?: NonAttribute<Team>;

  static initModel(sequelize: Sequelize) {
    Study.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        title: { type: DataTypes.STRING(200), allowNull: false },
        description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        status: {
          type: DataTypes.STRING(24),
          allowNull: false,
          defaultValue: 'draft',
          validate: { isIn: [STUDY_STATUSES as unknown as string[]] },
        },
        document: { type: DataTypes.JSON, allowNull: true },
        teamDefaults: { type: DataTypes.JSON, allowNull: true, field: 'team_defaults' },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
      },
      { sequelize, tableName: 'studies', modelName: 'Study' },
    );
  }
}
