import { checkIndex, checkVector } from './check-input';
import { checkProfile } from './check-profile';
import { clusterModes } from './mode-clusters';
import { modalFromTemperatures, temperaturesFromModal } from './modal-state';
import { runSegmentsInBlocks } from './profile-blocks';
import { runSegments } from './profile-kernel';
import { periodicModes } from './periodic-start';
import type { ModalModel, Peak, Profile, RunOptions, RunResult } from './types';

/**
 * Runs a long piecewise-constant profile in modal coordinates (exact, PHYSICS.md §3).
 *
 * Per segment and mode: the update x ← x∞ + e^(−λh)(x − x∞), with x∞ = F u. A peaks-only
 * run goes a block of segments at a time, each mode through the whole block in turn
 * (runSegmentsInBlocks); a run that records boundaries goes segment by segment with a small
 * cache of recent inputs and durations (runSegments, PROFILE_CACHE_SIZE). Both take e^(−λh)
 * of slow modes and of near-equal rates from a short Taylor polynomial (expSmall). Per
 * watched node, cheap upper bounds of f on [0, h] (termwise first, then each cluster of
 * near-equal rates through its slowest one, see clusterModes) skip segments that cannot
 * raise the peak, and modal terms of one sign prove f monotone; the exact interior search
 * (interiorPeak) runs only when a peak could hide inside.
 * Memory is fixed unless recordBoundaries is set.
 *
 * Peaks are exact maxima over the whole profile (earliest time on a tie; s from its start).
 * Zero-length segments take no time and hold no peak. Bad durations or inputs throw
 * RangeError / TypeError naming `profile.durations[s]` or `profile.inputs[i]`.
 */
export function runProfile(model: ModalModel, profile: Profile, options: RunOptions = {}): RunResult {
  const { modeCount: n, nodeCount: N, inputCount: q, outputFromModes: W, outputFromInputs: D } = model;
  const { durations, inputs } = checkProfile(profile, q);
  const watch = Int32Array.from(options.watchNodes ?? [], (j, w) => checkIndex(j, `options.watchNodes[${w}]`, N));
  const nw = watch.length;

  const x = new Float64Array(n);
  const u = Float64Array.from({ length: q }, (_, j) => inputs[j]);
  if (options.periodic) {
    periodicModes(model, durations, inputs, x, 'profile.durations');
  } else if (options.initial !== undefined) {
    checkVector(options.initial, 'options.initial', N);
    modalFromTemperatures(model, options.initial, x);
  } else {
    modalFromTemperatures(model, new Float64Array(N).fill(u[q - 1]), x);
  }
  const initial = temperaturesFromModal(model, x, u);
  const S = durations.length;
  const record = options.recordBoundaries === true;
  const boundaries = record ? new Float64Array((S + 1) * N) : new Float64Array(0);
  const boundaryTimes = record ? new Float64Array(S + 1) : new Float64Array(0);
  if (record) boundaries.set(initial, 0);

  const watchRows = new Float64Array(nw * n);
  // a_0 = W_j x∞ + D_j u = (W F + D)_j u: the watched rows of the steady-state map.
  const watchSteady = new Float64Array(nw * q);
  const F = model.modesFromInputs;
  const columns = new Float64Array(q * n);
  for (let k = 0; k < n; k++) for (let j = 0; j < q; j++) columns[j * n + k] = F[k * q + j];
  for (let w = 0; w < nw; w++) {
    for (let k = 0; k < n; k++) watchRows[w * n + k] = W[watch[w] * n + k];
    for (let j = 0; j < q; j++) {
      let v = D[watch[w] * q + j];
      for (let k = 0; k < n; k++) v += watchRows[w * n + k] * F[k * q + j];
      watchSteady[w * q + j] = v;
    }
  }
  const peakValue = new Float64Array(nw).fill(-Infinity);
  const peakTime = new Float64Array(nw);
  const state: BoundaryState = { model, x, inputs, boundaries, boundaryTimes };
  const clusters = clusterModes(model.rates);
  if (record) {
    runSegments(
      toFloat64(durations),
      toFloat64(inputs),
      model.rates,
      columns,
      watchRows,
      watchSteady,
      x,
      peakValue,
      peakTime,
      model.scratch.sum,
      clusters,
      q,
      (s: number, t: number) => recordBoundary(state, s, t),
    );
  } else {
    runSegmentsInBlocks(toFloat64(durations), toFloat64(inputs), model.rates, columns, watchRows, watchSteady, x, peakValue, peakTime, model.scratch.sum, clusters, q);
  }

  const peaks: Peak[] = [];
  for (let w = 0; w < nw; w++) {
    // A profile of zero total length has one instant, its start.
    if (peakValue[w] === -Infinity) peaks.push({ valueC: initial[watch[w]], timeS: 0 });
    else peaks.push({ valueC: peakValue[w], timeS: peakTime[w] });
  }
  for (let j = 0; j < q; j++) u[j] = inputs[(S - 1) * q + j];
  const result: RunResult = { peaks, final: temperaturesFromModal(model, x, u), initial };
  if (record) {
    result.boundaries = boundaries;
    result.boundaryTimes = boundaryTimes;
  }
  return result;
}

type BoundaryState = {
  model: ModalModel;
  x: Float64Array;
  inputs: ArrayLike<number>;
  boundaries: Float64Array;
  boundaryTimes: Float64Array;
};

/** Stores the state at the end of segment s, massless nodes at that segment's inputs. */
function recordBoundary(state: BoundaryState, s: number, t: number): void {
  const { model, x, inputs, boundaries, boundaryTimes } = state;
  const N = model.nodeCount;
  const q = model.inputCount;
  const { modeCount: n, outputFromModes: W, outputFromInputs: D } = model;
  for (let i = 0; i < N; i++) {
    let v = 0;
    for (let k = 0; k < n; k++) v += W[i * n + k] * x[k];
    for (let j = 0; j < q; j++) v += D[i * q + j] * inputs[s * q + j];
    boundaries[(s + 1) * N + i] = v;
  }
  boundaryTimes[s + 1] = t;
}

function toFloat64(values: ArrayLike<number>): Float64Array {
  return values instanceof Float64Array ? values : Float64Array.from(values);
}

