import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { createApp, type AppLocals } from '../../server/app';
import { loadConfig } from '../../server/config';
import { createDb, type Db } from '../../server/db';
import { migrateUp } from '../../server/migrate';
import type { Role } from '../../server/models';
import { hashPassword } from '../../server/services/auth-service';

export const TEST_PASSWORD = 'correct horse battery';

/** A fresh app on its own migrated SQLite file. */
export async function createTestApp() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'junctura-test-'));
  const config = loadConfig({
    NODE_ENV: 'test',
    DATABASE_URL: `sqlite:${path.join(dir, 'test.sqlite')}`,
    SESSION_SECRET: 'test-secret-test-secret-test-secret',
    WEB_DIR: path.join(dir, 'no-web'),
  });
  const db = createDb(config.databaseUrl);
  await migrateUp(db.sequelize);
  const app = createApp(config, db);
  const close = async () => {
    await (app.locals as AppLocals).close();
    fs.rmSync(dir, { recursive: true, force: true });
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
