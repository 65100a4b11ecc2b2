import { createTurningPoints, rainflow, rainflowPeriodic, turningPoints, type RainflowCycles } from '@/core/reliability';
import { assertInDelta } from '../../helpers/assert-in-delta';
import { seededRandom } from '../../helpers/seeded-random';

/** Cycle counts by range, summed (the standard reports its example that way). */
function countsByRange(c: RainflowCycles): Record<string, number> {
  const out: Record<string, number> = {};
  for (let k = 0; k < c.length; k++) out[String(c.range[k])] = (out[String(c.range[k])] ?? 0) + c.count[k];
  return out;
}

const total = (c: RainflowCycles, f: (k: number) => number) => {
  let s = 0;
  for (let k = 0; k < c.length; k++) s += f(k);
  return s;
};

function randomWalk(seed: number, n: number): Float64Array {
  const rnd = seededRandom(seed);
  const out = new Float64Array(n);
  let v = 0;
  for (let i = 0; i < n; i++) out[i] = v += rnd() - 0.5;
  return out;
}

describe('rainflow (ASTM E1049-85, reapproved 2017, §5.4.4)', () => {
  it('counts the worked example of §5.4.4', () => {
    // ASTM E1049-85 (2017) §5.4.4 example, series −2, 1, −3, 5, −1, 3, −4, 4, −2:
    // range 3: 0.5, 4: 1.5, 6: 0.5, 8: 1.0, 9: 0.5 cycles (also PHYSICS.md §6).
    const c = rainflow([-2, 1, -3, 5, -1, 3, -4, 4, -2]);
    expect(countsByRange(c)).toEqual({ '3': 0.5, '4': 1.5, '6': 0.5, '8': 1, '9': 0.5 });
  });

  it('gives the means of the standard example cycles', () => {
    // Same example, traced by hand through §5.4.4: the one full cycle is −1 → 3 (range 4, mean 1);
    // the rest are half cycles −2→1, 1→−3, −3→5, 5→−4, −4→4, 4→−2 (the 8 count is two halves).
    const c = rainflow([-2, 1, -3, 5, -1, 3, -4, 4, -2]);
    const rows = Array.from({ length: c.length }, (_, k) => [c.range[k], c.mean[k], c.count[k]]);
    expect(rows.filter(([, , n]) => n === 1)).toEqual([[4, 1, 1]]);
    expect(rows.filter(([, , n]) => n === 0.5).sort((a, b) => a[0] - b[0] || a[1] - b[1])).toEqual([
      [3, -0.5, 0.5],
      [4, -1, 0.5],
      [6, 1, 0.5],
      [8, 0, 0.5],
      [8, 1, 0.5],
      [9, 0.5, 0.5],
    ]);
  });

  it('reduces the history to peaks and valleys first (ASTM E1049 §5.4.1: only turning points count)', () => {
    const dense = [-2, -1, 0, 1, 1, -3, 0, 5, 2, -1, 3, -4, 0, 4, -2];
    expect(countsByRange(rainflow(dense))).toEqual(countsByRange(rainflow([-2, 1, -3, 5, -1, 3, -4, 4, -2])));
  });

  it('a constant or single-point history has no cycles', () => {
    expect(rainflow([]).length).toBe(0);
    expect(rainflow([3]).length).toBe(0);
    expect(rainflow([3, 3, 3]).length).toBe(0);
    expect(rainflowPeriodic([3, 3]).length).toBe(0);
  });
});

describe('rainflow properties (seeded random histories)', () => {
  it('turning-point reduction is idempotent and keeps first, last, min and max', () => {
    for (let seed = 1; seed <= 20; seed++) {
      const h = randomWalk(seed, 500);
      const tp = turningPoints(h);
      expect(Array.from(turningPoints(tp))).toEqual(Array.from(tp));
      expect(tp[0]).toBe(h[0]);
      expect(tp[tp.length - 1]).toBe(h[h.length - 1]);
      expect(Math.max(...tp)).toBe(Math.max(...h));
      expect(Math.min(...tp)).toBe(Math.min(...h));
      // Alternating: every inner point is a strict peak or valley.
      for (let i = 1; i + 1 < tp.length; i++) expect((tp[i] - tp[i - 1]) * (tp[i + 1] - tp[i])).toBeLessThan(0);
    }
  });

  it('counts every reversal once: Σ 2·count = turning points − 1', () => {
    // Each full cycle removes two ranges between adjacent turning points, each half cycle one
    // (ASTM E1049 §5.4.4 steps 4–6), so the counted half-ranges add up to the reversals.
    for (let seed = 1; seed <= 20; seed++) {
      const h = randomWalk(seed, 2000);
      const c = rainflow(h);
      assertInDelta(total(c, (k) => 2 * c.count[k]), turningPoints(h).length - 1, 1e-9, `seed ${seed}`);
    }
  });

  it('the largest range counted is the overall max − min, with at least half a cycle', () => {
    for (let seed = 1; seed <= 20; seed++) {
      const h = randomWalk(seed, 1000);
      const c = rainflow(h);
      const largest = Math.max(...c.range);
      assertInDelta(largest, Math.max(...h) - Math.min(...h), 1e-12, `seed ${seed}`);
    }
  });

  it('each cycle lies inside the history: mean ± range/2 within [min, max]', () => {
    const h = randomWalk(7, 5000);
    const c = rainflow(h);
    const lo = Math.min(...h);
    const hi = Math.max(...h);
    for (let k = 0; k < c.length; k++) {
      expect(c.mean[k] - c.range[k] / 2).toBeGreaterThanOrEqual(lo - 1e-12);
      expect(c.mean[k] + c.range[k] / 2).toBeLessThanOrEqual(hi + 1e-12);
    }
  });

  it('shifting a history moves the means, scaling it scales the ranges', () => {
    const h = randomWalk(11, 800);
    const base = rainflow(h);
    const moved = rainflow(h.map((v) => 3 * v + 10));
    expect(moved.length).toBe(base.length);
    for (let k = 0; k < base.length; k++) {
      assertInDelta(moved.range[k], 3 * base.range[k], 1e-9, 'range');
      assertInDelta(moved.mean[k], 3 * base.mean[k] + 10, 1e-9, 'mean');
      expect(moved.count[k]).toBe(base.count[k]);
    }
  });

  it('a pure sine gives one full cycle of range 2A per period', () => {
    const periods = 12;
    const perPeriod = 40;
    const h = Array.from({ length: periods * perPeriod + 1 }, (_, i) => 5 * Math.sin((2 * Math.PI * i) / perPeriod + 0.3));
    const c = rainflow(h);
    const near2A = total(c, (k) => (c.range[k] > 9.9 ? c.count[k] : 0));
    // The open ends of the record leave half cycles: the count is periods to within one.
    expect(Math.abs(near2A - periods)).toBeLessThanOrEqual(1);
    // One period, closed as a repeating block: exactly one cycle of 2A (A = 5, sampled at its crest).
    const onePeriod = Array.from({ length: 4 }, (_, i) => 5 * Math.sin((2 * Math.PI * i) / 4));
    const p = rainflowPeriodic(onePeriod);
    expect(Array.from(p.count)).toEqual([1]);
    assertInDelta(p.range[0], 10, 1e-12, 'range 2A');
    assertInDelta(p.mean[0], 0, 1e-12, 'mean');
  });

  it('a repeated block counts as many times its periodic cycles (only full cycles)', () => {
    for (let seed = 1; seed <= 10; seed++) {
      const block = randomWalk(seed, 60);
      const once = rainflowPeriodic(block);
      for (const n of once.count) expect(n).toBe(1);
      // Repeating the block 50 times: the open record's count tends to 50 × the periodic one.
      const repeated = new Float64Array(block.length * 50);
      for (let r = 0; r < 50; r++) repeated.set(block, r * block.length);
      const open = rainflow(repeated);
      const damageLike = (c: RainflowCycles) => total(c, (k) => c.count[k] * c.range[k] ** 4);
      const ratio = damageLike(open) / damageLike(once);
      expect(ratio).toBeGreaterThan(48);
      expect(ratio).toBeLessThan(52);
    }
  });

  it('streaming reduction matches the batch one', () => {
    const h = randomWalk(3, 3000);
    const tp = createTurningPoints(4);
    for (const v of h) tp.push(v);
    expect(Array.from(tp.values())).toEqual(Array.from(turningPoints(h)));
  });

  it('refuses a non-finite value', () => {
    expect(() => turningPoints([1, NaN])).toThrow(RangeError);
  });
});
