import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Team } from './team';

/** A thermal interface: a typical Rθcs for a package, or conductivity and thickness over the contact area. */
export class InterfaceMaterial extends Model<InferAttributes<InterfaceMaterial>, InferCreationAttributes<InterfaceMaterial>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team['id']>;
  declare name: string;
  declare kind: 'per_package' | 'per_area';
  declare packageName: string | null;
  declare rthKPerW: number | null;
  declare conductivityWPerMK: number | null;
  declare thicknessMm: number | null;
  declare contactKCm2PerW: number | null;
  declare notes: CreationOptional<string>;
  declare isDemo: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    InterfaceMaterial.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        kind: { type: DataTypes.STRING(16), allowNull: false },
        packageName: { type: DataTypes.STRING(40), allowNull: true, field: 'package_name' },
        rthKPerW: { type: DataTypes.DOUBLE, allowNull: true, field: 'rth_k_per_w' },
        conductivityWPerMK: { type: DataTypes.DOUBLE, allowNull: true, field: 'conductivity_w_per_mk' },
        thicknessMm: { type: DataTypes.DOUBLE, allowNull: true, field: 'thickness_mm' },
        contactKCm2PerW: { type: DataTypes.DOUBLE, allowNull: true, field: 'contact_k_cm2_per_w' },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        isDemo: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false, field: 'is_demo' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
      },
      { sequelize, tableName: 'interface_materials', modelName: 'InterfaceMaterial' },
    );
  }
}
