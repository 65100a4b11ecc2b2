import { interpolateLogLog, naturalConvectionRsa, MIN_CONVECTION_RISE_K } from '@/core/study';
import { assertInRelDelta } from '../../helpers/assert-in-delta';

describe('naturalConvectionRsa', () => {
  it('scales as (ΔTref/ΔT)^(1/4): twice the rise gives 2^(−1/4) of the reference Rθsa', () => {
    // Laminar natural convection h ∝ ΔT^(1/4) (Incropera & DeWitt ch. 9; PHYSICS.md §3): 1.2 · 2^(−0.25) = 1.00907 K/W.
    assertInRelDelta(naturalConvectionRsa(1.2, 40, 0.25, 80), 1.2 * Math.pow(2, -0.25), 1e-15, 'Rsa(80 K)');
  });

  it('returns the reference value at the reference rise and grows at smaller rises', () => {
    expect(naturalConvectionRsa(0.8, 50, 0.25, 50)).toBe(0.8);
    // Half the rise: 2^(1/4) times the resistance.
    assertInRelDelta(naturalConvectionRsa(0.8, 50, 0.25, 25), 0.8 * Math.pow(2, 0.25), 1e-15, 'Rsa(25 K)');
  });

  it('holds the value at MIN_CONVECTION_RISE_K below it instead of growing without bound', () => {
    const atFloor = naturalConvectionRsa(1, 50, 0.25, MIN_CONVECTION_RISE_K);
    expect(naturalConvectionRsa(1, 50, 0.25, 0)).toBe(atFloor);
    expect(Number.isFinite(atFloor)).toBe(true);
  });
});

describe('interpolateLogLog', () => {
  it('reproduces a power law exactly between two of its points', () => {
    // Catalogue forced-air curves follow R ∝ v^(−b) closely (common practice); a straight line in log-log is such a law.
    const law = (v: number) => 0.9 * Math.pow(v, -0.6);
    const points = [1, 2, 5].map((v) => ({ x: v, y: law(v) }));
    for (const v of [1.3, 2.7, 4.1]) assertInRelDelta(interpolateLogLog(points, v), law(v), 1e-14, `R(${v})`);
  });

  it('returns the point values at the points', () => {
    const points = [{ x: 1, y: 0.5 }, { x: 3, y: 0.3 }];
    expect(interpolateLogLog(points, 1)).toBe(0.5);
    assertInRelDelta(interpolateLogLog(points, 3), 0.3, 1e-15, 'R(3)');
  });
});
