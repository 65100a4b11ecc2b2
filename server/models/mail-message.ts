import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A message kept by the local fake mail transport (development and tests). */
export class MailMessage extends Model<InferAttributes<MailMessage>, InferCreationAttributes<MailMessage>> {
  declare id: CreationOptional<number>;
  declare to: string;
  declare subject: string;
  declare text: string;
  declare html: string;
  declare links: string[];
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    MailMessage.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        to: { type: DataTypes.STRING(254), allowNull: false },
        subject: { type: DataTypes.STRING(300), allowNull: false },
        text: { type: DataTypes.TEXT, allowNull: false },
        html: { type: DataTypes.TEXT, allowNull: false },
        links: { type: DataTypes.JSON, allowNull: false },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'mail_messages', modelName: 'MailMessage', updatedAt: false },
    );
  }
}
