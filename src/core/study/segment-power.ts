import { solveOperatingPoint, type OperatingPoint, type PassMember } from '../electrical';
import type { Device, ProfileSegment, StudyDocument } from './types';
import { NO_POWER } from './parse-profile';

const passDevices = new WeakMap<StudyDocument, number[]>();

/** Which devices an electrical segment feeds: its `devices` list, else every device whose role is "pass". */
export function fedDevices(doc: StudyDocument, segment: ProfileSegment): number[] {
  const ids = segment.electrical?.devices;
  if (ids) return ids.map((id) => doc.devices.findIndex((d) => d.id === id));
  let out = passDevices.get(doc);
  if (!out) {
    out = doc.devices.flatMap((d, i) => ((d.electrical?.role ?? 'pass') === 'pass' ? [i] : []));
    passDevices.set(doc, out);
  }
  return out;
}

const member = (device: Device, on: boolean): PassMember => ({
  count: device.count,
  iqA: device.electrical?.iqA ?? 0,
  dropout: device.electrical?.dropout,
  currentLimit: device.electrical?.currentLimit,
  on,
  share: device.currentShare,
});

export type SegmentPower = {
  /** Watts in one part of each device, in device order. */
  partPowerW: Float64Array;
  /** The electrical operating point, for segments driven by vinV/voutV/iloadA. */
  operatingPoint?: OperatingPoint;
  /** Devices that drive feeds, in device order of `fed`. */
  fed: number[];
};

/**
 * Dissipation of one part of every device over a segment, given which devices are on
 * (a device in thermal shutdown delivers nothing; its `powerW` is 0 and fed parts draw only Iq).
 */
export function segmentPower(doc: StudyDocument, segment: ProfileSegment, fed: number[], on: ArrayLike<boolean>): SegmentPower {
  const partPowerW = new Float64Array(doc.devices.length);
  doc.devices.forEach((d, i) => {
    const w = segment.powerW[d.id];
    if (w !== undefined && on[i]) partPowerW[i] = w;
  });
  if (!segment.electrical) return { partPowerW, fed };
  const members = fed.map((i) => member(doc.devices[i], on[i]));
  const operatingPoint = solveOperatingPoint(segment.electrical, members);
  fed.forEach((i, k) => {
    partPowerW[i] = operatingPoint.partPowerW[k];
  });
  return { partPowerW, operatingPoint, fed };
}

function hasEntries(o: object): boolean {
  if (o === NO_POWER) return false;
  for (const k in o) if (Object.prototype.hasOwnProperty.call(o, k)) return true;
  return false;
}

/** Drive values whose dissipation a power cache holds before it starts again. */
const MAX_CACHED_DRIVES = 4096;

/**
 * segmentPower remembered by drive value (Vin, Vout, Iload) for the segments it depends on
 * nothing else for: no `devices` list (the pass devices are fed), no powerW entries, every
 * device on. A long logged profile repeats its steps; the result is shared read-only.
 */
export function createSegmentPowerCache(doc: StudyDocument): (segment: ProfileSegment, fed: number[], on: ArrayLike<boolean>) => SegmentPower {
  const byVin = new Map<number, Map<number, Map<number, SegmentPower>>>();
  let size = 0;
  return (segment, fed, on) => {
    const e = segment.electrical;
    let plain = e !== undefined && e.devices === undefined;
    for (let i = 0; plain && i < on.length; i++) plain = on[i];
    if (plain && hasEntries(segment.powerW)) plain = false;
    if (!plain) return segmentPower(doc, segment, fed, on);
    const drive = e!;
    let byVout = byVin.get(drive.vinV);
    if (!byVout) byVin.set(drive.vinV, (byVout = new Map()));
    let byIload = byVout.get(drive.voutV);
    if (!byIload) byVout.set(drive.voutV, (byIload = new Map()));
    let p = byIload.get(drive.iloadA);
    if (!p) {
      if (size >= MAX_CACHED_DRIVES) {
        byVin.clear();
        size = 0;
        return segmentPower(doc, segment, fed, on);
      }
      p = segmentPower(doc, segment, fed, on);
      byIload.set(drive.iloadA, p);
      size++;
    }
    return p;
  };
}
