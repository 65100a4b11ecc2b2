import { checkNonNegative, checkString } from './check';

/**
 * Heatsink materials near room temperature. Copper: pure copper in Incropera & DeWitt,
 * Fundamentals of Heat and Mass Transfer, Table A.1 (ρ 8933 kg/m³, cp 385 J/(kg·K),
 * k 401 W/(m·K); from memory). Aluminium: the same table lists pure aluminium at 2702 kg/m³,
 * 903 J/(kg·K), 237 W/(m·K) (from memory); extrusions are 6063-type alloys, rounded here to
 * 2700 kg/m³ and 900 J/(kg·K) with k ≈ 200 W/(m·K) (from memory, common practice).
 */
export const SINK_MATERIALS = {
  aluminium: { densityKgPerM3: 2700, specificHeatJPerKgK: 900, conductivityWPerMK: 200 },
  copper: { densityKgPerM3: 8933, specificHeatJPerKgK: 385, conductivityWPerMK: 401 },
} as const;

export type SinkMaterial = keyof typeof SINK_MATERIALS;

export const SINK_MATERIAL_NAMES = Object.keys(SINK_MATERIALS) as SinkMaterial[];

export function checkMaterial(value: unknown, path: string): SinkMaterial {
  const name = checkString(value, path);
  if (!(name in SINK_MATERIALS)) throw new RangeError(`${path}: must be one of ${SINK_MATERIAL_NAMES.join(', ')}, got "${name}"`);
  return name as SinkMaterial;
}

/** Heat capacity C = m · cp, J/K. */
export function capacityFromMass(massKg: number, material: SinkMaterial): number {
  checkNonNegative(massKg, 'massKg');
  return massKg * SINK_MATERIALS[checkMaterial(material, 'material')].specificHeatJPerKgK;
}

/** Mass m = ρ · V, kg. */
export function massFromVolume(volumeM3: number, material: SinkMaterial): number {
  checkNonNegative(volumeM3, 'volumeM3');
  return volumeM3 * SINK_MATERIALS[checkMaterial(material, 'material')].densityKgPerM3;
}

/** Heat capacity C = ρ · V · cp, J/K. */
export function capacityFromVolume(volumeM3: number, material: SinkMaterial): number {
  return capacityFromMass(massFromVolume(volumeM3, material), material);
}
