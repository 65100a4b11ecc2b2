import { demoParts } from '../../server/seed/demo-parts';
import { createTestApp, makeTeam, makeUser, signedIn } from './test-app';

let ctx: Awaited<ReturnType<typeof createTestApp>>;
type Agent = Awaited<ReturnType<typeof signedIn>>;
let designer: Agent;
let reviewer: Agent;

beforeAll(async () => {
  ctx = await createTestApp();
  const teamId = (await makeTeam(ctx.db, 'Parts')).id;
  await makeUser(ctx.db, 'd@parts.test', [{ teamId, role: 'designer' }]);
  await makeUser(ctx.db, 'r@parts.test', [{ teamId, role: 'reviewer' }]);
  designer = await signedIn(ctx.app, 'd@parts.test');
  reviewer = await signedIn(ctx.app, 'r@parts.test');
});
afterAll(() => ctx.close());

const zth = (terms: { rKPerW: number; tauS: number }[], t: number) => terms.reduce((z, x) => z + x.rKPerW * (1 - Math.exp(-t / x.tauS)), 0);

describe('parts library', () => {
  it('accepts every demo part, checked by the same parsers as a study', async () => {
    for (const part of demoParts()) {
      const res = await designer.post('/api/parts').send(part);
      expect({ name: part.name, status: res.status, error: res.body.error }).toEqual({ name: part.name, status: 201, error: undefined });
    }
    expect((await reviewer.get('/api/parts')).body.items).toHaveLength(demoParts().length);
  });

  it('names the bad field inside the thermal, electrical and SOA models', async () => {
    const base = demoParts()[2];
    const badThermal = await designer.post('/api/parts').send({ ...base, thermal: { kind: 'foster', terms: [{ rKPerW: 0.2, tauS: -1 }] } });
    expect(badThermal.status).toBe(400);
    expect(badThermal.body.error.details[0].path).toBe('thermal.terms[0].tauS');

    const badElectrical = await designer.post('/api/parts').send({ ...base, electrical: { iqA: -0.1 } });
    expect(badElectrical.body.error.details[0].path).toBe('electrical.iqA');

    const badSoa = await designer.post('/api/parts').send({ ...base, soa: { ...(base.soa as object), icMaxA: 0 } });
    expect(badSoa.status).toBe(400);
    expect(badSoa.body.error.details[0].path).toMatch(/^soa\.icMaxA/);
  });

  it('is read-only for reviewers', async () => {
    expect((await reviewer.post('/api/parts').send(demoParts()[0])).status).toBe(403);
  });
});

describe('Zth(t) CSV fit', () => {
  it('fits a Foster set to points in ms and °C/W and reports the residual', async () => {
    // Zth(t) = Σ Ri (1 − e^(−t/τi)) of a known Foster set (PHYSICS.md §3), sampled like a datasheet curve.
    const truth = [{ rKPerW: 0.1, tauS: 0.001 }, { rKPerW: 0.3, tauS: 0.02 }, { rKPerW: 0.4, tauS: 0.3 }];
    const rows = Array.from({ length: 36 }, (_, i) => 0.01 * 10 ** (i / 5)).map((ms) => `${ms.toPrecision(6)},${zth(truth, ms / 1000).toPrecision(6)}`);
    const res = await designer.post('/api/parts/zth-fit').attach('file', Buffer.from(`t (ms),Zth (°C/W)\n${rows.join('\n')}\n`), 'zth.csv');
    expect(res.status).toBe(200);
    expect(res.body.points).toHaveLength(36);
    expect(res.body.points[0].timeS).toBeCloseTo(1e-5, 12);
    expect(res.body.fit.maxRelativeError).toBeLessThan(0.01);
    const total = res.body.fit.terms.reduce((s: number, t: { rKPerW: number }) => s + t.rKPerW, 0);
    expect(total).toBeCloseTo(0.8, 2);
    expect(res.body.fit.warning).toBeUndefined();
  });

  it('says which columns it could not find', async () => {
    const res = await designer.post('/api/parts/zth-fit').attach('file', Buffer.from('a,b\n1,2\n'), 'zth.csv');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/Time and Zth/);
  });
});

describe('SOA points CSV', () => {
  it('groups boundary points by pulse width', async () => {
    const csv = 'Vce (V),Ic (A),Pulse\n1,80,1ms\n60,4,1ms\n1,60,dc\n5,20,dc\n60,0.5,dc\n';
    const res = await designer.post('/api/parts/soa-points').attach('file', Buffer.from(csv), 'soa.csv');
    expect(res.status).toBe(200);
    expect(res.body.curves).toEqual([
      { pulseS: 0.001, points: [{ vceV: 1, icA: 80 }, { vceV: 60, icA: 4 }] },
      { pulseS: 'dc', points: [{ vceV: 1, icA: 60 }, { vceV: 5, icA: 20 }, { vceV: 60, icA: 0.5 }] },
    ]);
  });
});
