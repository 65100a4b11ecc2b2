import { DataTypes, type QueryInterface } from 'sequelize';

type Ctx = { context: QueryInterface };

const common = {
  id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
  team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
  name: { type: DataTypes.STRING(120), allowNull: false },
  notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
  is_demo: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

export async function up({ context: qi }: Ctx) {
  await qi.createTable('heatsinks', {
    ...common,
    description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    rth_k_per_w: { type: DataTypes.DOUBLE, allowNull: false },
    reference_rise_k: { type: DataTypes.DOUBLE, allowNull: false },
    forced_air: { type: DataTypes.JSON, allowNull: false },
    mass_kg: { type: DataTypes.DOUBLE, allowNull: true },
    material: { type: DataTypes.STRING(16), allowNull: true },
    capacity_j_per_k: { type: DataTypes.DOUBLE, allowNull: true },
    width_mm: { type: DataTypes.DOUBLE, allowNull: true },
    length_mm: { type: DataTypes.DOUBLE, allowNull: true },
    height_mm: { type: DataTypes.DOUBLE, allowNull: true },
    devices_per_sink: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    price: { type: DataTypes.DOUBLE, allowNull: true },
  });
  await qi.addIndex('heatsinks', ['team_id', 'name'], { name: 'heatsinks_team_name' });

  await qi.createTable('interface_materials', {
    ...common,
    kind: { type: DataTypes.STRING(16), allowNull: false },
    package_name: { type: DataTypes.STRING(40), allowNull: true },
    rth_k_per_w: { type: DataTypes.DOUBLE, allowNull: true },
    conductivity_w_per_mk: { type: DataTypes.DOUBLE, allowNull: true },
    thickness_mm: { type: DataTypes.DOUBLE, allowNull: true },
    contact_k_cm2_per_w: { type: DataTypes.DOUBLE, allowNull: true },
  });
  await qi.addIndex('interface_materials', ['team_id', 'name'], { name: 'interface_materials_team_name' });
}

export async function down({ context: qi }: Ctx) {
  await qi.dropTable('interface_materials');
  await qi.dropTable('heatsinks');
}
