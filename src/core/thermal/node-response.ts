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
 * Maximum of the loaded sum on [0, h] (endpoints and every interior extremum); writes
 * [value, τ] into out. The earliest τ wins a tie.
 */
export function maximumOfSum(ws: ExpSumWorkspace, h: number, out: Float64Array): void {
  let best = evaluateSum(ws, 0);
  let at = 0;
  const count = h > 0 ? isolateRoots(ws, 0, h, 1) : 0;
  for (let r = 0; r < count; r++) {
    const t = ws.roots[ws.maxTerms + r];
    const v = evaluateSum(ws, t);
    if (v > best) {
      best = v;
      at = t;
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
