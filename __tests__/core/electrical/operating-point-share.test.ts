import { solveOperatingPoint } from '@/core/electrical';

describe('solveOperatingPoint with a current share error', () => {
  it('gives the favoured part (1 + e) of the equal share and the others the rest', () => {
    // P = (Vin − Vout)·I_part + Vin·Iq (PHYSICS.md §1), I_part = (I/n)(1 ± e).
    const op = solveOperatingPoint({ vinV: 24, voutV: 12, iloadA: 4 }, [
      { count: 1, iqA: 0, on: true, share: 1.1 },
      { count: 1, iqA: 0, on: true, share: 0.9 },
    ]);
    expect(op.partPowerW[0]).toBeCloseTo(12 * 2.2, 12);
    expect(op.partPowerW[1]).toBeCloseTo(12 * 1.8, 12);
    expect(op.currentA).toBeCloseTo(4, 12);
  });

  it('limits the group where the favoured part reaches its own limit', () => {
    // Each part may carry 3 A: with 1.2 of the share, the first reaches it at 2 × 3 / 1.2 = 5 A in all.
    const limit = [{ x: 0, y: 3 }];
    const op = solveOperatingPoint({ vinV: 24, voutV: 12, iloadA: 8 }, [
      { count: 1, iqA: 0, on: true, currentLimit: limit, share: 1.2 },
      { count: 1, iqA: 0, on: true, currentLimit: limit, share: 0.8 },
    ]);
    expect(op.currentLimited).toBe(true);
    expect(op.currentA).toBeCloseTo(5, 12);
    expect(op.partPowerW[0]).toBeCloseTo(12 * 3, 12);
  });
});
