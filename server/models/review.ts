import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Study } from './study';
import type { User } from './user';

export const REVIEW_DECISIONS = ['approved', 'changes_requested'] as const;
export type ReviewDecision = (typeof REVIEW_DECISIONS)[number];

/** A reviewer's decision, attached to the revision it was given on. */
export class Review extends Model<InferAttributes<Review>, InferCreationAttributes<Review>> {
  declare id: CreationOptional<number>;
  declare studyId: ForeignKey<Study['id']>;
  declare reviewerId: ForeignKey<User['id']> | null;
  declare revisionNumber: number;
  declare decision: ReviewDecision;
  declare comment: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare reviewer?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    Review.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        revisionNumber: { type: DataTypes.INTEGER, allowNull: false, field: 'revision_number' },
        decision: { type: DataTypes.STRING(24), allowNull: false, validate: { isIn: [REVIEW_DECISIONS as unknown as string[]] } },
        comment: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'reviews', modelName: 'Review', updatedAt: false },
    );
  }
}
