import type { StudyDocument } from './types';
import type { AmbientIntervals } from './ambient-intervals';

/**
 * Visits the constant-input pieces of `passes` passes of the profile, in time order: every
 * segment, cut where the ambient changes and at the chart bucket edges k·bucketS. Zero-length
 * segments are skipped. With `wrapAmbient` the ambient restarts with each pass (a periodic
 * study); otherwise its times run from the start of the first pass.
 */
export type PieceVisitor = (
  startS: number,
  durationS: number,
  segmentIndex: number,
  ambientC: number,
  bucket: number,
  /** The pass the piece belongs to, and whether it is the first piece of its segment. */
  pass: number,
  segmentStart: boolean,
) => void;

export type TimelineOptions = {
  passes: number;
  bucketS: number;
  bucketCount: number;
  wrapAmbient: boolean;
};

export function passDurationS(doc: StudyDocument): number {
  let total = 0;
  for (const s of doc.profile.segments) total += s.durationS;
  return total;
}

export function forEachPiece(doc: StudyDocument, ambient: AmbientIntervals, options: TimelineOptions, visit: PieceVisitor): number {
  const { segments } = doc.profile;
  const { startS, valueC } = ambient;
  const period = passDurationS(doc);
  let t = 0;
  let bucket = 0;
  let nextEdge = options.bucketCount > 1 ? options.bucketS : Infinity;
  let amb = 0;
  let ambOffset = 0;
  for (let pass = 0; pass < options.passes; pass++) {
    if (options.wrapAmbient) {
      amb = 0;
      ambOffset = pass * period;
    }
    for (let s = 0; s < segments.length; s++) {
      const duration = segments[s].durationS;
      if (duration === 0) continue;
      const segEnd = t + duration;
      let cur = t;
      while (cur < segEnd) {
        while (amb + 1 < startS.length && startS[amb + 1] + ambOffset <= cur) amb++;
        while (nextEdge <= cur) {
          bucket++;
          nextEdge = bucket + 1 < options.bucketCount ? (bucket + 1) * options.bucketS : Infinity;
        }
        const nextAmb = amb + 1 < startS.length ? startS[amb + 1] + ambOffset : Infinity;
        const end = Math.min(segEnd, nextAmb, nextEdge);
        visit(cur, end - cur, s, valueC[amb], bucket, pass, cur === t);
        cur = end;
      }
      t = segEnd;
    }
  }
  return t;
}
