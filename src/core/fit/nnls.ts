import { Matrix, solve } from 'ml-matrix';

export type NnlsResult = { x: Float64Array; residualNorm: number; iterations: number };

const MAX_ITERATIONS_PER_VARIABLE = 30;

/**
 * Non-negative least squares, min ‖A x − b‖₂ subject to x ≥ 0, by the active-set method of
 * Lawson & Hanson, *Solving Least Squares Problems* (1974), ch. 23, algorithm NNLS.
 * `tolerance` decides when a gradient component counts as positive.
 */
export function nnls(a: Matrix, b: ArrayLike<number>, tolerance = 1e-12): NnlsResult {
  const m = a.rows;
  const n = a.columns;
  if (b.length !== m) throw new RangeError(`b: needs ${m} values, got ${b.length}`);
  const bv = Matrix.columnVector(Array.from(b));
  const x = new Float64Array(n);
  const passive = new Array<boolean>(n).fill(false);
  const scale = Math.max(1, a.norm('frobenius') * bv.norm('frobenius'));
  const tol = tolerance * scale;

  const gradient = () => {
    const r = bv.clone().sub(a.mmul(Matrix.columnVector(Array.from(x))));
    return a.transpose().mmul(r).to1DArray();
  };
  const solvePassive = (): Float64Array => {
    const cols = passive.flatMap((p, j) => (p ? [j] : []));
    const s = new Float64Array(n);
    if (cols.length === 0) return s;
    const sub = a.subMatrixColumn(cols);
    const z = solve(sub, bv).to1DArray();
    cols.forEach((j, k) => (s[j] = z[k]));
    return s;
  };

  let iterations = 0;
  const maxIterations = MAX_ITERATIONS_PER_VARIABLE * Math.max(1, n);
  let w = gradient();
  while (iterations < maxIterations) {
    let j = -1;
    for (let k = 0; k < n; k++) if (!passive[k] && w[k] > tol && (j < 0 || w[k] > w[j])) j = k;
    if (j < 0) break;
    passive[j] = true;
    for (;;) {
      iterations++;
      const s = solvePassive();
      let feasible = true;
      for (let k = 0; k < n; k++) if (passive[k] && s[k] <= 0) feasible = false;
      if (feasible) {
        x.set(s);
        break;
      }
      // Step from x towards s as far as feasibility allows, then drop what hit zero.
      let alpha = Infinity;
      for (let k = 0; k < n; k++) if (passive[k] && s[k] <= 0) alpha = Math.min(alpha, x[k] / (x[k] - s[k]));
      for (let k = 0; k < n; k++) x[k] += alpha * (s[k] - x[k]);
      for (let k = 0; k < n; k++) {
        if (passive[k] && x[k] <= tol) {
          passive[k] = false;
          x[k] = 0;
        }
      }
      if (iterations >= maxIterations) break;
    }
    w = gradient();
  }
  const r = bv.clone().sub(a.mmul(Matrix.columnVector(Array.from(x))));
  return { x, residualNorm: r.norm('frobenius'), iterations };
}
