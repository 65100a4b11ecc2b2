import { interpolateLinear, type CurvePoint } from './interpolate-linear';
import { passDissipationW } from './dissipation';

/** One entry of a group of pass parts fed from the same input to the same output. */
export type PassMember = {
  /** Identical parts in this entry. */
  count: number;
  /** Input current of one part that does not reach the load, A (it flows in shutdown too). */
  iqA: number;
  /** Dropout of one part against its own current: x in A, y in V. */
  dropout?: readonly CurvePoint[];
  /** Current limit of one part against its differential Vin − Vout: x in V, y in A. */
  currentLimit?: readonly CurvePoint[];
  /** False while the entry is in thermal shutdown: it carries no load current. */
  on: boolean;
  /** Current of each part as a fraction of the equal share (part-to-part mismatch); default 1. */
  share?: number;
};

export type Drive = { vinV: number; voutV: number; iloadA: number };

export type OperatingPoint = {
  /** Output voltage actually reached, V (below the request in dropout, 0 with every part off). */
  voutV: number;
  /** Current delivered to the load, A (below the request in current limit). */
  currentA: number;
  /** Current in each conducting part, A. */
  partCurrentA: number;
  /** Dissipation of one part of each member, W, in member order. */
  partPowerW: number[];
  /** Highest dropout among conducting parts at their current, V. */
  dropoutV: number;
  inDropout: boolean;
  currentLimited: boolean;
  /** Group current limit at the final differential, A (Infinity without limit data). */
  limitA: number;
  outputOff: boolean;
};

const MAX_ITERATIONS = 50;
const REL_TOL = 1e-12;

/**
 * Operating point of parts in parallel sharing the load current equally (PHYSICS.md §1):
 * the output sags to Vin − Vdropout(I/n) when the input lacks headroom, and the current is
 * clamped to n·Ilim(Vin − Vout). Both depend on each other, so the pair is iterated to a
 * fixed point. The output voltage is held where the regulator puts it; a resistive load,
 * which would pull it lower in current limit, is not modelled. A member's `share` scales the
 * current of its parts (a share error, PHYSICS.md §1); dropout and limit are taken at that current.
 */
export function solveOperatingPoint(drive: Drive, members: readonly PassMember[]): OperatingPoint {
  const { vinV, iloadA } = drive;
  const conducting = members.filter((m) => m.on);
  const n = conducting.reduce((sum, m) => sum + m.count, 0);
  if (n === 0) {
    return {
      voutV: 0,
      currentA: 0,
      partCurrentA: 0,
      partPowerW: members.map((m) => passDissipationW(vinV, vinV, 0, m.iqA)), // quiescent only
      dropoutV: 0,
      inDropout: false,
      currentLimited: false,
      limitA: 0,
      outputOff: true,
    };
  }
  let current = iloadA;
  let vout = drive.voutV;
  let dropoutV = 0;
  let limitA = Infinity;
  for (let k = 0; k < MAX_ITERATIONS; k++) {
    const part = current / n;
    dropoutV = 0;
    for (const m of conducting) if (m.dropout) dropoutV = Math.max(dropoutV, interpolateLinear(m.dropout, part * (m.share ?? 1)));
    vout = Math.min(drive.voutV, Math.max(0, vinV - dropoutV));
    let partLimit = Infinity;
    for (const m of conducting) if (m.currentLimit) partLimit = Math.min(partLimit, interpolateLinear(m.currentLimit, vinV - vout) / (m.share ?? 1));
    limitA = partLimit * n;
    const next = Math.min(iloadA, limitA);
    if (Math.abs(next - current) <= REL_TOL * Math.max(1, iloadA)) {
      current = next;
      break;
    }
    current = next;
  }
  const part = current / n;
  return {
    voutV: vout,
    currentA: current,
    partCurrentA: part,
    partPowerW: members.map((m) => passDissipationW(vinV, vout, m.on ? part * (m.share ?? 1) : 0, m.iqA)),
    dropoutV,
    inDropout: vout < drive.voutV,
    currentLimited: current < iloadA,
    limitA,
    outputOff: false,
  };
}
