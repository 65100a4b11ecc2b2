import {
  checkPlateFin,
  plateFinCandidate,
  plateFinForced,
  plateFinNaturalAtPower,
  plateFinNaturalAtRise,
  scanFinCount,
  SINK_MATERIALS,
  type FinCountScan,
  type PlateFinForced,
  type PlateFinGeometry,
  type PlateFinNatural,
  type SinkMaterial,
} from '@/core/heatsink';

import { readFields, readSpeeds, type FieldSpec } from './geometry-fields';

export type PlateFinKey = 'baseWidth' | 'length' | 'baseThickness' | 'finCount' | 'finHeight' | 'finThickness' | 'emissivity';
export type ConditionKey = 'level' | 'ambient';

export const PLATE_FIN_FIELDS: Record<PlateFinKey, FieldSpec> = {
  baseWidth: { label: 'Base width', unit: 'mm', read: 'length-mm', above: 0 },
  length: { label: 'Length (along the fins)', unit: 'mm', read: 'length-mm', above: 0 },
  baseThickness: { label: 'Base thickness', unit: 'mm', read: 'length-mm', above: 0 },
  finCount: { label: 'Fin count', unit: '', read: 'integer', min: 2 },
  finHeight: { label: 'Fin height', unit: 'mm', read: 'length-mm', above: 0 },
  finThickness: { label: 'Fin thickness', unit: 'mm', read: 'length-mm', above: 0 },
  emissivity: { label: 'Emissivity', unit: '', read: 'number', min: 0, max: 1 },
};

/** Natural convection at a power (W) or at a rise (K), in an ambient (°C). */
export type NaturalCondition = { by: 'power' | 'rise'; levelText: string; ambientText: string; speedsText: string };

export const conditionFields = (by: NaturalCondition['by']): Record<ConditionKey, FieldSpec> => ({
  level: by === 'power' ? { label: 'Power', unit: 'W', read: 'power', above: 0 } : { label: 'Rise above ambient', unit: 'K', read: 'temperatureDifference', above: 0 },
  ambient: { label: 'Ambient', unit: '°C', read: 'temperature', above: -273.15 },
});

/** An invented starting extrusion (demo values, not a product): 100 × 75 mm, 10 fins 25 mm tall. */
export const DEMO_PLATE_FIN: Record<PlateFinKey, string> = {
  baseWidth: '100',
  length: '75',
  baseThickness: '5',
  finCount: '10',
  finHeight: '25',
  finThickness: '2',
  emissivity: '0.85',
};
export const DEMO_PLATE_FIN_MATERIAL: SinkMaterial = 'aluminium';

export const DEMO_CONDITION: NaturalCondition = { by: 'power', levelText: '20', ambientText: '25', speedsText: '1, 2, 4' };

export type PlateFinEstimate = {
  geometry: PlateFinGeometry;
  natural: PlateFinNatural;
  powerW: number;
  forced: PlateFinForced[];
  /** null when the width holds more fins than are worth scanning. */
  scan: FinCountScan | null;
  massKg: number;
  capacityJPerK: number;
  envelopeVolumeM3: number;
};

export type EstimateOutcome<T> = { ok: true; estimate: T } | { ok: false; errors: Record<string, string> };

/** Scans stop here: beyond it the fins are foil and the table says nothing new. */
const MAX_SCANNED_FINS = 300;

/** Labels for the paths the core names in its messages. */
const CORE_PATHS: Record<string, string> = {
  'geometry.baseWidthM': 'Base width',
  'geometry.lengthM': 'Length',
  'geometry.baseThicknessM': 'Base thickness',
  'geometry.finCount': 'Fin count',
  'geometry.finHeightM': 'Fin height',
  'geometry.finThicknessM': 'Fin thickness',
  'geometry.emissivity': 'Emissivity',
  'geometry.heightM': 'Height',
  'geometry.widthM': 'Width',
  'geometry.thicknessM': 'Thickness',
  powerW: 'Power',
  riseK: 'Rise',
};

/** A core error with its path put in the form's words ("geometry.finCount: …" → "Fin count: …"). */
export function coreMessage(error: unknown): { field: string; message: string } {
  const text = error instanceof Error ? error.message : String(error);
  const cut = text.indexOf(': ');
  const path = cut > 0 ? text.slice(0, cut) : '';
  const label = CORE_PATHS[path];
  return label ? { field: path.replace(/^geometry\./, ''), message: `${label}: ${text.slice(cut + 2)}` } : { field: 'form', message: text };
}

/**
 * Every figure of the plate-fin design at once, from the form's text: still-air Rθsa at the
 * power or rise asked, forced-air Rθsa at each speed, heat capacity and the fin-count scan at
 * the same rise. Bad input answers the fields at fault.
 */
export function estimatePlateFin(texts: Record<PlateFinKey, string>, material: SinkMaterial, condition: NaturalCondition): EstimateOutcome<PlateFinEstimate> {
  const shape = readFields(texts, PLATE_FIN_FIELDS);
  const cond = readFields({ level: condition.levelText, ambient: condition.ambientText }, conditionFields(condition.by));
  const speeds = readSpeeds(condition.speedsText);
  const errors: Record<string, string> = { ...shape.errors, ...cond.errors };
  if (!speeds.ok) errors.speeds = speeds.message;
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  const v = shape.values as Record<PlateFinKey, number>;
  const shapeOnly: Omit<PlateFinGeometry, 'finCount'> = {
    baseWidthM: v.baseWidth,
    lengthM: v.length,
    baseThicknessM: v.baseThickness,
    finHeightM: v.finHeight,
    finThicknessM: v.finThickness,
    material,
    emissivity: v.emissivity,
  };
  const geometry: PlateFinGeometry = { ...shapeOnly, finCount: v.finCount };
  const options = { ambientC: cond.values.ambient! };
  try {
    const checked = checkPlateFin(geometry);
    const level = cond.values.level!;
    const natural = condition.by === 'power' ? plateFinNaturalAtPower(geometry, level, options) : plateFinNaturalAtRise(geometry, level, options);
    const powerW = natural.riseK / natural.rsaKPerW;
    const forced = speeds.ok ? speeds.value.map((s) => plateFinForced(geometry, s, natural.riseK, options)) : [];
    const fits = Math.floor(checked.baseWidthM / checked.finThicknessM);
    const scan = fits <= MAX_SCANNED_FINS ? scanFinCount(shapeOnly, natural.riseK, options) : null;
    const massKg = checked.metalVolumeM3 * SINK_MATERIALS[material].densityKgPerM3;
    return {
      ok: true,
      estimate: {
        geometry,
        natural,
        powerW,
        forced,
        scan,
        massKg,
        capacityJPerK: massKg * SINK_MATERIALS[material].specificHeatJPerKgK,
        envelopeVolumeM3: checked.envelopeVolumeM3,
      },
    };
  } catch (error) {
    if (!(error instanceof RangeError || error instanceof TypeError)) throw error;
    const { field, message } = coreMessage(error);
    return { ok: false, errors: { [field]: message } };
  }
}

/** The catalogue rating of an estimate: Rθsa at the reference rise with the model's own exponent, forced-air points, mass and heat capacity. */
export function plateFinRating(estimate: PlateFinEstimate, referenceRiseK: number) {
  const speeds = estimate.forced.map((f) => f.airSpeedMPerS);
  return plateFinCandidate(estimate.geometry, { id: 'custom', referenceRiseK, airSpeedsMPerS: speeds, ambientC: estimate.natural.ambientC });
}
