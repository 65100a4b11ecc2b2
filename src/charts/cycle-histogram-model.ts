import { scaleLinear } from 'd3-scale';

import type { CycleHistogram } from '@/core/study';

/** One bar: cycles per repeat with a range in [fromK, toK), and its share of the damage. */
export type CycleBar = { fromK: number; toK: number; count: number; damageShare: number };

/** A bar holding at least this share of the damage is drawn dark and labelled with it. */
export const HEAVY_DAMAGE_SHARE = 0.1;

/** The histogram's bars, empty bins left out of the list (the axis still spans them). */
export function cycleBars(h: CycleHistogram): CycleBar[] {
  return h.counts.flatMap((count, k) => (count > 0 ? [{ fromK: h.edgesK[k], toK: h.edgesK[k + 1], count, damageShare: h.damageShare[k] }] : []));
}

/** Count axis from zero to a nice value at or above the tallest bar. */
export function countDomain(bars: readonly CycleBar[]): [number, number] {
  const top = Math.max(1, ...bars.map((b) => b.count));
  const [, hi] = scaleLinear().domain([0, top]).nice(4).domain();
  return [0, hi];
}

/** "12 %" for a damage share 0–1 (below 1 %: "<1 %"). */
export function shareText(share: number): string {
  const pct = share * 100;
  return pct < 1 ? '<1\u00a0%' : `${Math.round(pct)}\u00a0%`;
}
