import { isGroup, type RawDocument, type RawItem } from './types';

function mapSegments(doc: RawDocument, change: (segment: RawItem) => RawItem): RawDocument {
  const walk = (items: RawItem[] | undefined): RawItem[] | undefined =>
    items?.map((item) => (isGroup(item) ? { ...item, segments: walk(item.segments) } : change(item)));
  if (!doc.profile) return doc;
  return { ...doc, profile: { ...doc.profile, segments: walk(doc.profile.segments) } };
}

/**
 * Renames device `index` and the references to it (power per device, fed devices, the rail
 * plan's device). References are left alone when the new id is already another device's,
 * so a passing clash while typing does not merge two devices' loads.
 */
export function renameDevice(doc: RawDocument, index: number, to: string): RawDocument {
  const devices = doc.devices ?? [];
  const from = devices[index]?.id;
  const next: RawDocument = { ...doc, devices: devices.map((d, i) => (i === index ? { ...d, id: to } : d)) };
  if (from === undefined || from === to || devices.some((d, i) => i !== index && d.id === to)) return next;
  const renamed = mapSegments(next, (item) => {
    const segment = { ...item } as Record<string, unknown> & { powerW?: Record<string, unknown>; devices?: string[] };
    if (segment.powerW && from in segment.powerW) {
      segment.powerW = Object.fromEntries(Object.entries(segment.powerW).map(([k, v]) => [k === from ? to : k, v]));
    }
    if (segment.devices) segment.devices = segment.devices.map((id) => (id === from ? to : id));
    return segment as RawItem;
  });
  if (renamed.railPlan?.device === from) renamed.railPlan = { ...renamed.railPlan, device: to };
  return renamed;
}

/** Removes device `index` and its loads in the profile (its power entries, its place in fed-device lists). */
export function removeDevice(doc: RawDocument, index: number): RawDocument {
  const id = doc.devices?.[index]?.id;
  const next: RawDocument = { ...doc, devices: (doc.devices ?? []).filter((_, i) => i !== index) };
  if (id === undefined) return next;
  return mapSegments(next, (item) => {
    const segment = { ...item } as Record<string, unknown> & { powerW?: Record<string, unknown>; devices?: string[] };
    if (segment.powerW && id in segment.powerW) {
      const { [id]: _gone, ...rest } = segment.powerW;
      segment.powerW = rest;
    }
    if (segment.devices) {
      const left = segment.devices.filter((d) => d !== id);
      if (left.length > 0) segment.devices = left;
      else delete segment.devices;
    }
    return segment as RawItem;
  });
}

/** Renames sink `index` and what points at it (devices' `sink`, other sinks' `to`), with the same clash rule. */
export function renameSink(doc: RawDocument, index: number, to: string): RawDocument {
  const sinks = doc.sinks ?? [];
  const from = sinks[index]?.id;
  const clash = sinks.some((s, i) => i !== index && s.id === to);
  const follow = from !== undefined && from !== to && !clash;
  return {
    ...doc,
    sinks: sinks.map((s, i) => (i === index ? { ...s, id: to } : follow && s.to === from ? { ...s, to } : s)),
    devices: follow ? (doc.devices ?? []).map((d) => (d.sink === from ? { ...d, sink: to } : d)) : doc.devices,
  };
}

/** The ids of the devices a power segment may name, in document order. */
export const deviceIds = (doc: RawDocument): string[] => (doc.devices ?? []).map((d) => d.id ?? '');
