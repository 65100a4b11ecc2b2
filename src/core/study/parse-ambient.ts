import type { Ambient, Enclosure } from './types';
import { asArray, asObject, fieldPath, onlyKeys, rangeFail, readNumber, readOptionalNumber, readOptionalString, typeFail } from './field-reader';

const CELSIUS = { min: -273.15, exclusive: true, unit: '°C' };

/** Reads `ambient`: `{ temperatureC }` or `{ profile: [{ timeS, temperatureC }], interpolation }`. */
export function parseAmbient(value: unknown, path: string): Ambient {
  const obj = asObject(value, path);
  onlyKeys(obj, ['temperatureC', 'profile', 'interpolation'], path);
  if (obj.profile === undefined) {
    if (obj.interpolation !== undefined) typeFail(fieldPath(path, 'interpolation'), 'only used with profile');
    return { kind: 'constant', temperatureC: readNumber(obj, 'temperatureC', path, CELSIUS) };
  }
  if (obj.temperatureC !== undefined) typeFail(fieldPath(path, 'temperatureC'), 'give either temperatureC or profile, not both');
  const interpolation = readOptionalString(obj, 'interpolation', path) ?? 'step';
  if (interpolation !== 'step' && interpolation !== 'linear') {
    rangeFail(fieldPath(path, 'interpolation'), `must be "step" or "linear", got ${JSON.stringify(interpolation)}`);
  }
  const profilePath = fieldPath(path, 'profile');
  const points = asArray(obj.profile, profilePath, 1).map((item, i) => {
    const p = fieldPath(profilePath, i);
    const point = asObject(item, p);
    onlyKeys(point, ['timeS', 'temperatureC'], p);
    return { timeS: readNumber(point, 'timeS', p, { min: 0, unit: 's' }), temperatureC: readNumber(point, 'temperatureC', p, CELSIUS) };
  });
  for (let i = 1; i < points.length; i++) {
    if (points[i].timeS <= points[i - 1].timeS) {
      rangeFail(fieldPath(fieldPath(profilePath, i), 'timeS'), `must be after the previous point's ${points[i - 1].timeS} s`);
    }
  }
  return { kind: 'profile', interpolation, points };
}

/** Reads `enclosure`: the air inside a case, between the sinks and the room. */
export function parseEnclosure(value: unknown, path: string): Enclosure {
  const obj = asObject(value, path);
  onlyKeys(obj, ['rthKPerW', 'capacityJPerK', 'notes'], path);
  readOptionalString(obj, 'notes', path);
  return {
    rthKPerW: readNumber(obj, 'rthKPerW', path, { min: 0, exclusive: true, unit: 'K/W' }),
    capacityJPerK: readOptionalNumber(obj, 'capacityJPerK', path, { min: 0, unit: 'J/K' }) ?? 0,
  };
}
