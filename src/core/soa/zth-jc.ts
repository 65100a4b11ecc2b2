import { fosterZth } from '../thermal';
import type { ZthJc } from './types';

const isTerms = (z: ZthJc): z is Extract<ZthJc, readonly unknown[]> => Array.isArray(z);

/** Zθjc(t), K/W. */
export function zthJcAt(z: ZthJc, tS: number): number {
  return isTerms(z) ? fosterZth(z, tS) : z.zthKPerW(tS);
}

/** The largest time constant of the junction-case path, s. */
export function largestTauS(z: ZthJc): number {
  return isTerms(z) ? z.reduce((m, t) => Math.max(m, t.tauS), 0) : z.largestTauS;
}
