import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Study } from './study';
import type { User } from './user';

/** A saved state of a study; `number` equals the study's version when it was saved. */
export class Revision extends Model<InferAttributes<Revision>, InferCreationAttributes<Revision>> {
  declare id: CreationOptional<number>;
  declare studyId: ForeignKey<Study['id']>;
  declare authorId: ForeignKey<User['id']> | null;
  declare number: number;
  declare title: string;
  declare description: string;
  declare document: Record<string, unknown> | null;
  declare createdAt: CreationOptional<Date>;
  declare author?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    Revision.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        number: { type: DataTypes.INTEGER, allowNull: false },
        title: { type: DataTypes.STRING(200), allowNull: false },
        description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        document: { type: DataTypes.JSON, allowNull: true },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'revisions', modelName: 'Revision', updatedAt: false },
    );
  }
}
