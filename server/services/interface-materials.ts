import { interfaceMaterialSchema } from '../../src/validation/catalogues';
import type { InterfaceMaterial } from '../models';
import { catalogueService } from './catalogue-service';
import type { FieldSpec } from './csv/map-rows';

export type InterfaceMaterialView = ReturnType<typeof view>;

const view = (m: InterfaceMaterial) => ({
  id: m.id,
  teamId: m.teamId,
  name: m.name,
  kind: m.kind,
  packageName: m.packageName,
  rthKPerW: m.rthKPerW,
  conductivityWPerMK: m.conductivityWPerMK,
  thicknessMm: m.thicknessMm,
  contactKCm2PerW: m.contactKCm2PerW,
  notes: m.notes,
  isDemo: m.isDemo,
  updatedAt: m.updatedAt.toISOString(),
});

export const INTERFACE_FIELDS: FieldSpec[] = [
  { field: 'name', label: 'Name', kind: 'text', aliases: ['material'] },
  { field: 'kind', label: 'Kind', kind: 'choice', choices: ['per_package', 'per_area'], aliases: ['type'] },
  { field: 'packageName', label: 'Package', kind: 'text', aliases: ['package_name', 'case'] },
  { field: 'rthKPerW', label: 'Rθcs', kind: 'quantity', unit: 'thermalResistance', defaultUnit: 'K/W', units: ['K/W', '°C/W', 'C/W'], aliases: ['rth', 'rcs', 'rthcs', 'rth_k_per_w'] },
  { field: 'conductivityWPerMK', label: 'Conductivity', kind: 'number', aliases: ['k', 'conductivity_w_per_mk', 'thermalconductivity'] },
  { field: 'thicknessMm', label: 'Thickness', kind: 'quantity', unit: 'length', scale: 1000, defaultUnit: 'mm', units: ['mm', 'um', 'µm'], aliases: ['t', 'thickness_mm'] },
  { field: 'contactKCm2PerW', label: 'Contact resistance', kind: 'number', aliases: ['contact', 'contact_k_cm2_per_w'] },
  { field: 'notes', label: 'Notes', kind: 'text', aliases: ['comment'] },
];

export const interfaceMaterials = catalogueService({
  noun: 'Interface material',
  modelOf: (db) => db.models.InterfaceMaterial,
  schema: interfaceMaterialSchema,
  specs: INTERFACE_FIELDS,
  view: (row) => view(row as InterfaceMaterial),
  exportHeaders: ['name', 'kind', 'package_name', 'rth_k_per_w', 'conductivity_w_per_mk', 'thickness_mm', 'contact_k_cm2_per_w', 'notes'],
  exportRow: (m: InterfaceMaterialView) => ({
    name: m.name,
    kind: m.kind,
    package_name: m.packageName,
    rth_k_per_w: m.rthKPerW,
    conductivity_w_per_mk: m.conductivityWPerMK,
    thickness_mm: m.thicknessMm,
    contact_k_cm2_per_w: m.contactKCm2PerW,
    notes: m.notes,
  }),
});
