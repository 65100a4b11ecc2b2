import { Matrix, solve } from 'ml-matrix';
import { nnls } from '../../../src/core/fit';

/** Seeded generator (mulberry32) so the random problems repeat. */
function rng(seed: number) {
  return () => {
    seed |= 0;
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * Reference: the NNLS optimum is the best of the unconstrained least-squares solutions over
 * every subset of free variables that come out non-negative (the KKT conditions of a convex
 * problem; Lawson & Hanson 1974, ch. 23). Enumerating all 2ⁿ subsets checks it by brute force.
 */
function bruteForce(a: Matrix, b: number[]) {
  const n = a.columns;
  let best = { x: new Array(n).fill(0), r: Matrix.columnVector(b).norm('frobenius') };
  for (let mask = 1; mask < 1 << n; mask++) {
    const cols = Array.from({ length: n }, (_, j) => j).filter((j) => mask & (1 << j));
    const z = solve(a.subMatrixColumn(cols), Matrix.columnVector(b)).to1DArray();
    if (z.some((v) => v < 0)) continue;
    const x = new Array(n).fill(0);
    cols.forEach((j, k) => (x[j] = z[k]));
    const r = Matrix.columnVector(b).sub(a.mmul(Matrix.columnVector(x))).norm('frobenius');
    if (r < best.r - 1e-12) best = { x, r };
  }
  return best;
}

describe('nnls', () => {
  it('matches the brute-force optimum on 30 random over-determined problems', () => {
    const random = rng(7);
    for (let trial = 0; trial < 30; trial++) {
      const m = 8 + Math.floor(random() * 5);
      const n = 3 + Math.floor(random() * 4);
      const a = new Matrix(m, n);
      for (let i = 0; i < m; i++) for (let j = 0; j < n; j++) a.set(i, j, random() * 2 - 1);
      const b = Array.from({ length: m }, () => random() * 2 - 1);
      const got = nnls(a, b);
      const want = bruteForce(a, b);
      expect(got.residualNorm).toBeCloseTo(want.r, 9);
      want.x.forEach((v, j) => expect(got.x[j]).toBeCloseTo(v, 7));
      expect(Math.min(...got.x)).toBeGreaterThanOrEqual(0);
    }
  });

  it('returns the exact solution when it is already non-negative', () => {
    const a = new Matrix([[1, 0], [0, 2], [1, 1]]);
    const x = [0.5, 1.5];
    const b = a.mmul(Matrix.columnVector(x)).to1DArray();
    const got = nnls(a, b);
    expect(got.x[0]).toBeCloseTo(0.5, 12);
    expect(got.x[1]).toBeCloseTo(1.5, 12);
    expect(got.residualNorm).toBeLessThan(1e-12);
  });

  it('refuses a right-hand side of the wrong length', () => {
    expect(() => nnls(new Matrix(3, 2), [1, 2])).toThrow(RangeError);
  });
});
