import type { FosterTerm, ModalModel } from './types';

/** Step response, K/W: rise of node nodeIndex t seconds after a unit step of power input inputIndex. */
export function zth(model: ModalModel, inputIndex: number, nodeIndex: number, t: number): number {
  throw new Error('not implemented yet');
}

/**
 * The same response as a Foster-like sum: Zth(t) = instantKPerW + Σ r (1 − e^(−t/τ)).
 * Terms of a transfer (not driving-point) response may have negative r.
 */
export function zthTerms(model: ModalModel, inputIndex: number, nodeIndex: number): { instantKPerW: number; terms: FosterTerm[] } {
  throw new Error('not implemented yet');
}
