import type { StudyDocument } from './types';
import type { StudyModel } from './study-model';
import type { Observer } from './observer';
import type { EventLog } from './event-log';
import type { AmbientIntervals } from './ambient-intervals';
import { forEachPiece } from './timeline';
import { createStepper } from './stepper';
import { createBatchRunner } from './batch-runner';
import type { SoaTracker } from './soa-tracker';

/** Either solver path behind one face. */
export type Runner = {
  T: Float64Array;
  on: boolean[];
  reset(T: ArrayLike<number>, on: readonly boolean[]): void;
  stretches(): number;
  piece(t0: number, h: number, segmentIndex: number, ambientC: number, bucket: number): void;
  finish(t: number, ambientC: number): void;
  rsaRange(): [number, number][] | undefined;
};

export function makeRunner(sm: StudyModel, batch: boolean, observer: Observer | null, events: EventLog | null, soa: SoaTracker | null = null): Runner {
  if (batch) {
    const b = createBatchRunner(sm, observer, events, soa);
    const on = sm.doc.devices.map(() => true);
    return {
      T: b.T,
      on,
      reset: (T) => b.T.set(T),
      stretches: () => b.pieces,
      piece: b.addPiece,
      finish: b.finish,
      rsaRange: () => undefined,
    };
  }
  const s = createStepper(sm, observer, events, soa);
  return {
    T: s.T,
    on: s.on,
    reset: s.reset,
    stretches: () => s.stretches,
    piece: (t0, h, segmentIndex, ambientC) => s.runPiece(t0, h, segmentIndex, ambientC),
    finish: s.finish,
    rsaRange: s.rsaRange,
  };
}

export type PassesRun = { endS: number; ambientMinC: number; ambientMaxC: number };

/** Called before the first piece of each segment (tap changes are logged there). */
export type SegmentStart = (timeS: number, segmentIndex: number, pass: number) => void;

/** Runs `passes` passes of the profile through the runner from its current state. */
export function runPasses(
  doc: StudyDocument,
  runner: Runner,
  ambient: AmbientIntervals,
  passes: number,
  bucketS: number,
  bucketCount: number,
  onSegmentStart?: SegmentStart,
): PassesRun {
  let lastTa = ambient.valueC[0];
  let ambientMinC = Infinity;
  let ambientMaxC = -Infinity;
  const endS = forEachPiece(doc, ambient, { passes, bucketS, bucketCount, wrapAmbient: doc.profile.periodic }, (t0, h, s, ta, bucket, pass, first) => {
    if (first && onSegmentStart) onSegmentStart(t0, s, pass);
    lastTa = ta;
    if (ta < ambientMinC) ambientMinC = ta;
    if (ta > ambientMaxC) ambientMaxC = ta;
    runner.piece(t0, h, s, ta, bucket);
  });
  runner.finish(endS, lastTa);
  return { endS, ambientMinC, ambientMaxC };
}
