import type { ModalModel } from './types';

/** Steady node temperatures T∞ = G⁻¹ B u, °C, for constant inputs u = [P_1 … P_m, Ta]. */
export function steadyState(model: ModalModel, u: ArrayLike<number>, out?: Float64Array): Float64Array {
  throw new Error('not implemented yet');
}
