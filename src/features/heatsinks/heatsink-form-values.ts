import { numberOrNull, textOf } from '@/features/catalogues/form-values';

import type { Heatsink } from './types';

export type ForcedAirRow = { airSpeedMPerS: string; rthKPerW: string };

/** What the form edits: text as typed, mass in grams. */
export type HeatsinkFormValues = {
  name: string;
  description: string;
  rthKPerW: string;
  referenceRiseK: string;
  convectionExponent: string;
  forcedAir: ForcedAirRow[];
  massG: string;
  material: '' | 'aluminium' | 'copper';
  capacityJPerK: string;
  widthMm: string;
  lengthMm: string;
  heightMm: string;
  devicesPerSink: string;
  price: string;
  notes: string;
};

/** 75 K is the rise most still-air catalogue ratings are stated at (common practice). */
export const DEFAULT_REFERENCE_RISE_K = 75;

export function emptyHeatsinkValues(): HeatsinkFormValues {
  return {
    name: '',
    description: '',
    rthKPerW: '',
    referenceRiseK: String(DEFAULT_REFERENCE_RISE_K),
    convectionExponent: '',
    forcedAir: [],
    massG: '',
    material: '',
    capacityJPerK: '',
    widthMm: '',
    lengthMm: '',
    heightMm: '',
    devicesPerSink: '1',
    price: '',
    notes: '',
  };
}

export function heatsinkValues(h: Heatsink): HeatsinkFormValues {
  return {
    name: h.name,
    description: h.description,
    rthKPerW: textOf(h.rthKPerW),
    referenceRiseK: textOf(h.referenceRiseK),
    convectionExponent: textOf(h.convectionExponent),
    forcedAir: h.forcedAir.map((p) => ({ airSpeedMPerS: textOf(p.airSpeedMPerS), rthKPerW: textOf(p.rthKPerW) })),
    // Rounded to µg so kg → g does not show binary noise (0.084 kg → 84 g, not 84.00000000000001).
    massG: h.massKg === null ? '' : String(Number((h.massKg * 1000).toFixed(6))),
    material: h.material ?? '',
    capacityJPerK: textOf(h.capacityJPerK),
    widthMm: textOf(h.widthMm),
    lengthMm: textOf(h.lengthMm),
    heightMm: textOf(h.heightMm),
    devicesPerSink: textOf(h.devicesPerSink),
    price: textOf(h.price),
    notes: h.notes,
  };
}

const required = (text: string) => numberOrNull(text) ?? undefined;

/** The API body (the shared heatsink schema's fields): empty optional values as null, defaults left to the schema. */
export function heatsinkInput(v: HeatsinkFormValues): Record<string, unknown> {
  const grams = numberOrNull(v.massG);
  return {
    name: v.name,
    description: v.description,
    rthKPerW: required(v.rthKPerW),
    referenceRiseK: required(v.referenceRiseK),
    convectionExponent: numberOrNull(v.convectionExponent),
    forcedAir: v.forcedAir.map((p) => ({ airSpeedMPerS: required(p.airSpeedMPerS), rthKPerW: required(p.rthKPerW) })),
    massKg: grams === null ? null : grams / 1000,
    material: v.material === '' ? null : v.material,
    capacityJPerK: numberOrNull(v.capacityJPerK),
    widthMm: numberOrNull(v.widthMm),
    lengthMm: numberOrNull(v.lengthMm),
    heightMm: numberOrNull(v.heightMm),
    devicesPerSink: required(v.devicesPerSink),
    price: numberOrNull(v.price),
    notes: v.notes,
  };
}
