import { checkFinite, checkRange } from './check';
import { KELVIN_OFFSET, STEFAN_BOLTZMANN } from './constants';

/**
 * Linearised radiation coefficient, W/(m²·K): hr = ε σ (Ts² + T∞²)(Ts + T∞) in kelvin, so
 * that q'' = hr (Ts − T∞) exactly equals ε σ (Ts⁴ − T∞⁴) (a small grey surface in large
 * surroundings at T∞; Incropera & DeWitt eq. 1.9). Temperatures in °C.
 */
export function radiationCoefficient(emissivity: number, surfaceC: number, ambientC: number): number {
  checkRange(emissivity, 'emissivity', 0, 1);
  const ts = checkFinite(surfaceC, 'surfaceC') + KELVIN_OFFSET;
  const ta = checkFinite(ambientC, 'ambientC') + KELVIN_OFFSET;
  if (!(ts > 0)) throw new RangeError(`surfaceC: must be above absolute zero, got ${surfaceC}`);
  if (!(ta > 0)) throw new RangeError(`ambientC: must be above absolute zero, got ${ambientC}`);
  return emissivity * STEFAN_BOLTZMANN * (ts * ts + ta * ta) * (ts + ta);
}
