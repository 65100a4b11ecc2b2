import type { Model, ModelStatic } from 'sequelize';
import { createDb } from '../../server/db';
import { createMigrator, migrateUp } from '../../server/migrate';
import { createTestDatabase, TEST_DIALECT, type TestDatabase } from './test-app';

describe('migrations', () => {
  let database: TestDatabase;
  let db: ReturnType<typeof createDb>;
  beforeAll(async () => {
    database = await createTestDatabase();
    db = createDb(database.url);
  });
  afterAll(async () => {
    await db.sequelize.close();
    await database.drop();
  });

  it('create every table, apply once only, and roll back cleanly', async () => {
    expect(db.dialect).toBe(TEST_DIALECT);
    expect(await migrateUp(db.sequelize)).toEqual(['0001-initial', '0002-team-work', '0003-catalogues', '0004-parts', '0005-team-settings', '0006-auth-attempts', '0007-convection-exponent']);
    expect(await migrateUp(db.sequelize)).toEqual([]);
    const tables = (await db.sequelize.getQueryInterface().showAllTables()).sort();
    expect(tables).toEqual(expect.arrayContaining([
        'Sessions', 'audit_events', 'auth_attempts', 'comments', 'heatsinks', 'interface_materials', 'invitations', 'mail_messages', 'memberships', 'parts',
        'password_resets', 'reviews', 'revisions', 'schema_migrations', 'studies', 'team_settings', 'teams', 'users',
      ]));

    await createMigrator(db.sequelize).down({ to: 0 });
    const after = await db.sequelize.getQueryInterface().showAllTables();
    expect(after).not.toContain('users');
    expect(after).not.toContain('revisions');
    expect(await migrateUp(db.sequelize)).toEqual(['0001-initial', '0002-team-work', '0003-catalogues', '0004-parts', '0005-team-settings', '0006-auth-attempts', '0007-convection-exponent']);
  });

  it('adds the heatsink convection exponent as a nullable column, keeps the rows on the way up and down', async () => {
    await migrateUp(db.sequelize);
    const migrator = createMigrator(db.sequelize);
    const qi = db.sequelize.getQueryInterface();
    await migrator.down({ to: '0007-convection-exponent' });
    expect(Object.keys(await qi.describeTable('heatsinks'))).not.toContain('convection_exponent');
    const now = new Date();
    const teamId = (await db.models.Team.create({ name: 'Migrated' })).id;
    await qi.bulkInsert('heatsinks', [{ team_id: teamId, name: 'Older sink', notes: '', is_demo: false, description: '', rth_k_per_w: 2, reference_rise_k: 75, forced_air: '[]', devices_per_sink: 1, created_at: now, updated_at: now }]);

    expect(await migrateUp(db.sequelize)).toEqual(['0007-convection-exponent']);
    const column = (await qi.describeTable('heatsinks')).convection_exponent;
    expect(column).toMatchObject({ allowNull: true });
    // A sink from before the column has no exponent: the laminar default applies.
    const older = await db.models.Heatsink.findOne({ where: { name: 'Older sink' } });
    expect(older!.convectionExponent).toBeNull();
    await older!.update({ convectionExponent: 1 / 3 });
    expect((await db.models.Heatsink.findByPk(older!.id))!.convectionExponent).toBeCloseTo(1 / 3, 12);

    await migrator.down({ to: '0007-convection-exponent' });
    expect(Object.keys(await qi.describeTable('heatsinks'))).not.toContain('convection_exponent');
    // The rest of the table is as 0003 made it: its index, and the team's rows go with the team.
    expect((await qi.showIndex('heatsinks') as { name: string }[]).map((i) => i.name)).toContain('heatsinks_team_name');
    const [rows] = await db.sequelize.query(`SELECT name, rth_k_per_w FROM heatsinks WHERE name = 'Older sink'`);
    expect(rows).toEqual([{ name: 'Older sink', rth_k_per_w: 2 }]);
    expect(await migrateUp(db.sequelize)).toEqual(['0007-convection-exponent']);
    await db.models.Team.destroy({ where: { id: teamId } });
    expect(await db.models.Heatsink.count({ where: { name: 'Older sink' } })).toBe(0);
  });

  // Column types as each dialect's describeTable names them, by Sequelize data type.
  const columnTypes: Record<string, Record<typeof TEST_DIALECT, RegExp>> = {
    INTEGER: { sqlite: /^INTEGER$/, postgres: /^INTEGER$/ },
    BIGINT: { sqlite: /^BIGINT$/, postgres: /^BIGINT$/ },
    STRING: { sqlite: /^VARCHAR\(\d+\)$/, postgres: /^CHARACTER VARYING\(\d+\)$/ },
    TEXT: { sqlite: /^TEXT$/, postgres: /^TEXT$/ },
    JSON: { sqlite: /^JSON$/, postgres: /^JSON$/ },
    BOOLEAN: { sqlite: /^TINYINT\(1\)$/, postgres: /^BOOLEAN$/ },
    'DOUBLE PRECISION': { sqlite: /^DOUBLE PRECISION$/, postgres: /^DOUBLE PRECISION$/ },
    DATE: { sqlite: /^DATETIME$/, postgres: /^TIMESTAMP WITH TIME ZONE$/ },
  };

  it('give every model attribute a column of its type (and nullability, where the model says) on this dialect', async () => {
    await migrateUp(db.sequelize);
    const qi = db.sequelize.getQueryInterface();
    const problems: string[] = [];
    for (const model of Object.values(db.models) as ModelStatic<Model>[]) {
      const table = model.getTableName() as string;
      const columns = await qi.describeTable(table);
      for (const attribute of Object.values(model.getAttributes())) {
        const field = attribute.field ?? '';
        const column = columns[field];
        const key = (attribute.type as unknown as { key: string }).key;
        if (!column) problems.push(`${table}.${field} is missing`);
        else if (!columnTypes[key]?.[TEST_DIALECT].test(column.type)) problems.push(`${table}.${field} is ${column.type}, not ${key}`);
        else if (!attribute.primaryKey && attribute.allowNull !== undefined && column.allowNull !== attribute.allowNull) problems.push(`${table}.${field} allowNull is ${column.allowNull}`);
      }
    }
    expect(problems).toEqual([]);
  });

  (TEST_DIALECT === 'sqlite' ? it : it.skip)('runs SQLite in WAL mode with a busy timeout', async () => {
    const [mode] = (await db.sequelize.query('PRAGMA journal_mode', { plain: false, raw: true }))[0] as { journal_mode: string }[];
    expect(mode.journal_mode).toBe('wal');
    const [busy] = (await db.sequelize.query('PRAGMA busy_timeout', { raw: true }))[0] as Record<string, number>[];
    expect(Object.values(busy)[0]).toBe(5000);
  });

  (TEST_DIALECT === 'postgres' ? it : it.skip)('runs PostgreSQL transactions at READ COMMITTED, the level the compare-and-set saves are written for', async () => {
    const level = await db.sequelize.transaction(async (transaction) => {
      const row = (await db.sequelize.query('SHOW transaction_isolation', { plain: true, transaction })) as { transaction_isolation: string };
      return row.transaction_isolation;
    });
    expect(level).toBe('read committed');
  });
});
