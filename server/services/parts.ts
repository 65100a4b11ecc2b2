import { fitFoster } from '../../src/core/fit';
import { parseQuantity } from '../../src/core/units';
import { partSchema } from '../../src/validation/parts';
import { AppError } from '../errors';
import type { Part } from '../models';
import { catalogueService } from './catalogue-service';
import { mapRows, suggestMapping, type ColumnMapping, type FieldSpec } from './csv/map-rows';
import { readCsv } from './csv/read-csv';

export type PartView = ReturnType<typeof view>;

const view = (p: Part) => ({
  id: p.id,
  teamId: p.teamId,
  name: p.name,
  kind: p.kind,
  packageName: p.packageName,
  description: p.description,
  tjMaxC: p.tjMaxC,
  thermal: p.thermal,
  electrical: p.electrical,
  soa: p.soa,
  zthPoints: p.zthPoints,
  zthFit: p.zthFit,
  notes: p.notes,
  isDemo: p.isDemo,
  updatedAt: p.updatedAt.toISOString(),
});

/** A CSV of parts carries the scalar fields and a lumped Rθjc; richer models are entered in the app. */
export const PART_FIELDS: FieldSpec[] = [
  { field: 'name', label: 'Name', kind: 'text', aliases: ['part', 'partnumber', 'type'] },
  { field: 'kind', label: 'Kind', kind: 'choice', choices: ['regulator', 'bipolar', 'darlington', 'mosfet'], aliases: ['technology'] },
  { field: 'packageName', label: 'Package', kind: 'text', aliases: ['package_name', 'case'] },
  { field: 'description', label: 'Description', kind: 'text', aliases: ['desc'] },
  { field: 'tjMaxC', label: 'Tj,max', kind: 'quantity', unit: 'temperature', defaultUnit: '°C', units: ['°C', 'C'], aliases: ['tjmax', 'tj_max_c', 'tj'] },
  { field: 'notes', label: 'Notes', kind: 'text', aliases: ['comment'] },
];

export const parts = catalogueService({
  noun: 'Part',
  modelOf: (db) => db.models.Part,
  schema: partSchema,
  specs: PART_FIELDS,
  extraFromRow: (cell, mapping) => {
    const column = (mapping.rthJcKPerW as { column?: string } | undefined)?.column;
    if (!column) return { value: {}, errors: [{ column: '(mapping)', message: 'map a column to rthJcKPerW (Rθjc in K/W)' }] };
    const raw = cell(column);
    const v = Number((raw ?? '').replace(',', '.').replace(/\s*(K|°C|C)\/W$/, ''));
    if (raw === undefined) return { value: {}, errors: [{ column, message: `the file has no column "${column}"` }] };
    if (!(Number.isFinite(v) && v > 0)) return { value: {}, errors: [{ column, message: `"${raw}" is not a positive thermal resistance` }] };
    return { value: { thermal: { kind: 'lumped', rthKPerW: v } }, errors: [] };
  },
  suggestExtra: (headers) => {
    const column = headers.find((h) => /^(rth_?jc|rθjc|rthjc|r_?jc|theta_?jc)/i.test(h.replace(/\s/g, '')));
    return column ? { rthJcKPerW: { column } } : {};
  },
  view: (row) => view(row as Part),
  exportHeaders: ['name', 'kind', 'package_name', 'tj_max_c', 'rth_jc_k_per_w', 'description', 'notes'],
  exportRow: (p: PartView) => ({
    name: p.name,
    kind: p.kind,
    package_name: p.packageName,
    tj_max_c: p.tjMaxC,
    rth_jc_k_per_w: thermalTotal(p.thermal),
    description: p.description,
    notes: p.notes,
  }),
});

/** Rθjc of a package model: the sum of its resistances. */
function thermalTotal(thermal: Record<string, unknown>): number | null {
  if (thermal.kind === 'lumped') return thermal.rthKPerW as number;
  const list = (thermal.terms ?? thermal.stages) as { rKPerW: number }[] | undefined;
  return list ? list.reduce((s, t) => s + t.rKPerW, 0) : null;
}

const ZTH_FIELDS: FieldSpec[] = [
  { field: 'timeS', label: 'Time', kind: 'quantity', unit: 'time', defaultUnit: 's', units: ['s', 'ms', 'us', 'µs'], aliases: ['t', 'time_s', 'tp', 'pulse'] },
  { field: 'zthKPerW', label: 'Zth', kind: 'quantity', unit: 'thermalResistance', defaultUnit: 'K/W', units: ['K/W', '°C/W', 'C/W'], aliases: ['zth_k_per_w', 'zthjc', 'zθjc', 'z'] },
];

function readMapped(buffer: Buffer, specs: FieldSpec[], given?: ColumnMapping) {
  const table = readCsv(buffer);
  const mapping = given ?? suggestMapping(table.headers, specs);
  const missing = specs.filter((s) => !mapping[s.field]).map((s) => s.label);
  if (missing.length) {
    throw AppError.badRequest(`Name the columns for ${missing.join(' and ')}: the header has ${table.headers.join(', ')}`, missing.map((m) => ({ path: 'mapping', message: `no column for ${m}` })));
  }
  const { records, errors } = mapRows(table, specs, mapping);
  if (errors.length) {
    throw new AppError(400, 'import_failed', `${errors.length} cell(s) could not be read; the first at row ${errors[0].row}, column "${errors[0].column}": ${errors[0].message}`, errors.map((e) => ({ ...e, path: `row ${e.row}, ${e.column}` })));
  }
  return records;
}

/** Zth(t) points from a CSV (time and Zth columns, units in the header or the mapping), fitted to a Foster set. */
export function fitZthCsv(buffer: Buffer, mapping?: ColumnMapping, perDecade?: number) {
  const records = readMapped(buffer, ZTH_FIELDS, mapping);
  const points = records.map(({ line, record }) => {
    if (record.timeS === undefined || record.zthKPerW === undefined) {
      throw AppError.badRequest(`row ${line}: time and Zth are both needed`, [{ path: `row ${line}`, message: 'time and Zth are both needed' }]);
    }
    return { timeS: record.timeS as number, zthKPerW: record.zthKPerW as number };
  });
  try {
    return { points, fit: fitFoster(points, { perDecade }) };
  } catch (err) {
    if (err instanceof RangeError) throw AppError.badRequest(err.message, [{ path: err.message.split(':')[0], message: err.message }]);
    throw err;
  }
}

const SOA_FIELDS: FieldSpec[] = [
  { field: 'vceV', label: 'Vce', kind: 'quantity', unit: 'voltage', defaultUnit: 'V', units: ['V', 'mV'], aliases: ['vds', 'vce_v', 'voltage', 'v'] },
  { field: 'icA', label: 'Ic', kind: 'quantity', unit: 'current', defaultUnit: 'A', units: ['A', 'mA'], aliases: ['id', 'ic_a', 'current', 'i'] },
  { field: 'pulse', label: 'Pulse', kind: 'text', aliases: ['tp', 'pulse_s', 'width', 'duration'] },
];

/** SOA boundary points from a CSV, grouped into one curve per pulse width ("dc" or a time such as 1ms). */
export function soaCurvesCsv(buffer: Buffer, mapping?: ColumnMapping) {
  const table = readCsv(buffer);
  const m = mapping ?? suggestMapping(table.headers, SOA_FIELDS);
  const records = readMapped(buffer, SOA_FIELDS.filter((s) => s.field !== 'pulse' || m.pulse), m);
  const curves = new Map<number | 'dc', { vceV: number; icA: number }[]>();
  for (const { line, record } of records) {
    const raw = String(record.pulse ?? 'dc').trim();
    let pulse: number | 'dc';
    if (/^dc$/i.test(raw)) pulse = 'dc';
    else {
      const q = parseQuantity(raw, 'time');
      if (!q.ok || q.value <= 0) throw AppError.badRequest(`row ${line}: pulse "${raw}" is neither dc nor a time`, [{ path: `row ${line}, ${m.pulse?.column ?? 'pulse'}`, message: `"${raw}" is neither dc nor a time` }]);
      pulse = q.value;
    }
    if (!curves.has(pulse)) curves.set(pulse, []);
    curves.get(pulse)!.push({ vceV: record.vceV as number, icA: record.icA as number });
  }
  return [...curves.entries()].map(([pulseS, points]) => ({ pulseS, points: points.sort((a, b) => a.vceV - b.vceV) }));
}
