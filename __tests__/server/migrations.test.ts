import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { createDb } from '../../server/db';
import { createMigrator, migrateUp } from '../../server/migrate';

describe('migrations', () => {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'junctura-migrate-'));
  const db = createDb(`sqlite:${path.join(dir, 'm.sqlite')}`);
  afterAll(async () => {
    await db.sequelize.close();
    fs.rmSync(dir, { recursive: true, force: true });
  });

  it('create every table, apply once only, and roll back cleanly', async () => {
    expect(await migrateUp(db.sequelize)).toEqual(['0001-initial', '0002-team-work', '0003-catalogues', '0004-parts']);
    expect(await migrateUp(db.sequelize)).toEqual([]);
    const tables = (await db.sequelize.getQueryInterface().showAllTables()).sort();
    expect(tables).toEqual(expect.arrayContaining([
        'Sessions', 'audit_events', 'comments', 'heatsinks', 'interface_materials', 'invitations', 'mail_messages', 'memberships', 'parts',
        'password_resets', 'reviews', 'revisions', 'schema_migrations', 'studies', 'teams', 'users',
      ]));

    await createMigrator(db.sequelize).down({ to: 0 });
    const after = await db.sequelize.getQueryInterface().showAllTables();
    expect(after).not.toContain('users');
    expect(after).not.toContain('revisions');
    expect(await migrateUp(db.sequelize)).toEqual(['0001-initial', '0002-team-work', '0003-catalogues', '0004-parts']);
  });

  it('runs SQLite in WAL mode with a busy timeout', async () => {
    const [mode] = (await db.sequelize.query('PRAGMA journal_mode', { plain: false, raw: true }))[0] as { journal_mode: string }[];
    expect(mode.journal_mode).toBe('wal');
    const [busy] = (await db.sequelize.query('PRAGMA busy_timeout', { raw: true }))[0] as Record<string, number>[];
    expect(Object.values(busy)[0]).toBe(5000);
  });
});
