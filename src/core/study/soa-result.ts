import { checkOperatingPoints, SOA_CHART_DECADES, SOA_REFERENCE_CASE_C, soaBoundary, type SoaCheck, type SoaModel } from '../soa';
import type { Device } from './types';
import type { MergedPoint, SoaAccumulator } from './soa-accumulator';
import type { DeviceSoaResult, SoaPointResult } from './soa-result-types';
import { MAX_LISTED_SOA_POINTS } from './constants';

/** The SOA core names its model `model`; the study names the device's field. */
function withDevicePath<T>(index: number, run: () => T): T {
  try {
    return run();
  } catch (e) {
    if (!(e instanceof RangeError)) throw e;
    throw new RangeError(e.message.replace(/^model\b/, `devices[${index}].soa`));
  }
}

function pointResult(p: MergedPoint, check: SoaCheck, k: number): SoaPointResult {
  return {
    timeS: p.timeS,
    durationS: p.durationS,
    vceV: p.vceV,
    icA: p.icA,
    caseC: p.caseC,
    pulseS: check.pulses[k],
    allowedA: check.allowedA[k],
    margin: check.margin[k],
    limit: check.limits[k],
    occurrences: p.occurrences,
    firstTimeS: p.firstTimeS,
  };
}

/** Boundaries at the worst point's condition and at 25 °C, reaching down to the lowest listed Vce. */
function boundaries(model: SoaModel, worst: SoaPointResult, points: SoaPointResult[]): DeviceSoaResult['boundaries'] {
  const lowest = points.reduce((v, p) => (p.vceV > 0 && p.vceV < v ? p.vceV : v), Infinity);
  const curve = (caseC: number) => {
    const cond = { caseC, pulseS: worst.pulseS };
    const plain = soaBoundary(model, cond);
    const bottom = plain.vceMaxV / 10 ** SOA_CHART_DECADES;
    return lowest / 2 < bottom ? soaBoundary(model, cond, { vceMinV: lowest / 2 }) : plain;
  };
  return { atWorstCase: curve(worst.caseC), atReference: curve(SOA_REFERENCE_CASE_C) };
}

/**
 * The indices of the `k` lowest margins, the earliest first among equal margins (then the lower
 * index), in that order: a full sort's first k, found by sorting the margins alone (a typed
 * array) for the k-th and then ordering only those at or below it.
 */
export function lowestMargins(margin: Float64Array, points: readonly { timeS: number }[], k: number): number[] {
  const n = points.length;
  const byMargin = (a: number, b: number) => margin[a] - margin[b] || points[a].timeS - points[b].timeS || a - b;
  const all = () => Array.from({ length: n }, (_, i) => i);
  if (n <= k) return all();
  const sorted = margin.slice(0, n).sort();
  const kth = sorted[k - 1];
  // NaN sorts last in a typed array but compares as nothing: the full sort says what it says then.
  if (Number.isNaN(kth) || Number.isNaN(sorted[n - 1])) return all().sort(byMargin).slice(0, k);
  const within: number[] = [];
  for (let i = 0; i < n; i++) if (margin[i] <= kth) within.push(i);
  return within.sort(byMargin).slice(0, k);
}

/** Checks a device's merged operating points (checkOperatingPoints) and lays out the result. */
export function deviceSoaResult(device: Device, index: number, acc: SoaAccumulator): DeviceSoaResult {
  const model = device.soa!;
  const merged = acc.points();
  const check = withDevicePath(index, () => checkOperatingPoints(model, merged));
  // The lowest margins (earliest first among equals) are listed, in time order; only they
  // (and the worst point) become result objects.
  const n = merged.length;
  const chosen = lowestMargins(check.margin, merged, MAX_LISTED_SOA_POINTS);
  const made = new Map<number, SoaPointResult>();
  const resultOf = (k: number) => {
    let r = made.get(k);
    if (!r) made.set(k, (r = pointResult(merged[k], check, k)));
    return r;
  };
  const listed = chosen.map(resultOf).sort((a, b) => a.timeS - b.timeS);
  const worst = check.worst ? resultOf(check.worst.index) : null;
  const failedPoints = check.failedCount + acc.droppedFailed;
  const warnings: DeviceSoaResult['warnings'] = [];
  if (acc.linearMode.stretches > 0) {
    warnings.push({ code: 'mosfet-linear-mode', message: acc.linearMode.message, stretches: acc.linearMode.stretches, firstTimeS: acc.linearMode.firstTimeS });
  }
  return {
    device: device.id,
    transistor: model.transistor,
    passed: failedPoints === 0,
    stretches: acc.stretches,
    distinctPoints: merged.length + acc.droppedPoints,
    failedPoints,
    points: listed,
    pointsListedAll: listed.length === n && acc.droppedPoints === 0,
    worst,
    warnings,
    boundaries: worst ? withDevicePath(index, () => boundaries(model, worst, listed)) : null,
  };
}
