import { parseQuantity, type UnitKind } from '../../../src/core/units';
import type { CsvTable } from './read-csv';

/** How a catalogue field is read from a cell. `scale` turns the SI value into the field's unit (m → mm: 1000). */
export type FieldSpec =
  | { field: string; label: string; kind: 'text'; aliases: string[] }
  | { field: string; label: string; kind: 'quantity'; unit: UnitKind; scale?: number; defaultUnit: string; units: string[]; aliases: string[] }
  | { field: string; label: string; kind: 'integer'; aliases: string[] }
  | { field: string; label: string; kind: 'number'; aliases: string[] }
  | { field: string; label: string; kind: 'choice'; choices: readonly string[]; aliases: string[] };

/** Which column feeds which field, and for bare numbers the unit they are in. */
export type ColumnMapping = Record<string, { column: string; unit?: string }>;

export type RowError = { row: number; column: string; field: string; message: string };

const normalise = (s: string) =>
  s
    .toLowerCase()
    .replace(/\(.*?\)|\[.*?\]/g, '')
    .replace(/[^a-z0-9θ]+/g, '');

const unitIn = (header: string) => /[([]\s*([^)\]]+?)\s*[)\]]/.exec(header)?.[1];

/** A first guess at the mapping from the header names, e.g. "Mass (g)" → massKg in g. */
export function suggestMapping(headers: string[], specs: FieldSpec[]): ColumnMapping {
  const mapping: ColumnMapping = {};
  for (const spec of specs) {
    const names = [spec.field, spec.label, ...spec.aliases].map(normalise);
    const column = headers.find((h) => names.includes(normalise(h)));
    if (!column) continue;
    const unit = unitIn(column);
    mapping[spec.field] = spec.kind === 'quantity' && unit && spec.units.includes(unit) ? { column, unit } : { column };
  }
  return mapping;
}

function readCell(spec: FieldSpec, raw: string, unit: string | undefined): { ok: true; value: unknown } | { ok: false; reason: string } {
  if (raw === '') return { ok: true, value: undefined };
  switch (spec.kind) {
    case 'text':
      return { ok: true, value: raw };
    case 'integer': {
      if (!/^[+-]?\d+$/.test(raw)) return { ok: false, reason: `"${raw}" is not a whole number` };
      return { ok: true, value: Number(raw) };
    }
    case 'number': {
      const v = Number(raw.replace(',', '.'));
      return Number.isFinite(v) && raw.trim() !== '' ? { ok: true, value: v } : { ok: false, reason: `"${raw}" is not a number` };
    }
    case 'choice': {
      const v = raw.toLowerCase();
      return spec.choices.includes(v) ? { ok: true, value: v } : { ok: false, reason: `"${raw}" is not one of ${spec.choices.join(', ')}` };
    }
    case 'quantity': {
      const bare = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)([eE][+-]?\d+)?$/.test(raw);
      const r = parseQuantity(bare ? `${raw} ${unit ?? spec.defaultUnit}` : raw, spec.unit);
      return r.ok ? { ok: true, value: r.value * (spec.scale ?? 1) } : { ok: false, reason: r.reason };
    }
  }
}

/**
 * Turns every data row into a plain object of field values, collecting every cell that cannot
 * be read (row, column, reason) instead of stopping at the first.
 */
export function mapRows(table: CsvTable, specs: FieldSpec[], mapping: ColumnMapping) {
  const errors: RowError[] = [];
  const bySpec = new Map(specs.map((s) => [s.field, s]));
  for (const [field, m] of Object.entries(mapping)) {
    const spec = bySpec.get(field);
    if (!spec) errors.push({ row: 1, column: m.column, field, message: `there is no field "${field}" to map to` });
    else if (!table.headers.includes(m.column)) errors.push({ row: 1, column: m.column, field, message: `the file has no column "${m.column}"` });
    else if (spec.kind === 'quantity' && m.unit && !spec.units.includes(m.unit)) {
      errors.push({ row: 1, column: m.column, field, message: `unit "${m.unit}" is not one of ${spec.units.join(', ')}` });
    }
  }
  if (errors.length) return { records: [], errors };

  const records = table.rows.map(({ line, cells }) => {
    const record: Record<string, unknown> = {};
    for (const [field, m] of Object.entries(mapping)) {
      const spec = bySpec.get(field)!;
      const raw = cells[table.headers.indexOf(m.column)] ?? '';
      const cell = readCell(spec, raw, m.unit);
      if (cell.ok) {
        if (cell.value !== undefined) record[field] = cell.value;
      } else errors.push({ row: line, column: m.column, field, message: cell.reason });
    }
    return { line, record };
  });
  return { records, errors };
}
