import { parseQuantity, type UnitKind } from '@/core/units';

/** How a field's text is read: a quantity in a shown unit (a bare number is taken in it), a whole number or a plain number. */
export type FieldSpec = { label: string; unit: string; read: 'length-mm' | 'integer' | 'number' | UnitKind; min?: number; max?: number; above?: number };

export type FieldRead = { ok: true; value: number } | { ok: false; message: string };

const BARE = /^\s*[+-]?(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][+-]?\d+)?\s*$/;

/**
 * Reads one field's text into SI, or says why not, naming the field. Lengths are typed in mm
 * by default and accept any SI-prefixed metre ("0.1 m", "35 µm", "7.5 cm").
 */
export function readField(text: string, spec: FieldSpec): FieldRead {
  const name = spec.label;
  const trimmed = text.trim();
  if (trimmed === '') return { ok: false, message: `${name} is empty` };
  let value: number;
  if (spec.read === 'integer' || spec.read === 'number') {
    value = Number(trimmed.replace(',', '.'));
    if (!Number.isFinite(value)) return { ok: false, message: `${name}: "${trimmed}" is not a number` };
    if (spec.read === 'integer' && !Number.isInteger(value)) return { ok: false, message: `${name} must be a whole number, got ${trimmed}` };
  } else {
    const kind: UnitKind = spec.read === 'length-mm' ? 'length' : spec.read;
    const parsed = parseQuantity(spec.read === 'length-mm' && BARE.test(trimmed) ? `${trimmed} mm` : trimmed, kind);
    if (!parsed.ok) return { ok: false, message: `${name} ${parsed.reason}` };
    value = parsed.value;
  }
  const shown = spec.read === 'length-mm' ? `${Number((value * 1e3).toPrecision(6))} mm` : `${Number(value.toPrecision(6))}${spec.unit ? ` ${spec.unit}` : ''}`;
  if (spec.above !== undefined && !(value > spec.above)) return { ok: false, message: `${name} must be above ${spec.above}${spec.unit && spec.read !== 'length-mm' ? ` ${spec.unit}` : ''}, got ${shown}` };
  if (spec.min !== undefined && value < spec.min) return { ok: false, message: `${name} must be at least ${spec.min}, got ${shown}` };
  if (spec.max !== undefined && value > spec.max) return { ok: false, message: `${name} must be at most ${spec.max}, got ${shown}` };
  return { ok: true, value };
}

/** Reads every field of a form; values in SI by key, and the messages of those that fail. */
export function readFields<K extends string>(texts: Record<K, string>, specs: Record<K, FieldSpec>): { values: Partial<Record<K, number>>; errors: Partial<Record<K, string>> } {
  const values: Partial<Record<K, number>> = {};
  const errors: Partial<Record<K, string>> = {};
  for (const key of Object.keys(specs) as K[]) {
    const r = readField(texts[key] ?? '', specs[key]);
    if (r.ok) values[key] = r.value;
    else errors[key] = r.message;
  }
  return { values, errors };
}

/** A list of air speeds typed as "1, 2.5, 4" (m/s, or with the unit), strictly increasing. */
export function readSpeeds(text: string, label = 'Air speeds'): { ok: true; value: number[] } | { ok: false; message: string } {
  // Commas or semicolons part the speeds; plain numbers may also be parted by spaces ("1 2 4").
  const parts = text
    .split(/[;,]/)
    .flatMap((p) => (/^[\d.\s]+$/.test(p) ? p.split(/\s+/) : [p]))
    .map((p) => p.trim())
    .filter(Boolean);
  const out: number[] = [];
  for (const part of parts) {
    const parsed = parseQuantity(part, 'speed');
    if (!parsed.ok) return { ok: false, message: `${label}: ${part} ${parsed.reason}` };
    if (!(parsed.value > 0) || parsed.value > 50) return { ok: false, message: `${label}: each speed must lie above 0 and at most 50 m/s, got ${part}` };
    if (out.length && parsed.value <= out[out.length - 1]) return { ok: false, message: `${label}: list the speeds from the lowest up, each once` };
    out.push(parsed.value);
  }
  return { ok: true, value: out };
}
