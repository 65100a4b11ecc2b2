import { AIR_300K, type AirProperties } from './air';
import { checkPositive } from './check';
import { STANDARD_GRAVITY } from './constants';

/**
 * Elenbaas number El = Ra_s · s/L = g β ΔT s⁴ / (ν α L) of a vertical channel of spacing s
 * and height L (Elenbaas 1942; Bar-Cohen & Rohsenow, J. Heat Transfer 106, 1984).
 */
export function elenbaasNumber(spacingM: number, lengthM: number, riseK: number, betaPerK: number, air: AirProperties = AIR_300K): number {
  checkPositive(spacingM, 'spacingM');
  checkPositive(lengthM, 'lengthM');
  checkPositive(riseK, 'riseK');
  checkPositive(betaPerK, 'betaPerK');
  return (STANDARD_GRAVITY * betaPerK * riseK * spacingM ** 4) / (air.nuM2PerS * air.alphaM2PerS * lengthM);
}

/**
 * Channel Nusselt number Nu_s = h s / k of symmetric isothermal vertical plates, the composite
 * correlation Nu_s = [576/El² + 2.873/El^(1/2)]^(−1/2) of Bar-Cohen & Rohsenow (1984): it
 * joins the fully developed limit El/24 and the isolated-plate limit 0.59 El^(1/4).
 */
export function parallelPlateNusselt(elenbaas: number): number {
  checkPositive(elenbaas, 'elenbaas');
  return 1 / Math.sqrt(576 / (elenbaas * elenbaas) + 2.873 / Math.sqrt(elenbaas));
}

/**
 * Spacing that maximises the heat an array of isothermal plates sheds per unit base area,
 * s_opt = 2.714 (L ν α / (g β ΔT))^(1/4) (Bar-Cohen & Rohsenow 1984). It follows from the
 * composite correlation: Q per base area ∝ Nu_s / s² ∝ [576/El + 2.873 El^(1/2)]^(−1/2),
 * largest at El^(3/2) = 576/1.4365, El ≈ 54.4, El^(1/4) ≈ 2.716.
 */
export function optimumPlateSpacing(lengthM: number, riseK: number, betaPerK: number, air: AirProperties = AIR_300K): number {
  checkPositive(lengthM, 'lengthM');
  checkPositive(riseK, 'riseK');
  checkPositive(betaPerK, 'betaPerK');
  return 2.714 * Math.pow((lengthM * air.nuM2PerS * air.alphaM2PerS) / (STANDARD_GRAVITY * betaPerK * riseK), 0.25);
}
