import { addTerm, type ExpSumWorkspace, isolateRoots, refine, resetSum, shifted } from './exp-sum-roots';

/**
 * Largest interior maximum of f(τ) = a_0 + Σ a_k e^(−λ_k τ) on (0, h), a_k = w_k d_k (w: the
 * node's row of W at offset `base`; d = x − x∞ at the segment start). Writes [value, τ] to
 * out and returns true when there is one, false when f has no interior maximum.
 *
 * f′ = Σ c_k e^(−λ_k τ), c_k = −λ_k a_k, has at most as many zeros as its coefficients have
 * sign changes in order of λ (Descartes' rule for exponential sums, Pólya & Szegő II,
 * Part V, from memory). None: f is monotone. One: an interior maximum exists exactly when
 * f′(0) > 0 > f′(h), and one bracketed Newton solve finds it. More: full isolation.
 */
export function interiorPeak(
  ws: ExpSumWorkspace,
  rates: Float64Array,
  w: Float64Array,
  base: number,
  dev: Float64Array,
  a0: number,
  h: number,
  out: Float64Array,
): boolean {
  const n = rates.length;
  resetSum(ws);
  for (let k = 0; k < n; k++) addTerm(ws, -rates[k] * w[base + k] * dev[k], rates[k]);
  let changes = 0;
  for (let k = 1; k < ws.count; k++) if (ws.coef[k] > 0 !== ws.coef[k - 1] > 0) changes++;
  if (changes === 0) return false;
  if (changes === 1) {
    const d0 = shifted(ws.coef, ws.rate, 0, ws.count, 0);
    const dh = shifted(ws.coef, ws.rate, 0, ws.count, h);
    if (!(d0 > 0 && dh < 0)) return false;
    const t = refine(ws.coef, ws.rate, 0, ws.count, 0, h, d0, dh, h);
    out[0] = valueAt(rates, w, base, dev, a0, t);
    out[1] = t;
    return true;
  }
  const count = isolateRoots(ws, 0, h, 0);
  let found = false;
  for (let r = 0; r < count; r++) {
    const t = ws.roots[r];
    const v = valueAt(rates, w, base, dev, a0, t);
    if (!found || v > out[0]) {
      out[0] = v;
      out[1] = t;
      found = true;
    }
  }
  return found;
}

function valueAt(
  rates: Float64Array,
  w: Float64Array,
  base: number,
  dev: Float64Array,
  a0: number,
  t: number,
): number {
  let v = a0;
  for (let k = 0; k < rates.length; k++) v += w[base + k] * dev[k] * Math.exp(-rates[k] * t);
  return v;
}

