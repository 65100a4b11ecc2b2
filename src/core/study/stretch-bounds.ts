import type { ModalModel } from '../thermal';

/**
 * Cheap bounds of node temperatures over a constant-input stretch, to skip exact peak and
 * crossing searches that cannot matter. In modal form T_k(τ) = a0 + Σ a_i e^(−λ_i τ)
 * (PHYSICS.md §3); each term moves monotonically from a_i to a_i e^(−λ_i h), so the sum of
 * the larger (smaller) ends bounds T_k on [0, h] from above (below).
 */
export type StretchBounds = {
  /** Prepares the modal amplitudes of state T under inputs u over length h. */
  load(T: ArrayLike<number>, u: ArrayLike<number>, h: number): void;
  upper(node: number): number;
  lower(node: number): number;
  /** The larger of the node's values at the two ends of the stretch (a lower bound of its maximum). */
  endMax(node: number): number;
};

export function createStretchBounds(model: ModalModel): StretchBounds {
  const { modeCount: n, nodeCount: N, inputCount: q, rates } = model;
  const P = model.modesFromTemperatures;
  const F = model.modesFromInputs;
  const W = model.outputFromModes;
  const D = model.outputFromInputs;
  const dx = new Float64Array(n);
  const xInf = new Float64Array(n);
  const decay = new Float64Array(n);
  let uRef: ArrayLike<number> = [];

  function load(T: ArrayLike<number>, u: ArrayLike<number>, h: number): void {
    uRef = u;
    for (let i = 0; i < n; i++) {
      let x = 0;
      for (let j = 0; j < N; j++) x += P[i * N + j] * T[j];
      let xi = 0;
      for (let j = 0; j < q; j++) xi += F[i * q + j] * u[j];
      xInf[i] = xi;
      dx[i] = x - xi;
      decay[i] = Math.exp(-rates[i] * h);
    }
  }

  function bound(node: number, sign: 1 | -1): number {
    let v = 0;
    for (let j = 0; j < q; j++) v += D[node * q + j] * uRef[j];
    for (let i = 0; i < n; i++) {
      const w = W[node * n + i];
      v += w * xInf[i];
      const a = w * dx[i];
      const b = a * decay[i];
      v += sign > 0 ? Math.max(a, b) : Math.min(a, b);
    }
    return v;
  }

  function endMax(node: number): number {
    let v = 0;
    for (let j = 0; j < q; j++) v += D[node * q + j] * uRef[j];
    let start = 0;
    let end = 0;
    for (let i = 0; i < n; i++) {
      const w = W[node * n + i];
      v += w * xInf[i];
      start += w * dx[i];
      end += w * dx[i] * decay[i];
    }
    return v + Math.max(start, end);
  }

  return { load, upper: (node) => bound(node, 1), lower: (node) => bound(node, -1), endMax };
}
