import { DataTypes, type QueryInterface } from 'sequelize';

type Ctx = { context: QueryInterface };

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

export async function up({ context: qi }: Ctx) {
  await qi.createTable('users', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    ...timestamps,
  });
  await qi.createTable('teams', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    ...timestamps,
  });
  await qi.createTable('memberships', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    role: { type: DataTypes.STRING(16), allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('memberships', ['user_id', 'team_id'], { unique: true, name: 'memberships_user_team' });
  await qi.addIndex('memberships', ['team_id'], { name: 'memberships_team' });
  await qi.createTable('studies', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    author_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' } },
    title: { type: DataTypes.STRING(200), allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    status: { type: DataTypes.STRING(24), allowNull: false, defaultValue: 'draft' },
    document: { type: DataTypes.JSON, allowNull: true },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    ...timestamps,
  });
  await qi.addIndex('studies', ['team_id', 'updated_at'], { name: 'studies_team_updated' });
  // The session store's table (connect-session-sequelize's default model "Session").
  await qi.createTable('Sessions', {
    sid: { type: DataTypes.STRING(36), primaryKey: true },
    expires: { type: DataTypes.DATE, allowNull: true },
    data: { type: DataTypes.TEXT, allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('Sessions', ['expires'], { name: 'sessions_expires' });
}

export async function down({ context: qi }: Ctx) {
  await qi.dropTable('Sessions');
  await qi.dropTable('studies');
  await qi.dropTable('memberships');
  await qi.dropTable('teams');
  await qi.dropTable('users');
}
