import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Sequelize } from 'sequelize';
import request from 'supertest';
import { createApp, type AppLocals } from '../../server/app';
import { loadConfig } from '../../server/config';
import { createDb, dialectOf, type Db } from '../../server/db';
import { migrateUp } from '../../server/migrate';
import type { Role } from '../../server/models';
import { hashPassword } from '../../server/services/auth-service';

export const TEST_PASSWORD = 'correct horse battery';

/**
 * The server tests run on SQLite, or on PostgreSQL when TEST_DATABASE_URL=postgres://… names a
 * server (`npm run test:pg` sets it): each test database is then created there and dropped after.
 */
export const TEST_DIALECT = process.env.TEST_DATABASE_URL ? dialectOf(process.env.TEST_DATABASE_URL) : 'sqlite';
if (process.env.TEST_DATABASE_URL && TEST_DIALECT !== 'postgres') {
  throw new Error(`TEST_DATABASE_URL must start with postgres:// (got "${process.env.TEST_DATABASE_URL}")`);
}

export type TestDatabase = { url: string; dir: string; drop: () => Promise<void> };

let databases = 0;

/** An empty database of its own: a SQLite file in a temporary folder, or a new PostgreSQL database. */
export async function createTestDatabase(): Promise<TestDatabase> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'junctura-test-'));
  const removeDir = () => fs.rmSync(dir, { recursive: true, force: true });
  const admin = process.env.TEST_DATABASE_URL;
  if (!admin) return { url: `sqlite:${path.join(dir, 'test.sqlite')}`, dir, drop: async () => removeDir() };

  const name = `junctura_test_${process.pid}_${++databases}_${Math.random().toString(36).slice(2, 8)}`;
  const onAdmin = async (sql: string) => {
    const s = new Sequelize(admin, { dialect: 'postgres', logging: false, pool: { max: 1 } });
    try {
      await s.query(sql);
    } finally {
      await s.close();
    }
  };
  await onAdmin(`CREATE DATABASE "${name}"`);
  const url = new URL(admin);
  url.pathname = `/${name}`;
  return {
    url: url.toString(),
    dir,
    drop: async () => {
      await onAdmin(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
      removeDir();
    },
  };
}

/** A fresh app on its own migrated database. */
export async function createTestApp() {
  const database = await createTestDatabase();
  const config = loadConfig({
    NODE_ENV: 'test',
    DATABASE_URL: database.url,
    SESSION_SECRET: 'test-secret-test-secret-test-secret',
    WEB_DIR: path.join(database.dir, 'no-web'),
  });
  const db = createDb(config.databaseUrl, { poolMax: config.databasePoolMax });
  await migrateUp(db.sequelize);
  const app = createApp(config, db);
  const close = async () => {
    await (app.locals as AppLocals).close();
    await database.drop();
  };
  return { app, db, config, close };
}

export async function makeTeam(db: Db, name: string) {
  return db.models.Team.create({ name });
}

export async function makeUser(db: Db, email: string, memberships: { teamId: number; role: Role }[] = []) {
  const user = await db.models.User.create({ email, name: email.split('@')[0], passwordHash: await hashPassword(TEST_PASSWORD, 4) });
  for (const m of memberships) await db.models.Membership.create({ userId: user.id, teamId: m.teamId, role: m.role });
  return user;
}

export async function makeStudy(db: Db, teamId: number, authorId: number, title: string) {
  return db.models.Study.create({ teamId, authorId, title });
}

/** A supertest agent that keeps cookies, signed in as the given user. */
export async function signedIn(app: Parameters<typeof request.agent>[0], email: string) {
  const agent = request.agent(app);
  const res = await agent.post('/api/session').send({ email, password: TEST_PASSWORD });
  if (res.status !== 200) throw new Error(`sign-in as ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}
