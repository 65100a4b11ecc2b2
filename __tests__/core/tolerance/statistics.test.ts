import { histogram, quantile, ranks, spearman, wilson } from '@/core/tolerance';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('tolerance statistics', () => {
  it('takes quantiles linearly between order statistics (Hyndman & Fan definition 7)', () => {
    // h = (n − 1)q: for [1, 2, 3, 4] and q = 0.25, h = 0.75 → 1.75 (definition 7, the NumPy default; from memory).
    expect(quantile([1, 2, 3, 4], 0.25)).toBeCloseTo(1.75, 12);
    expect(quantile([1, 2, 3, 4], 0.5)).toBeCloseTo(2.5, 12);
    expect(quantile([10], 0.99)).toBe(10);
  });

  it('gives the Wilson score interval', () => {
    // k = 0: the upper end is z²/(n + z²) (closed form of Wilson's interval at p̂ = 0).
    const z = 1.959963984540054;
    const none = wilson(0, 10);
    expect(none.low).toBe(0);
    assertInDelta(none.high, (z * z) / (10 + z * z), 1e-12, 'upper at k = 0');
    // k = n mirrors it.
    assertInDelta(wilson(10, 10).low, 1 - (z * z) / (10 + z * z), 1e-12, 'lower at k = n');
    // The interval is symmetric about (k + z²/2)/(n + z²) (Wilson 1927).
    const w = wilson(30, 100);
    assertInDelta((w.low + w.high) / 2, (30 + (z * z) / 2) / (100 + z * z), 1e-12, 'centre');
  });

  it("matches Spearman's closed form 1 − 6Σd²/(n(n² − 1)) without ties", () => {
    const x = [3.1, 1.2, 5.5, 4.0, 2.2, 9.9, 7.1];
    const y = [2.0, 1.0, 4.0, 7.0, 3.0, 6.0, 5.0];
    const rx = ranks(x);
    const ry = ranks(y);
    const n = x.length;
    const d2 = Array.from(rx).reduce((s, r, i) => s + (r - ry[i]) ** 2, 0);
    assertInDelta(spearman(x, y), 1 - (6 * d2) / (n * (n * n - 1)), 1e-12, 'ρ');
    // Any increasing function has ρ = 1, any decreasing one ρ = −1 (rank invariance).
    expect(spearman(x, x.map((v) => Math.exp(v)))).toBeCloseTo(1, 12);
    expect(spearman(x, x.map((v) => -v * v * v))).toBeCloseTo(-1, 12);
  });

  it('gives tied values the mean of their ranks', () => {
    expect(Array.from(ranks([5, 1, 5, 3]))).toEqual([3.5, 1, 3.5, 2]);
  });

  it("bins by Sturges' rule and counts every run", () => {
    const sorted = Float64Array.from({ length: 1000 }, (_, i) => i / 999);
    const h = histogram(sorted);
    expect(h.counts.length).toBe(Math.ceil(Math.log2(1000)) + 1);
    expect(h.counts.reduce((a, b) => a + b, 0)).toBe(1000);
    expect(h.edgesC[0]).toBe(0);
    assertInDelta(h.edgesC[h.edgesC.length - 1], 1, 1e-12, 'last edge');
  });
});
