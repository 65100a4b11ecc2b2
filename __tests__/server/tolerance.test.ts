import request from 'supertest';
import { closeTolerancePool } from '../../server/workers/tolerance-pool';
import { createTestApp, makeTeam, makeUser, signedIn } from './test-app';

let ctx: Awaited<ReturnType<typeof createTestApp>>;
let designer: Awaited<ReturnType<typeof signedIn>>;
let reviewer: Awaited<ReturnType<typeof signedIn>>;
let outsider: Awaited<ReturnType<typeof signedIn>>;
let studyId: number;

// One lumped device, no heat capacity anywhere: Tj = Ta + P(Rjc + Rcs + Rsa) = 25 + 20 × 2 = 65 °C
// (series thermal resistances, textbook).
const doc = {
  format: 'junctura-study',
  version: 1,
  title: 'Sweep me',
  marginK: 20,
  ambient: { temperatureC: 25 },
  sinks: [{ id: 'S1', rthKPerW: 1.2 }],
  devices: [{ id: 'Q1', tjMaxC: 150, sink: 'S1', package: { kind: 'lumped', rthKPerW: 0.5 }, interface: { rthKPerW: 0.3 } }],
  profile: { segments: [{ durationS: 60, powerW: { Q1: 20 } }], repeat: 1 },
};

beforeAll(async () => {
  ctx = await createTestApp();
  const teamId = (await makeTeam(ctx.db, 'Sweep')).id;
  const other = (await makeTeam(ctx.db, 'Other')).id;
  await makeUser(ctx.db, 'd@sweep.test', [{ teamId, role: 'designer' }]);
  await makeUser(ctx.db, 'r@sweep.test', [{ teamId, role: 'reviewer' }]);
  await makeUser(ctx.db, 'o@other.test', [{ teamId: other, role: 'owner' }]);
  designer = await signedIn(ctx.app, 'd@sweep.test');
  reviewer = await signedIn(ctx.app, 'r@sweep.test');
  outsider = await signedIn(ctx.app, 'o@other.test');
  studyId = (await designer.post('/api/studies').send({ title: 'Sweep me', document: doc })).body.study.id;
});
afterAll(async () => {
  await closeTolerancePool();
  await ctx.close();
});

describe('POST /api/studies/:id/tolerance', () => {
  it('sweeps the corners on the worker pool; the worst is every resistance high and the ambient high', async () => {
    const res = await reviewer.post(`/api/studies/${studyId}/tolerance`).send({ mode: 'corners', rthSaPct: 10, interfacePct: 20, ambientLowK: -5, ambientHighK: 10 });
    expect(res.status).toBe(200);
    expect(res.body.result.runs).toBe(8);
    // 35 + 20 × (0.5 + 0.36 + 1.32) = 78.6 °C.
    expect(res.body.result.worstCorner.peakC).toBeCloseTo(78.6, 9);
    expect(res.body.result.worstCorner.words).toBe('Rθsa +10 %, Interface Rθcs +20 %, Ambient +10 K');
    expect(res.body.result.devices[0].nominalC).toBeCloseTo(27.5 + 40, 9);
  });

  it('gives the same Monte Carlo answer for the same seed, split over the pool', async () => {
    const body = { mode: 'monte-carlo', rthJcPct: 10, rthSaPct: 10, runs: 300, seed: 9 };
    const a = await designer.post(`/api/studies/${studyId}/tolerance`).send(body);
    const b = await designer.post(`/api/studies/${studyId}/tolerance`).send(body);
    expect(a.status).toBe(200);
    expect(b.body.result.devices).toEqual(a.body.result.devices);
    expect(a.body.result.histogram.counts.reduce((s: number, c: number) => s + c, 0)).toBe(300);
    expect(a.body.result.sensitivity.method).toBe('spearman');
  });

  it('answers 400 naming each bad field, and over the run cap', async () => {
    const bad = await designer.post(`/api/studies/${studyId}/tolerance`).send({ mode: 'monte-carlo', rthSaPct: 80, ambientLowK: 5, ambientHighK: 0, runs: 1.5 });
    expect(bad.status).toBe(400);
    const paths = bad.body.error.details.map((d: { path: string }) => d.path).sort();
    expect(paths).toEqual(['ambientHighK', 'rthSaPct', 'runs']);
    const many = await designer.post(`/api/studies/${studyId}/tolerance`).send({ mode: 'monte-carlo', rthSaPct: 5, runs: 50_000 });
    expect(many.status).toBe(400);
    expect(many.body.error.details[0]).toEqual({ path: 'runs', message: 'Runs must be at most 20,000' });
    const typed = await designer.post(`/api/studies/${studyId}/tolerance`).send({ mode: 'corners', rthSaPct: '10' });
    expect(typed.body.error.details[0]).toEqual({ path: 'rthSaPct', message: 'must be a number' });
    const unknown = await designer.post(`/api/studies/${studyId}/tolerance`).send({ mode: 'corners', tempPct: 1 });
    expect(unknown.status).toBe(400);
  });

  it('refuses a sweep over the total work limit, saying how many runs fit', async () => {
    const long = { ...doc, profile: { segments: [{ durationS: 1, powerW: { Q1: 20 } }], repeat: 100_000 } };
    const id = (await designer.post('/api/studies').send({ title: 'Long', document: long })).body.study.id;
    const res = await designer.post(`/api/studies/${id}/tolerance`).send({ mode: 'monte-carlo', rthSaPct: 5, runs: 1000 });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toBe('runs');
    expect(res.body.error.message).toMatch(/at most 500 runs for this study/);
  });

  it('answers 404 to another team and 401 without a session', async () => {
    expect((await outsider.post(`/api/studies/${studyId}/tolerance`).send({ mode: 'corners', rthSaPct: 5 })).status).toBe(404);
    expect((await request(ctx.app).post(`/api/studies/${studyId}/tolerance`).send({ mode: 'corners' })).status).toBe(401);
  });
});
