import { DataTypes, type QueryInterface } from 'sequelize';

type Ctx = { context: QueryInterface };

/**
 * Team defaults for new studies (one row per team), and on each study the defaults it was
 * started with, so the editor can say which values came from them.
 */
export async function up({ context: qi }: Ctx) {
  await qi.createTable('team_settings', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, unique: true, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    settings: { type: DataTypes.JSON, allowNull: false },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    updated_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addColumn('studies', 'team_defaults', { type: DataTypes.JSON, allowNull: true });
}

export async function down({ context: qi }: Ctx) {
  await qi.removeColumn('studies', 'team_defaults');
  await qi.dropTable('team_settings');
}
