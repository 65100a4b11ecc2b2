import { PEAK_SEARCH_ABS_TOL } from './constants';
import { addTerm, type ExpSumWorkspace, isolateRoots, resetSum } from './exp-sum-roots';
import type { ModalModel } from './types';

/**
 * Over a constant-input segment a node follows f(τ) = a_0 + Σ a_k e^(−λ_k τ), with
 * a_k = W_jk (x_k − x∞_k) and a_0 = W_j·x∞ + D_j·u. These helpers load f − offset into a
 * root-isolation workspace and take its exact maximum.
 */
export function loadNodeResponse(
  model: ModalModel,
  ws: ExpSumWorkspace,
  node: number,
  x: Float64Array,
  xInf: Float64Array,
  u: ArrayLike<number>,
  offset: number,
  sign: 1 | -1,
): void {
  const { modeCount: n, inputCount: q, rates, outputFromModes: W, outputFromInputs: D } = model;
  let a0 = -offset;
  for (let k = 0; k < n; k++) a0 += W[node * n + k] * xInf[k];
  for (let j = 0; j < q; j++) a0 += D[node * q + j] * u[j];
  resetSum(ws);
  addTerm(ws, sign * a0, 0);
  for (let k = 0; k < n; k++) addTerm(ws, sign * W[node * n + k] * (x[k] - xInf[k]), rates[k]);
}

/** Value of the loaded level-0 sum at τ. */
export function evaluateSum(ws: ExpSumWorkspace, t: number): number {
  let v = 0;
  for (let k = 0; k < ws.count; k++) v += ws.coef[k] * Math.exp(-ws.rate[k] * t);
  return v;
}

/**
 * False when no interior value can exceed both ends: f(τ) ≤ Σ max(c_k, c_k e^(−r_k h)) on
 * [0, h] (each term is monotone), and that bound is not above max(f(0), f(h)).
 */
function mayRiseInside(ws: ExpSumWorkspace, h: number, start: number): boolean {
  let bound = 0;
  let end = 0;
  for (let k = 0; k < ws.count; k++) {
    const c = ws.coef[k];
    const ce = c * Math.exp(-ws.rate[k] * h);
    end += ce;
    bound += c > ce ? c : ce;
  }
  return bound > (start > end ? start : end) + PEAK_SEARCH_ABS_TOL;
}

/** Sign changes of the loaded sum's coefficients, in order of rate, from term `from` on. */
export function signChanges(ws: ExpSumWorkspace, from: number): number {
  let changes = 0;
  for (let k = from + 1; k < ws.count; k++) if (ws.coef[k] > 0 !== ws.coef[k - 1] > 0) changes++;
  return changes;
}

/**
 * Maximum of the loaded sum on [0, h] (endpoints and every interior extremum); writes
 * [value, τ] into out. The earliest τ wins a tie.
 * The interior search runs only when f′ may vanish inside (its coefficients change sign)
 * and a termwise bound says the inside could beat both ends.
 */
export function maximumOfSum(ws: ExpSumWorkspace, h: number, out: Float64Array): void {
  let best = evaluateSum(ws, 0);
  let at = 0;
  const first = ws.count > 0 && ws.rate[0] === 0 ? 1 : 0;
  // No sign change among the rate terms: f is monotone and its ends are its extremes.
  if (h > 0 && signChanges(ws, first) > 0 && mayRiseInside(ws, h, best)) {
    const count = isolateRoots(ws, 0, h, 1);
    for (let r = 0; r < count; r++) {
      const t = ws.roots[ws.maxTerms + r];
      const v = evaluateSum(ws, t);
      if (v > best) {
        best = v;
        at = t;
      }
    }
  }
  const end = evaluateSum(ws, h);
  if (end > best) {
    best = end;
    at = h;
  }
  out[0] = best;
  out[1] = at;
}
