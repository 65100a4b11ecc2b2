import type { ModalModel } from './types';

/**
 * Modal state x = Qᵀ C^(1/2) T (n entries) from node temperatures (°C, N entries).
 * Massless nodes carry no state and are ignored.
 */
export function modalFromTemperatures(
  model: ModalModel,
  temperatures: ArrayLike<number>,
  out: Float64Array = new Float64Array(model.modeCount),
): Float64Array {
  const { modeCount: n, nodeCount: N, modesFromTemperatures: P } = model;
  for (let k = 0; k < n; k++) {
    let v = 0;
    for (let i = 0; i < N; i++) v += P[k * N + i] * temperatures[i];
    out[k] = v;
  }
  return out;
}

/** Node temperatures T = W x + D u (°C); massless nodes follow the inputs u instantly. */
export function temperaturesFromModal(
  model: ModalModel,
  x: ArrayLike<number>,
  u: ArrayLike<number>,
  out: Float64Array = new Float64Array(model.nodeCount),
): Float64Array {
  const { modeCount: n, nodeCount: N, inputCount: q, outputFromModes: W, outputFromInputs: D } = model;
  for (let i = 0; i < N; i++) {
    let v = 0;
    for (let k = 0; k < n; k++) v += W[i * n + k] * x[k];
    for (let j = 0; j < q; j++) v += D[i * q + j] * u[j];
    out[i] = v;
  }
  return out;
}

/** x∞ = F u, the modal equilibrium of constant inputs u. */
export function modalEquilibrium(model: ModalModel, u: ArrayLike<number>, out: Float64Array): Float64Array {
  const { modeCount: n, inputCount: q, modesFromInputs: F } = model;
  for (let k = 0; k < n; k++) {
    let v = 0;
    for (let j = 0; j < q; j++) v += F[k * q + j] * u[j];
    out[k] = v;
  }
  return out;
}
