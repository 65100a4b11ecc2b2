import { Z_95 } from './constants';
import type { Histogram, Percentiles, Probability } from './types';

/**
 * Quantile q (0…1) of sorted values, linear between order statistics: Hyndman & Fan's
 * definition 7 (Amer. Statist. 50, 1996), the default of R and NumPy.
 */
export function quantile(sorted: ArrayLike<number>, q: number): number {
  const n = sorted.length;
  if (n === 0) return NaN;
  const h = (n - 1) * q;
  const lo = Math.floor(h);
  const hi = Math.min(n - 1, lo + 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}

export function percentiles(sorted: ArrayLike<number>): Percentiles {
  return { p1: quantile(sorted, 0.01), p5: quantile(sorted, 0.05), p50: quantile(sorted, 0.5), p95: quantile(sorted, 0.95), p99: quantile(sorted, 0.99) };
}

/**
 * k successes in n trials as p = k/n with the Wilson score interval (E. B. Wilson, J. Amer.
 * Statist. Assoc. 22, 1927), which unlike the plain normal approximation stays inside [0, 1]
 * and keeps its coverage near p = 0, where a design that passes sits.
 */
export function wilson(count: number, runs: number, z = Z_95): Probability {
  if (runs === 0) return { count, runs, p: NaN, low: 0, high: 1 };
  const p = count / runs;
  const z2 = z * z;
  const denominator = 1 + z2 / runs;
  const mid = (p + z2 / (2 * runs)) / denominator;
  const half = (z / denominator) * Math.sqrt((p * (1 - p)) / runs + z2 / (4 * runs * runs));
  return { count, runs, p, low: Math.max(0, mid - half), high: Math.min(1, mid + half) };
}

/** Mid-ranks 1…n (ties share the mean of their ranks). */
export function ranks(values: ArrayLike<number>): Float64Array {
  const n = values.length;
  const order = Array.from({ length: n }, (_, i) => i).sort((a, b) => values[a] - values[b]);
  const out = new Float64Array(n);
  for (let i = 0; i < n; ) {
    let j = i;
    while (j + 1 < n && values[order[j + 1]] === values[order[i]]) j++;
    const rank = (i + j) / 2 + 1;
    for (let k = i; k <= j; k++) out[order[k]] = rank;
    i = j + 1;
  }
  return out;
}

/** Pearson correlation; 0 when either side does not vary. */
export function pearson(x: ArrayLike<number>, y: ArrayLike<number>): number {
  const n = x.length;
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    mx += x[i];
    my += y[i];
  }
  mx /= n;
  my /= n;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    sxy += (x[i] - mx) * (y[i] - my);
    sxx += (x[i] - mx) ** 2;
    syy += (y[i] - my) ** 2;
  }
  return sxx > 0 && syy > 0 ? sxy / Math.sqrt(sxx * syy) : 0;
}

/** Spearman's rank correlation ρ (C. Spearman, Amer. J. Psychol. 15, 1904): Pearson's r of the mid-ranks. */
export function spearman(x: ArrayLike<number>, y: ArrayLike<number>): number {
  return pearson(ranks(x), ranks(y));
}

/**
 * Equal-width bins over [min, max]; the count from Sturges' rule, ⌈log2 n⌉ + 1 (H. A. Sturges,
 * J. Amer. Statist. Assoc. 21, 1926), between 5 and 40.
 */
export function histogram(sorted: ArrayLike<number>): Histogram {
  const n = sorted.length;
  if (n === 0) return { edgesC: [], counts: [] };
  const lo = sorted[0];
  const hi = sorted[n - 1];
  const bins = hi > lo ? Math.min(40, Math.max(5, Math.ceil(Math.log2(n)) + 1)) : 1;
  const width = hi > lo ? (hi - lo) / bins : 1;
  const edgesC = Array.from({ length: bins + 1 }, (_, i) => (hi > lo ? lo + i * width : lo - 0.5 + i));
  const counts = new Array<number>(bins).fill(0);
  for (let i = 0; i < n; i++) counts[Math.min(bins - 1, Math.floor((sorted[i] - edgesC[0]) / width))]++;
  return { edgesC, counts };
}
