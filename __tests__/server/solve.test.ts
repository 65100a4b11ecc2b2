import request from 'supertest';
import { createTestApp, makeTeam, makeUser, signedIn } from './test-app';

let ctx: Awaited<ReturnType<typeof createTestApp>>;
let agent: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  ctx = await createTestApp();
  const team = await makeTeam(ctx.db, 'Regulators');
  await makeUser(ctx.db, 'd@reg.test', [{ teamId: team.id, role: 'designer' }]);
  agent = await signedIn(ctx.app, 'd@reg.test');
});
afterAll(() => ctx.close());

// One lumped device: Rjc 0.5, Rcs 0.3, Rsa 1.2 K/W, 20 W at 25 °C ambient.
const study = (durationS: number) => ({
  format: 'junctura-study',
  version: 1,
  title: 'Single device',
  ambient: { temperatureC: 25 },
  sinks: [{ id: 'S1', rthKPerW: 1.2, capacityJPerK: 50 }],
  devices: [{ id: 'Q1', tjMaxC: 150, sink: 'S1', package: { kind: 'lumped', rthKPerW: 0.5 }, interface: { rthKPerW: 0.3 } }],
  profile: { segments: [{ durationS, powerW: { Q1: 20 } }], repeat: 1 },
});

describe('POST /api/solve', () => {
  it('reaches the series-resistance steady state Ta + P (Rjc + Rcs + Rsa) after many time constants', async () => {
    // Thermal analogue of Ohm's law (textbook): 25 + 20 × (0.5 + 0.3 + 1.2) = 65 °C.
    // The sink's time constant is 1.2 × 50 = 60 s; 6000 s is a hundred of them.
    const res = await agent.post('/api/solve').send({ document: study(6000) });
    expect(res.status).toBe(200);
    expect(res.body.result.devices.Q1.peakJunctionC).toBeCloseTo(65, 6);
    expect(res.body.result.meetsTarget).toBe(true);
    expect(Array.isArray(res.body.result.series['Q1.junction'].timeS)).toBe(true);
  });

  it('answers 400 naming the bad field under document', async () => {
    const bad = study(10);
    bad.sinks[0].rthKPerW = -1;
    const res = await agent.post('/api/solve').send({ document: bad });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toBe('document.sinks[0].rthKPerW');
  });

  it('requires a session', async () => {
    expect((await request(ctx.app).post('/api/solve').send({ document: study(10) })).status).toBe(401);
  });
});

describe('study documents on save', () => {
  it('are checked by the core parser and refused with the field path, saving nothing', async () => {
    const created = await agent.post('/api/studies').send({ title: 'Reg', document: study(10) });
    expect(created.status).toBe(201);
    const bad = study(10);
    (bad.devices[0] as Record<string, unknown>).sink = 'S9';
    const res = await agent.put(`/api/studies/${created.body.study.id}`).send({ baseVersion: 1, document: bad });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toMatch(/^document\.devices\[0\]\.sink/);
    expect((await agent.get(`/api/studies/${created.body.study.id}`)).body.study.version).toBe(1);
  });

  it('are solved for the saved study by GET /api/studies/:id/result', async () => {
    const created = await agent.post('/api/studies').send({ title: 'Reg', document: study(6000) });
    const res = await agent.get(`/api/studies/${created.body.study.id}/result`);
    expect(res.status).toBe(200);
    expect(res.body.version).toBe(1);
    expect(res.body.result.devices.Q1.peakJunctionC).toBeCloseTo(65, 6);
  });
});
