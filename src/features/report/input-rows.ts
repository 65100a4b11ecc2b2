import type { Device, ElectricalModel, PackageModel, ProfileSegment, Sink, StudyDocument } from '@/core/study';
import { packageRthKPerW } from '@/features/studies/document-facts';
import { formatDuration, formatNumber, formatQuantity, formatRange } from '@/features/studies/quantity-format';

/** A field the parser does not keep (notes, interface material), read from the saved document. */
export function rawText(raw: unknown, path: readonly (string | number)[]): string | undefined {
  let at: unknown = raw;
  for (const key of path) {
    if (typeof at !== 'object' || at === null) return undefined;
    at = (at as Record<string | number, unknown>)[key];
  }
  return typeof at === 'string' && at.trim() ? at.trim() : undefined;
}

const KIND_LABELS = { regulator: 'integrated regulator', bipolar: 'bipolar', darlington: 'Darlington', mosfet: 'MOSFET' } as const;

export type DeviceRow = {
  id: string;
  name: string;
  kind: string;
  count: string;
  tjMax: string;
  packageModel: string;
  interface: string;
  sink: string;
  electrical: string;
};

export function packageLabel(model: PackageModel): string {
  if (model.kind === 'foster') return `Foster, ${model.terms.length} ${model.terms.length === 1 ? 'term' : 'terms'}`;
  if (model.kind === 'cauer') return `Cauer, ${model.stages.length} ${model.stages.length === 1 ? 'stage' : 'stages'}`;
  return 'single RC';
}

/** "0.2 K/W, τ 1 ms; 0.5 K/W, τ 50 ms" for Foster; R and C per stage for Cauer. */
export function packageTerms(model: PackageModel): string {
  const tau = (s: number) => (s < 1 ? formatQuantity(s * 1000, 'ms') : formatDuration(s));
  if (model.kind === 'foster') return model.terms.map((t) => `${formatQuantity(t.rKPerW, 'K/W')}, τ ${tau(t.tauS)}`).join('; ');
  if (model.kind === 'cauer') return model.stages.map((s) => `${formatQuantity(s.rKPerW, 'K/W')}, ${formatQuantity(s.capacityJPerK, 'J/K')}`).join('; ');
  return `${formatQuantity(model.rthKPerW, 'K/W')}, ${formatQuantity(model.capacityJPerK, 'J/K')}`;
}

function electricalText(model: ElectricalModel | undefined, hasSoa: boolean): string {
  const parts: string[] = [];
  if (model) {
    parts.push(model.role === 'pass' ? 'pass element' : 'other role');
    parts.push(`Iq ${formatQuantity(model.iqA * 1000, 'mA')}`);
    if (model.dropout?.length) parts.push(`dropout ${formatRange(model.dropout.map((p) => p.y), 'V')}`);
    if (model.currentLimit?.length) parts.push(`current limit ${formatRange(model.currentLimit.map((p) => p.y), 'A')}`);
    if (model.thermalShutdown) {
      parts.push(`shutdown at ${formatQuantity(model.thermalShutdown.tripC, '°C')}, ${formatQuantity(model.thermalShutdown.hysteresisK, 'K')} hysteresis`);
    }
    if (model.adjustable) parts.push(`adjustable, Vref ${formatQuantity(model.adjustable.vrefV, 'V')}`);
  }
  if (hasSoa) parts.push('SOA model');
  return parts.length ? parts.join(', ') : 'power given directly';
}

export function deviceRows(document: StudyDocument, raw: unknown): DeviceRow[] {
  return document.devices.map((device: Device, i) => {
    const material = rawText(raw, ['devices', i, 'interface', 'material']);
    return {
      id: device.id,
      name: device.name ?? '—',
      kind: device.kind ? KIND_LABELS[device.kind] : '—',
      count: String(device.count),
      tjMax: formatQuantity(device.tjMaxC, '°C'),
      packageModel: `${packageLabel(device.package)}, Rθjc ${formatQuantity(packageRthKPerW(device.package), 'K/W')}`,
      interface: `Rθcs ${formatQuantity(device.interfaceRthKPerW, 'K/W')}${material ? `, ${material}` : ''}`,
      sink: device.sink,
      electrical: electricalText(device.electrical, Boolean(device.soa)),
    };
  });
}

export type SinkRow = { id: string; name: string; rth: string; cooling: string; capacity: string; to: string };

export function sinkRows(document: StudyDocument): SinkRow[] {
  return document.sinks.map((sink: Sink) => {
    let cooling = 'fixed Rθsa';
    let rth = formatQuantity(sink.rthKPerW, 'K/W');
    if (sink.naturalConvection) {
      cooling = `natural convection, exponent ${formatNumber(sink.naturalConvection.exponent)}`;
      rth += ` at a ${formatQuantity(sink.naturalConvection.referenceRiseK, 'K')} rise`;
    } else if (sink.forcedAir) {
      cooling = `forced air at ${formatQuantity(sink.forcedAir.airSpeedMPerS, 'm/s')} (${sink.forcedAir.points.length} catalogue points)`;
      rth += ` at ${formatQuantity(sink.forcedAir.airSpeedMPerS, 'm/s')}`;
    }
    return {
      id: sink.id,
      name: sink.name ?? '—',
      rth,
      cooling,
      capacity: sink.capacityJPerK > 0 ? formatQuantity(sink.capacityJPerK, 'J/K') : 'massless',
      to: sink.to,
    };
  });
}

export type SegmentRow = { index: number; start: string; label: string; duration: string; drive: string };

function driveText(segment: ProfileSegment): string {
  const parts: string[] = [];
  if (segment.electrical) {
    const e = segment.electrical;
    parts.push(`${formatQuantity(e.vinV, 'V')} in, ${formatQuantity(e.voutV, 'V')} out, ${formatQuantity(e.iloadA, 'A')}`);
  }
  if (segment.railDrive) {
    const r = segment.railDrive;
    parts.push(`${formatQuantity(r.voutV, 'V')} out, ${formatQuantity(r.iloadA, 'A')}, input from the rail plan`);
  }
  for (const [device, watts] of Object.entries(segment.powerW)) parts.push(`${device} ${formatQuantity(watts, 'W')}`);
  return parts.length ? parts.join('; ') : 'no load';
}

/** The expanded segments of one pass, each with its start time. */
export function segmentRows(document: StudyDocument): SegmentRow[] {
  let t = 0;
  return document.profile.segments.map((segment, i) => {
    const row = { index: i + 1, start: formatDuration(t), label: segment.label ?? '—', duration: formatDuration(segment.durationS), drive: driveText(segment) };
    t += segment.durationS;
    return row;
  });
}
