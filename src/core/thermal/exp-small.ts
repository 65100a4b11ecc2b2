import { SMALL_EXP_ARG } from './constants';

// A module-level copy: under CommonJS an imported binding is read through a getter per call.
const LIMIT = SMALL_EXP_ARG;

// (−1)^k / k!, k = 2…8.
const C2 = 1 / 2;
const C3 = -1 / 6;
const C4 = 1 / 24;
const C5 = -1 / 120;
const C6 = 1 / 720;
const C7 = -1 / 5040;
const C8 = 1 / 40320;

/**
 * e^(−δ) for 0 ≤ δ ≤ SMALL_EXP_ARG by its Taylor polynomial to δ⁸, evaluated by Estrin's
 * scheme (pairs, then powers of δ², so the multiplications do not wait on each other): a
 * few multiplications where Math.exp costs a library call. Outside that range it defers to
 * Math.exp, so it is never wrong, only slower.
 */
export function expSmall(d: number): number {
  if (!(d >= 0 && d <= LIMIT)) return Math.exp(-d);
  const x2 = d * d;
  const x4 = x2 * x2;
  const low = 1 - d + x2 * (C2 + C3 * d);
  const high = C4 + C5 * d + x2 * (C6 + C7 * d);
  return low + x4 * (high + x4 * C8);
}
