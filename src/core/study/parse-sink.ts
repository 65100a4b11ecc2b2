import type { ForcedAir, Sink } from './types';
import { asArray, asObject, fieldPath, onlyKeys, rangeFail, readId, readNumber, readOptionalNumber, readOptionalString, typeFail } from './field-reader';
import { SINK_MATERIALS, SPECIFIC_HEAT_J_PER_KG_K, type SinkMaterial } from './materials';
import { interpolateLogLog } from './convection';

const SINK_KEYS = ['id', 'name', 'notes', 'rthKPerW', 'capacityJPerK', 'massKg', 'material', 'to', 'naturalConvection', 'forcedAir'];

/** Natural convection, laminar: h ∝ ΔT^(1/4) (Incropera & DeWitt, ch. 9). */
export const DEFAULT_CONVECTION_EXPONENT = 0.25;

function parseForcedAir(value: unknown, path: string): ForcedAir {
  const obj = asObject(value, path);
  onlyKeys(obj, ['airSpeedMPerS', 'points'], path);
  const airSpeedMPerS = readNumber(obj, 'airSpeedMPerS', path, { min: 0, exclusive: true, unit: 'm/s' });
  const pointsPath = fieldPath(path, 'points');
  const points = asArray(obj.points, pointsPath, 1).map((item, i) => {
    const p = fieldPath(pointsPath, i);
    const point = asObject(item, p);
    onlyKeys(point, ['airSpeedMPerS', 'rthKPerW'], p);
    return {
      airSpeedMPerS: readNumber(point, 'airSpeedMPerS', p, { min: 0, exclusive: true, unit: 'm/s' }),
      rthKPerW: readNumber(point, 'rthKPerW', p, { min: 0, exclusive: true, unit: 'K/W' }),
    };
  });
  for (let i = 1; i < points.length; i++) {
    if (points[i].airSpeedMPerS <= points[i - 1].airSpeedMPerS) {
      rangeFail(fieldPath(fieldPath(pointsPath, i), 'airSpeedMPerS'), 'must be above the previous point (points go in increasing air speed)');
    }
  }
  const lo = points[0].airSpeedMPerS;
  const hi = points[points.length - 1].airSpeedMPerS;
  if (airSpeedMPerS < lo || airSpeedMPerS > hi) {
    rangeFail(fieldPath(path, 'airSpeedMPerS'), `${airSpeedMPerS} m/s lies outside the curve's points (${lo}–${hi} m/s); the curve is not extrapolated`);
  }
  return { airSpeedMPerS, points };
}

function parseCapacity(obj: Record<string, unknown>, path: string): number {
  const capacity = readOptionalNumber(obj, 'capacityJPerK', path, { min: 0, unit: 'J/K' });
  const mass = readOptionalNumber(obj, 'massKg', path, { min: 0, unit: 'kg' });
  const material = readOptionalString(obj, 'material', path);
  if (capacity !== undefined) {
    if (mass !== undefined) typeFail(fieldPath(path, 'massKg'), 'give either capacityJPerK or massKg with material, not both');
    if (material !== undefined) typeFail(fieldPath(path, 'material'), 'only used with massKg; capacityJPerK is already given');
    return capacity;
  }
  if (mass === undefined) {
    if (material !== undefined) typeFail(fieldPath(path, 'massKg'), 'is required with material');
    return 0;
  }
  if (material === undefined) typeFail(fieldPath(path, 'material'), `is required with massKg (one of ${SINK_MATERIALS.join(', ')})`);
  if (!SINK_MATERIALS.includes(material as SinkMaterial)) {
    rangeFail(fieldPath(path, 'material'), `must be one of ${SINK_MATERIALS.join(', ')}, got ${JSON.stringify(material)}`);
  }
  return mass * SPECIFIC_HEAT_J_PER_KG_K[material as SinkMaterial];
}

/** Reads `sinks[i]`; `to` is resolved by the caller, which knows the other sinks. */
export function parseSink(value: unknown, path: string, hasEnclosure: boolean): Sink {
  const obj = asObject(value, path);
  onlyKeys(obj, SINK_KEYS, path);
  readOptionalString(obj, 'notes', path);
  const id = readId(obj, 'id', path);
  const to = obj.to === undefined ? (hasEnclosure ? 'enclosure' : 'ambient') : readId(obj, 'to', path);
  const capacityJPerK = parseCapacity(obj, path);
  const sink: Sink = { id, rthKPerW: 0, capacityJPerK, to };
  const name = readOptionalString(obj, 'name', path);
  if (name !== undefined) sink.name = name;
  if (obj.forcedAir !== undefined) {
    if (obj.rthKPerW !== undefined) typeFail(fieldPath(path, 'rthKPerW'), 'give either rthKPerW or forcedAir, not both (forcedAir sets Rθsa from its curve)');
    if (obj.naturalConvection !== undefined) typeFail(fieldPath(path, 'naturalConvection'), 'cannot be combined with forcedAir');
    sink.forcedAir = parseForcedAir(obj.forcedAir, fieldPath(path, 'forcedAir'));
    sink.rthKPerW = interpolateLogLog(
      sink.forcedAir.points.map((p) => ({ x: p.airSpeedMPerS, y: p.rthKPerW })),
      sink.forcedAir.airSpeedMPerS,
    );
    return sink;
  }
  sink.rthKPerW = readNumber(obj, 'rthKPerW', path, { min: 0, exclusive: true, unit: 'K/W' });
  if (obj.naturalConvection !== undefined) {
    const p = fieldPath(path, 'naturalConvection');
    const nc = asObject(obj.naturalConvection, p);
    onlyKeys(nc, ['referenceRiseK', 'exponent'], p);
    sink.naturalConvection = {
      referenceRiseK: readNumber(nc, 'referenceRiseK', p, { min: 0, exclusive: true, unit: 'K' }),
      exponent: readOptionalNumber(nc, 'exponent', p, { min: 0, max: 1 }) ?? DEFAULT_CONVECTION_EXPONENT,
    };
  }
  return sink;
}
