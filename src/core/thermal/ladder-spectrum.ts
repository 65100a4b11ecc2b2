/**
 * Eigenvalues of a Cauer ladder, G v = λ C v, to high relative accuracy: bisection on the
 * Sturm count of G − λC, whose LDLᵀ pivots d_i = g_i + t_i follow the subtraction-free
 * "differential" recurrence t_i = g_(i−1) t_(i−1) / d_(i−1) − λ C_i (Demmel & Kahan 1990;
 * Parlett, The Symmetric Eigenvalue Problem, from memory). A plain QR eigen solver loses
 * about eps·λmax/λmin on the slowest mode; this keeps every λ to a few eps.
 *
 * g[i] is the conductance from node i towards node i + 1 (the last one to the reference),
 * c[i] the capacity of node i; `first` = 1 drops node 0 (held at the reference).
 */
export function ladderEigenvalues(g: Float64Array, c: Float64Array, first = 0): Float64Array {
  const n = g.length - first;
  const out = new Float64Array(n);
  let upper = 0;
  for (let i = first; i < g.length; i++) upper = Math.max(upper, (2 * (g[i] + (i > 0 ? g[i - 1] : 0))) / c[i]);
  for (let k = 0; k < n; k++) {
    // The k-th eigenvalue (ascending) is where the count of those below λ passes k.
    let lo = k > 0 ? out[k - 1] : upper * 1e-300;
    let hi = upper;
    for (let it = 0; it < 2000 && hi - lo > 4 * Number.EPSILON * hi; it++) {
      const mid = hi > 2 * lo ? Math.sqrt(lo * hi) : 0.5 * (lo + hi);
      if (countBelow(g, c, first, mid) > k) hi = mid;
      else lo = mid;
    }
    out[k] = 0.5 * (lo + hi);
  }
  return out;
}

/** Number of eigenvalues of the ladder (from node `first` on) below λ. */
function countBelow(g: Float64Array, c: Float64Array, first: number, lambda: number): number {
  let count = 0;
  let t = first > 0 ? g[first - 1] - lambda * c[first] : -lambda * c[first];
  for (let i = first; ; i++) {
    let d = g[i] + t;
    if (d === 0) d = -Number.MIN_VALUE;
    if (d < 0) count++;
    if (i + 1 === g.length) return count;
    t = (g[i] * t) / d - lambda * c[i + 1];
  }
}
