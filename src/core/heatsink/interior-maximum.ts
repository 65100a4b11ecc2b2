import { PEAK_MAX_ITERATIONS, PEAK_TIME_REL_TOL } from './constants';

/**
 * Interior maximum on (0, h) of f(τ) = a_0 + Σ a_k e^(−λ_k τ), a_k = W_k d_k (rates ascending).
 *
 * f'(τ) = Σ c_k e^(−λ_k τ), c_k = −λ_k a_k, has no more zeros on (0, ∞) than its partial sums
 * c_1, c_1 + c_2, … (ascending λ) have sign changes, and no more on (−∞, h) than the partial
 * sums of c_k e^(−λ_k h) taken in descending λ (Laguerre's extension of Descartes' rule of
 * signs; Pólya & Szegő, Problems and Theorems in Analysis II, Part V, from memory). With at
 * most one zero, an interior maximum exists exactly when f'(0) > 0 > f'(h), and a safeguarded
 * Newton search on f' finds it.
 *
 * Returns 'none' (the maximum lies at an end), 'found' with [value, τ] in out, or 'unknown'
 * when the rule allows several zeros (the caller then searches exactly).
 */
export function interiorMaximum(
  rates: Float64Array,
  W: Float64Array,
  wb: number,
  d: Float64Array,
  decay: Float64Array,
  base: number,
  a0: number,
  h: number,
  out: Float64Array,
): 'none' | 'found' | 'unknown' {
  const n = rates.length;
  let slope0 = 0;
  let slopeH = 0;
  let changes = 0;
  let last = 0;
  for (let k = 0; k < n; k++) {
    const c = -rates[k] * W[wb + k] * d[k];
    slope0 += c;
    slopeH += c * decay[base + k];
    if (slope0 !== 0) {
      const sign = slope0 > 0 ? 1 : -1;
      if (last !== 0 && sign !== last) changes++;
      last = sign;
    }
  }
  if (changes > 1 && descendingChanges(rates, W, wb, d, decay, base, h) > 1) return 'unknown';
  if (!(slope0 > 0 && slopeH < 0)) return 'none';

  let lo = 0;
  let hi = h;
  let tau = (slope0 / (slope0 - slopeH)) * h;
  const tol = PEAK_TIME_REL_TOL * h;
  for (let it = 0; it < PEAK_MAX_ITERATIONS && hi - lo > tol; it++) {
    let g = 0;
    let dg = 0;
    for (let k = 0; k < n; k++) {
      const c = -rates[k] * W[wb + k] * d[k] * Math.exp(-rates[k] * tau);
      g += c;
      dg -= rates[k] * c;
    }
    if (g === 0) break;
    if (g > 0) lo = tau;
    else hi = tau;
    const next = tau - g / dg;
    if (next > lo && next < hi) {
      const step = Math.abs(next - tau);
      tau = next;
      if (step <= tol) break;
    } else {
      tau = 0.5 * (lo + hi);
    }
  }
  let v = a0;
  for (let k = 0; k < n; k++) v += W[wb + k] * d[k] * Math.exp(-rates[k] * tau);
  out[0] = v;
  out[1] = tau;
  return 'found';
}

/** Sign changes of the partial sums of c_k e^(−λ_k h), fastest mode first. */
function descendingChanges(rates: Float64Array, W: Float64Array, wb: number, d: Float64Array, decay: Float64Array, base: number, h: number): number {
  let changes = 0;
  let last = 0;
  let sum = 0;
  // Terms whose e^(−λh) underflows still carry their sign: they are summed as S·e^E until
  // the first term of normal size arrives.
  let scaled = 0;
  let scale = 0;
  for (let k = rates.length - 1; k >= 0; k--) {
    const c = -rates[k] * W[wb + k] * d[k];
    if (c === 0) continue;
    const e = decay[base + k];
    if (e === 0) {
      const exponent = -rates[k] * h;
      scaled = scaled === 0 ? c : scaled * Math.exp(scale - exponent) + c;
      scale = exponent;
      sum = scaled;
    } else {
      if (scaled !== 0) {
        sum = scaled * Math.exp(scale);
        scaled = 0;
      }
      sum += c * e;
    }
    if (sum !== 0) {
      const sign = sum > 0 ? 1 : -1;
      if (last !== 0 && sign !== last) changes++;
      last = sign;
    }
  }
  return changes;
}
