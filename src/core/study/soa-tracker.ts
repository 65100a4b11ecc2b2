import { peakInSegment, type ModalModel } from '../thermal';
import type { StudyModel } from './study-model';
import type { SegmentPower } from './segment-power';
import { boundsFor } from './observer';
import { createSoaAccumulator, type SoaAccumulator, type SoaStretch } from './soa-accumulator';
import { SOA_CASE_TOL_K, STRETCH_JOIN_REL_TOL } from './constants';

type Open = { timeS: number; endS: number; vceV: number; icA: number; caseC: number };

/**
 * Operating points of the devices with an SOA model, gathered while the final run is solved
 * (PHYSICS.md §4): a stretch is a run of constant Vce = Vin − Vout and Ic = I/n of one part,
 * however many pieces (chart buckets, ambient steps, events) it is solved in; its case
 * temperature is the highest one during the stretch, to SOA_CASE_TOL_K on the hot side.
 * Stretches without current, and devices driven by powerW, have nothing to check and are left out.
 */
export type SoaTracker = {
  /** Devices tracked (indices into doc.devices) and their accumulators, in device order. */
  devices: number[];
  accumulators: SoaAccumulator[];
  /** `boundsLoaded`: the model's stretch bounds already hold this stretch (T, u, h), as the observer leaves them. */
  stretch(model: ModalModel, T: ArrayLike<number>, u: ArrayLike<number>, t: number, h: number, segmentIndex: number, power: SegmentPower, on: ArrayLike<boolean>, boundsLoaded?: boolean): void;
  /** Closes the open stretches; a periodic run joins its last stretch to its first when they continue each other. */
  finish(endS: number): void;
};

/**
 * `stretchCase` false: a stretch's case temperature is left at its start value instead of its
 * highest (no search): for a caller that checks every point at the device's peak case
 * temperature afterwards (raiseCase), which is hotter still.
 */
export function createSoaTracker(sm: StudyModel, stretchCase = true): SoaTracker | null {
  const { doc } = sm;
  const devices = doc.devices.flatMap((d, i) => (d.soa ? [i] : []));
  if (devices.length === 0) return null;
  const accumulators = devices.map((d) => createSoaAccumulator(doc.devices[d].soa!));
  const open: (Open | null)[] = devices.map(() => null);
  const firstOfRun: (Open | null)[] = devices.map(() => null);
  const periodic = doc.profile.periodic;

  /** Stretches handed to the accumulators (they copy what they keep): one object, refilled. */
  const scratch: SoaStretch = { timeS: 0, durationS: 0, vceV: 0, icA: 0, caseC: 0 };
  const fill = (o: Open): SoaStretch => {
    scratch.timeS = o.timeS;
    scratch.durationS = o.endS - o.timeS;
    scratch.vceV = o.vceV;
    scratch.icA = o.icA;
    scratch.caseC = o.caseC;
    return scratch;
  };
  /** A closed stretch's record, reused for the device's next one unless a periodic run holds it back. */
  const spare: (Open | null)[] = devices.map(() => null);

  function close(k: number): void {
    const o = open[k];
    open[k] = null;
    if (!o) return;
    // Held back: in a periodic run it may continue the last stretch of the period.
    if (periodic && o.timeS === 0 && !firstOfRun[k]) {
      firstOfRun[k] = o;
      return;
    }
    accumulators[k].add(fill(o));
    spare[k] = o;
  }

  // The piece being tracked, for caseMax (set per call of stretch: no closure per piece).
  let pieceModel: ModalModel | null = null;
  let pieceT: ArrayLike<number> = [];
  let pieceU: ArrayLike<number> = [];
  let pieceH = 0;
  let loaded = false;

  /** Highest case temperature of the piece, above `atLeast` (else atLeast): the modal bound where it is tight, else the exact search. */
  function caseMax(node: number, atLeast: number): number {
    if (!stretchCase) return Math.max(atLeast, pieceT[node]);
    const model = pieceModel!;
    const bounds = boundsFor(model);
    if (!loaded) bounds.load(pieceT, pieceU, pieceH);
    loaded = true;
    const upper = bounds.upper(node);
    if (upper <= atLeast) return atLeast;
    if (upper - bounds.endMax(node) <= SOA_CASE_TOL_K) return Math.max(atLeast, upper);
    // Bounds over halved sub-stretches settle most stretches to the tolerance at a fraction of the exact search's cost.
    const within = bounds.maxWithin(node, SOA_CASE_TOL_K);
    const best = Number.isNaN(within) ? peakInSegment(model, pieceT, pieceU, pieceH, node).valueC : within;
    return Math.max(atLeast, best);
  }

  function stretch(model: ModalModel, T: ArrayLike<number>, u: ArrayLike<number>, t: number, h: number, segmentIndex: number, power: SegmentPower, on: ArrayLike<boolean>, boundsLoaded = false): void {
    if (h === 0) return;
    const drive = doc.profile.segments[segmentIndex].electrical;
    const op = power.operatingPoint;
    pieceModel = model;
    pieceT = T;
    pieceU = u;
    pieceH = h;
    loaded = boundsLoaded;
    for (let k = 0; k < devices.length; k++) {
      const d = devices[k];
      const conducts = drive && op && !op.outputOff && on[d] && op.partCurrentA > 0 && power.fed.includes(d);
      if (!conducts) {
        close(k);
        continue;
      }
      const vceV = drive.vinV - op.voutV;
      const icA = op.partCurrentA;
      const o = open[k];
      const node = sm.case[d];
      if (o && o.vceV === vceV && o.icA === icA && Math.abs(o.endS - t) <= STRETCH_JOIN_REL_TOL * Math.max(1, t)) {
        o.endS = t + h;
        o.caseC = caseMax(node, o.caseC);
        continue;
      }
      close(k);
      const caseC = caseMax(node, -Infinity);
      const next = spare[k];
      spare[k] = null;
      if (next) {
        next.timeS = t;
        next.endS = t + h;
        next.vceV = vceV;
        next.icA = icA;
        next.caseC = caseC;
        open[k] = next;
      } else {
        open[k] = { timeS: t, endS: t + h, vceV, icA, caseC };
      }
    }
    pieceT = pieceU = [];
  }

  function finish(endS: number): void {
    devices.forEach((_, k) => {
      const last = open[k];
      const first = firstOfRun[k];
      open[k] = null;
      if (last && first && last !== first && last.vceV === first.vceV && last.icA === first.icA && Math.abs(last.endS - endS) <= STRETCH_JOIN_REL_TOL * Math.max(1, endS)) {
        accumulators[k].add({ ...toStretch(last), durationS: last.endS - last.timeS + (first.endS - first.timeS), caseC: Math.max(last.caseC, first.caseC) });
        return;
      }
      if (last) accumulators[k].add(toStretch(last));
      if (first) accumulators[k].add(toStretch(first));
    });
  }

  return { devices, accumulators, stretch, finish };
}

const toStretch = (o: Open): SoaStretch => ({ timeS: o.timeS, durationS: o.endS - o.timeS, vceV: o.vceV, icA: o.icA, caseC: o.caseC });
