import { flatPlateAtPower, flatPlateAtRise, SINK_MATERIALS, type FlatPlateEstimate, type FlatPlateGeometry, type SinkMaterial } from '@/core/heatsink';

import { readFields, type FieldSpec } from './geometry-fields';
import { coreMessage, conditionFields, type EstimateOutcome, type NaturalCondition } from './plate-fin-estimate';

export type FlatPlateKey = 'height' | 'width' | 'thickness' | 'emissivity';

export const FLAT_PLATE_FIELDS: Record<FlatPlateKey, FieldSpec> = {
  height: { label: 'Height (along gravity)', unit: 'mm', read: 'length-mm', above: 0 },
  width: { label: 'Width', unit: 'mm', read: 'length-mm', above: 0 },
  thickness: { label: 'Metal thickness', unit: 'mm', read: 'length-mm', above: 0 },
  emissivity: { label: 'Emissivity', unit: '', read: 'number', min: 0, max: 1 },
};

/** An invented copper pour (demo values): 50 × 40 mm of 1 oz (35 µm) copper under solder mask, both faces shedding. */
export const DEMO_FLAT_PLATE: Record<FlatPlateKey, string> = {
  height: '50',
  width: '40',
  thickness: '35 µm',
  emissivity: '0.9',
};
export const DEMO_FLAT_PLATE_MATERIAL: SinkMaterial = 'copper';

export const DEMO_PLATE_CONDITION: NaturalCondition = { by: 'power', levelText: '2', ambientText: '25', speedsText: '' };

export type FlatPlateDesign = { geometry: FlatPlateGeometry; natural: FlatPlateEstimate; powerW: number; massKg: number };

/** Still-air Rθsa of a vertical plate or copper area at the power or rise asked, with its spreading check. */
export function estimateFlatPlate(texts: Record<FlatPlateKey, string>, material: SinkMaterial, faces: 1 | 2, condition: NaturalCondition): EstimateOutcome<FlatPlateDesign> {
  const shape = readFields(texts, FLAT_PLATE_FIELDS);
  const cond = readFields({ level: condition.levelText, ambient: condition.ambientText }, conditionFields(condition.by));
  const errors: Record<string, string> = { ...shape.errors, ...cond.errors };
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  const v = shape.values as Record<FlatPlateKey, number>;
  const geometry: FlatPlateGeometry = { heightM: v.height, widthM: v.width, thicknessM: v.thickness, material, emissivity: v.emissivity, faces };
  const options = { ambientC: cond.values.ambient! };
  try {
    const level = cond.values.level!;
    const natural = condition.by === 'power' ? flatPlateAtPower(geometry, level, options) : flatPlateAtRise(geometry, level, options);
    const massKg = v.height * v.width * v.thickness * SINK_MATERIALS[material].densityKgPerM3;
    return { ok: true, estimate: { geometry, natural, powerW: natural.riseK / natural.rsaKPerW, massKg } };
  } catch (error) {
    if (!(error instanceof RangeError || error instanceof TypeError)) throw error;
    const { field, message } = coreMessage(error);
    return { ok: false, errors: { [field]: message } };
  }
}
