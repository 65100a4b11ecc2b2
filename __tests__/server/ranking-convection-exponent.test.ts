import { createTestApp, makeTeam, makeUser, signedIn } from './test-app';

let ctx: Awaited<ReturnType<typeof createTestApp>>;
let agent: Awaited<ReturnType<typeof signedIn>>;
let studyId: number;

// One lumped device: Rjc 0.5, Rcs 0.3 K/W, 20 W for 6000 s at 25 °C ambient.
const doc = {
  format: 'junctura-study',
  version: 1,
  title: 'Exponent ranking',
  marginK: 20,
  ambient: { temperatureC: 25 },
  sinks: [{ id: 'S1', rthKPerW: 1.2, capacityJPerK: 50 }],
  devices: [{ id: 'Q1', tjMaxC: 150, sink: 'S1', package: { kind: 'lumped', rthKPerW: 0.5 }, interface: { rthKPerW: 0.3 } }],
  profile: { segments: [{ durationS: 6000, powerW: { Q1: 20 } }], repeat: 1 },
};

// Two sinks with the same still-air rating, 5 K/W at a 50 K rise, 45 J/K (50 g of aluminium,
// cp 900 J/(kg·K), Incropera & DeWitt Table A.1): one with the laminar default, one with n = 1/3.
const sink = (name: string, convectionExponent: number | null) => ({
  name,
  rthKPerW: 5,
  referenceRiseK: 50,
  convectionExponent,
  forcedAir: [],
  massKg: 0.05,
  material: 'aluminium' as const,
  capacityJPerK: null,
  widthMm: null,
  lengthMm: null,
  heightMm: null,
  price: null,
});

beforeAll(async () => {
  ctx = await createTestApp();
  const teamId = (await makeTeam(ctx.db, 'Exponents')).id;
  await makeUser(ctx.db, 'd@exponent.test', [{ teamId, role: 'designer' }]);
  await ctx.db.models.Heatsink.create({ ...sink('Laminar default', null), teamId });
  await ctx.db.models.Heatsink.create({ ...sink('Third power', 1 / 3), teamId });
  agent = await signedIn(ctx.app, 'd@exponent.test');
  studyId = (await agent.post('/api/studies').send({ title: 'Exponent ranking', document: doc })).body.study.id;
});
afterAll(() => ctx.close());

type Ranked = { name: string; rsaKPerW: number; meanRiseK: number; convectionExponent: { n: number; given: boolean }; steady: { rsaKPerW: number }; devices: { peakC: number }[] };

describe('ranking with a catalogue convection exponent', () => {
  it('gives the sink with n = 1/3 the lower Rθsa the scaling law predicts at a rise above its reference', async () => {
    const res = await agent.get(`/api/studies/${studyId}/ranking`);
    expect(res.status).toBe(200);
    const all = [...res.body.result.passing, ...res.body.result.failing] as Ranked[];
    const laminar = all.find((c) => c.name === 'Laminar default')!;
    const third = all.find((c) => c.name === 'Third power')!;
    // Each candidate says which exponent it ran with, and whether the catalogue gave it.
    expect(laminar.convectionExponent).toEqual({ n: 0.25, given: false });
    expect(third.convectionExponent.given).toBe(true);
    expect(third.convectionExponent.n).toBeCloseTo(1 / 3, 12);

    // Natural convection: Rθ(ΔT) = Rθref (ΔTref/ΔT)^n, laminar n = 1/4 (Incropera & DeWitt,
    // Fundamentals of Heat and Mass Transfer, ch. 9, h ∝ ΔT^(1/4); from memory). In steady
    // state the rise is ΔT = P·Rθ(ΔT): each steady Rθsa must satisfy that law at its own rise.
    const P = 20;
    const law = (n: number, riseK: number) => 5 * Math.pow(50 / riseK, n);
    for (const [c, n] of [[laminar, 1 / 4], [third, 1 / 3]] as const) {
      const rise = c.steady.rsaKPerW * P;
      expect(rise).toBeGreaterThan(50);
      expect(c.steady.rsaKPerW).toBeCloseTo(law(n, rise), 9);
    }
    // Worked by hand: ΔT = (5 · 50^n · 20)^(1/(1+n)) gives 87.06 K, 4.353 K/W for n = 1/4 and
    // 84.09 K, 4.204 K/W for n = 1/3.
    expect(laminar.steady.rsaKPerW).toBeCloseTo(4.353, 3);
    expect(third.steady.rsaKPerW).toBeCloseTo(4.204, 3);

    // The profile is linearised at its mean rise, a little below the steady one after the
    // warm-up (τ ≈ 4.3 K/W × 45 J/K ≈ 200 s of 6000 s), so Rθsa follows the law there too.
    for (const [c, n] of [[laminar, 1 / 4], [third, 1 / 3]] as const) {
      expect(c.meanRiseK).toBeGreaterThan(50);
      expect(Math.abs(c.rsaKPerW / law(n, c.meanRiseK) - 1)).toBeLessThan(0.01);
    }
    expect(third.rsaKPerW).toBeLessThan(laminar.rsaKPerW);
    expect(laminar.rsaKPerW / third.rsaKPerW).toBeCloseTo(4.353 / 4.204, 2);
    // Steady after 6000 s ≫ τ: Tj = Ta + P (Rjc + Rcs + Rθsa), thermal resistances in series (textbook).
    for (const c of [laminar, third]) expect(c.devices[0].peakC).toBeCloseTo(25 + P * (0.5 + 0.3 + c.rsaKPerW), 1);
    expect(third.devices[0].peakC).toBeLessThan(laminar.devices[0].peakC);
  });
});
