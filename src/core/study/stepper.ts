import { advance, firstCrossing, type ModalModel } from '../thermal';
import { shutdownWatch } from '../electrical';
import type { StudyModel } from './study-model';
import type { EventLog } from './event-log';
import { boundsFor, notePower, observeStretch, sampleState, type Observer } from './observer';
import { createSegmentPowerCache, fedDevices, type SegmentPower } from './segment-power';
import { logDriveEvents } from './drive-events';
import type { SoaTracker } from './soa-tracker';
import { MAX_TOGGLES_PER_PIECE } from './constants';

/** Round-off allowance of the stretch bounds, K. */
const BOUND_MARGIN_K = 1e-9;

/** Smallest stretch the convection check may cut a piece to, as a fraction of the piece. */
const MIN_SPLIT_FRACTION = 1e-9;

/**
 * Event-driven solver of a study: steps its pieces one constant-input stretch at a time,
 * ending a stretch where a device trips or resumes (thermal shutdown, found exactly with
 * firstCrossing) and splitting it where a natural-convection sink's rise moves Rθsa by more
 * than the tolerance (checked at the middle and the end of each stretch).
 */
export type Stepper = {
  T: Float64Array;
  on: boolean[];
  /** Constant-input stretches solved so far. */
  stretches: number;
  runPiece(t0: number, h: number, segmentIndex: number, ambientC: number): void;
  /** Final sample at time t. */
  finish(t: number, ambientC: number): void;
  reset(T: ArrayLike<number>, on: readonly boolean[]): void;
  /** Lowest and highest Rθsa used per sink, K/W. */
  rsaRange(): [number, number][];
};

export function createStepper(sm: StudyModel, observer: Observer | null, events: EventLog | null, soa: SoaTracker | null = null): Stepper {
  const { doc } = sm;
  const m = doc.devices.length;
  const N = sm.reference.nodeCount;
  const T = new Float64Array(N);
  const trial = new Float64Array(N);
  const mid = new Float64Array(N);
  const scratch = new Float64Array(N);
  const u = new Float64Array(m + 1);
  const rsaUsed = new Float64Array(doc.sinks.length);
  const on = doc.devices.map(() => true);
  const shutdown = doc.devices.flatMap((d, i) => (d.electrical?.thermalShutdown ? [i] : []));
  /** Fed devices by segment index (an array: a long profile would fill a map one entry per segment). */
  const fedCache: number[][] = [];
  /** Power by segment index while every device is on. */
  const powerCache: SegmentPower[] = [];
  const powerFor = createSegmentPowerCache(doc);
  let power: SegmentPower | null = null;
  let powerSegment = -1;
  const powerOn = on.slice();
  let suggested = Infinity;
  /** Devices tripping or resuming at the end of the current stretch (one list, refilled). */
  const tripped: number[] = [];

  const rsaLow = new Float64Array(doc.sinks.length).fill(Infinity);
  const rsaHigh = new Float64Array(doc.sinks.length).fill(-Infinity);
  const rsaRange = () => doc.sinks.map((_, i): [number, number] => [rsaLow[i], rsaHigh[i]]);
  const self: Stepper = { T, on, stretches: 0, runPiece, finish, reset, rsaRange };

  function reset(T0: ArrayLike<number>, on0: readonly boolean[]): void {
    T.set(T0);
    on0.forEach((v, i) => (on[i] = v));
    powerSegment = -1;
    suggested = Infinity;
  }

  function sameOn(): boolean {
    for (let i = 0; i < m; i++) if (on[i] !== powerOn[i]) return false;
    return true;
  }

  function updatePower(segmentIndex: number): SegmentPower {
    if (power && powerSegment === segmentIndex && sameOn()) return power;
    const segment = doc.profile.segments[segmentIndex];
    let fed = fedCache[segmentIndex];
    if (!fed) fedCache[segmentIndex] = fed = fedDevices(doc, segment);
    // With every device on, a segment's power is the same each time it is met (passes, pieces).
    let allOn = true;
    for (let i = 0; i < m; i++) allOn &&= on[i];
    if (allOn) {
      power = powerCache[segmentIndex] ??= powerFor(segment, fed, on);
    } else power = powerFor(segment, fed, on);
    powerSegment = segmentIndex;
    for (let i = 0; i < m; i++) powerOn[i] = on[i];
    for (let d = 0; d < m; d++) u[d] = power.partPowerW[d] * doc.devices[d].count;
    return power;
  }

  /** The stretch length whose end state `trial` holds (NaN when it holds none). */
  let trialFor = NaN;

  /** Longest stretch from T (at most h) over which Rθsa stays within tolerance. */
  function convectionStep(model: ModalModel, h: number, ambientC: number): number {
    trialFor = NaN;
    if (sm.nonLinearSinks.length === 0) return h;
    let step = Math.min(h, suggested);
    const floor = h * MIN_SPLIT_FRACTION;
    while (step > floor) {
      advance(model, T, u, step, trial);
      advance(model, T, u, step / 2, mid);
      if (sm.rsaMismatch(trial, ambientC, rsaUsed) <= sm.tolerance && sm.rsaMismatch(mid, ambientC, rsaUsed) <= sm.tolerance) {
        trialFor = step;
        break;
      }
      step /= 2;
    }
    suggested = step < h ? step * 2 : Infinity;
    return Math.max(step, floor);
  }

  function runPiece(t0: number, h: number, segmentIndex: number, ambientC: number): void {
    u[m] = ambientC;
    const end = t0 + h;
    let t = t0;
    let toggles = 0;
    for (;;) {
      const p = updatePower(segmentIndex);
      const model = sm.modelAt(T, ambientC, rsaUsed);
      for (let i = 0; i < rsaUsed.length; i++) {
        if (rsaUsed[i] < rsaLow[i]) rsaLow[i] = rsaUsed[i];
        if (rsaUsed[i] > rsaHigh[i]) rsaHigh[i] = rsaUsed[i];
      }
      let step = convectionStep(model, end - t, ambientC);
      tripped.length = 0;
      const bounds = boundsFor(model);
      if (shutdown.length > 0) bounds.load(T, u, step);
      for (const d of shutdown) {
        const watch = shutdownWatch(doc.devices[d].electrical!.thermalShutdown!, on[d]);
        const j = sm.junction[d];
        // Bounds rule most stretches out: Tj cannot reach the level anywhere in them.
        if (watch.direction === 'up' ? bounds.upper(j) < watch.levelC - BOUND_MARGIN_K : bounds.lower(j) > watch.levelC + BOUND_MARGIN_K) continue;
        const tc = firstCrossing(model, T, u, step, sm.junction[d], watch.levelC, watch.direction);
        if (tc === null) continue;
        if (tc < step) {
          step = tc;
          tripped.length = 0;
          tripped.push(d);
        } else if (tc === step) tripped.push(d);
      }
      ++self.stretches;
      if (++sm.work.stretches > sm.work.limit) {
        throw new RangeError(
          `profile: solving needs more than ${sm.work.limit.toLocaleString('en')} constant stretches (thermal shutdown cycling, natural-convection splits and periodic passes included); shorten the profile or its repeat count`,
        );
      }
      if (observer) {
        observeStretch(observer, sm, model, T, u, t, step, ambientC, scratch);
        notePower(observer, p.partPowerW, step);
      }
      // observeStretch leaves the bounds loaded with this stretch.
      soa?.stretch(model, T, u, t, step, segmentIndex, p, on, observer !== null);
      if (events) {
        const drive = doc.profile.segments[segmentIndex].electrical;
        if (drive) logDriveEvents(doc, events, p, drive.vinV, drive.voutV, drive.iloadA, t, step);
      }
      // The convection check solved this very stretch already (same model, state and inputs).
      if (step === trialFor) {
        for (let i = 0; i < N; i++) T[i] = trial[i];
      } else advance(model, T, u, step, T);
      const last = tripped.length === 0 && step >= end - t;
      t = last ? end : t + step;
      // The crossing was found on the exact solution, so the state flips even when rounding leaves Tj a hair short of the level.
      if (tripped.length > 0 && ++toggles > MAX_TOGGLES_PER_PIECE) {
        const d = tripped[0];
        throw new RangeError(
          `devices[${d}].electrical.thermalShutdown: trips and resumes more than ${MAX_TOGGLES_PER_PIECE.toLocaleString('en')} times within one ${h.toPrecision(3)} s segment at ${t.toPrecision(4)} s (too little heat capacity at the junction, or too narrow a hysteresis); the result would not mean anything`,
        );
      }
      for (const d of tripped) {
        on[d] = !on[d];
        events?.add({ kind: on[d] ? 'resume' : 'shutdown', timeS: t, device: doc.devices[d].id, junctionC: T[sm.junction[d]] });
      }
      if (last || t >= end) return;
    }
  }

  function finish(t: number, ambientC: number): void {
    if (observer) sampleState(observer, t, T, ambientC);
  }

  return self;
}
