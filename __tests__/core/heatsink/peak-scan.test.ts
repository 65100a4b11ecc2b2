import { AMBIENT, compileNetwork, runProfile, type NetworkSpec } from '@/core/thermal';
import { PEAK_TOLERANCE_K, scanPeaks, scanProfile } from '@/core/heatsink';
import { assertNear } from './assert-near';

/** Deterministic pseudo-random numbers (LCG, Numerical Recipes' constants). */
function generator(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 4294967296;
  };
}

const oneNode = (r: number, c: number): NetworkSpec => ({
  nodes: [{ id: 'j', capacityJPerK: c }],
  links: [{ a: 'j', b: AMBIENT, rKPerW: r }],
  heatInputs: ['j'],
});

describe('scanPeaks', () => {
  it('matches the single-RC step response Ta + P R (1 − e^(−t/RC)) at the end of a burst', () => {
    // Textbook first-order response: R = 2 K/W, C = 50 J/K (τ = 100 s), 30 W for 80 s then
    // 0 W for 200 s, Ta = 25 °C: peak 25 + 60 (1 − e^(−0.8)) = 25 + 60 × 0.550671 = 58.04026 °C at 80 s.
    const model = compileNetwork(oneNode(2, 50));
    const profile = scanProfile(Float64Array.from([80, 200]), Float64Array.from([30, 25, 0, 25]), 2);
    const r = scanPeaks(model, profile, Int32Array.from([0]), false);
    assertNear(r.peakC[0], 25 + 60 * (1 - Math.exp(-0.8)), 1e-9, 'peak');
    assertNear(r.peakC[0], 58.04026, 1e-5, 'peak, hand value');
    assertNear(r.peakTimeS[0], 80, 1e-9, 'peak time');
    assertNear(r.finalC[0], 25 + 60 * (1 - Math.exp(-0.8)) * Math.exp(-2), 1e-9, 'final');
  });

  it('starts a periodic profile in its steady state: peak P R (1 − e^(−tp/τ)) / (1 − e^(−T/τ))', () => {
    // PHYSICS.md §3, periodic pulses into one RC (exact for that network): R = 1, C = 20
    // (τ = 20 s), 10 W for 5 s in a 25 s period, Ta = 30 °C:
    // 30 + 10 (1 − e^(−0.25)) / (1 − e^(−1.25)) = 30 + 10 × 0.221199 / 0.713495 = 33.10022 °C.
    const model = compileNetwork(oneNode(1, 20));
    const profile = scanProfile(Float64Array.from([5, 20]), Float64Array.from([10, 30, 0, 30]), 2);
    const r = scanPeaks(model, profile, Int32Array.from([0]), true);
    assertNear(r.peakC[0], 30 + (10 * -Math.expm1(-0.25)) / -Math.expm1(-1.25), 1e-9, 'periodic peak');
    assertNear(r.peakC[0], 33.10022, 1e-5, 'periodic peak, hand value');
    assertNear(r.initialC[0], r.finalC[0], 1e-9, 'start equals end over one period');
  });

  // Cross-check against the thermal core's exact runProfile (itself tested against closed
  // forms and the trapezoidal integrator) on random ladders, two devices on one sink: the
  // scan may lie below the exact peak by at most PEAK_TOLERANCE_K and never above it.
  const cases = [
    { seed: 1, identical: false, periodic: false },
    { seed: 2, identical: true, periodic: false },
    { seed: 3, identical: true, periodic: true },
    { seed: 4, identical: false, periodic: true },
    { seed: 5, identical: false, periodic: false },
  ];
  it.each(cases)('agrees with runProfile on a random two-device network (seed $seed, identical devices $identical, periodic $periodic)', ({ seed, identical, periodic }) => {
    const next = generator(seed);
    const stage = () => ({ r: 0.05 + next(), c: 0.01 * Math.pow(1000, next()) });
    const a = [stage(), stage(), stage()];
    const b = identical ? a : [stage(), stage(), stage()];
    const nodes = [];
    const links = [];
    for (const [name, chain] of [['a', a], ['b', b]] as const) {
      chain.forEach((s, k) => {
        nodes.push({ id: `${name}${k}`, capacityJPerK: s.c });
        links.push({ a: `${name}${k}`, b: k < 2 ? `${name}${k + 1}` : `${name}.case`, rKPerW: s.r });
      });
      nodes.push({ id: `${name}.case`, capacityJPerK: 0 });
      links.push({ a: `${name}.case`, b: 'sink', rKPerW: 0.2 });
    }
    nodes.push({ id: 'sink', capacityJPerK: 50 + 500 * next() });
    links.push({ a: 'sink', b: AMBIENT, rKPerW: 0.3 + 2 * next() });
    const model = compileNetwork({ nodes, links, heatInputs: ['a0', 'b0'] });
    const S = 3000;
    const durations = Float64Array.from({ length: S }, () => [0.05, 0.4, 2, 9][Math.floor(next() * 4)]);
    const inputs = new Float64Array(S * 3);
    for (let s = 0; s < S; s++) {
      inputs[s * 3] = next() < 0.5 ? 0 : 40 * next();
      inputs[s * 3 + 1] = next() < 0.5 ? 0 : 40 * next();
      inputs[s * 3 + 2] = 35;
    }
    const watch = [model.nodeIndex.get('a0')!, model.nodeIndex.get('b0')!];
    const exact = runProfile(model, { durations, inputs }, { watchNodes: watch, periodic });
    const got = scanPeaks(model, scanProfile(durations, inputs, 3), Int32Array.from(watch), periodic);
    exact.peaks.forEach((p, w) => {
      expect(got.peakC[w]).toBeLessThanOrEqual(p.valueC + 1e-9);
      expect(got.peakC[w]).toBeGreaterThanOrEqual(p.valueC - PEAK_TOLERANCE_K);
    });
    exact.final.forEach((v, i) => assertNear(got.finalC[i], v, 1e-9, `final[${i}]`));
  });

  it('agrees with runProfile with three devices on the sink (the general path)', () => {
    const next = generator(11);
    const nodes = [];
    const links = [];
    for (const name of ['a', 'b', 'c']) {
      nodes.push({ id: `${name}.j`, capacityJPerK: 0.02 + next() }, { id: `${name}.c`, capacityJPerK: 1 + 5 * next() });
      links.push({ a: `${name}.j`, b: `${name}.c`, rKPerW: 0.2 + next() }, { a: `${name}.c`, b: 'sink', rKPerW: 0.1 + next() });
    }
    nodes.push({ id: 'sink', capacityJPerK: 300 });
    links.push({ a: 'sink', b: AMBIENT, rKPerW: 0.8 });
    const model = compileNetwork({ nodes, links, heatInputs: ['a.j', 'b.j', 'c.j'] });
    const S = 2000;
    const durations = Float64Array.from({ length: S }, () => 0.1 + 5 * next());
    const inputs = new Float64Array(S * 4);
    for (let s = 0; s < S; s++) {
      for (let i = 0; i < 3; i++) inputs[s * 4 + i] = next() < 0.4 ? 0 : 30 * next();
      inputs[s * 4 + 3] = 30;
    }
    const watch = ['a.j', 'b.j', 'c.j'].map((id) => model.nodeIndex.get(id)!);
    const exact = runProfile(model, { durations, inputs }, { watchNodes: watch });
    const got = scanPeaks(model, scanProfile(durations, inputs, 4), Int32Array.from(watch), false);
    exact.peaks.forEach((p, w) => {
      expect(got.peakC[w]).toBeLessThanOrEqual(p.valueC + 1e-9);
      expect(got.peakC[w]).toBeGreaterThanOrEqual(p.valueC - PEAK_TOLERANCE_K);
    });
  });

  it('finds a peak inside a segment (junction overshoot while the sink cools)', () => {
    // A heater warms the sink for 1000 s with the junction off; then the junction takes 40 W
    // while the heater stops. The junction (τ ≈ 0.5 s) rises to about sink + 40 K within
    // seconds and then falls with the cooling sink (τ ≈ 100 s): its maximum lies inside the
    // last segment, above both of its ends. Checked against the core's exact runProfile.
    const model = compileNetwork({
      nodes: [
        { id: 'j', capacityJPerK: 0.5 },
        { id: 'heater', capacityJPerK: 1 },
        { id: 's', capacityJPerK: 200 },
      ],
      links: [
        { a: 'j', b: 's', rKPerW: 1 },
        { a: 'heater', b: 's', rKPerW: 0.1 },
        { a: 's', b: AMBIENT, rKPerW: 0.5 },
      ],
      heatInputs: ['j', 'heater'],
    });
    const durations = Float64Array.from([1000, 100]);
    const inputs = Float64Array.from([0, 100, 25, 40, 0, 25]);
    const exact = runProfile(model, { durations, inputs }, { watchNodes: [0], recordBoundaries: true });
    const got = scanPeaks(model, scanProfile(durations, inputs, 3), Int32Array.from([0]), false);
    const ends = exact.boundaries!;
    expect(exact.peaks[0].valueC).toBeGreaterThan(Math.max(ends[1 * 3], ends[2 * 3]) + 1);
    assertNear(got.peakC[0], exact.peaks[0].valueC, PEAK_TOLERANCE_K, 'peak');
    assertNear(got.peakTimeS[0], exact.peaks[0].timeS, 1e-3, 'peak time');
  });
});
