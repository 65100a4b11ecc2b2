import type { RawDevice, RawSink } from './types';

/** The fields of a `GET /api/parts` item the editor copies (thermal is written like a device's package). */
export type LibraryPart = {
  id: number;
  name: string;
  kind: string;
  packageName: string;
  tjMaxC: number;
  thermal: Record<string, unknown>;
  electrical: Record<string, unknown> | null;
  soa: Record<string, unknown> | null;
  isDemo: boolean;
};

/** The fields of a `GET /api/heatsinks` item the editor copies. */
export type CatalogueSink = {
  id: number;
  name: string;
  rthKPerW: number;
  referenceRiseK: number;
  /** Null: the catalogue gives no exponent (laminar 1/4). */
  convectionExponent?: number | null;
  forcedAir: { airSpeedMPerS: number; rthKPerW: number }[];
  massKg: number | null;
  material: 'aluminium' | 'copper' | null;
  capacityJPerK: number | null;
  isDemo: boolean;
};

const copy = <T>(value: T): T => JSON.parse(JSON.stringify(value)) as T;

/**
 * The device with the part's datasheet values: name, kind, Tj,max, package model, electrical
 * model and SOA replace the device's own; its id, sink, count, interface and notes stay.
 */
export function deviceFromPart(device: RawDevice, part: LibraryPart): RawDevice {
  const next: RawDevice = { ...device, name: part.name, kind: part.kind, partId: part.id, tjMaxC: part.tjMaxC, package: copy(part.thermal) };
  delete next.electrical;
  delete next.soa;
  if (part.electrical) next.electrical = copy(part.electrical);
  if (part.soa && part.kind !== 'regulator') next.soa = copy(part.soa);
  return next;
}

export type SinkAir = { kind: 'still' } | { kind: 'forced'; airSpeedMPerS: number };

/**
 * The sink with the catalogue entry's values: still air (Rθsa at the reference rise, natural
 * convection, with the entry's exponent when it gives one, else the sink's own) or the
 * forced-air curve at one speed; heat capacity given, or mass and material.
 * Its id and `to` stay.
 */
export function sinkFromCatalogue(sink: RawSink, entry: CatalogueSink, air: SinkAir): RawSink {
  const next: RawSink = { ...sink, name: entry.name };
  for (const key of ['rthKPerW', 'naturalConvection', 'forcedAir', 'capacityJPerK', 'massKg', 'material'] as const) delete next[key];
  if (air.kind === 'forced') {
    next.forcedAir = { airSpeedMPerS: air.airSpeedMPerS, points: copy(entry.forcedAir) };
  } else {
    next.rthKPerW = entry.rthKPerW;
    const exponent = entry.convectionExponent ?? sink.naturalConvection?.exponent;
    next.naturalConvection = exponent === undefined ? { referenceRiseK: entry.referenceRiseK } : { referenceRiseK: entry.referenceRiseK, exponent };
  }
  if (entry.capacityJPerK !== null) next.capacityJPerK = entry.capacityJPerK;
  else if (entry.massKg !== null && entry.material !== null) {
    next.massKg = entry.massKg;
    next.material = entry.material;
  }
  return next;
}
