import fs from 'node:fs';
import path from 'node:path';
import { createTestApp, makeTeam, makeUser, signedIn } from './test-app';

let ctx: Awaited<ReturnType<typeof createTestApp>>;
let agent: Awaited<ReturnType<typeof signedIn>>;
let outsider: Awaited<ReturnType<typeof signedIn>>;
let studyId: number;

// One lumped device: Rjc 0.5, Rcs 0.3 K/W, 20 W for 6000 s at 25 °C ambient.
const doc = {
  format: 'junctura-study',
  version: 1,
  title: 'Rank me',
  marginK: 20,
  ambient: { temperatureC: 25 },
  sinks: [{ id: 'S1', rthKPerW: 1.2, capacityJPerK: 50 }],
  devices: [{ id: 'Q1', tjMaxC: 150, sink: 'S1', package: { kind: 'lumped', rthKPerW: 0.5 }, interface: { rthKPerW: 0.3 } }],
  profile: { segments: [{ durationS: 6000, powerW: { Q1: 20 } }], repeat: 1 },
};

const sink = (name: string, rthKPerW: number, massKg: number, forcedAir: { airSpeedMPerS: number; rthKPerW: number }[] = []) => ({
  name,
  description: '',
  rthKPerW,
  referenceRiseK: 75,
  forcedAir,
  massKg,
  material: 'aluminium' as const,
  capacityJPerK: null,
  widthMm: 50,
  lengthMm: 50,
  heightMm: 20,
  price: massKg * 10,
});

beforeAll(async () => {
  ctx = await createTestApp();
  const teamId = (await makeTeam(ctx.db, 'Rank')).id;
  const other = (await makeTeam(ctx.db, 'Other')).id;
  await makeUser(ctx.db, 'd@rank.test', [{ teamId, role: 'designer' }]);
  await makeUser(ctx.db, 'o@other.test', [{ teamId: other, role: 'owner' }]);
  for (const s of [sink('Huge', 0.3, 2), sink('Medium', 1.5, 0.4), sink('Tiny', 12, 0.01), sink('Fan sink', 3, 0.2, [{ airSpeedMPerS: 1, rthKPerW: 0.5 }, { airSpeedMPerS: 2, rthKPerW: 0.3 }])]) {
    await ctx.db.models.Heatsink.create({ ...s, teamId });
  }
  await ctx.db.models.Heatsink.create({ ...sink('Not ours', 0.1, 0.05), teamId: other });
  agent = await signedIn(ctx.app, 'd@rank.test');
  outsider = await signedIn(ctx.app, 'o@other.test');
  studyId = (await agent.post('/api/studies').send({ title: 'Rank me', document: doc })).body.study.id;
});
afterAll(() => ctx.close());

describe('GET /api/studies/:id/ranking', () => {
  it("simulates only the team's own sinks and sorts the passing ones by mass", async () => {
    const res = await agent.get(`/api/studies/${studyId}/ranking?sort=mass`);
    expect(res.status).toBe(200);
    expect(res.body.candidates).toBe(4);
    const { passing, failing } = res.body.result as { passing: { name: string; massKg: number; worstMarginK: number }[]; failing: { name: string; worstMarginK: number }[] };
    const names = [...passing, ...failing].map((c) => c.name);
    expect(names).not.toContain('Not ours');
    expect(failing.map((c) => c.name)).toContain('Tiny');
    const masses = passing.map((c) => c.massKg);
    expect(masses).toEqual([...masses].sort((a, b) => a - b));
    for (const c of passing) expect(c.worstMarginK).toBeGreaterThanOrEqual(0);
    for (const c of failing) expect(c.worstMarginK).toBeLessThan(0);
  });

  it('uses the forced-air point at the asked air speed: the steady state is the series sum Ta + P (Rjc + Rcs + Rsa)', async () => {
    // Log-log interpolation is exact at a catalogue point: Rsa(2 m/s) = 0.3 K/W. Steady after
    // 6000 s ≫ τ: 25 + 20 × (0.5 + 0.3 + 0.3) = 47 °C (thermal Ohm's law, textbook).
    const res = await agent.get(`/api/studies/${studyId}/ranking?airSpeed=2`);
    expect(res.status).toBe(200);
    const all = [...res.body.result.passing, ...res.body.result.failing];
    const fan = all.find((c: { name: string }) => c.name === 'Fan sink');
    expect(fan.rsaKPerW).toBeCloseTo(0.3, 9);
    expect(fan.devices[0].peakC).toBeCloseTo(47, 2);
  });

  it('ranks at the study site: the forced-air Rθsa times the altitude factor, in the series sum', async () => {
    const created = await agent.post('/api/studies').send({ title: 'Rank me high', document: { ...doc, site: { altitudeM: 1800 } } });
    expect(created.status).toBe(201);
    const res = await agent.get(`/api/studies/${created.body.study.id}/ranking?airSpeed=2`);
    expect(res.status).toBe(200);
    // Standard atmosphere at 1,800 m: p/p0 = (1 − 0.0065·H/288.15)^5.2559, H = 1,799.5 m
    // geopotential, ≈ 0.8043 (U.S. Standard Atmosphere 1976); forced air h ∝ ρ^(1/2).
    const factor = 1 / Math.sqrt(Math.pow(1 - (0.0065 * 1799.49) / 288.15, 5.2559));
    expect(res.body.result.site.altitudeM).toBe(1800);
    expect(res.body.result.site.forcedRsaFactor).toBeCloseTo(factor, 4);
    const fan = [...res.body.result.passing, ...res.body.result.failing].find((c: { name: string }) => c.name === 'Fan sink');
    expect(fan.rsaKPerW).toBeCloseTo(0.3 * factor, 4);
    expect(fan.devices[0].peakC).toBeCloseTo(25 + 20 * (0.5 + 0.3 + 0.3 * factor), 2);
  });

  it('ranks a study whose input comes from a rail plan, on the taps its evaluation selected', async () => {
    const lab = JSON.parse(fs.readFileSync(path.join(__dirname, '../../examples/lab-supply-two-tap.json'), 'utf8'));
    const created = await agent.post('/api/studies').send({ title: 'Lab supply', document: lab });
    expect(created.status).toBe(201);
    const res = await agent.get(`/api/studies/${created.body.study.id}/ranking`);
    expect(res.status).toBe(200);
    const all = [...res.body.result.passing, ...res.body.result.failing];
    expect(all.length + res.body.result.excluded.length).toBe(4);
    for (const c of all) expect(Number.isFinite(c.devices[0].peakC)).toBe(true);
  });

  it('ranks the on-board demo, whose copper pour leads to the enclosure air: the steady answer counts the air’s rise', async () => {
    const onboard = JSON.parse(fs.readFileSync(path.join(__dirname, '../../examples/onboard-24v-to-5v.json'), 'utf8'));
    const created = await agent.post('/api/studies').send({ title: 'On-board regulator', document: onboard });
    expect(created.status).toBe(201);
    const res = await agent.get(`/api/studies/${created.body.study.id}/ranking?sink=PCB&airSpeed=2`);
    expect(res.status).toBe(200);
    const { result, notes } = res.body;
    // The enclosure's 3.5 K/W at 1,800 m, derated as laminar natural convection, h ∝ ρ^(1/2)
    // (U.S. Standard Atmosphere 1976, p/p0 ≈ 0.8043), as the study's own site adjustment does.
    const ratio = Math.pow(1 - (0.0065 * 1799.49) / 288.15, 5.2559);
    const renc = 3.5 / Math.sqrt(ratio);
    expect(result.enclosure.rthKPerW).toBeCloseTo(renc, 3);
    expect(result.enclosure.capacityJPerK).toBe(90);
    expect(notes.join(' ')).toContain('enclosure air');
    // Heaviest segment, one regulator: P = (Vin − Vout)·I + Vin·Iq = 19 V × 0.8 A + 24 V × 5 mA
    // = 15.32 W (PHYSICS.md §1). In steady state it all crosses the wall: 15.32 × 3.903 = 59.8 K,
    // and junction to pour 15.32 × (0.35 + 1.1 + 1.55 + 1.2) = 64.3 K: together more than the
    // 90 K from 40 °C to the 130 °C target, so the steady answer finds no sink.
    expect(result.required.feasible).toBe(false);
    expect(result.required.enclosureRiseK).toBeCloseTo(15.32 * renc, 2);
    expect(result.required.reason).toContain('the enclosure air rises 59.79 K above the ambient');
    // The fan sink at 2 m/s, 0.3 K/W × 1/sqrt(p/p0) at the site: its steady margin is the series
    // sum 130 − [40 + 15.32 × (4.2 + Rsa + Renc)] (thermal resistances in series, common practice).
    const all = [...result.passing, ...result.failing];
    const fan = all.find((c: { name: string }) => c.name === 'Fan sink');
    expect(fan.rsaKPerW).toBeCloseTo(0.3 / Math.sqrt(ratio), 3);
    expect(fan.steady.marginK).toBeCloseTo(130 - (40 + 15.32 * (4.2 + 0.3 / Math.sqrt(ratio) + renc)), 2);
    // The 1,100 s profile from cold leaves the housing (τ ≈ 90 J/K × 3.9 K/W = 350 s) well short
    // of that: the simulated peak of the fan sink lies far below its steady value.
    expect(fan.devices[0].peakC).toBeLessThan(130 - fan.steady.marginK - 20);
    for (const c of all) expect(Number.isFinite(c.devices[0].peakC)).toBe(true);
  });

  it('answers 400 for a bad sort key or number, and 404 to other teams', async () => {
    expect((await agent.get(`/api/studies/${studyId}/ranking?sort=colour`)).status).toBe(400);
    expect((await agent.get(`/api/studies/${studyId}/ranking?ambientC=warm`)).body.error.details[0].path).toBe('ambientC');
    expect((await outsider.get(`/api/studies/${studyId}/ranking`)).status).toBe(404);
  });
});
