import { checkVector } from './check-input';
import type { ModalModel } from './types';

/**
 * Steady node temperatures T∞ = G⁻¹ B u, °C, for constant inputs u = [P_1 … P_m, Ta]
 * (W…, °C). Solved from the full conductance matrix, so it equals the Ohm's-law answer.
 */
export function steadyState(
  model: ModalModel,
  u: ArrayLike<number>,
  out: Float64Array = new Float64Array(model.nodeCount),
): Float64Array {
  checkVector(u, 'u', model.inputCount);
  const { nodeCount: N, inputCount: q, steadyFromInputs: K } = model;
  for (let i = 0; i < N; i++) {
    let v = 0;
    for (let j = 0; j < q; j++) v += K[i * q + j] * u[j];
    out[i] = v;
  }
  return out;
}
