import path from 'node:path';
import { signIn, startTestServer, type TestServer } from '../../server/scripts/test-server';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, DEMO_STUDY_FILES } from '../../server/seed/demo';
import { createTestDatabase, TEST_DIALECT, type TestDatabase } from './test-app';

/*
 * The real server (server/index.ts: connect, migrate, seed, listen) in two processes on one
 * database, as behind a load balancer without sticky sessions: on SQLite a shared file, on
 * PostgreSQL (TEST_DATABASE_URL) a database of this file's own.
 */
jest.setTimeout(180_000);

let database: TestDatabase;
let servers: TestServer[] = [];

beforeAll(async () => {
  database = await createTestDatabase();
  // Both start at once on the empty database: one migrates and seeds, the other waits for it.
  const dbFile = TEST_DIALECT === 'sqlite' ? database.url.slice('sqlite:'.length) : path.join(database.dir, 'unused.sqlite');
  const started = await Promise.allSettled([0, 1].map(() => startTestServer({ dbFile, databaseUrl: database.url })));
  servers = started.flatMap((s) => (s.status === 'fulfilled' ? [s.value] : []));
  const failed = started.find((s) => s.status === 'rejected');
  if (failed) throw failed.reason;
});
afterAll(async () => {
  for (const s of servers) await s.stop();
  await database.drop();
});

const json = async (url: string, cookie: string, init: RequestInit = {}) => {
  const res = await fetch(url, { ...init, headers: { cookie, 'content-type': 'application/json', ...(init.headers ?? {}) } });
  return { status: res.status, body: res.status === 204 ? null : await res.json() };
};

describe(`the real server on ${TEST_DIALECT}, two processes`, () => {
  it('seeds the demo data once; every demo account signs in on either process and sees the three demo studies', async () => {
    const [a, b] = servers;
    for (const [i, account] of DEMO_ACCOUNTS.entries()) {
      const server = servers[i % 2];
      const cookie = await signIn(server.url, account.email, DEMO_PASSWORD);
      const list = await json(`${(i % 2 ? a : b).url}/api/studies`, cookie);
      expect(list.status).toBe(200);
      expect(list.body.studies).toHaveLength(DEMO_STUDY_FILES.length);
      expect(list.body.studies.every((s: { teamName: string }) => s.teamName === 'Demo Lab (demo data)')).toBe(true);
    }
    const owner = await signIn(a.url, DEMO_ACCOUNTS[0].email, DEMO_PASSWORD);
    const teams = await json(`${b.url}/api/teams`, owner);
    expect(teams.body.teams).toEqual([expect.objectContaining({ teamName: 'Demo Lab (demo data)', role: 'owner' })]);
    const heatsinks = await json(`${b.url}/api/heatsinks`, owner);
    expect(heatsinks.body.items).toHaveLength(40);
    const parts = await json(`${a.url}/api/parts`, owner);
    expect(parts.body.items).toHaveLength(6);
  });

  it('solves a demo study, saves it on one process and answers a stale save on the other with the conflict', async () => {
    const [a, b] = servers;
    const designer = await signIn(a.url, 'designer@example.com', DEMO_PASSWORD);
    const study = (await json(`${a.url}/api/studies`, designer)).body.studies.find((s: { title: string }) => /laboratory supply/i.test(s.title));
    const result = await json(`${b.url}/api/studies/${study.id}/result`, designer);
    expect(result.status).toBe(200);
    expect(result.body.version).toBe(study.version);

    const save = await json(`${a.url}/api/studies/${study.id}`, designer, { method: 'PUT', body: JSON.stringify({ baseVersion: study.version, description: 'Saved through process A (demo data)' }) });
    expect(save.status).toBe(200);
    expect(save.body.study.version).toBe(study.version + 1);
    const stale = await json(`${b.url}/api/studies/${study.id}`, designer, { method: 'PUT', body: JSON.stringify({ baseVersion: study.version, description: 'Stale' }) });
    expect(stale.status).toBe(409);
    expect(stale.body.current.description).toBe('Saved through process A (demo data)');
  });

  it('ends a session on every process at sign-out on one', async () => {
    const [a, b] = servers;
    const cookie = await signIn(a.url, 'reviewer@example.com', DEMO_PASSWORD);
    expect((await json(`${b.url}/api/session`, cookie)).status).toBe(200);
    expect((await json(`${b.url}/api/session`, cookie, { method: 'DELETE' })).status).toBe(204);
    expect((await json(`${a.url}/api/session`, cookie)).status).toBe(401);
  });
});
