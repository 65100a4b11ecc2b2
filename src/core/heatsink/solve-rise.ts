import { checkNonNegative } from './check';
import { MAX_RISE_ITERATIONS, MIN_CONVECTION_RISE_K, RISE_ABS_TOL_K } from './constants';

/**
 * The rise at which a sink sheds P watts: the root of ΔT − P · Rsa(ΔT). Rsa falls as ΔT
 * grows (convection and radiation both strengthen), so the left side increases and the root
 * is unique; bisection on [MIN_CONVECTION_RISE_K, P · Rsa(MIN_CONVECTION_RISE_K)] finds it.
 */
export function riseAtPower(powerW: number, rsaAt: (riseK: number) => number): { riseK: number; rsaKPerW: number; iterations: number } {
  checkNonNegative(powerW, 'powerW');
  const lowR = rsaAt(MIN_CONVECTION_RISE_K);
  if (powerW * lowR <= MIN_CONVECTION_RISE_K) return { riseK: powerW * lowR, rsaKPerW: lowR, iterations: 0 };
  let lo = MIN_CONVECTION_RISE_K;
  let hi = powerW * lowR;
  let it = 0;
  while (hi - lo > RISE_ABS_TOL_K && it < MAX_RISE_ITERATIONS) {
    const mid = 0.5 * (lo + hi);
    if (mid - powerW * rsaAt(mid) > 0) hi = mid;
    else lo = mid;
    it++;
  }
  const rise = 0.5 * (lo + hi);
  return { riseK: rise, rsaKPerW: rise / powerW, iterations: it };
}
