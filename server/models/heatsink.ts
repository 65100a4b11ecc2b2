import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Team } from './team';

export type ForcedAirPoint = { airSpeedMPerS: number; rthKPerW: number };

/**
 * A team's catalogue heatsink. Rθsa is for still air at `referenceRiseK` above ambient and
 * scales with the rise as (ΔTref/ΔT)^convectionExponent; null is the laminar default, 1/4.
 */
export class Heatsink extends Model<InferAttributes<Heatsink>, InferCreationAttributes<Heatsink>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team['id']>;
  declare name: string;
  declare description: CreationOptional<string>;
  declare rthKPerW: number;
  declare referenceRiseK: number;
  declare convectionExponent: CreationOptional<number | null>;
  declare forcedAir: ForcedAirPoint[];
  declare massKg: number | null;
  declare material: 'aluminium' | 'copper' | null;
  declare capacityJPerK: number | null;
  declare widthMm: number | null;
  declare lengthMm: number | null;
  declare heightMm: number | null;
  declare devicesPerSink: CreationOptional<number>;
  declare price: number | null;
  declare notes: CreationOptional<string>;
  declare isDemo: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Heatsink.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        rthKPerW: { type: DataTypes.DOUBLE, allowNull: false, field: 'rth_k_per_w' },
        referenceRiseK: { type: DataTypes.DOUBLE, allowNull: false, field: 'reference_rise_k' },
        convectionExponent: { type: DataTypes.DOUBLE, allowNull: true, field: 'convection_exponent' },
        forcedAir: { type: DataTypes.JSON, allowNull: false, field: 'forced_air' },
        massKg: { type: DataTypes.DOUBLE, allowNull: true, field: 'mass_kg' },
        material: { type: DataTypes.STRING(16), allowNull: true },
        capacityJPerK: { type: DataTypes.DOUBLE, allowNull: true, field: 'capacity_j_per_k' },
        widthMm: { type: DataTypes.DOUBLE, allowNull: true, field: 'width_mm' },
        lengthMm: { type: DataTypes.DOUBLE, allowNull: true, field: 'length_mm' },
        heightMm: { type: DataTypes.DOUBLE, allowNull: true, field: 'height_mm' },
        devicesPerSink: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1, field: 'devices_per_sink' },
        price: { type: DataTypes.DOUBLE, allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        isDemo: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false, field: 'is_demo' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
      },
      { sequelize, tableName: 'heatsinks', modelName: 'Heatsink' },
    );
  }
}
