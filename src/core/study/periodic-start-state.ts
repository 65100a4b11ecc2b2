import type { StudyDocument } from './types';
import type { StudyModel } from './study-model';
import type { AmbientIntervals } from './ambient-intervals';
import { makeRunner, runPasses } from './run-passes';
import { maxDifference, periodicCorrection } from './periodic';
import { fedDevices, segmentPower } from './segment-power';
import { passDurationS } from './timeline';
import { MAX_PERIODIC_ITERATIONS, MAX_PERIODIC_STRETCHES, PERIODIC_TOLERANCE_K } from './constants';

export type PeriodicStart = {
  T: Float64Array;
  on: boolean[];
  iterations: number;
  residualK: number;
  converged: boolean;
};

/** Input vector at the period start (first non-empty segment, ambient at t = 0). */
function startInput(doc: StudyDocument, ambient: AmbientIntervals, on: boolean[]): Float64Array {
  const u = new Float64Array(doc.devices.length + 1);
  const segment = doc.profile.segments.find((s) => s.durationS > 0)!;
  const p = segmentPower(doc, segment, fedDevices(doc, segment), on);
  doc.devices.forEach((d, i) => (u[i] = p.partPowerW[i] * d.count));
  u[doc.devices.length] = ambient.valueC[0];
  return u;
}

/**
 * Start state of the periodic steady state of the profile repeated forever. A linear study
 * needs one period and the modal closed form (periodicCorrection). With events or a
 * non-linear sink the same step is iterated, falling back to plain period-by-period
 * repetition when it stops halving the change, until a period's start moves less than
 * PERIODIC_TOLERANCE_K with the same on/off states. Only nodes with a capacity count: the
 * others jump with the inputs at the period boundary.
 */
export function periodicStartState(sm: StudyModel, batch: boolean, ambient: AmbientIntervals, T0: Float64Array): PeriodicStart {
  const { doc } = sm;
  const period = passDurationS(doc);
  const runner = makeRunner(sm, batch, null, null);
  let T: Float64Array = Float64Array.from(T0);
  let on = doc.devices.map(() => true);
  let residual = Infinity;
  let accelerate = true;
  let iterations = 0;
  while (iterations < MAX_PERIODIC_ITERATIONS && runner.stretches() < MAX_PERIODIC_STRETCHES) {
    iterations++;
    runner.reset(T, on);
    runPasses(doc, runner, ambient, 1, period, 1);
    const change = maxDifference(runner.T, T, sm.dynamicNodes);
    const sameStates = runner.on.every((v, i) => v === on[i]);
    if (change <= PERIODIC_TOLERANCE_K && sameStates) return { T, on, iterations, residualK: change, converged: true };
    if (change > residual / 2) accelerate = false;
    residual = change;
    const endOn = [...runner.on];
    T = accelerate ? periodicCorrection(sm.modelAt(T, ambient.valueC[0]), T, runner.T, startInput(doc, ambient, endOn), period) : Float64Array.from(runner.T);
    on = endOn;
    // Linear: the closed form is exact, so one period is the whole work.
    if (batch) return { T, on, iterations, residualK: 0, converged: true };
  }
  return { T, on, iterations, residualK: residual, converged: false };
}
