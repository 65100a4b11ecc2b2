import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Study } from './study';
import type { User } from './user';

/** Where on the results a comment points: a time on the heat curves or an SOA operating point. */
export type CommentAnchor = { kind: 'time'; timeS: number } | { kind: 'soa'; vceV: number; icA: number };

export class Comment extends Model<InferAttributes<Comment>, InferCreationAttributes<Comment>> {
  declare id: CreationOptional<number>;
  declare studyId: ForeignKey<Study['id']>;
  declare authorId: ForeignKey<User['id']> | null;
  declare revisionNumber: number;
  declare body: string;
  declare anchor: CommentAnchor | null;
  declare createdAt: CreationOptional<Date>;
  declare author?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    Comment.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        revisionNumber: { type: DataTypes.INTEGER, allowNull: false, field: 'revision_number' },
        body: { type: DataTypes.TEXT, allowNull: false },
        anchor: { type: DataTypes.JSON, allowNull: true },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'comments', modelName: 'Comment', updatedAt: false },
    );
  }
}
