import { describeDeviation } from './inputs';
import type { TolerancePlan } from './plan';
import { histogram, percentiles, spearman, wilson } from './statistics';
import type { DeviceSpread, Sensitivity, ToleranceResult } from './types';

/** Every run's deviations (runs × inputs) and peaks (runs × devices), row by row. */
export type SweepRuns = { deviations: Float64Array; peaks: Float64Array };

const column = (rows: Float64Array, width: number, j: number, n: number) => Float64Array.from({ length: n }, (_, i) => rows[i * width + j]);

function ranked(list: Omit<Sensitivity, 'relative'>[]): Sensitivity[] {
  const top = Math.max(0, ...list.map((s) => Math.abs(s.value)));
  return list.map((s) => ({ ...s, relative: top > 0 ? Math.abs(s.value) / top : 0 })).sort((a, b) => Math.abs(b.value) - Math.abs(a.value));
}

/**
 * The statistics of a finished sweep: per device the spread of its peak junction temperature
 * (mean, standard deviation, percentiles) and how often it passes its target and its Tj,max
 * (with 95 % Wilson intervals); a histogram of the focus device (least nominal margin); the
 * worst corner in words; and the ranking of inputs by their pull on the focus peak: Spearman's
 * rank correlation over Monte Carlo runs, or the two-level factorial main effect over corners
 * (mean peak with the input high minus with it low: Box, Hunter & Hunter, Statistics for
 * Experimenters, 2nd ed., 2005, ch. 5).
 */
export function summariseTolerance(plan: TolerancePlan, nominal: Float64Array, runs: SweepRuns): ToleranceResult {
  const { doc, inputs, spec } = plan;
  const n = plan.runs;
  const m = doc.devices.length;
  const k = inputs.length;
  const targets = doc.devices.map((d) => d.tjMaxC - doc.marginK);
  let focus = 0;
  doc.devices.forEach((_, d) => {
    if (targets[d] - nominal[d] < targets[focus] - nominal[focus]) focus = d;
  });

  const devices: DeviceSpread[] = doc.devices.map((device, d) => {
    const values = column(runs.peaks, m, d, n);
    const sorted = Float64Array.from(values).sort();
    let sum = 0;
    for (const v of values) sum += v;
    const mean = sum / n;
    let ss = 0;
    for (const v of values) ss += (v - mean) ** 2;
    const above = (limit: number) => values.reduce((c, v) => c + (v > limit ? 1 : 0), 0);
    return {
      id: device.id,
      tjMaxC: device.tjMaxC,
      targetC: targets[d],
      nominalC: nominal[d],
      minC: sorted[0],
      maxC: sorted[n - 1],
      meanC: mean,
      sdK: n > 1 ? Math.sqrt(ss / (n - 1)) : 0,
      percentiles: percentiles(sorted),
      exceedTarget: wilson(above(targets[d]), n),
      exceedMax: wilson(above(device.tjMaxC), n),
    };
  });

  let anyTarget = 0;
  let anyMax = 0;
  let worst = 0;
  let worstMargin = Infinity;
  let worstDevice = 0;
  for (let i = 0; i < n; i++) {
    let overTarget = false;
    let overMax = false;
    for (let d = 0; d < m; d++) {
      const peak = runs.peaks[i * m + d];
      overTarget ||= peak > targets[d];
      overMax ||= peak > doc.devices[d].tjMaxC;
      if (targets[d] - peak < worstMargin) {
        worstMargin = targets[d] - peak;
        worst = i;
        worstDevice = d;
      }
    }
    if (overTarget) anyTarget++;
    if (overMax) anyMax++;
  }

  const focusPeaks = column(runs.peaks, m, focus, n);
  const notes: string[] = [];
  let sensitivity: ToleranceResult['sensitivity'];
  if (spec.mode === 'corners') {
    const list = inputs.map((input, j) => {
      let high = 0;
      let low = 0;
      for (let i = 0; i < n; i++) {
        if ((i >> j) & 1) high += focusPeaks[i];
        else low += focusPeaks[i];
      }
      return { key: input.key, label: input.label, value: (high - low) / (n / 2) };
    });
    sensitivity = { method: 'main-effect', ranking: ranked(list) };
  } else {
    const list = inputs.map((input, j) => ({ key: input.key, label: input.label, value: spearman(column(runs.deviations, k, j, n), focusPeaks) }));
    sensitivity = { method: 'spearman', ranking: ranked(list) };
  }

  const result: ToleranceResult = {
    mode: spec.mode,
    runs: n,
    inputs,
    skipped: plan.skipped,
    focus: doc.devices[focus].id,
    devices,
    anyExceedTarget: wilson(anyTarget, n),
    anyExceedMax: wilson(anyMax, n),
    histogram: histogram(Float64Array.from(focusPeaks).sort()),
    sensitivity,
    notes,
  };
  if (spec.mode === 'monte-carlo') result.seed = spec.seed;
  if (spec.mode === 'corners') {
    const deviations = Array.from(runs.deviations.subarray(worst * k, (worst + 1) * k));
    result.worstCorner = {
      index: worst,
      peakC: runs.peaks[worst * m + worstDevice],
      device: doc.devices[worstDevice].id,
      marginToTargetK: worstMargin,
      deviations,
      words: inputs.length ? inputs.map((input, j) => describeDeviation(input, deviations[j])).join(', ') : 'no input varies',
    };
  }
  if (plan.shareGroup.length === 1 && inputs.some((i) => i.key === 'share')) {
    notes.push(`Share error on one device entry of ${doc.devices[plan.shareGroup[0]].count} identical parts: every part is taken at the worst part's share, which over-states the sink's heat (conservative).`);
  }
  return result;
}
