import { checkAirPoints, type AirPoint } from './forced-air';
import { checkArray, checkInteger, checkNonNegative, checkObject, checkPositive, checkRange, checkString } from './check';
import { checkMaterial, SINK_MATERIALS, type SinkMaterial } from './materials';
import { LAMINAR_EXPONENT } from './natural-convection';

/** Still-air rating of a sink: Rθsa at a stated rise, scaling as (ΔTref/ΔT)^exponent. */
export type NaturalRating = { rthKPerW: number; referenceRiseK: number; exponent?: number };

/**
 * A sink offered to the ranking. The heat capacity is capacityJPerK, else massKg × cp of
 * material, else 0 (no thermal mass: steady behaviour). volumeM3, massKg and price are the
 * sort keys; devicesPerSink, when given, is how many parts it can carry.
 */
export type SinkCandidate = {
  id: string;
  name?: string;
  natural?: NaturalRating;
  forcedAir?: AirPoint[];
  capacityJPerK?: number;
  massKg?: number;
  material?: SinkMaterial;
  volumeM3?: number;
  price?: number;
  devicesPerSink?: number;
};

/** A candidate with its checks done and its heat capacity resolved. */
export type CheckedCandidate = {
  id: string;
  name?: string;
  natural?: Required<NaturalRating>;
  /** Whether the natural rating gave its exponent (else the laminar 1/4 was filled in). */
  exponentGiven?: boolean;
  forcedAir?: AirPoint[];
  capacityJPerK: number;
  /** How the capacity was found. */
  capacitySource: 'given' | 'mass' | 'none';
  massKg?: number;
  volumeM3?: number;
  price?: number;
  devicesPerSink?: number;
};

export function checkCandidate(value: unknown, path: string): CheckedCandidate {
  const c = checkObject(value, path);
  const out: CheckedCandidate = { id: checkString(c.id, `${path}.id`), capacityJPerK: 0, capacitySource: 'none' };
  if (c.name !== undefined) out.name = checkString(c.name, `${path}.name`);
  if (c.natural !== undefined) {
    const p = `${path}.natural`;
    const n = checkObject(c.natural, p);
    out.natural = {
      rthKPerW: checkPositive(n.rthKPerW, `${p}.rthKPerW`),
      referenceRiseK: checkPositive(n.referenceRiseK, `${p}.referenceRiseK`),
      exponent: n.exponent === undefined ? LAMINAR_EXPONENT : checkRange(n.exponent, `${p}.exponent`, 0, 1),
    };
    out.exponentGiven = n.exponent !== undefined;
  }
  if (c.forcedAir !== undefined) out.forcedAir = checkAirPoints(c.forcedAir, `${path}.forcedAir`);
  if (!out.natural && !out.forcedAir) throw new TypeError(`${path}: needs a natural rating, forced-air points, or both`);
  if (c.massKg !== undefined) out.massKg = checkNonNegative(c.massKg, `${path}.massKg`);
  const material = c.material === undefined ? undefined : checkMaterial(c.material, `${path}.material`);
  if (c.capacityJPerK !== undefined) {
    out.capacityJPerK = checkNonNegative(c.capacityJPerK, `${path}.capacityJPerK`);
    out.capacitySource = 'given';
  } else if (out.massKg !== undefined) {
    if (material === undefined) throw new TypeError(`${path}.material: is required with massKg when capacityJPerK is not given`);
    out.capacityJPerK = out.massKg * SINK_MATERIALS[material].specificHeatJPerKgK;
    out.capacitySource = 'mass';
  }
  if (c.volumeM3 !== undefined) out.volumeM3 = checkNonNegative(c.volumeM3, `${path}.volumeM3`);
  if (c.price !== undefined) out.price = checkNonNegative(c.price, `${path}.price`);
  if (c.devicesPerSink !== undefined) out.devicesPerSink = checkInteger(c.devicesPerSink, `${path}.devicesPerSink`, 1);
  return out;
}

export function checkCandidates(value: unknown, path = 'candidates'): CheckedCandidate[] {
  const list = checkArray(value, path).map((c, i) => checkCandidate(c, `${path}[${i}]`));
  const seen = new Set<string>();
  list.forEach((c, i) => {
    if (seen.has(c.id)) throw new RangeError(`${path}[${i}].id: "${c.id}" is used by an earlier candidate`);
    seen.add(c.id);
  });
  return list;
}
