import { histogramModel } from '@/charts/tolerance-histogram-model';

describe('tolerance histogram model', () => {
  it('keeps the bins and both limit lines on the chart', () => {
    const m = histogramModel([90, 95, 100, 105], [3, 10, 2], 130, 150);
    expect(m.bars).toEqual([
      { x0: 90, x1: 95, count: 3 },
      { x0: 95, x1: 100, count: 10 },
      { x0: 100, x1: 105, count: 2 },
    ]);
    expect(m.domain[0]).toBeLessThan(90);
    expect(m.domain[1]).toBeGreaterThan(150);
    expect(m.maxCount).toBe(10);
  });

  it('gives a scale to a sweep whose runs all landed in one bin with none counted', () => {
    const m = histogramModel([99.5, 100.5], [0], 100, 100);
    expect(m.maxCount).toBe(1);
    expect(m.domain[1] - m.domain[0]).toBeGreaterThan(0);
  });
});
