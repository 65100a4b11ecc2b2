import { DataTypes, type QueryInterface } from 'sequelize';

type Ctx = { context: QueryInterface };

const createdAt = { created_at: { type: DataTypes.DATE, allowNull: false } };
const ref = (model: string, onDelete: 'CASCADE' | 'SET NULL' = 'CASCADE', allowNull = false) => ({
  type: DataTypes.INTEGER,
  allowNull,
  references: { model, key: 'id' },
  onDelete,
});

export async function up({ context: qi }: Ctx) {
  await qi.createTable('revisions', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    study_id: ref('studies'),
    number: { type: DataTypes.INTEGER, allowNull: false },
    author_id: ref('users', 'SET NULL', true),
    title: { type: DataTypes.STRING(200), allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    document: { type: DataTypes.JSON, allowNull: true },
    ...createdAt,
  });
  await qi.addIndex('revisions', ['study_id', 'number'], { unique: true, name: 'revisions_study_number' });

  await qi.createTable('reviews', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    study_id: ref('studies'),
    revision_number: { type: DataTypes.INTEGER, allowNull: false },
    reviewer_id: ref('users', 'SET NULL', true),
    decision: { type: DataTypes.STRING(24), allowNull: false },
    comment: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    ...createdAt,
  });
  await qi.addIndex('reviews', ['study_id'], { name: 'reviews_study' });

  await qi.createTable('comments', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    study_id: ref('studies'),
    author_id: ref('users', 'SET NULL', true),
    revision_number: { type: DataTypes.INTEGER, allowNull: false },
    body: { type: DataTypes.TEXT, allowNull: false },
    anchor: { type: DataTypes.JSON, allowNull: true },
    ...createdAt,
  });
  await qi.addIndex('comments', ['study_id'], { name: 'comments_study' });

  await qi.createTable('invitations', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: ref('teams'),
    email: { type: DataTypes.STRING(254), allowNull: false },
    role: { type: DataTypes.STRING(16), allowNull: false },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    invited_by_id: ref('users', 'SET NULL', true),
    expires_at: { type: DataTypes.DATE, allowNull: false },
    accepted_at: { type: DataTypes.DATE, allowNull: true },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    ...createdAt,
  });
  await qi.addIndex('invitations', ['team_id'], { name: 'invitations_team' });

  await qi.createTable('password_resets', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    user_id: ref('users'),
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    ...createdAt,
  });

  await qi.createTable('mail_messages', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    to: { type: DataTypes.STRING(254), allowNull: false },
    subject: { type: DataTypes.STRING(300), allowNull: false },
    text: { type: DataTypes.TEXT, allowNull: false },
    html: { type: DataTypes.TEXT, allowNull: false },
    links: { type: DataTypes.JSON, allowNull: false },
    ...createdAt,
  });

  await qi.createTable('audit_events', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: ref('teams'),
    actor_id: ref('users', 'SET NULL', true),
    action: { type: DataTypes.STRING(64), allowNull: false },
    subject_type: { type: DataTypes.STRING(32), allowNull: true },
    subject_id: { type: DataTypes.INTEGER, allowNull: true },
    details: { type: DataTypes.JSON, allowNull: true },
    ...createdAt,
  });
  await qi.addIndex('audit_events', ['team_id', 'created_at'], { name: 'audit_events_team_time' });
}

export async function down({ context: qi }: Ctx) {
  for (const t of ['audit_events', 'mail_messages', 'password_resets', 'invitations', 'comments', 'reviews', 'revisions']) {
    await qi.dropTable(t);
  }
}
