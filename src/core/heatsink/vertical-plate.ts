import { AIR_300K, type AirProperties } from './air';
import { checkFinite, checkPositive } from './check';
import { STANDARD_GRAVITY } from './constants';

/** Rayleigh number Ra_L = g β ΔT L³ / (ν α) on the height L. */
export function rayleighNumber(lengthM: number, riseK: number, betaPerK: number, air: AirProperties = AIR_300K): number {
  checkPositive(lengthM, 'lengthM');
  checkFinite(riseK, 'riseK');
  checkPositive(betaPerK, 'betaPerK');
  return (STANDARD_GRAVITY * betaPerK * Math.abs(riseK) * lengthM ** 3) / (air.nuM2PerS * air.alphaM2PerS);
}

/**
 * Mean Nusselt number of an isothermal vertical plate in free convection, Churchill & Chu
 * (Int. J. Heat Mass Transfer 18, 1975), for the whole range of Ra_L:
 * Nu_L = {0.825 + 0.387 Ra_L^(1/6) / [1 + (0.492/Pr)^(9/16)]^(8/27)}².
 */
export function verticalPlateNusselt(rayleigh: number, pr = AIR_300K.pr): number {
  if (!(rayleigh >= 0 && rayleigh < Infinity)) throw new RangeError(`rayleigh: must be finite and ≥ 0, got ${rayleigh}`);
  checkPositive(pr, 'pr');
  const root = 0.825 + (0.387 * Math.pow(rayleigh, 1 / 6)) / Math.pow(1 + Math.pow(0.492 / pr, 9 / 16), 8 / 27);
  return root * root;
}
