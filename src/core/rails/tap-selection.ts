import { checkNumber } from './check';
import { checkThresholds } from './compile-plan';
import type { TapThresholds } from './types';

/** Tap a comparator without memory would pick: one above each threshold passed. */
export function tapWithoutHistory(t: TapThresholds, sensedV: number): number {
  let k = 0;
  while (k < t.thresholdsV.length && sensedV > t.thresholdsV[k]) k++;
  return k;
}

/**
 * One step of the selection (PHYSICS.md §2): from tap k up to k+1 above θk + h/2, down to
 * k−1 below θ(k−1) − h/2; a jump over several bands moves several taps at once.
 */
export function nextTap(t: TapThresholds, tap: number, sensedV: number): number {
  const th = t.thresholdsV;
  const half = t.hysteresisV / 2;
  let k = tap;
  while (k < th.length && sensedV > th[k] + half) k++;
  while (k > 0 && sensedV < th[k - 1] - half) k--;
  return k;
}

export type TapChange = { index: number; from: number; to: number };

/**
 * The selected tap over a sequence of sensed voltages, with hysteresis. The first value picks
 * its tap without history unless `initialTap` says where the selector stands.
 */
export function selectTaps(
  t: TapThresholds,
  sensedV: ArrayLike<number>,
  initialTap?: number,
): { taps: Int32Array; changes: TapChange[] } {
  checkThresholds(t, t.thresholdsV.length + 1, 'thresholds');
  const n = sensedV.length;
  const taps = new Int32Array(n);
  const changes: TapChange[] = [];
  if (initialTap !== undefined && (!Number.isInteger(initialTap) || initialTap < 0 || initialTap > t.thresholdsV.length)) {
    throw new RangeError(`initialTap: must be a whole number from 0 to ${t.thresholdsV.length}, got ${initialTap}`);
  }
  let tap = initialTap;
  for (let k = 0; k < n; k++) {
    const v = checkNumber(sensedV[k], `sensedV[${k}]`);
    const next = tap === undefined ? tapWithoutHistory(t, v) : nextTap(t, tap, v);
    if (tap !== undefined && next !== tap) changes.push({ index: k, from: tap, to: next });
    taps[k] = tap = next;
  }
  return { taps, changes };
}
