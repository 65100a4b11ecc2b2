import { heatsinkSchema } from '../../src/validation/catalogues';
import type { Heatsink } from '../models';
import { catalogueService } from './catalogue-service';
import type { FieldSpec } from './csv/map-rows';

export type HeatsinkView = ReturnType<typeof view>;

const view = (h: Heatsink) => ({
  id: h.id,
  teamId: h.teamId,
  name: h.name,
  description: h.description,
  rthKPerW: h.rthKPerW,
  referenceRiseK: h.referenceRiseK,
  /** n of Rθsa(ΔT) = Rθsa,ref (ΔTref/ΔT)^n; null is the laminar default, 1/4. */
  convectionExponent: h.convectionExponent ?? null,
  forcedAir: h.forcedAir,
  massKg: h.massKg,
  material: h.material,
  capacityJPerK: h.capacityJPerK,
  widthMm: h.widthMm,
  lengthMm: h.lengthMm,
  heightMm: h.heightMm,
  devicesPerSink: h.devicesPerSink,
  price: h.price,
  notes: h.notes,
  isDemo: h.isDemo,
  updatedAt: h.updatedAt.toISOString(),
});

const mm = { kind: 'quantity' as const, unit: 'length' as const, scale: 1000, defaultUnit: 'mm', units: ['mm', 'cm', 'm'] };

export const HEATSINK_FIELDS: FieldSpec[] = [
  { field: 'name', label: 'Name', kind: 'text', aliases: ['part', 'model', 'partnumber', 'type'] },
  { field: 'description', label: 'Description', kind: 'text', aliases: ['desc'] },
  { field: 'rthKPerW', label: 'Rθsa', kind: 'quantity', unit: 'thermalResistance', defaultUnit: 'K/W', units: ['K/W', '°C/W', 'C/W'], aliases: ['rth', 'rsa', 'rthsa', 'θsa', 'thermalresistance', 'rth_k_per_w'] },
  { field: 'referenceRiseK', label: 'Reference rise', kind: 'quantity', unit: 'temperatureDifference', defaultUnit: 'K', units: ['K', '°C'], aliases: ['rise', 'deltat', 'dt', 'reference_rise_k'] },
  { field: 'convectionExponent', label: 'Convection exponent', kind: 'number', aliases: ['n', 'exponent', 'convection_exponent', 'naturalconvectionexponent'] },
  { field: 'massKg', label: 'Mass', kind: 'quantity', unit: 'mass', defaultUnit: 'g', units: ['g', 'kg'], aliases: ['weight', 'mass_kg'] },
  { field: 'material', label: 'Material', kind: 'choice', choices: ['aluminium', 'copper'], aliases: ['alloy'] },
  { field: 'capacityJPerK', label: 'Heat capacity', kind: 'quantity', unit: 'heatCapacity', defaultUnit: 'J/K', units: ['J/K', 'kJ/K'], aliases: ['capacity', 'cth', 'capacity_j_per_k'] },
  { field: 'widthMm', label: 'Width', ...mm, aliases: ['w', 'width_mm'] },
  { field: 'lengthMm', label: 'Length', ...mm, aliases: ['l', 'length_mm'] },
  { field: 'heightMm', label: 'Height', ...mm, aliases: ['h', 'height_mm', 'finheight'] },
  { field: 'devicesPerSink', label: 'Devices per sink', kind: 'integer', aliases: ['devices', 'positions', 'devices_per_sink'] },
  { field: 'price', label: 'Price', kind: 'number', aliases: ['cost', 'unitprice'] },
  { field: 'notes', label: 'Notes', kind: 'text', aliases: ['comment', 'remarks'] },
];

/** Columns named like `rth_k_per_w_at_2_m_s` (our export) or mapped by hand carry forced-air points. */
const FORCED_AIR_HEADER = /^rth_k_per_w_at_(\d+(?:\.\d+)?)_m_s$/;

export const heatsinks = catalogueService({
  noun: 'Heatsink',
  modelOf: (db) => db.models.Heatsink,
  schema: heatsinkSchema,
  specs: HEATSINK_FIELDS,
  extraFromRow: (cell, mapping) => {
    const columns = (mapping.forcedAir as { column: string; airSpeedMPerS: number }[] | undefined) ?? [];
    const errors: { column: string; message: string }[] = [];
    const forcedAir = [];
    for (const c of columns) {
      const raw = cell(c.column);
      if (raw === undefined) {
        errors.push({ column: c.column, message: `the file has no column "${c.column}"` });
        continue;
      }
      if (raw === '') continue;
      const v = Number(raw.replace(',', '.').replace(/\s*(K|°C|C)\/W$/, ''));
      if (!Number.isFinite(v)) errors.push({ column: c.column, message: `"${raw}" is not a thermal resistance` });
      else forcedAir.push({ airSpeedMPerS: c.airSpeedMPerS, rthKPerW: v });
    }
    return { value: columns.length ? { forcedAir } : {}, errors };
  },
  suggestExtra: (headers) => {
    const forcedAir = suggestForcedAir(headers);
    return forcedAir.length ? { forcedAir } : {};
  },
  view: (row) => view(row as Heatsink),
  exportHeaders: ['name', 'description', 'rth_k_per_w', 'reference_rise_k', 'convection_exponent', 'mass_kg', 'material', 'capacity_j_per_k', 'width_mm', 'length_mm', 'height_mm', 'devices_per_sink', 'price', 'notes'],
  exportRow: (h: HeatsinkView) => ({
    name: h.name,
    description: h.description,
    rth_k_per_w: h.rthKPerW,
    reference_rise_k: h.referenceRiseK,
    convection_exponent: h.convectionExponent,
    mass_kg: h.massKg,
    material: h.material,
    capacity_j_per_k: h.capacityJPerK,
    width_mm: h.widthMm,
    length_mm: h.lengthMm,
    height_mm: h.heightMm,
    devices_per_sink: h.devicesPerSink,
    price: h.price,
    notes: h.notes,
    ...Object.fromEntries(h.forcedAir.map((p) => [`rth_k_per_w_at_${p.airSpeedMPerS}_m_s`, p.rthKPerW])),
  }),
});

/** Forced-air columns the export writes, for the mapping step's suggestion. */
export function suggestForcedAir(headers: string[]) {
  return headers.flatMap((column) => {
    const m = FORCED_AIR_HEADER.exec(column);
    return m ? [{ column, airSpeedMPerS: Number(m[1]) }] : [];
  });
}
