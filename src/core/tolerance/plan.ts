import { evaluateStudy, type StudyDocument } from '../study';
import { MAX_AMBIENT_SHIFT_K, MAX_CORNER_INPUTS, MAX_RUNS, MAX_SPREAD_PCT, MAX_TOTAL_SEGMENTS } from './constants';
import { fastPathApplies, fastPeaks } from './fast-peaks';
import { activeInputs, centre, shareGroup } from './inputs';
import { deviationsOf, perturbStudy } from './perturb';
import { mulberry32, runSeed, standardNormal } from './random';
import type { ActiveInput, RunPeaks, SkippedInput, ToleranceSpec } from './types';

/** A sweep set up on a parsed study: which inputs vary, how many runs, and how to make each. */
export type TolerancePlan = {
  doc: StudyDocument;
  spec: ToleranceSpec;
  inputs: ActiveInput[];
  skipped: SkippedInput[];
  shareGroup: number[];
  runs: number;
  /** Segments one run solves (profile segments × repeat). */
  segmentsPerRun: number;
  /** Runs take the peak scan (linear study, constant ambient) instead of the full pipeline. */
  fast: boolean;
};

const SPREADS = ['rthJcPct', 'rthSaPct', 'interfacePct', 'linePct', 'loadPct', 'sharePct'] as const;

function checkSpec(spec: ToleranceSpec): void {
  if (spec.mode !== 'corners' && spec.mode !== 'monte-carlo') throw new RangeError(`mode: must be "corners" or "monte-carlo", got ${JSON.stringify(spec.mode)}`);
  for (const key of SPREADS) {
    const v = spec[key];
    if (!(v >= 0 && v <= MAX_SPREAD_PCT)) throw new RangeError(`${key}: must be from 0 to ${MAX_SPREAD_PCT} %, got ${v}`);
  }
  for (const key of ['ambientLowK', 'ambientHighK'] as const) {
    if (!(Math.abs(spec[key]) <= MAX_AMBIENT_SHIFT_K)) throw new RangeError(`${key}: must be within ±${MAX_AMBIENT_SHIFT_K} K, got ${spec[key]}`);
  }
  if (spec.ambientHighK < spec.ambientLowK) throw new RangeError(`ambientHighK: must not be below ambientLowK (${spec.ambientLowK} K), got ${spec.ambientHighK}`);
  if (spec.mode === 'monte-carlo' && !(Number.isInteger(spec.seed) && spec.seed >= 0 && spec.seed <= 0xffffffff)) {
    throw new RangeError(`seed: must be a whole number from 0 to 4294967295, got ${spec.seed}`);
  }
}

/**
 * Checks a spec against a study and sets the sweep up. Throws a RangeError naming the field:
 * corners over more than MAX_CORNER_INPUTS inputs, more than MAX_RUNS runs, or more than
 * MAX_TOTAL_SEGMENTS segments solved in all.
 */
export function planTolerance(doc: StudyDocument, spec: ToleranceSpec): TolerancePlan {
  checkSpec(spec);
  const { inputs, skipped } = activeInputs(doc, spec);
  let runs: number;
  if (spec.mode === 'corners') {
    if (inputs.length > MAX_CORNER_INPUTS) {
      throw new RangeError(`mode: corners over ${inputs.length} inputs would take 2^${inputs.length} runs; at most ${MAX_CORNER_INPUTS} inputs (use Monte Carlo)`);
    }
    runs = 2 ** inputs.length;
  } else {
    if (!(Number.isInteger(spec.runs) && spec.runs >= 1 && spec.runs <= MAX_RUNS)) throw new RangeError(`runs: must be a whole number from 1 to ${MAX_RUNS}, got ${spec.runs}`);
    runs = spec.runs;
  }
  const segmentsPerRun = Math.max(1, doc.profile.segments.length * doc.profile.repeat);
  if (runs * segmentsPerRun > MAX_TOTAL_SEGMENTS) {
    const most = Math.max(1, Math.floor(MAX_TOTAL_SEGMENTS / segmentsPerRun));
    throw new RangeError(`runs: ${runs} runs × ${segmentsPerRun} segments exceeds the ${MAX_TOTAL_SEGMENTS.toExponential(0)} segments one sweep may solve; at most ${most} runs for this study`);
  }
  // A sweep reports junction peaks only: the SOA check, the costliest part of a solve after the
  // network itself, is left out of every run.
  const peaksOnly: StudyDocument = { ...doc, devices: doc.devices.map(({ soa: _soa, ...device }) => device) };
  return { doc: peaksOnly, spec, inputs, skipped, shareGroup: shareGroup(doc), runs, segmentsPerRun, fast: fastPathApplies(doc) };
}

/**
 * Deviations of run `index` (one per input, in input order). Corners: bit j of the index puts
 * input j at its high extreme, else its low one. Monte Carlo: uniform over [low, high], or
 * normal about the middle with half the range as 3σ (not truncated).
 */
export function runDeviations(plan: TolerancePlan, index: number, out = new Float64Array(plan.inputs.length)): Float64Array {
  if (plan.spec.mode === 'corners') {
    plan.inputs.forEach((input, j) => {
      out[j] = (index >> j) & 1 ? input.high : input.low;
    });
    return out;
  }
  const next = mulberry32(runSeed(plan.spec.seed, index));
  plan.inputs.forEach((input, j) => {
    const half = (input.high - input.low) / 2;
    out[j] = input.distribution === 'uniform' ? input.low + (input.high - input.low) * next() : centre(input) + (half / 3) * standardNormal(next);
  });
  return out;
}

/** Peak junction temperature of every device (°C, device order) with the given deviations. */
export function evaluateDeviations(plan: TolerancePlan, values: ArrayLike<number>): RunPeaks {
  const doc = perturbStudy(plan.doc, deviationsOf(plan.inputs, values), plan.shareGroup);
  if (plan.fast) return fastPeaks(doc);
  const result = evaluateStudy(doc, { seriesPoints: 0 });
  return Float64Array.from(plan.doc.devices, (d) => result.devices[d.id].peakJunctionC);
}

/** The nominal run: every input at the middle of its range. */
export function evaluateNominal(plan: TolerancePlan): RunPeaks {
  return evaluateDeviations(plan, plan.inputs.map(centre));
}

/** Runs [from, to): their deviations (runs × inputs) and peaks (runs × devices), row by row. */
export type RunBlock = { from: number; to: number; deviations: Float64Array; peaks: Float64Array };

export function evaluateRuns(plan: TolerancePlan, from: number, to: number, onRun?: (done: number) => void): RunBlock {
  const k = plan.inputs.length;
  const m = plan.doc.devices.length;
  const deviations = new Float64Array((to - from) * k);
  const peaks = new Float64Array((to - from) * m);
  for (let i = from; i < to; i++) {
    const row = deviations.subarray((i - from) * k, (i - from + 1) * k);
    runDeviations(plan, i, row);
    peaks.set(evaluateDeviations(plan, row), (i - from) * m);
    onRun?.(i - from + 1);
  }
  return { from, to, deviations, peaks };
}
