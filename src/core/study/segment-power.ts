import { solveOperatingPoint, type OperatingPoint, type PassMember } from '../electrical';
import type { Device, ProfileSegment, StudyDocument } from './types';

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
