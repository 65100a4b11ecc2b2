import { checkNumber, checkVector } from './check-input';
import { modalEquilibrium, modalFromTemperatures, temperaturesFromModal } from './modal-state';
import type { ModalModel } from './types';

/**
 * Node temperatures (°C) after h seconds of constant inputs u = [P_1 … P_m, Ta], exact:
 * T(h) = T∞ + e^(A h)(T(0) − T∞), A = −C⁻¹G. Cost O(N·(n + q)), independent of h.
 * h = 0 returns the start state, with massless nodes at their values for u.
 * Writes into out when given (no allocation); out may be the temperatures array itself.
 */
export function advance(
  model: ModalModel,
  temperatures: ArrayLike<number>,
  u: ArrayLike<number>,
  h: number,
  out: Float64Array = new Float64Array(model.nodeCount),
): Float64Array {
  checkVector(temperatures, 'temperatures', model.nodeCount);
  checkVector(u, 'u', model.inputCount);
  checkNumber(h, 'h', 0);
  const { x, xInf } = model.scratch;
  modalFromTemperatures(model, temperatures, x);
  modalEquilibrium(model, u, xInf);
  advanceModes(model.rates, x, xInf, h);
  if (h > 0) return temperaturesFromModal(model, x, u, out);
  // No time passes: keep the stored temperatures bit for bit, update massless nodes only.
  const { nodeCount: N, massless } = model;
  const fed = temperaturesFromModal(model, x, u);
  for (let i = 0; i < N; i++) out[i] = massless[i] === 1 ? fed[i] : temperatures[i];
  return out;
}

/** x ← x∞ + e^(−λh)(x − x∞), written with expm1 so short steps keep their precision. */
export function advanceModes(rates: Float64Array, x: Float64Array, xInf: Float64Array, h: number): void {
  if (h === 0) return;
  for (let k = 0; k < rates.length; k++) x[k] += -Math.expm1(-rates[k] * h) * (xInf[k] - x[k]);
}
