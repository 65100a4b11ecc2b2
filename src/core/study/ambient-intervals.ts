import type { Ambient } from './types';
import { AMBIENT_RAMP_STEP_K } from './constants';

/** Ambient as constant stretches: interval k holds valueC[k] from startS[k] to startS[k + 1]. */
export type AmbientIntervals = { startS: Float64Array; valueC: Float64Array };

/**
 * Piecewise-constant ambient for the solver. "step": each point's value holds until the next
 * point (the first value also before it). "linear": ramps between points are cut into equal
 * pieces whose ends differ by at most AMBIENT_RAMP_STEP_K, each held at its mid value (the
 * ramp's mean over the piece), so the error in Ta stays within half that step.
 */
export function ambientIntervals(ambient: Ambient): AmbientIntervals {
  if (ambient.kind === 'constant') return { startS: Float64Array.of(0), valueC: Float64Array.of(ambient.temperatureC) };
  const { points } = ambient;
  const starts: number[] = [0];
  const values: number[] = [points[0].temperatureC];
  const push = (t: number, v: number) => {
    if (t <= starts[starts.length - 1]) values[values.length - 1] = v;
    else {
      starts.push(t);
      values.push(v);
    }
  };
  for (let i = 0; i + 1 < points.length; i++) {
    const a = points[i];
    const b = points[i + 1];
    if (ambient.interpolation === 'step') {
      push(b.timeS, b.temperatureC);
      continue;
    }
    const pieces = Math.max(1, Math.ceil(Math.abs(b.temperatureC - a.temperatureC) / AMBIENT_RAMP_STEP_K));
    for (let k = 0; k < pieces; k++) {
      const t0 = a.timeS + ((b.timeS - a.timeS) * k) / pieces;
      const mid = a.temperatureC + ((b.temperatureC - a.temperatureC) * (k + 0.5)) / pieces;
      push(t0, mid);
    }
    push(b.timeS, b.temperatureC);
  }
  return { startS: Float64Array.from(starts), valueC: Float64Array.from(values) };
}

/** Ambient value at time t (s) of the intervals. */
export function ambientAt(intervals: AmbientIntervals, t: number): number {
  const { startS, valueC } = intervals;
  let k = 0;
  while (k + 1 < startS.length && startS[k + 1] <= t) k++;
  return valueC[k];
}
