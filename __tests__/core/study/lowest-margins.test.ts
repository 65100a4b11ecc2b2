import { lowestMargins } from '@/core/study/soa-result';
import { mulberry32 } from '@/core/tolerance/random';

/** The definition: every index sorted by (margin, time, index), the first k. */
function bySort(margin: Float64Array, points: { timeS: number }[], k: number): number[] {
  const order = Array.from({ length: points.length }, (_, i) => i);
  if (points.length <= k) return order;
  return order.sort((a, b) => margin[a] - margin[b] || points[a].timeS - points[b].timeS || a - b).slice(0, k);
}

describe('the lowest SOA margins listed', () => {
  it('are a full sort’s first k, ties in margin broken by time and then index', () => {
    // Seeded test data: the same cases every run.
    const next = mulberry32(7);
    for (const [n, k, levels] of [
      [5000, 500, 40],
      [5000, 500, 1e9],
      [800, 500, 3],
      [501, 500, 2],
      [300, 500, 10],
    ]) {
      // Few distinct margins and times make ties; -0 and 0 are one margin.
      const margin = Float64Array.from({ length: n }, () => (next() < 0.02 ? -0 : Math.floor(next() * levels) / levels));
      const points = Array.from({ length: n }, () => ({ timeS: Math.floor(next() * 50) }));
      expect(lowestMargins(margin, points, k)).toEqual(bySort(margin, points, k));
    }
  });

  it('falls back to the full sort when a margin is NaN', () => {
    const margin = Float64Array.from([0.5, Number.NaN, 0.2, 0.9, 0.1]);
    const points = [0, 1, 2, 3, 4].map((t) => ({ timeS: t }));
    expect(lowestMargins(margin, points, 2)).toEqual(bySort(margin, points, 2));
  });
});
