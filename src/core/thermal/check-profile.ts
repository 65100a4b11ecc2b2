import { describe } from './check-input';
import type { Profile } from './types';

/** Checks a flat profile once, up front, so the segment loop needs no checks. */
export function checkProfile(profile: Profile, q: number): { durations: ArrayLike<number>; inputs: ArrayLike<number> } {
  if (profile == null || typeof profile !== 'object') throw new TypeError(`profile: expected an object, got ${describe(profile)}`);
  const { durations, inputs } = profile;
  if (durations == null || typeof durations.length !== 'number') throw new TypeError('profile.durations: expected an array of numbers');
  if (inputs == null || typeof inputs.length !== 'number') throw new TypeError('profile.inputs: expected an array of numbers');
  if (durations.length === 0) throw new RangeError('profile.durations: at least one segment is required');
  if (inputs.length !== durations.length * q) {
    throw new RangeError(`profile.inputs: expected ${durations.length} × ${q} = ${durations.length * q} values, got ${inputs.length}`);
  }
  // Typed arrays hold numbers only: a tight loop finds the first bad value, if any.
  const badDuration = durations instanceof Float64Array ? firstBadDuration(durations) : -1;
  for (let s = durations instanceof Float64Array ? badDuration : 0; s >= 0 && s < durations.length; s++) {
    const h = durations[s];
    if (typeof h !== 'number') throw new TypeError(`profile.durations[${s}]: expected a number, got ${describe(h)}`);
    if (!(h >= 0 && h < Infinity)) throw new RangeError(`profile.durations[${s}]: must be finite and ≥ 0, got ${h}`);
  }
  const badInput = inputs instanceof Float64Array ? firstNonFinite(inputs) : -1;
  for (let i = inputs instanceof Float64Array ? badInput : 0; i >= 0 && i < inputs.length; i++) {
    const v = inputs[i];
    if (typeof v !== 'number') throw new TypeError(`profile.inputs[${i}]: expected a number, got ${describe(v)}`);
    if (v - v !== 0) throw new RangeError(`profile.inputs[${i}]: must be finite, got ${v}`);
  }
  return { durations, inputs };
}

function firstBadDuration(values: Float64Array): number {
  for (let i = 0; i < values.length; i++) if (!(values[i] >= 0 && values[i] < Infinity)) return i;
  return -1;
}

function firstNonFinite(values: Float64Array): number {
  for (let i = 0; i < values.length; i++) if (values[i] - values[i] !== 0) return i;
  return -1;
}
