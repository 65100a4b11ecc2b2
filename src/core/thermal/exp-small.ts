import { SMALL_EXP_ARG } from './constants';

// 1/k!, k = 2…9.
const I2 = 1 / 2;
const I3 = 1 / 6;
const I4 = 1 / 24;
const I5 = 1 / 120;
const I6 = 1 / 720;
const I7 = 1 / 5040;
const I8 = 1 / 40320;
const I9 = 1 / 362880;

/**
 * e^(−δ) for 0 ≤ δ ≤ SMALL_EXP_ARG by its Taylor polynomial to δ⁹ (Horner's rule, no
 * division): a few multiplications where Math.exp costs a library call. Outside that range
 * it defers to Math.exp, so it is never wrong, only slower.
 */
export function expSmall(d: number): number {
  if (!(d >= 0 && d <= SMALL_EXP_ARG)) return Math.exp(-d);
  const x = -d;
  return 1 + x * (1 + x * (I2 + x * (I3 + x * (I4 + x * (I5 + x * (I6 + x * (I7 + x * (I8 + x * I9))))))));
}
