import { advance, compileNetwork, peakInSegment, runProfile } from '@/core/thermal';
import type { NetworkSpec } from '@/core/thermal';
import { assertInDelta } from '../../helpers/assert-in-delta';
import { seededRandom } from '../../helpers/seeded-random';

// A small junction on a large, hot sink: started cold, the junction first warms from the
// sink, then follows it down as the sink cools, so its maximum lies inside the segment.
const twoNode: NetworkSpec = {
  nodes: [
    { id: 'junction', capacityJPerK: 0.5 },
    { id: 'sink', capacityJPerK: 50 },
  ],
  links: [
    { a: 'junction', b: 'sink', rKPerW: 1 },
    { a: 'sink', b: 'ambient', rKPerW: 1 },
  ],
  heatInputs: ['junction'],
};

/** Densely sampled maximum of the exact solution (advance from the segment start). */
function sampledMax(model: ReturnType<typeof compileNetwork>, T0: number[], u: number[], h: number, node: number, samples: number) {
  let best = -Infinity;
  let at = 0;
  for (let i = 0; i <= samples; i++) {
    const t = (h * i) / samples;
    const v = advance(model, T0, u, t)[node];
    if (v > best) {
      best = v;
      at = t;
    }
  }
  return { best, at };
}

describe('peakInSegment', () => {
  const model = compileNetwork(twoNode);
  const T0 = [25, 90];
  const u = [0, 25];
  const h = 60;

  it('finds an interior maximum of the junction that the segment ends miss', () => {
    const peak = peakInSegment(model, T0, u, h, 0);
    const ends = Math.max(T0[0], advance(model, T0, u, h)[0]);
    expect(peak.timeS).toBeGreaterThan(0);
    expect(peak.timeS).toBeLessThan(h);
    expect(peak.valueC).toBeGreaterThan(ends + 10);
    // Reference: 200,001 samples of the exact solution; the sampled value can only be lower,
    // by at most ~f″·Δt² (Δt = 3e-4 s).
    const { best, at } = sampledMax(model, T0, u, h, 0, 200_000);
    expect(peak.valueC).toBeGreaterThanOrEqual(best - 1e-12);
    assertInDelta(peak.valueC, best, 1e-6, 'peak value');
    assertInDelta(peak.timeS, at, 2 * (h / 200_000), 'peak time');
  });

  it('runProfile reports the same interior peak', () => {
    const run = runProfile(model, { durations: [h], inputs: u }, { initial: T0, watchNodes: [0] });
    const peak = peakInSegment(model, T0, u, h, 0);
    assertInDelta(run.peaks[0].valueC, peak.valueC, 1e-12, 'value');
    assertInDelta(run.peaks[0].timeS, peak.timeS, 1e-9, 'time');
  });
});

describe('runProfile peaks', () => {
  // Two devices of three stages each on one sink with an enclosure air node (8 nodes).
  const device = (k: string) => [
    { id: `j${k}`, capacityJPerK: 0.02 },
    { id: `p${k}`, capacityJPerK: 0.3 },
    { id: `c${k}`, capacityJPerK: 2 },
  ];
  const spec: NetworkSpec = {
    nodes: [...device('1'), ...device('2'), { id: 'sink', capacityJPerK: 180 }, { id: 'air', capacityJPerK: 50 }],
    links: [
      ...['1', '2'].flatMap((k) => [
        { a: `j${k}`, b: `p${k}`, rKPerW: 0.3 },
        { a: `p${k}`, b: `c${k}`, rKPerW: 0.4 },
        { a: `c${k}`, b: 'sink', rKPerW: 0.3 },
      ]),
      { a: 'sink', b: 'air', rKPerW: 1.1 },
      { a: 'air', b: 'ambient', rKPerW: 0.4 },
    ],
    heatInputs: ['j1', 'j2'],
  };
  const model = compileNetwork(spec);

  it.each([1, 2, 3])('random profile %i: every watched peak equals the best exact per-segment peak', (seed) => {
    const rnd = seededRandom(seed);
    const S = 400;
    const durations = new Float64Array(S);
    const inputs = new Float64Array(S * 3);
    for (let s = 0; s < S; s++) {
      durations[s] = rnd() < 0.1 ? 0 : 10 ** (-3 + 3 * rnd());
      inputs[s * 3] = rnd() < 0.5 ? 0 : 12 * rnd();
      inputs[s * 3 + 1] = rnd() < 0.5 ? 0 : 12 * rnd();
      inputs[s * 3 + 2] = 25 + 10 * rnd();
    }
    // Cool devices on a hot sink: the junctions warm from the sink first, so peaks fall
    // inside segments as well as at their ends.
    const initial = [25, 30, 50, 25, 30, 50, 90, 60].map((v) => v + 5 * rnd());
    const watch = [0, 3, 6, 7];
    const run = runProfile(model, { durations, inputs }, { initial, watchNodes: watch });
    // Reference: segment by segment with peakInSegment (full root isolation, no bounds).
    let T: Float64Array = Float64Array.from(initial);
    const best = watch.map(() => ({ valueC: -Infinity, timeS: 0 }));
    let t = 0;
    for (let s = 0; s < S; s++) {
      const u = inputs.subarray(s * 3, s * 3 + 3);
      if (durations[s] > 0) {
        watch.forEach((node, w) => {
          const p = peakInSegment(model, T, u, durations[s], node);
          if (p.valueC > best[w].valueC) best[w] = { valueC: p.valueC, timeS: t + p.timeS };
        });
      }
      T = advance(model, T, u, durations[s]);
      t += durations[s];
    }
    watch.forEach((_, w) => {
      assertInDelta(run.peaks[w].valueC, best[w].valueC, 1e-9, `peak ${w}`);
      assertInDelta(run.peaks[w].timeS, best[w].timeS, 1e-6, `peak time ${w}`);
    });
    run.final.forEach((v, i) => assertInDelta(v, T[i], 1e-9, `final ${i}`));
  });

  it('a junction warmed by a hot sink peaks inside a segment of a long profile', () => {
    // Device 1 off on a sink at 95 °C: its junction rises towards the sink, then falls with it.
    const S = 50;
    const durations = new Float64Array(S).fill(2);
    const inputs = new Float64Array(S * 3);
    for (let s = 0; s < S; s++) inputs.set([0, s % 2 === 0 ? 5 : 0, 25], s * 3);
    const initial = [25, 25, 25, 40, 45, 60, 95, 70];
    const run = runProfile(model, { durations, inputs }, { initial, watchNodes: [0] });
    const peak = run.peaks[0];
    expect(peak.timeS % 2).toBeGreaterThan(1e-3);
    // Reference: 20,000 exact samples of the segment holding the peak.
    const s = Math.floor(peak.timeS / 2);
    let T: Float64Array = Float64Array.from(initial);
    for (let k = 0; k < s; k++) T = advance(model, T, inputs.subarray(k * 3, k * 3 + 3), 2);
    const u = Array.from(inputs.subarray(s * 3, s * 3 + 3));
    const { best, at } = sampledMax(model, Array.from(T), u, 2, 0, 20_000);
    expect(peak.valueC).toBeGreaterThanOrEqual(best - 1e-12);
    assertInDelta(peak.valueC, best, 1e-7, 'peak value');
    assertInDelta(peak.timeS, 2 * s + at, 2e-4, 'peak time');
  });

  it('interior peaks inside a dense sampling of a PWM profile are not missed', () => {
    const S = 60;
    const durations = Float64Array.from({ length: S }, (_, s) => (s % 2 === 0 ? 0.004 : 0.011));
    const inputs = new Float64Array(S * 3);
    for (let s = 0; s < S; s++) inputs.set(s % 2 === 0 ? [35, 0, 30] : [0, 20, 30], s * 3);
    const initial = [30, 30, 30, 95, 90, 85, 60, 40];
    const run = runProfile(model, { durations, inputs }, { initial, watchNodes: [0, 3] });
    // Reference: 2,000 exact samples per segment.
    let T: Float64Array = Float64Array.from(initial);
    const sampled = [-Infinity, -Infinity];
    for (let s = 0; s < S; s++) {
      const u = inputs.subarray(s * 3, s * 3 + 3);
      [0, 3].forEach((node, w) => (sampled[w] = Math.max(sampled[w], sampledMax(model, Array.from(T), Array.from(u), durations[s], node, 2000).best)));
      T = advance(model, T, u, durations[s]);
    }
    sampled.forEach((v, w) => {
      expect(run.peaks[w].valueC).toBeGreaterThanOrEqual(v - 1e-12);
      assertInDelta(run.peaks[w].valueC, v, 1e-6, `peak ${w}`);
    });
  });
});
