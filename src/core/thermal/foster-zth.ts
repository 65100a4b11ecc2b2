import type { FosterTerm } from './types';

/** Foster step response Zth(t) = Σ R_i (1 − e^(−t/τ_i)), K/W, t in s. */
export function fosterZth(terms: readonly FosterTerm[], t: number): number {
  throw new Error('not implemented yet');
}
