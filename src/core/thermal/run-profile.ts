import { checkIndex, checkVector, describe } from './check-input';
import { PEAK_SEARCH_ABS_TOL } from './constants';
import { modalFromTemperatures, temperaturesFromModal } from './modal-state';
import { loadNodeResponse, maximumOfSum } from './node-response';
import { periodicModes } from './periodic-start';
import type { ModalModel, Peak, Profile, RunOptions, RunResult } from './types';

/**
 * Runs a long piecewise-constant profile in modal coordinates (exact, PHYSICS.md §3).
 *
 * Per segment and mode: one multiply-add for x∞ per input (skipped while u repeats), one
 * exp (skipped while h repeats) and the state update; per watched node a bound
 * a_0 + Σ max(a_k, a_k e^(−λ_k h)) ≥ max f on [0, h], so the exact interior search runs
 * only when a segment could raise the peak. Memory is fixed unless recordBoundaries is set.
 *
 * Peaks are exact maxima over the whole profile, earliest time on a tie, times in s from
 * its start. Zero-length segments take no time and so cannot hold a peak. Bad durations or
 * inputs throw RangeError / TypeError naming `profile.durations[s]` or `profile.inputs[i]`.
 */
export function runProfile(model: ModalModel, profile: Profile, options: RunOptions = {}): RunResult {
  const { modeCount: n, nodeCount: N, inputCount: q, rates, outputFromModes: W, outputFromInputs: D } = model;
  const { durations, inputs } = checkProfile(profile, q);
  const S = durations.length;
  const watch = Int32Array.from(options.watchNodes ?? [], (j, w) => checkIndex(j, `options.watchNodes[${w}]`, N));
  const nw = watch.length;

  const x = new Float64Array(n);
  const xInf = new Float64Array(n);
  const decay = new Float64Array(n);
  const u = new Float64Array(q);
  const a0 = new Float64Array(nw);
  const peakValue = new Float64Array(nw).fill(-Infinity);
  const peakTime = new Float64Array(nw);
  const found = new Float64Array(2);
  const ws = model.scratch.sum;
  const W0 = new Float64Array(nw * n); // watched rows of W, contiguous
  for (let w = 0; w < nw; w++) for (let k = 0; k < n; k++) W0[w * n + k] = W[watch[w] * n + k];

  for (let j = 0; j < q; j++) u[j] = inputs[j];
  if (options.periodic) {
    periodicModes(model, durations, inputs, x, 'profile.durations');
  } else if (options.initial !== undefined) {
    checkVector(options.initial, 'options.initial', N);
    modalFromTemperatures(model, options.initial, x);
  } else {
    const cold = new Float64Array(N).fill(u[q - 1]);
    modalFromTemperatures(model, cold, x);
  }
  const initial = temperaturesFromModal(model, x, u);

  const record = options.recordBoundaries === true;
  const boundaries = record ? new Float64Array((S + 1) * N) : undefined;
  const boundaryTimes = record ? new Float64Array(S + 1) : undefined;
  if (boundaries) boundaries.set(initial, 0);

  const F = model.modesFromInputs;
  let lastH = NaN;
  let changed = true;
  let t = 0;
  for (let s = 0; s < S; s++) {
    const h = durations[s];
    const row = s * q;
    for (let j = 0; j < q; j++) {
      const v = inputs[row + j];
      if (v !== u[j]) {
        u[j] = v;
        changed = true;
      }
    }
    if (changed) {
      changed = false;
      for (let k = 0; k < n; k++) {
        let v = 0;
        for (let j = 0; j < q; j++) v += F[k * q + j] * u[j];
        xInf[k] = v;
      }
      for (let w = 0; w < nw; w++) {
        const i = watch[w];
        let v = 0;
        for (let k = 0; k < n; k++) v += W0[w * n + k] * xInf[k];
        for (let j = 0; j < q; j++) v += D[i * q + j] * u[j];
        a0[w] = v;
      }
    }
    if (h > 0) {
      if (h !== lastH) {
        lastH = h;
        for (let k = 0; k < n; k++) decay[k] = Math.exp(-rates[k] * h);
      }
      for (let w = 0; w < nw; w++) {
        const base = w * n;
        let start = a0[w];
        let end = a0[w];
        let bound = a0[w];
        for (let k = 0; k < n; k++) {
          const a = W0[base + k] * (x[k] - xInf[k]);
          const ae = a * decay[k];
          start += a;
          end += ae;
          bound += a > ae ? a : ae;
        }
        let best = peakValue[w];
        if (bound <= best + PEAK_SEARCH_ABS_TOL) continue;
        if (start > best) {
          best = start;
          peakTime[w] = t;
        }
        if (end > best) {
          best = end;
          peakTime[w] = t + h;
        }
        if (bound > best + PEAK_SEARCH_ABS_TOL) {
          // Modal terms of both signs: an interior maximum may exceed both ends.
          loadNodeResponse(model, ws, watch[w], x, xInf, u, 0, 1);
          maximumOfSum(ws, h, found);
          if (found[0] > best) {
            best = found[0];
            peakTime[w] = t + found[1];
          }
        }
        peakValue[w] = best;
      }
      for (let k = 0; k < n; k++) x[k] = xInf[k] + decay[k] * (x[k] - xInf[k]);
      t += h;
    }
    if (boundaries && boundaryTimes) {
      temperaturesFromModal(model, x, u, boundaries.subarray((s + 1) * N, (s + 2) * N));
      boundaryTimes[s + 1] = t;
    }
  }

  const peaks: Peak[] = [];
  for (let w = 0; w < nw; w++) {
    // A profile of zero total length: the only instant is the start.
    if (peakValue[w] === -Infinity) peaks.push({ valueC: initial[watch[w]], timeS: 0 });
    else peaks.push({ valueC: peakValue[w], timeS: peakTime[w] });
  }
  const result: RunResult = { peaks, final: temperaturesFromModal(model, x, u), initial };
  if (boundaries) {
    result.boundaries = boundaries;
    result.boundaryTimes = boundaryTimes;
  }
  return result;
}

function checkProfile(profile: Profile, q: number): { durations: ArrayLike<number>; inputs: ArrayLike<number> } {
  if (profile == null || typeof profile !== 'object') throw new TypeError(`profile: expected an object, got ${describe(profile)}`);
  const { durations, inputs } = profile;
  if (durations == null || typeof durations.length !== 'number') throw new TypeError('profile.durations: expected an array of numbers');
  if (inputs == null || typeof inputs.length !== 'number') throw new TypeError('profile.inputs: expected an array of numbers');
  if (durations.length === 0) throw new RangeError('profile.durations: at least one segment is required');
  if (inputs.length !== durations.length * q) {
    throw new RangeError(`profile.inputs: expected ${durations.length} × ${q} = ${durations.length * q} values, got ${inputs.length}`);
  }
  // One pass up front keeps the segment loop free of checks.
  for (let s = 0; s < durations.length; s++) {
    const h = durations[s];
    if (typeof h !== 'number') throw new TypeError(`profile.durations[${s}]: expected a number, got ${describe(h)}`);
    if (!(h >= 0 && h < Infinity)) throw new RangeError(`profile.durations[${s}]: must be finite and ≥ 0, got ${h}`);
  }
  for (let i = 0; i < inputs.length; i++) {
    const v = inputs[i];
    if (typeof v !== 'number') throw new TypeError(`profile.inputs[${i}]: expected a number, got ${describe(v)}`);
    if (v - v !== 0) throw new RangeError(`profile.inputs[${i}]: must be finite, got ${v}`);
  }
  return { durations, inputs };
}
