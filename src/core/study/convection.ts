import type { CurvePoint, Sink } from './types';
import { MIN_CONVECTION_RISE_K } from './constants';

/** Interpolates y(x) linearly in log x – log y between points (x increasing, all positive). */
export function interpolateLogLog(points: CurvePoint[], x: number): number {
  if (points.length === 1 || x <= points[0].x) return points[0].y;
  const last = points[points.length - 1];
  if (x >= last.x) return last.y;
  let i = 1;
  while (points[i].x < x) i++;
  const a = points[i - 1];
  const b = points[i];
  const f = Math.log(x / a.x) / Math.log(b.x / a.x);
  return Math.exp(Math.log(a.y) + f * Math.log(b.y / a.y));
}

/**
 * Natural-convection Rθsa at a rise ΔT of the sink above the air it sheds into:
 * Rsa(ΔT) = Rsa,ref (ΔTref / ΔT)^n (laminar n = 1/4: PHYSICS.md §3, Incropera & DeWitt ch. 9).
 * Rises below MIN_CONVECTION_RISE_K use the value there, since Rsa grows without bound at zero rise.
 */
export function naturalConvectionRsa(rsaRef: number, referenceRiseK: number, exponent: number, riseK: number): number {
  const rise = Math.max(riseK, MIN_CONVECTION_RISE_K);
  return rsaRef * Math.pow(referenceRiseK / rise, exponent);
}

/** Rθsa of a sink at the given rise (constant unless it has a natural-convection law). */
export function sinkRsa(sink: Sink, riseK: number): number {
  const nc = sink.naturalConvection;
  return nc ? naturalConvectionRsa(sink.rthKPerW, nc.referenceRiseK, nc.exponent, riseK) : sink.rthKPerW;
}
