import { Transaction } from 'sequelize';
import { loadConfig } from '../../server/config';
import { createDb, type Db } from '../../server/db';
import type { Deps } from '../../server/deps';
import { AppError } from '../../server/errors';
import { createMailer } from '../../server/mail/mailer';
import { migrateUp } from '../../server/migrate';
import { sessionView, type SessionView } from '../../server/services/auth-service';
import { reviewStudy, submitForReview } from '../../server/services/review-service';
import { findStudy, saveStudy } from '../../server/services/studies-service';
import { changeRole } from '../../server/services/team-service';
import { createTestDatabase, makeStudy, makeTeam, makeUser, TEST_DIALECT, type TestDatabase } from './test-app';

/*
 * Two Db instances on one database stand for two server processes behind a load balancer:
 * each has its own connection pool (PostgreSQL) or its own connection and write queue
 * (SQLite), so nothing in one process orders the other's writes. Runs on the dialect the
 * server tests run on (SQLite, or PostgreSQL with TEST_DATABASE_URL).
 */
// Racing writers on a shared, busy machine wait on each other's locks: far beyond jest's 5 s.
jest.setTimeout(60_000);

let database: TestDatabase;
let dbs: [Db, Db];

beforeAll(async () => {
  database = await createTestDatabase();
  dbs = [createDb(database.url), createDb(database.url)];
  await migrateUp(dbs[0].sequelize);
});
afterAll(async () => {
  for (const db of dbs) await db.sequelize.close();
  await database.drop();
});

const deps = (db: Db): Deps => {
  const config = loadConfig({ NODE_ENV: 'test', SESSION_SECRET: 'test-secret-test-secret-test-secret' });
  return { db, config, mailer: createMailer(db, { from: config.mailFrom }) };
};
const auth = async (db: Db, userId: number) => (await sessionView(db, userId)) as SessionView;
const statusOf = (outcome: PromiseSettledResult<unknown>) => (outcome.status === 'fulfilled' ? 200 : outcome.reason instanceof AppError ? outcome.reason.status : 500);

let teams = 0;
async function teamWithEditors(count: number) {
  const team = await makeTeam(dbs[0], `Bench ${++teams}`);
  const users = [];
  for (let i = 0; i < count; i++) users.push(await makeUser(dbs[0], `editor${i}.${teams}@bench.test`, [{ teamId: team.id, role: 'owner' }]));
  return { team, users };
}

describe('writes from two processes at once', () => {
  it('let one of many saves from the same version win; the others get the conflict and nothing else is written', async () => {
    const { team, users } = await teamWithEditors(2);
    const created = await makeStudy(dbs[0], team.id, users[0].id, 'Shared');
    await dbs[0].models.Revision.create({ studyId: created.id, number: 1, authorId: users[0].id, title: 'Shared', description: '', document: null });

    const attempts = Array.from({ length: 8 }, async (_, i) => {
      const db = dbs[i % 2];
      const me = await auth(db, users[i % 2].id);
      const study = await findStudy(db, me.memberships, created.id);
      return saveStudy(db, me, study, { baseVersion: 1, title: `Save ${i}` });
    });
    const outcomes = await Promise.allSettled(attempts);
    const statuses = outcomes.map(statusOf);
    expect(statuses.filter((s) => s === 200)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(7);

    const winner = outcomes.find((o) => o.status === 'fulfilled') as PromiseFulfilledResult<{ title: string; version: number }>;
    const stored = await dbs[1].models.Study.findByPk(created.id);
    expect(stored).toMatchObject({ version: 2, title: winner.value.title });
    const revisions = await dbs[1].models.Revision.findAll({ where: { studyId: created.id }, order: [['number', 'ASC']] });
    expect(revisions.map((r) => [r.number, r.title])).toEqual([
      [1, 'Shared'],
      [2, winner.value.title],
    ]);
  });

  it('land every save of clients that reload and retry on a conflict, one revision per save, none lost', async () => {
    const { team, users } = await teamWithEditors(2);
    const created = await makeStudy(dbs[0], team.id, users[0].id, 'Busy');
    await dbs[0].models.Revision.create({ studyId: created.id, number: 1, authorId: users[0].id, title: 'Busy', description: '', document: null });

    const client = async (i: number) => {
      const db = dbs[i % 2];
      const me = await auth(db, users[i % 2].id);
      for (let tries = 0; tries < 50; tries++) {
        const study = await findStudy(db, me.memberships, created.id);
        try {
          return await saveStudy(db, me, study, { baseVersion: study.version, description: `client ${i}` });
        } catch (err) {
          if (!(err instanceof AppError && err.status === 409)) throw err;
        }
      }
      throw new Error(`client ${i} never saved`);
    };
    const saved = await Promise.all(Array.from({ length: 6 }, (_, i) => client(i)));

    const revisions = await dbs[1].models.Revision.findAll({ where: { studyId: created.id }, order: [['number', 'ASC']] });
    expect(revisions.map((r) => r.number)).toEqual([1, 2, 3, 4, 5, 6, 7]);
    expect(revisions.slice(1).map((r) => r.description).sort()).toEqual(['client 0', 'client 1', 'client 2', 'client 3', 'client 4', 'client 5']);
    // Each answer is the study as read after its save: a later save may already be in it,
    // but its version and content always belong together.
    for (const s of saved) expect(s.description).toBe(revisions[s.version - 1].description);
    expect((await dbs[0].models.Study.findByPk(created.id))!.version).toBe(7);
  });

  it('keep one owner when two owners step down at the same moment', async () => {
    for (let round = 0; round < 4; round++) {
      const { team, users } = await teamWithEditors(2);
      const outcomes = await Promise.allSettled(
        [0, 1].map(async (i) => changeRole(dbs[i], await auth(dbs[i], users[i].id), team.id, users[i].id, 'designer')),
      );
      expect(outcomes.map(statusOf).sort()).toEqual([200, 409]);
      expect(await dbs[0].models.Membership.count({ where: { teamId: team.id, role: 'owner' } })).toBe(1);
    }
  });

  it('refuse an approval of a revision that a save replaced after the reviewer opened it', async () => {
    const { team, users } = await teamWithEditors(1);
    const reviewer = await makeUser(dbs[0], `reviewer.${teams}@bench.test`, [{ teamId: team.id, role: 'reviewer' }]);
    const created = await makeStudy(dbs[0], team.id, users[0].id, 'In review');
    await dbs[0].models.Revision.create({ studyId: created.id, number: 1, authorId: users[0].id, title: 'In review', description: '', document: null });
    const author = await auth(dbs[0], users[0].id);
    await submitForReview(deps(dbs[0]), author, await findStudy(dbs[0], author.memberships, created.id));

    // The reviewer's process reads revision 1 in review; the author's saves revision 2 first.
    const reviewerAuth = await auth(dbs[1], reviewer.id);
    const seenByReviewer = await findStudy(dbs[1], reviewerAuth.memberships, created.id);
    await saveStudy(dbs[0], author, await findStudy(dbs[0], author.memberships, created.id), { baseVersion: 1, title: 'Edited' });

    const outcome = await Promise.allSettled([reviewStudy(deps(dbs[1]), reviewerAuth, seenByReviewer, { decision: 'approved', comment: '' })]);
    expect(statusOf(outcome[0])).toBe(409);
    expect(await dbs[0].models.Study.findByPk(created.id)).toMatchObject({ status: 'draft', version: 2 });
    expect(await dbs[0].models.Review.count({ where: { studyId: created.id } })).toBe(0);
  });

  (TEST_DIALECT === 'postgres' ? it : it.skip)('run a whole transaction again when PostgreSQL aborts it with a serialization failure', async () => {
    // Write skew under SERIALIZABLE (PostgreSQL manual, "Serializable Isolation Level"): each
    // transaction counts the rows, then inserts one named after the count. Run one after the
    // other they insert "0" and "1"; run side by side PostgreSQL aborts one with SQLSTATE
    // 40001, and the retry must turn that into the serial outcome.
    const team = await makeTeam(dbs[0], 'Skew');
    let runs = 0;
    let arrived = 0;
    let release: () => void = () => undefined;
    const bothRead = new Promise<void>((resolve) => (release = resolve));
    const skew = (db: Db) =>
      db.sequelize.transaction({ isolationLevel: Transaction.ISOLATION_LEVELS.SERIALIZABLE }, async (transaction) => {
        runs++;
        const n = await db.models.AuditEvent.count({ where: { teamId: team.id }, transaction });
        if (++arrived === 2) release();
        if (arrived <= 2) await bothRead;
        await db.models.AuditEvent.create({ teamId: team.id, actorId: null, action: `skew.${n}` }, { transaction });
      });
    await Promise.all([skew(dbs[0]), skew(dbs[1])]);
    expect(runs).toBe(3);
    const actions = (await dbs[0].models.AuditEvent.findAll({ where: { teamId: team.id } })).map((e) => e.action).sort();
    expect(actions).toEqual(['skew.0', 'skew.1']);
  });
});
