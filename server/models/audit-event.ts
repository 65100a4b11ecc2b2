import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Team } from './team';
import type { User } from './user';

/** One line of a team's activity log: who did what, to what, when. */
export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team['id']>;
  declare actorId: ForeignKey<User['id']> | null;
  declare action: string;
  declare subjectType: string | null;
  declare subjectId: number | null;
  declare details: Record<string, unknown> | null;
  declare createdAt: CreationOptional<Date>;
  declare actor?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    AuditEvent.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        action: { type: DataTypes.STRING(64), allowNull: false },
        subjectType: { type: DataTypes.STRING(32), allowNull: true, field: 'subject_type' },
        subjectId: { type: DataTypes.INTEGER, allowNull: true, field: 'subject_id' },
        details: { type: DataTypes.JSON, allowNull: true },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'audit_events', modelName: 'AuditEvent', updatedAt: false },
    );
  }
}
