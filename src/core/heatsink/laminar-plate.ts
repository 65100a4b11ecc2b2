import { AIR_300K } from './air';
import { checkNonNegative, checkPositive } from './check';

/**
 * Mean Nusselt number of a flat plate in laminar parallel flow, Nu_L = 0.664 Re_L^(1/2) Pr^(1/3)
 * (Pohlhausen; Incropera & DeWitt eq. 7.30), valid while Re_L stays below about 5 × 10⁵.
 */
export function laminarPlateNusselt(reynolds: number, pr = AIR_300K.pr): number {
  checkNonNegative(reynolds, 'reynolds');
  checkPositive(pr, 'pr');
  return 0.664 * Math.sqrt(reynolds) * Math.cbrt(pr);
}

/** Laminar boundary-layer thickness at x, δ ≈ 5 x / Re_x^(1/2) (Blasius; Incropera & DeWitt eq. 7.19). */
export function laminarBoundaryLayerM(xM: number, reynolds: number): number {
  checkPositive(xM, 'xM');
  checkPositive(reynolds, 'reynolds');
  return (5 * xM) / Math.sqrt(reynolds);
}
