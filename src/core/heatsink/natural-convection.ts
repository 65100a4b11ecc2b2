import { checkPositive, checkNonNegative, checkRange, checkFinite } from './check';
import { MIN_CONVECTION_RISE_K } from './constants';

/** Laminar natural convection: h ∝ ΔT^(1/4) (PHYSICS.md §3; Incropera & DeWitt ch. 9). */
export const LAMINAR_EXPONENT = 0.25;

/**
 * Natural-convection Rθsa at a sink rise ΔT, K/W: Rsa(ΔT) = Rsa,ref (ΔTref/ΔT)^n.
 * Rises below MIN_CONVECTION_RISE_K take the value there (Rsa → ∞ as ΔT → 0).
 */
export function naturalConvectionRsa(rsaRefKPerW: number, referenceRiseK: number, riseK: number, exponent = LAMINAR_EXPONENT): number {
  checkPositive(rsaRefKPerW, 'rsaRefKPerW');
  checkPositive(referenceRiseK, 'referenceRiseK');
  checkFinite(riseK, 'riseK');
  checkRange(exponent, 'exponent', 0, 1);
  return rsaRefKPerW * Math.pow(referenceRiseK / Math.max(riseK, MIN_CONVECTION_RISE_K), exponent);
}

/**
 * Steady rise and Rθsa of a natural-convection sink shedding P watts. ΔT = Rsa(ΔT) · P has
 * the closed form ΔT = (Rsa,ref ΔTref^n P)^(1/(1+n)); below MIN_CONVECTION_RISE_K the
 * clamped Rθsa applies. P = 0 gives zero rise and the clamped value.
 */
export function naturalConvectionSteady(
  rsaRefKPerW: number,
  referenceRiseK: number,
  powerW: number,
  exponent = LAMINAR_EXPONENT,
): { riseK: number; rsaKPerW: number } {
  checkPositive(rsaRefKPerW, 'rsaRefKPerW');
  checkPositive(referenceRiseK, 'referenceRiseK');
  checkNonNegative(powerW, 'powerW');
  checkRange(exponent, 'exponent', 0, 1);
  const rise = Math.pow(rsaRefKPerW * Math.pow(referenceRiseK, exponent) * powerW, 1 / (1 + exponent));
  if (rise >= MIN_CONVECTION_RISE_K) return { riseK: rise, rsaKPerW: rise / powerW };
  const rsa = rsaRefKPerW * Math.pow(referenceRiseK / MIN_CONVECTION_RISE_K, exponent);
  return { riseK: rsa * powerW, rsaKPerW: rsa };
}

/** A still-air rating: Rθsa at a sink rise. */
export type RiseRating = { rthKPerW: number; riseK: number };

/**
 * The exponent n of Rsa(ΔT) = Rsa,ref (ΔTref/ΔT)^n through two still-air ratings of one sink:
 * n = ln(R1/R2) / ln(ΔT2/ΔT1). Returned as found, so a caller can say when it falls outside 0…1.
 */
export function convectionExponentFromRatings(a: RiseRating, b: RiseRating): number {
  checkPositive(a.rthKPerW, 'a.rthKPerW');
  checkPositive(a.riseK, 'a.riseK');
  checkPositive(b.rthKPerW, 'b.rthKPerW');
  checkPositive(b.riseK, 'b.riseK');
  if (a.riseK === b.riseK) throw new RangeError('b.riseK: must differ from a.riseK to fit an exponent');
  return Math.log(a.rthKPerW / b.rthKPerW) / Math.log(b.riseK / a.riseK);
}
