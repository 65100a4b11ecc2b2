import { advance, runProfile } from '../thermal';
import type { StudyModel } from './study-model';
import type { EventLog } from './event-log';
import { boundsFor, notePower, observeStretch, offerPeak, recordRow, sampleState, timeAtOrAbove, type Observer } from './observer';
import { fedDevices, segmentPower, type SegmentPower } from './segment-power';
import { logDriveEvents } from './drive-events';
import type { SoaTracker } from './soa-tracker';

/**
 * Fast path for linear studies (no thermal shutdown, no natural-convection sink): the pieces
 * of each chart bucket go to the thermal core's batch runProfile in one call, which tracks the
 * exact peaks; time above target is stepped out only in buckets where a junction reaches it.
 */
/** Pieces per runProfile call at most, so the buffers stay small on long profiles. */
const MAX_CHUNK = 65536;
/** Segments whose dissipation is kept for reuse (repeated passes and groups share indices). */
const POWER_CACHE_SIZE = 4096;
/** Chunks with fewer pieces are stepped one by one (same exact answer, less set-up). */
const MIN_BATCH = 48;

export type BatchRunner = {
  T: Float64Array;
  addPiece(t0: number, h: number, segmentIndex: number, ambientC: number, bucket: number): void;
  /** Solves the pieces gathered so far. */
  flush(): void;
  finish(t: number, ambientC: number): void;
  pieces: number;
};

export function createBatchRunner(sm: StudyModel, observer: Observer | null, events: EventLog | null, soa: SoaTracker | null = null): BatchRunner {
  const { doc } = sm;
  const model = sm.reference;
  const m = doc.devices.length;
  const q = m + 1;
  const N = model.nodeCount;
  const T = new Float64Array(N);
  const start = new Float64Array(N);
  const scratch = new Float64Array(N);
  const local = new Float64Array(N);
  const powerCache = new Map<number, SegmentPower>();
  const allOn = doc.devices.map(() => true);
  let durations = new Float64Array(1024);
  let inputs = new Float64Array(1024 * q);
  let times = new Float64Array(1024);
  let segmentOf = new Int32Array(1024);
  /** Power of each gathered piece, for the SOA tracker. */
  const powers: SegmentPower[] = [];
  let count = 0;
  let bucketOfChunk = -1;
  const self: BatchRunner = { T, addPiece, flush, finish, pieces: 0 };

  function powerOf(segmentIndex: number): SegmentPower {
    let p = powerCache.get(segmentIndex);
    if (!p) {
      if (powerCache.size >= POWER_CACHE_SIZE) powerCache.clear();
      const segment = doc.profile.segments[segmentIndex];
      p = segmentPower(doc, segment, fedDevices(doc, segment), allOn);
      powerCache.set(segmentIndex, p);
    }
    return p;
  }

  function addPiece(t0: number, h: number, segmentIndex: number, ambientC: number, bucket: number): void {
    if ((bucket !== bucketOfChunk || count >= MAX_CHUNK) && count > 0) flush();
    bucketOfChunk = bucket;
    if (count === durations.length) {
      const grow = (a: Float64Array, n: number) => {
        const b = new Float64Array(n);
        b.set(a);
        return b;
      };
      durations = grow(durations, count * 2);
      inputs = grow(inputs, count * 2 * q);
      times = grow(times, count * 2);
      const segments = new Int32Array(count * 2);
      segments.set(segmentOf);
      segmentOf = segments;
    }
    const p = powerOf(segmentIndex);
    for (let d = 0; d < m; d++) inputs[count * q + d] = p.partPowerW[d] * doc.devices[d].count;
    inputs[count * q + m] = ambientC;
    durations[count] = h;
    times[count] = t0;
    segmentOf[count] = segmentIndex;
    if (soa) powers[count] = p;
    count++;
    self.pieces++;
    if (observer) notePower(observer, p.partPowerW, h);
    if (events) {
      const drive = doc.profile.segments[segmentIndex].electrical;
      if (drive) logDriveEvents(doc, events, p, drive.vinV, drive.voutV, drive.iloadA, t0, h);
    }
  }

  /** State at time t0 + τ inside the chunk, from the chunk's start. */
  function stateAt(tau: number): Float64Array {
    local.set(start);
    let elapsed = 0;
    for (let k = 0; k < count; k++) {
      const u = inputs.subarray(k * q, (k + 1) * q);
      if (elapsed + durations[k] >= tau || k === count - 1) {
        advance(model, local, u, Math.max(0, Math.min(durations[k], tau - elapsed)), local);
        return local;
      }
      advance(model, local, u, durations[k], local);
      elapsed += durations[k];
    }
    return local;
  }

  function flush(): void {
    if (count === 0) return;
    if (count < MIN_BATCH && observer) return stepChunk(observer);
    start.set(T);
    const obs = observer;
    const t0 = times[0];
    const ambient0 = inputs[m];
    if (obs) sampleState(obs, t0, T, ambient0);
    const result = runProfile(model, { durations: durations.subarray(0, count), inputs: inputs.subarray(0, count * q) }, {
      initial: T,
      watchNodes: obs ? obs.nodes : [],
      recordBoundaries: obs?.rows != null || obs?.history != null || soa !== null,
    });
    if (soa && result.boundaries) {
      for (let k = 0; k < count; k++) {
        const u = inputs.subarray(k * q, (k + 1) * q);
        soa.stretch(model, result.boundaries.subarray(k * N, (k + 1) * N), u, times[k], durations[k], segmentOf[k], powers[k], allOn);
      }
    }
    if (obs) {
      if (obs.rows && result.boundaries) {
        for (let k = 1; k < count; k++) {
          const row = result.boundaries.subarray(k * N, (k + 1) * N);
          recordRow(obs, times[k], row, inputs[k * q + m]);
        }
      }
      if (obs.history && result.boundaries) junctionHistory(obs, result.boundaries, result.peaks);
      result.peaks.forEach((pk, w) => {
        const k = pieceAt(pk.timeS);
        const ta = inputs[k * q + m];
        offerPeak(obs, w, t0 + pk.timeS, pk.valueC, ta, () => stateAt(pk.timeS));
        obs.series?.add(w, t0 + pk.timeS, pk.valueC);
      });
      timeAboveTarget(obs, result.peaks.map((p) => p.valueC));
    }
    T.set(result.final);
    count = 0;
  }

  /** A sparse chunk: runProfile's set-up would cost more than stepping its few pieces exactly. */
  function stepChunk(obs: Observer): void {
    for (let k = 0; k < count; k++) {
      const u = inputs.subarray(k * q, (k + 1) * q);
      observeStretch(obs, sm, model, T, u, times[k], durations[k], inputs[k * q + m], scratch);
      soa?.stretch(model, T, u, times[k], durations[k], segmentOf[k], powers[k], allOn, true);
      advance(model, T, u, durations[k], T);
    }
    count = 0;
  }

  /** Each piece's exact start value and the chunk's interior junction peaks, in time order. */
  function junctionHistory(obs: Observer, boundaries: Float64Array, peaks: { valueC: number; timeS: number }[]): void {
    const history = obs.history!;
    const t0 = times[0];
    for (let d = 0; d < m; d++) {
      const j = obs.nodes[2 * d];
      const peak = peaks[2 * d];
      let pending = peak.timeS > 0;
      for (let k = 0; k <= count; k++) {
        const tk = k < count ? times[k] : times[count - 1] + durations[count - 1];
        if (pending && t0 + peak.timeS < tk) {
          history.add(d, t0 + peak.timeS, peak.valueC);
          pending = false;
        }
        history.add(d, tk, boundaries[k * N + j]);
      }
    }
  }

  function pieceAt(tau: number): number {
    let elapsed = 0;
    for (let k = 0; k < count; k++) {
      elapsed += durations[k];
      if (tau <= elapsed) return k;
    }
    return count - 1;
  }

  function timeAboveTarget(obs: Observer, peaks: number[]): void {
    for (let d = 0; d < m; d++) {
      const w = 2 * d;
      if (!(peaks[w] >= obs.targetC[d])) continue;
      local.set(start);
      const bounds = boundsFor(model);
      for (let k = 0; k < count; k++) {
        const u = inputs.subarray(k * q, (k + 1) * q);
        bounds.load(local, u, durations[k]);
        if (bounds.upper(obs.nodes[w]) >= obs.targetC[d]) {
          obs.timeAboveS[d] += timeAtOrAbove(model, local, u, durations[k], obs.nodes[w], obs.targetC[d], scratch);
        }
        advance(model, local, u, durations[k], local);
      }
    }
  }

  function finish(t: number, ambientC: number): void {
    flush();
    if (observer) sampleState(observer, t, T, ambientC);
  }

  return self;
}
