import type { PackageModel } from './types';
import { asArray, asObject, fieldPath, onlyKeys, readNumber, readOptionalNumber, readString, rangeFail } from './field-reader';

const positive = (unit: string) => ({ min: 0, exclusive: true, unit });

/** Reads `devices[i].package`: a Foster set, a Cauer ladder (junction first) or one lumped Rθjc. */
export function parsePackage(value: unknown, path: string): PackageModel {
  const obj = asObject(value, path);
  const kind = readString(obj, 'kind', path);
  if (kind === 'foster') {
    onlyKeys(obj, ['kind', 'terms'], path);
    const termsPath = fieldPath(path, 'terms');
    const terms = asArray(obj.terms, termsPath, 1).map((item, i) => {
      const p = fieldPath(termsPath, i);
      const term = asObject(item, p);
      onlyKeys(term, ['rKPerW', 'tauS'], p);
      return { rKPerW: readNumber(term, 'rKPerW', p, positive('K/W')), tauS: readNumber(term, 'tauS', p, positive('s')) };
    });
    return { kind, terms };
  }
  if (kind === 'cauer') {
    onlyKeys(obj, ['kind', 'stages'], path);
    const stagesPath = fieldPath(path, 'stages');
    const stages = asArray(obj.stages, stagesPath, 1).map((item, i) => {
      const p = fieldPath(stagesPath, i);
      const stage = asObject(item, p);
      onlyKeys(stage, ['rKPerW', 'capacityJPerK'], p);
      return {
        rKPerW: readNumber(stage, 'rKPerW', p, positive('K/W')),
        capacityJPerK: readNumber(stage, 'capacityJPerK', p, { min: 0, unit: 'J/K' }),
      };
    });
    return { kind, stages };
  }
  if (kind === 'lumped') {
    onlyKeys(obj, ['kind', 'rthKPerW', 'capacityJPerK'], path);
    return {
      kind,
      rthKPerW: readNumber(obj, 'rthKPerW', path, positive('K/W')),
      capacityJPerK: readOptionalNumber(obj, 'capacityJPerK', path, { min: 0, unit: 'J/K' }) ?? 0,
    };
  }
  return rangeFail(fieldPath(path, 'kind'), `must be "foster", "cauer" or "lumped", got ${JSON.stringify(kind)}`);
}
