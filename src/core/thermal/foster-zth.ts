import { checkFosterTerms } from './check-package';
import { checkNumber } from './check-input';
import type { FosterTerm } from './types';

/** Foster step response Zth(t) = Σ R_i (1 − e^(−t/τ_i)), K/W, t in s (t ≥ 0). */
export function fosterZth(terms: readonly FosterTerm[], t: number): number {
  checkFosterTerms(terms, 'terms');
  checkNumber(t, 't', 0);
  let z = 0;
  for (const term of terms) z -= term.rKPerW * Math.expm1(-t / term.tauS);
  return z;
}
