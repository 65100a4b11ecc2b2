import { DataTypes, type QueryInterface } from 'sequelize';

type Ctx = { context: QueryInterface };

export async function up({ context: qi }: Ctx) {
  await qi.createTable('parts', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(120), allowNull: false },
    kind: { type: DataTypes.STRING(16), allowNull: false },
    package_name: { type: DataTypes.STRING(40), allowNull: false, defaultValue: '' },
    description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    tj_max_c: { type: DataTypes.DOUBLE, allowNull: false },
    thermal: { type: DataTypes.JSON, allowNull: false },
    electrical: { type: DataTypes.JSON, allowNull: true },
    soa: { type: DataTypes.JSON, allowNull: true },
    zth_points: { type: DataTypes.JSON, allowNull: true },
    zth_fit: { type: DataTypes.JSON, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    is_demo: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('parts', ['team_id', 'name'], { name: 'parts_team_name' });
}

export async function down({ context: qi }: Ctx) {
  await qi.dropTable('parts');
}
