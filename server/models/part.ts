import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Team } from './team';

export const PART_KINDS = ['regulator', 'bipolar', 'darlington', 'mosfet'] as const;
export type PartKind = (typeof PART_KINDS)[number];

/**
 * A pass element of the team's library. `thermal` and `electrical` are written exactly as a
 * study device's `package` and `electrical` (docs/study-format.md); `soa` is the SOA model.
 */
export class Part extends Model<InferAttributes<Part>, InferCreationAttributes<Part>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team['id']>;
  declare name: string;
  declare kind: PartKind;
  declare packageName: CreationOptional<string>;
  declare description: CreationOptional<string>;
  declare tjMaxC: number;
  declare thermal: Record<string, unknown>;
  declare electrical: Record<string, unknown> | null;
  declare soa: Record<string, unknown> | null;
  declare zthPoints: { timeS: number; zthKPerW: number }[] | null;
  declare zthFit: Record<string, unknown> | null;
  declare notes: CreationOptional<string>;
  declare isDemo: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Part.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        kind: { type: DataTypes.STRING(16), allowNull: false },
        packageName: { type: DataTypes.STRING(40), allowNull: false, defaultValue: '', field: 'package_name' },
        description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        tjMaxC: { type: DataTypes.DOUBLE, allowNull: false, field: 'tj_max_c' },
        thermal: { type: DataTypes.JSON, allowNull: false },
        electrical: { type: DataTypes.JSON, allowNull: true },
        soa: { type: DataTypes.JSON, allowNull: true },
        zthPoints: { type: DataTypes.JSON, allowNull: true, field: 'zth_points' },
        zthFit: { type: DataTypes.JSON, allowNull: true, field: 'zth_fit' },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        isDemo: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false, field: 'is_demo' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
      },
      { sequelize, tableName: 'parts', modelName: 'Part' },
    );
  }
}
