import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import { createDb, withStartupLock, type Db } from '../../server/db';
import { createTestDatabase, TEST_DIALECT, type TestDatabase } from './test-app';

/* Migrations and the first seed run under withStartupLock so servers started together do them once. */
let database: TestDatabase;
let dbs: [Db, Db];

beforeAll(async () => {
  database = await createTestDatabase();
  dbs = [createDb(database.url), createDb(database.url)];
});
afterAll(async () => {
  for (const db of dbs) await db.sequelize.close();
  await database.drop();
});

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

describe('withStartupLock', () => {
  it('lets one holder at a time in, across two database handles on one database', async () => {
    const spans: [number, number][] = [];
    const hold = (db: Db) =>
      withStartupLock(db, async () => {
        const start = Date.now();
        await sleep(300);
        spans.push([start, Date.now()]);
        return db === dbs[0] ? 'first' : 'second';
      });
    expect((await Promise.all([hold(dbs[0]), hold(dbs[1]), hold(dbs[0])])).sort()).toEqual(['first', 'first', 'second']);
    spans.sort((a, b) => a[0] - b[0]);
    for (let i = 1; i < spans.length; i++) expect(spans[i][0]).toBeGreaterThanOrEqual(spans[i - 1][1]);
  });

  it('releases the lock when the work fails', async () => {
    await expect(withStartupLock(dbs[0], async () => Promise.reject(new Error('migration failed')))).rejects.toThrow('migration failed');
    expect(await withStartupLock(dbs[1], async () => 'after')).toBe('after');
  });

  (TEST_DIALECT === 'sqlite' ? it : it.skip)('takes over a SQLite lock file left by a process that has died', async () => {
    const storage = database.url.slice('sqlite:'.length);
    const dead = spawnSync(process.execPath, ['-e', 'process.stdout.write(String(process.pid))'], { encoding: 'utf8' });
    fs.writeFileSync(`${storage}.startup-lock`, dead.stdout);
    expect(await withStartupLock(dbs[0], async () => fs.readFileSync(`${storage}.startup-lock`, 'utf8'))).toBe(String(process.pid));
    expect(fs.existsSync(`${storage}.startup-lock`)).toBe(false);
  });
});
