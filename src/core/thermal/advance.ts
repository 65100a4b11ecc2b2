import type { ModalModel } from './types';

/**
 * Node temperatures after h seconds of constant inputs u, exact:
 * T(h) = T∞ + e^(A h)(T(0) − T∞). h = 0 returns the start state (massless nodes at u).
 * Writes into out when given (no allocation); out may alias temperatures.
 */
export function advance(model: ModalModel, temperatures: ArrayLike<number>, u: ArrayLike<number>, h: number, out?: Float64Array): Float64Array {
  throw new Error('not implemented yet');
}
