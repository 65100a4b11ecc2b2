import fs from 'node:fs';
import path from 'node:path';
import type { Db } from '../db';
import type { Role } from '../models';
import { hashPassword } from '../services/auth-service';
import { insertStudy } from '../services/studies-service';
import { seedDemoCatalogue } from './demo-catalogue';
import { seedDemoParts } from './demo-parts';

/** Invented demo data: printed in the README and by the server at start-up. */
export const DEMO_PASSWORD = 'junctura-demo';
export const DEMO_TEAM = 'Demo Lab (demo data)';
export const DEMO_ACCOUNTS: { email: string; name: string; role: Role }[] = [
  { email: 'owner@example.com', name: 'Olivia Owner (demo)', role: 'owner' },
  { email: 'designer@example.com', name: 'Dan Designer (demo)', role: 'designer' },
  { email: 'reviewer@example.com', name: 'Rita Reviewer (demo)', role: 'reviewer' },
];

/** The demo studies, written in the study format under examples/. */
export const DEMO_STUDY_FILES = ['bench-electronic-load.json', 'onboard-24v-to-5v.json', 'lab-supply-two-tap.json'];

export function examplesDir(): string {
  return path.resolve(__dirname, '..', '..', 'examples');
}

type ExampleDoc = { title: string; description?: string } & Record<string, unknown>;

function readExample(file: string): ExampleDoc {
  const full = path.join(examplesDir(), file);
  const doc = JSON.parse(fs.readFileSync(full, 'utf8')) as ExampleDoc;
  if (typeof doc.title !== 'string') throw new Error(`${full}: title is missing`);
  return doc;
}

/** Seeds the demo team, accounts and studies once: does nothing when any user exists. */
export async function seedDemo(db: Db, bcryptCost: number): Promise<boolean> {
  if ((await db.models.User.count()) > 0) return false;
  const passwordHash = await hashPassword(DEMO_PASSWORD, bcryptCost);
  const docs = DEMO_STUDY_FILES.map(readExample);
  await db.sequelize.transaction(async (transaction) => {
    const team = await db.models.Team.create({ name: DEMO_TEAM }, { transaction });
    const users = [];
    for (const account of DEMO_ACCOUNTS) {
      const user = await db.models.User.create({ email: account.email, name: account.name, passwordHash }, { transaction });
      await db.models.Membership.create({ userId: user.id, teamId: team.id, role: account.role }, { transaction });
      users.push(user);
    }
    await seedDemoCatalogue(db, team.id, transaction);
    await seedDemoParts(db, team.id, transaction);
    const designer = users[1];
    for (const doc of docs) {
      await insertStudy(db, { teamId: team.id, authorId: designer.id, title: doc.title, description: doc.description ?? '', document: doc }, transaction);
    }
  });
  return true;
}
