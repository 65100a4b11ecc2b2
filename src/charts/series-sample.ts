import type { Series } from '@/core/study';

/** Index of the last point at or before t (−1 when t is before the first point). */
export function indexAtOrBefore(timeS: readonly number[], t: number): number {
  let low = 0;
  let high = timeS.length - 1;
  if (high < 0 || t < timeS[0]) return -1;
  while (low < high) {
    const mid = (low + high + 1) >> 1;
    if (timeS[mid] <= t) low = mid;
    else high = mid - 1;
  }
  return low;
}

/**
 * The series value at time t, straight-line between its points; NaN outside its time range.
 * Where two points share a time (a step), the later one wins.
 */
export function valueAt(series: Series, t: number): number {
  const { timeS, valueC } = series;
  const n = timeS.length;
  if (n === 0 || !(t >= timeS[0] && t <= timeS[n - 1])) return NaN;
  const i = indexAtOrBefore(timeS, t);
  if (i === n - 1 || timeS[i] === t) return valueC[i];
  const t0 = timeS[i];
  const t1 = timeS[i + 1];
  return valueC[i] + ((valueC[i + 1] - valueC[i]) * (t - t0)) / (t1 - t0);
}

/** The points that draw [t0, t1]: those inside plus one on each side, so lines reach the edges. */
export function visibleRange(series: Series, t0: number, t1: number): { start: number; end: number } {
  const n = series.timeS.length;
  const start = Math.max(0, indexAtOrBefore(series.timeS, t0));
  let end = indexAtOrBefore(series.timeS, t1);
  end = Math.min(n - 1, end + 1);
  return { start, end: Math.max(start, end) };
}

/** Lowest and highest value the series takes over [t0, t1], ends interpolated. */
export function extentIn(series: Series, t0: number, t1: number): [number, number] {
  let low = Infinity;
  let high = -Infinity;
  const take = (v: number) => {
    if (Number.isNaN(v)) return;
    if (v < low) low = v;
    if (v > high) high = v;
  };
  take(valueAt(series, t0));
  take(valueAt(series, t1));
  const { timeS, valueC } = series;
  for (let i = Math.max(0, indexAtOrBefore(timeS, t0)); i < timeS.length && timeS[i] <= t1; i++) {
    if (timeS[i] >= t0) take(valueC[i]);
  }
  return [low, high];
}
