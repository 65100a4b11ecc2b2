import { naturalConvectionSteady, prepareRanking, rankPrepared, rankScenarios, rankSinks, type RankingSetup, type SinkCandidate } from '@/core/heatsink';
import { assertNear, assertRelative } from './assert-near';

/**
 * One part with a massless package (Rjc 0.5 K/W) and a 0.1 K/W interface on the sink slot,
 * Ta = 40 °C, Tj,max 150 °C, margin 20 K: target 130 °C. A burst of 50 W for 60 s from cold.
 * With a massless package the junction is Ta + P (Rjc + Rcs) + the sink rise, and the sink
 * is a single RC: rise P R (1 − e^(−t/RC)) (first-order step response, textbook).
 */
const burst = (seconds = 60): RankingSetup => ({
  devices: [{ id: 'q1', tjMaxC: 150, package: { kind: 'lumped', rthKPerW: 0.5, capacityJPerK: 0 }, interfaceRthKPerW: 0.1 }],
  segments: [{ durationS: seconds, powerW: { q1: 50 } }],
  ambientC: 40,
  marginK: 20,
});

/** A constant Rθsa: exponent 0 makes the rating independent of the rise. */
const fixed = (id: string, rsa: number, massKg: number, extra: Partial<SinkCandidate> = {}): SinkCandidate => ({
  id,
  natural: { rthKPerW: rsa, referenceRiseK: 50, exponent: 0 },
  massKg,
  material: 'aluminium',
  ...extra,
});

describe('rankSinks on a short burst', () => {
  // Steady: (130 − 40)/50 − 0.5 − 0.1 = 1.2 K/W required (PHYSICS.md §5).
  const candidates = [
    fixed('big', 1.0, 2.0), // meets the steady requirement
    fixed('massive', 3.0, 1.0), // 900 J/K: τ = 2700 s
    fixed('light', 3.0, 0.02), // 18 J/K: τ = 54 s
  ];
  const result = rankSinks(burst(), candidates, { sortBy: 'mass' });

  it('states the steady requirement', () => {
    assertNear(result.required.rsaKPerW, 1.2, 1e-12, 'required Rsa');
  });

  it('lets a sink with enough thermal mass pass a burst its steady Rθsa alone would fail', () => {
    // massive: rise 50 × 3 × (1 − e^(−60/2700)) = 150 × 0.0219771 = 3.29657 K → Tj 40 + 30 + 3.29657 = 73.29657 °C.
    const massive = result.ranked.find((r) => r.id === 'massive')!;
    assertNear(massive.devices[0].peakC, 40 + 30 + 150 * -Math.expm1(-60 / 2700), 1e-4, 'Tj massive');
    assertNear(massive.devices[0].peakC, 73.29657, 1e-4, 'Tj massive, hand value');
    expect(massive.status).toBe('pass');
    expect(massive.steady!.passes).toBe(false);
    // Its steady answer: 40 + 30 + 150 = 220 °C, 90 K over the target.
    assertNear(massive.steady!.marginK, -90, 1e-9, 'steady margin');
  });

  it('fails the same Rθsa with little mass: rise 150 (1 − e^(−60/54)) = 100.8 K', () => {
    const light = result.ranked.find((r) => r.id === 'light')!;
    // 18 J/K × 3 K/W = 54 s: 40 + 30 + 150 × (1 − e^(−1.1111)) = 40 + 30 + 150 × 0.670807 = 170.621 °C.
    assertNear(light.devices[0].peakC, 40 + 30 + 150 * -Math.expm1(-60 / 54), 1e-4, 'Tj light');
    expect(light.status).toBe('fail');
    assertNear(light.worstMarginK, 130 - light.devices[0].peakC, 1e-12, 'margin');
  });

  it('names the smallest passing sink, the steady choice and the gain from thermal mass', () => {
    expect(result.passing.map((r) => r.id)).toEqual(['massive', 'big']);
    expect(result.smallest?.id).toBe('massive');
    expect(result.steadyChoice?.id).toBe('big');
    expect(result.thermalMassGain).toEqual({ key: 'mass', smallest: 1, steady: 2, fraction: 0.5 });
    expect(result.message).toBeUndefined();
  });

  it('loses the burst advantage when the burst lasts: 3 hours at 50 W fail the massive sink too', () => {
    // 10800 s = 4 τ: rise 150 (1 − e^(−4)) = 147.25 K.
    const long = rankSinks(burst(10800), candidates);
    expect(long.passing.map((r) => r.id)).toEqual(['big']);
    expect(long.thermalMassGain?.fraction).toBe(0);
  });
});

describe('rankSinks sorting', () => {
  const candidates: SinkCandidate[] = [
    fixed('a', 0.5, 3, { volumeM3: 1e-3, price: 9 }),
    fixed('b', 0.6, 2, { volumeM3: 3e-3, price: 4 }),
    fixed('c', 0.7, 1, { volumeM3: 2e-3, price: 12 }),
    fixed('d', 0.9, 4, { price: 1 }),
  ];
  it.each([
    ['mass', ['c', 'b', 'a', 'd']],
    ['volume', ['a', 'c', 'b', 'd']], // d has no volume: last
    ['price', ['d', 'b', 'a', 'c']],
  ] as const)('orders passing sinks by %s', (sortBy, order) => {
    const r = rankSinks(burst(), candidates, { sortBy });
    expect(r.passing.map((c) => c.id)).toEqual(order);
    expect(r.smallest?.id).toBe(order[0]);
  });

  it('rejects an unknown sort key', () => {
    expect(() => rankSinks(burst(), candidates, { sortBy: 'colour' as never })).toThrow('options.sortBy');
  });
});

describe('rankSinks when nothing passes', () => {
  it('lists every candidate as failing, the closest first, and says by how much', () => {
    const r = rankSinks(burst(10800), [fixed('x', 4, 0.5), fixed('y', 2, 0.5), fixed('z', 8, 0.5)]);
    expect(r.passing).toEqual([]);
    expect(r.smallest).toBeNull();
    expect(r.failing.map((c) => c.id)).toEqual(['y', 'x', 'z']);
    expect(r.message).toContain('"y"');
    expect(r.message).toContain('Rθsa ≤ 1.20 K/W');
  });

  it('explains when no sink at all can work', () => {
    // 50 W × (2 + 0.1) K/W = 105 K > 130 − 40 = 90 K.
    const setup = burst();
    setup.devices[0].package = { kind: 'lumped', rthKPerW: 2, capacityJPerK: 0 };
    const r = rankSinks(setup, [fixed('x', 0.01, 5)]);
    expect(r.required.feasible).toBe(false);
    expect(r.message).toContain('even an ideal sink fails');
  });
});

describe('rankSinks what-ifs', () => {
  const setup = burst(10800);
  const candidates: SinkCandidate[] = [
    { id: 'fan', natural: { rthKPerW: 2, referenceRiseK: 50, exponent: 0 }, forcedAir: [{ airSpeedMPerS: 1, rthKPerW: 1.5 }, { airSpeedMPerS: 4, rthKPerW: 0.75 }], massKg: 1, material: 'aluminium' },
    { id: 'plain', natural: { rthKPerW: 1.5, referenceRiseK: 50, exponent: 0 }, massKg: 1, material: 'aluminium' },
    { id: 'ducted', forcedAir: [{ airSpeedMPerS: 2, rthKPerW: 0.5 }], massKg: 0.5, material: 'aluminium' },
  ];
  const prep = prepareRanking(setup);
  const [still, air] = rankScenarios(prep, candidates, [{}, { airSpeedMPerS: 2 }]);

  it('in still air uses natural ratings and leaves out sinks that have none', () => {
    expect(still.passing).toEqual([]);
    expect(still.excluded.map((c) => c.id)).toEqual(['ducted']);
    expect(still.excluded[0].reason).toContain('no still-air rating');
  });

  it('in moving air interpolates the forced-air curve and keeps still-air values where there is none', () => {
    // fan at 2 m/s: log–log between (1, 1.5) and (4, 0.75): 1.5 × 2^(−0.5) = 1.06066 K/W.
    const fan = air.ranked.find((c) => c.id === 'fan')!;
    assertNear(fan.rsaKPerW!, 1.5 / Math.SQRT2, 1e-12, 'fan Rsa');
    expect(fan.status).toBe('pass');
    const plain = air.ranked.find((c) => c.id === 'plain')!;
    expect(plain.notes.join()).toContain('still-air Rθsa used');
    const ducted = air.ranked.find((c) => c.id === 'ducted')!;
    expect(ducted.status).toBe('pass');
    expect(air.smallest?.id).toBe('ducted');
  });

  it('changes the verdict with the ambient and the margin', () => {
    const base = rankPrepared(prep, candidates, { airSpeedMPerS: 2 });
    const hot = rankPrepared(prep, candidates, { airSpeedMPerS: 2, ambientC: 70 });
    const strict = rankPrepared(prep, candidates, { airSpeedMPerS: 2, marginK: 60 });
    // 3 h at 50 W: ducted (0.5 K/W, 450 J/K, τ = 225 s) rises 25 K → 95 °C; fan (1.06 K/W,
    // 900 J/K, τ ≈ 955 s) rises 53.0 K → 123 °C. 30 K more ambient fails the fan (target 130 °C);
    // a 60 K margin (target 90 °C) fails both.
    expect(base.passing.map((c) => c.id)).toEqual(['ducted', 'fan']);
    expect(hot.passing.map((c) => c.id)).toEqual(['ducted']);
    const ducted = (r: typeof base) => r.ranked.find((c) => c.id === 'ducted')!.devices[0].peakC;
    assertNear(ducted(hot) - ducted(base), 30, 1e-6, 'ambient shift');
    expect(strict.scenario.marginK).toBe(60);
    expect(strict.passing).toEqual([]);
  });

  it('leaves out a sink that cannot carry all parts', () => {
    const r = rankPrepared(prep, [{ ...candidates[1], devicesPerSink: 1 }], {});
    expect(r.excluded).toHaveLength(0);
    const two = prepareRanking({ ...setup, devices: [{ ...setup.devices[0], count: 2 }] });
    const r2 = rankPrepared(two, [{ ...candidates[1], devicesPerSink: 1 }], {});
    expect(r2.excluded[0].reason).toBe('carries 1 part, the setup has 2');
  });
});

describe('rankSinks with natural convection', () => {
  it('linearises at the time-averaged rise: exact steady state under constant power', () => {
    // Periodic constant 40 W: the periodic steady state is the steady state, so the sink must
    // sit at the closed-form fixed point ΔT = (Rref ΔTref^n P)^(1/(1+n)) of the law, and Tj at
    // Ta + P (Rjc + Rcs) + ΔT (PHYSICS.md §3, §5).
    const setup: RankingSetup = { ...burst(), segments: [{ durationS: 100, powerW: { q1: 40 } }], periodic: true };
    const r = rankSinks(setup, [{ id: 'nc', natural: { rthKPerW: 1.2, referenceRiseK: 75 }, massKg: 0.4, material: 'aluminium' }]);
    const steady = naturalConvectionSteady(1.2, 75, 40);
    const c = r.ranked[0];
    assertRelative(c.rsaKPerW!, steady.rsaKPerW, 1e-12, 'Rsa');
    assertNear(c.meanRiseK!, steady.riseK, 1e-6, 'mean rise');
    assertNear(c.devices[0].peakC, 40 + 40 * 0.6 + steady.riseK, 1e-4, 'Tj');
    expect(c.runs).toBe(1);
  });

  it('from cold settles Rθsa within 1 % of the law at the simulated mean rise', () => {
    const setup: RankingSetup = {
      ...burst(),
      segments: Array.from({ length: 40 }, (_, i) => ({ durationS: 60, powerW: { q1: i % 2 ? 10 : 45 } })),
    };
    const r = rankSinks(setup, [{ id: 'nc', natural: { rthKPerW: 1.5, referenceRiseK: 75 }, massKg: 0.3, material: 'aluminium' }]);
    const c = r.ranked[0];
    const law = 1.5 * Math.pow(75 / c.meanRiseK!, 0.25);
    assertRelative(c.rsaKPerW!, law, 0.01, 'Rsa against the law at the mean rise');
    expect(c.notes).toEqual([]);
  });
});

describe('rankSinks input checks', () => {
  it('names the field at fault', () => {
    expect(() => rankSinks(burst(), [{ id: 'x' }])).toThrow('candidates[0]: needs a natural rating');
    expect(() => rankSinks(burst(), [fixed('x', 1, 1), fixed('x', 2, 1)])).toThrow('candidates[1].id: "x" is used by an earlier candidate');
    expect(() => rankSinks(burst(), [{ id: 'x', natural: { rthKPerW: 1, referenceRiseK: 50 }, massKg: 1 }])).toThrow('candidates[0].material');
    expect(() => rankSinks({ ...burst(), segments: [{ durationS: 1, powerW: { q9: 1 } }] }, [])).toThrow('setup.segments[0].powerW.q9: no device has the id "q9"');
    expect(() => rankSinks(burst(), [], { airSpeedMPerS: -1 })).toThrow('options.airSpeedMPerS: must be ≥ 0');
  });
});
