import { checkSoaModel, type SoaModel } from '../soa';
import { asArray, asObject, fieldPath, onlyKeys, rangeFail, readString, type Obj } from './field-reader';

const COMMON = ['kind', 'transistor', 'tjMaxC', 'zthJc', 'linearMode', 'notes'];
const PARAMETER_KEYS = [...COMMON, 'icMaxA', 'icPulseMaxA', 'vceoV', 'rthJcKPerW', 'secondBreakdown'];
const POINT_KEYS = [...COMMON, 'curves', 'secondBreakdownDerating'];

function eachItem(obj: Obj, key: string, path: string, keys: string[], visit?: (item: Obj, p: string) => void): void {
  if (obj[key] === undefined) return;
  const listPath = fieldPath(path, key);
  asArray(obj[key], listPath).forEach((raw, i) => {
    const p = fieldPath(listPath, i);
    const item = asObject(raw, p);
    onlyKeys(item, keys, p);
    visit?.(item, p);
  });
}

function derating(value: unknown, path: string): void {
  const d = asObject(value, path);
  const kind = readString(d, 'kind', path);
  if (kind === 'linear') onlyKeys(d, ['kind', 'fractionPerK'], path);
  else if (kind === 'points') {
    onlyKeys(d, ['kind', 'points'], path);
    eachItem(d, 'points', path, ['caseC', 'factor']);
  } else rangeFail(fieldPath(path, 'kind'), `must be "linear" or "points", got ${JSON.stringify(kind)}`);
}

/** Refuses fields the SOA model does not have, so a misspelt optional one is not ignored. */
function checkKeys(m: Obj, path: string): void {
  const kind = readString(m, 'kind', path);
  if (kind !== 'parameters' && kind !== 'points') rangeFail(fieldPath(path, 'kind'), `must be "parameters" or "points", got ${JSON.stringify(kind)}`);
  onlyKeys(m, kind === 'parameters' ? PARAMETER_KEYS : POINT_KEYS, path);
  if (m.zthJc !== undefined) {
    const zPath = fieldPath(path, 'zthJc');
    // JSON holds Zθjc as Foster terms; the SOA core also takes a function, which a file cannot.
    asArray(m.zthJc, zPath, 1);
    eachItem(m, 'zthJc', path, ['rKPerW', 'tauS']);
  }
  if (m.linearMode !== undefined) onlyKeys(asObject(m.linearMode, fieldPath(path, 'linearMode')), ['dcRated', 'longestRatedPulseS'], fieldPath(path, 'linearMode'));
  if (m.secondBreakdown !== undefined) {
    const p = fieldPath(path, 'secondBreakdown');
    const sb = asObject(m.secondBreakdown, p);
    onlyKeys(sb, ['referenceVceV', 'referenceIcA', 'exponent', 'derating', 'pulses'], p);
    derating(sb.derating, fieldPath(p, 'derating'));
    eachItem(sb, 'pulses', p, ['pulseS', 'referenceIcA']);
  }
  eachItem(m, 'curves', path, ['pulseS', 'points'], (curve, p) => eachItem(curve, 'points', p, ['vceV', 'icA']));
  if (m.secondBreakdownDerating !== undefined) derating(m.secondBreakdownDerating, fieldPath(path, 'secondBreakdownDerating'));
}

/**
 * Reads `devices[i].soa`: the SOA core's model as JSON (Zθjc as Foster terms), checked by
 * `checkSoaModel` so errors name the field (`devices[0].soa.icMaxA: must be > 0, got -1`).
 */
export function parseSoa(value: unknown, path: string): SoaModel {
  const obj = asObject(value, path);
  checkKeys(obj, path);
  // A plain copy: the document keeps no reference into the caller's object.
  const { notes: _notes, ...model } = JSON.parse(JSON.stringify(obj)) as SoaModel & { notes?: string };
  return checkSoaModel(model, path);
}
