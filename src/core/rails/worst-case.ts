import { CURRENT_LIMIT_BISECTIONS, THRESHOLD_SAFE_TOL_V, WORST_CASE_CURRENT_SAMPLES } from './constants';
import { CELL_CURRENT_LIMIT, CELL_STATUS, evaluateCell, serviceRange, type CellStatus } from './cell';
import { voltageAt } from './characteristic';
import { checkRange } from './check-range';
import { checkElement, dropoutAt, limitAt } from './element';
import type { CompiledTap, OutputRange, PassElement, RailModel, TapThresholds } from './types';

export type TapWorstCase = {
  tap: number;
  name: string;
  /** The lowest output the tap serves within the range, V. */
  voutV: number;
  /** Current of the worst dissipation, A (the highest current the tap may give, as a rule). */
  currentA: number;
  /** The highest current the tap may give at that output, A, and what sets it. */
  highestCurrentA: number;
  setBy: 'capability' | 'range' | 'current-limit';
  vinV: number;
  powerW: number;
  status: CellStatus;
};

export type WorstCases = { taps: (TapWorstCase | null)[]; overall: TapWorstCase | null };

/**
 * Highest load current tap k carries at voutV: its capability, the top of the range, or the
 * element's current limit at the differential that current leaves (first current from 0 up
 * where the limit bites, so a foldback curve is followed as the load rises).
 */
export function highestCurrent(tap: CompiledTap, element: PassElement, voutV: number, ioutMaxA: number) {
  const top = Math.min(tap.capabilityA, ioutMaxA);
  const setBy: TapWorstCase['setBy'] = tap.capabilityA < ioutMaxA ? 'capability' : 'range';
  if (!element.currentLimit) return { currentA: top, setBy };
  const passes = (i: number) => evaluateCell(tap, element, voutV, i).status !== CELL_CURRENT_LIMIT;
  let lo = 0;
  let hi = Number.NaN;
  for (let j = 1; j <= WORST_CASE_CURRENT_SAMPLES; j++) {
    const i = (top * j) / WORST_CASE_CURRENT_SAMPLES;
    if (!passes(i)) {
      hi = i;
      break;
    }
    lo = i;
  }
  if (Number.isNaN(hi)) return { currentA: top, setBy };
  for (let k = 0; k < CURRENT_LIMIT_BISECTIONS; k++) {
    const mid = (lo + hi) / 2;
    if (passes(mid)) lo = mid;
    else hi = mid;
  }
  return { currentA: lo, setBy: 'current-limit' as const };
}

/**
 * Worst dissipation per tap (PHYSICS.md §2): at the lowest output the tap serves and, as a
 * rule, its highest current, Pk = (Vtap,k(I) − Vout,min,k)·I + Vtap·Iq. Currents from 0 up to
 * the highest are sampled too, so a source stiff enough to peak below it is not missed.
 */
export function tapWorstCases(model: RailModel, element: PassElement, range: OutputRange, t: TapThresholds = model.plan): WorstCases {
  checkElement(element);
  checkRange(range);
  const taps = model.taps.map((tap, k): TapWorstCase | null => {
    const { fromV, toV } = serviceRange(t, k);
    const vout = Math.max(fromV, range.voutMinV);
    if (vout > Math.min(toV, range.voutMaxV)) return null;
    const high = highestCurrent(tap, element, vout, range.ioutMaxA);
    let best: TapWorstCase | null = null;
    for (let j = WORST_CASE_CURRENT_SAMPLES; j >= 1; j--) {
      const i = (high.currentA * j) / WORST_CASE_CURRENT_SAMPLES;
      const cell = evaluateCell(tap, element, vout, i);
      if (!(cell.powerW > (best?.powerW ?? -Infinity))) continue;
      best = {
        tap: k,
        name: tap.name,
        voutV: vout,
        currentA: i,
        highestCurrentA: high.currentA,
        setBy: high.setBy,
        vinV: cell.vinV,
        powerW: cell.powerW,
        status: CELL_STATUS[cell.status],
      };
    }
    return best;
  });
  const overall = taps.reduce<TapWorstCase | null>((a, b) => (b && (!a || b.powerW > a.powerW) ? b : a), null);
  return { taps, overall };
}

export type BestThreshold = {
  index: number;
  givenV: number;
  /** θk ≤ Vtap,k(Ik,max) − Vdropout − h/2 (PHYSICS.md §2). */
  bestV: number;
  /** The given threshold leaves tap k its headroom at full current. */
  safe: boolean;
  fullCurrentA: number;
};

/**
 * Highest safe threshold between tap k and k+1: where tap k still has headroom at full
 * current (its capability or the top of the range, less what the current limit allows at
 * the dropout differential).
 */
export function bestThresholds(model: RailModel, element: PassElement, range: OutputRange): BestThreshold[] {
  checkElement(element);
  checkRange(range);
  const half = model.plan.hysteresisV / 2;
  return model.plan.thresholdsV.map((givenV, k) => {
    const tap = model.taps[k];
    let full = Math.min(tap.capabilityA, range.ioutMaxA);
    full = Math.min(full, limitAt(element, dropoutAt(element, full)));
    const bestV = voltageAt(tap.characteristic, full) - dropoutAt(element, full) - half;
    return { index: k, givenV, bestV, safe: givenV <= bestV + THRESHOLD_SAFE_TOL_V, fullCurrentA: full };
  });
}
