import { checkNonNegative, checkPositive } from './check';

/**
 * Efficiency of a straight rectangular fin, η = tanh(mL)/(mL), m = √(2h/(k t)) (Incropera &
 * DeWitt §3.6, adiabatic tip; pass the corrected length L + t/2 to account for tip convection).
 * η → 1 as mL → 0 (series tanh x = x − x³/3 + …).
 */
export function finEfficiency(hWPerM2K: number, conductivityWPerMK: number, thicknessM: number, lengthM: number): number {
  checkNonNegative(hWPerM2K, 'hWPerM2K');
  checkPositive(conductivityWPerMK, 'conductivityWPerMK');
  checkPositive(thicknessM, 'thicknessM');
  checkNonNegative(lengthM, 'lengthM');
  const mL = Math.sqrt((2 * hWPerM2K) / (conductivityWPerMK * thicknessM)) * lengthM;
  // Below this the series 1 − (mL)²/3 is exact to rounding.
  if (mL < 1e-4) return 1 - (mL * mL) / 3;
  return Math.tanh(mL) / mL;
}
