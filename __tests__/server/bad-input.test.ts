import { createTestApp, makeStudy, makeTeam, makeUser, signedIn } from './test-app';

/**
 * A corpus of bad requests for every endpoint that takes a body: each must answer 4xx with
 * a JSON error that names a field (or the body), and write nothing.
 */
let ctx: Awaited<ReturnType<typeof createTestApp>>;
let owner: Awaited<ReturnType<typeof signedIn>>;
let teamId: number;
let studyId: number;
let heatsinkId: number;

beforeAll(async () => {
  ctx = await createTestApp();
  teamId = (await makeTeam(ctx.db, 'Corpus')).id;
  const u = await makeUser(ctx.db, 'owner@corpus.test', [{ teamId, role: 'owner' }]);
  studyId = (await makeStudy(ctx.db, teamId, u.id, 'Target')).id;
  await ctx.db.models.Revision.create({ studyId, number: 1, authorId: u.id, title: 'Target', description: '', document: null });
  heatsinkId = (await ctx.db.models.Heatsink.create({ teamId, name: 'H', rthKPerW: 1, referenceRiseK: 75, forcedAir: [], massKg: null, material: null, capacityJPerK: null, widthMm: null, lengthMm: null, heightMm: null, price: null })).id;
  owner = await signedIn(ctx.app, 'owner@corpus.test');
});
afterAll(() => ctx.close());

const RAW_BAD = [
  { name: 'malformed JSON', raw: '{"title": "x",' },
  { name: 'a JSON array', raw: '[1,2,3]' },
  { name: 'a bare string', raw: '"hello"' },
  { name: 'null', raw: 'null' },
];

const long = 'x'.repeat(100_000);
const script = '<script>alert(1)</script>';
const sqlish = "'; DROP TABLE studies; --";

type Endpoint = { name: string; method: 'post' | 'put' | 'patch'; path: () => string; bad: Record<string, unknown>[] };

const ENDPOINTS: Endpoint[] = [
  {
    name: 'create study',
    method: 'post',
    path: () => '/api/studies',
    bad: [{}, { title: 42 }, { title: long }, { title: 'ok', extra: 1 }, { title: 'ok', teamId: 'abc' }, { title: 'ok', teamId: -3 }, { title: 'ok', document: { format: 'other' } }, { title: 'ok', document: { format: 'junctura-study', version: 1, title: 't', ambient: { temperatureC: '__INF__' } } }],
  },
  {
    name: 'save study',
    method: 'put',
    path: () => `/api/studies/${studyId}`,
    bad: [{}, { baseVersion: 'one' }, { baseVersion: 1.5 }, { baseVersion: 0 }, { baseVersion: 1, title: '' }, { baseVersion: 1, document: 'text' }, { baseVersion: 1, surprise: true }],
  },
  { name: 'comment', method: 'post', path: () => `/api/studies/${studyId}/comments`, bad: [{}, { body: '' }, { body: long }, { body: 'x', anchor: { kind: 'place' } }, { body: 'x', anchor: { kind: 'time', timeS: -1 } }, { body: 'x', anchor: { kind: 'time', timeS: 'soon' } }] },
  { name: 'review', method: 'post', path: () => `/api/studies/${studyId}/review`, bad: [{}, { decision: 'maybe' }, { decision: 'changes_requested' }] },
  { name: 'invite', method: 'post', path: () => `/api/teams/${teamId}/invitations`, bad: [{}, { email: 'not-an-address', role: 'designer' }, { email: 'a@b.test', role: 'king' }, { email: script, role: 'owner' }] },
  { name: 'sign in', method: 'post', path: () => '/api/session', bad: [{}, { email: sqlish, password: 'x' }, { email: 'a@b.test', password: long }, { email: ['a@b.test'], password: 'x' }] },
  { name: 'sign up', method: 'post', path: () => '/api/accounts', bad: [{}, { name: 'A', email: 'a@b.test', password: 'short', teamName: 'T' }, { name: '\u0000', email: 'a@b.test', password: 'long enough pass', teamName: long }] },
  { name: 'password reset request', method: 'post', path: () => '/api/password-resets', bad: [{}, { email: 12 }] },
  {
    name: 'heatsink',
    method: 'put',
    path: () => `/api/heatsinks/${heatsinkId}`,
    bad: [{}, { name: 'H', rthKPerW: 'low' }, { name: 'H', rthKPerW: -1 }, { name: 'H', rthKPerW: '__INF__' }, { name: 'H', rthKPerW: 1, devicesPerSink: 2.5 }, { name: 'H', rthKPerW: 1, forcedAir: 'fast' }],
  },
  { name: 'solve', method: 'post', path: () => '/api/solve', bad: [{}, { document: null }, { document: { format: 'junctura-study', version: 2 } }] },
  {
    name: 'tolerance sweep',
    method: 'post',
    path: () => `/api/studies/${studyId}/tolerance`,
    bad: [{}, { mode: 'sideways' }, { mode: 'corners', rthSaPct: '__INF__' }, { mode: 'corners', rthJcPct: -5 }, { mode: 'monte-carlo', runs: 0 }, { mode: 'monte-carlo', seed: 1.5 }, { mode: 'corners', distributions: { rthSa: 'lognormal' } }, { mode: 'corners', extra: 1 }],
  },
];

async function counts() {
  const m = ctx.db.models;
  return [await m.Study.count(), await m.Revision.count(), await m.Comment.count(), await m.Invitation.count(), await m.User.count(), await m.Heatsink.count(), await m.Review.count()];
}

describe.each(ENDPOINTS)('$method $name', (endpoint) => {
  it.each(RAW_BAD.map((r) => [r.name, r.raw]))('answers 400 to %s and writes nothing', async (_name, raw) => {
    const before = await counts();
    const res = await owner[endpoint.method](endpoint.path()).set('Content-Type', 'application/json').send(raw as string);
    expect(res.status).toBe(400);
    expect(res.body.error.message).toEqual(expect.any(String));
    expect(await counts()).toEqual(before);
  });

  it.each(endpoint.bad.map((b) => [JSON.stringify(b).slice(0, 60), b]))('answers 4xx naming a field to %s and writes nothing', async (_name, body) => {
    const before = await counts();
    const text = JSON.stringify(body).replace('"__INF__"', '1e999');
    const res = await owner[endpoint.method](endpoint.path()).set('Content-Type', 'application/json').send(text.length ? text : '{}');
    expect(res.status).toBeGreaterThanOrEqual(400);
    expect(res.status).toBeLessThan(500);
    expect(res.body.error.code).toEqual(expect.any(String));
    if (res.status === 400) expect(res.body.error.details?.[0]?.path ?? res.body.error.message).toBeTruthy();
    expect(JSON.stringify(res.body)).not.toMatch(/at \S+\.(ts|js):\d+/);
    expect(await counts()).toEqual(before);
  });
});

describe('other bad requests', () => {
  it('refuses bodies over 2 MB with 413', async () => {
    const res = await owner.post('/api/studies').set('Content-Type', 'application/json').send(JSON.stringify({ title: 'x', description: 'y'.repeat(3 * 1024 * 1024) }));
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('payload_too_large');
  });

  it('treats a form-encoded body as missing JSON and names the body', async () => {
    const res = await owner.post('/api/studies').set('Content-Type', 'application/x-www-form-urlencoded').send('title=x');
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toBe('(body)');
  });

  it('refuses text holding the NUL character, which PostgreSQL text cannot store, naming the field', async () => {
    const before = await counts();
    const res = await owner.post('/api/studies').send({ title: 'Load\u0000bank', description: 'fine' });
    expect(res.status).toBe(400);
    expect(res.body.error.details).toEqual([{ path: 'title', message: 'must not contain the NUL character (U+0000)' }]);
    expect(await counts()).toEqual(before);
  });

  it('stores script- and SQL-like text verbatim as data, never executing it', async () => {
    const res = await owner.post('/api/studies').send({ title: `${script} ${sqlish}` });
    expect(res.status).toBe(201);
    expect(res.body.study.title).toBe(`${script} ${sqlish}`);
    expect(await ctx.db.models.Study.count()).toBeGreaterThan(1);
  });
});
