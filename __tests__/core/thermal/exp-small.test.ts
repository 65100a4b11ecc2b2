import { expSmall } from '@/core/thermal/exp-small';
import { SMALL_EXP_ARG } from '@/core/thermal';
import { seededRandom } from '../../helpers/seeded-random';

// Reference: the engine's Math.exp (ECMA-262 asks for an implementation-approximated value;
// V8 uses fdlibm's exp, correct to < 1 ulp) and the Taylor remainder bound
// |R| ≤ δ⁹/9! ≤ 4.1e−17 on [0, 1/16] (Lagrange form of the remainder).
describe('expSmall: e^(−δ) by a degree-8 Taylor polynomial', () => {
  it('agrees with Math.exp to a few ulp over its whole range', () => {
    const random = seededRandom(20261202);
    let worst = 0;
    for (let i = 0; i < 20000; i++) {
      const d = random() * SMALL_EXP_ARG;
      worst = Math.max(worst, Math.abs(expSmall(d) / Math.exp(-d) - 1));
    }
    for (const d of [0, 1e-300, 1e-17, 1e-9, 1e-3, SMALL_EXP_ARG / 2, SMALL_EXP_ARG]) {
      worst = Math.max(worst, Math.abs(expSmall(d) / Math.exp(-d) - 1));
    }
    expect(worst).toBeLessThan(4 * Number.EPSILON);
  });

  it('is exactly 1 at 0 and falls monotonically', () => {
    expect(expSmall(0)).toBe(1);
    let previous = 1;
    for (let i = 1; i <= 1000; i++) {
      const v = expSmall((i / 1000) * SMALL_EXP_ARG);
      expect(v).toBeLessThanOrEqual(previous);
      previous = v;
    }
  });

  it('defers to Math.exp outside its range', () => {
    for (const d of [0.1, 1, 40, 800, Infinity]) expect(expSmall(d)).toBe(Math.exp(-d));
    expect(Number.isNaN(expSmall(NaN))).toBe(true);
  });
});
