import type { ElectricalModel } from './types';
import { asObject, fieldPath, onlyKeys, rangeFail, readNumber, readOptionalNumber, readOptionalString } from './field-reader';
import { parseCurve } from './parse-curve';
import { ADJUSTABLE_VREF_V } from '../rails';

/** Reads `devices[i].electrical`: quiescent current, dropout, current limit, thermal shutdown, adjustable divider. */
export function parseElectrical(value: unknown, path: string): ElectricalModel {
  const obj = asObject(value, path);
  onlyKeys(obj, ['role', 'iqA', 'dropout', 'currentLimit', 'thermalShutdown', 'adjustable'], path);
  const role = readOptionalString(obj, 'role', path) ?? 'pass';
  if (role !== 'pass' && role !== 'other') rangeFail(fieldPath(path, 'role'), `must be "pass" or "other", got ${JSON.stringify(role)}`);
  const model: ElectricalModel = { role, iqA: readOptionalNumber(obj, 'iqA', path, { min: 0, unit: 'A' }) ?? 0 };
  if (obj.dropout !== undefined) {
    model.dropout = parseCurve(
      obj.dropout,
      fieldPath(path, 'dropout'),
      { key: 'currentA', min: 0, unit: 'A' },
      { key: 'voltageV', min: 0, unit: 'V' },
    );
  }
  if (obj.currentLimit !== undefined) {
    model.currentLimit = parseCurve(
      obj.currentLimit,
      fieldPath(path, 'currentLimit'),
      { key: 'differentialV', min: 0, unit: 'V' },
      { key: 'currentA', min: 0, exclusive: true, unit: 'A' },
    );
  }
  if (obj.thermalShutdown !== undefined) {
    const p = fieldPath(path, 'thermalShutdown');
    const sd = asObject(obj.thermalShutdown, p);
    onlyKeys(sd, ['tripC', 'hysteresisK'], p);
    model.thermalShutdown = {
      tripC: readNumber(sd, 'tripC', p, { min: -273.15, exclusive: true, unit: '°C' }),
      hysteresisK: readNumber(sd, 'hysteresisK', p, { min: 0, exclusive: true, unit: 'K' }),
    };
  }
  if (obj.adjustable !== undefined) {
    const p = fieldPath(path, 'adjustable');
    const adj = asObject(obj.adjustable, p);
    onlyKeys(adj, ['vrefV', 'r1Ohm', 'r2Ohm', 'iadjA'], p);
    model.adjustable = {
      vrefV: readOptionalNumber(adj, 'vrefV', p, { min: 0, exclusive: true, unit: 'V' }) ?? ADJUSTABLE_VREF_V,
      r1Ohm: readNumber(adj, 'r1Ohm', p, { min: 0, exclusive: true, unit: 'Ω' }),
      r2Ohm: readNumber(adj, 'r2Ohm', p, { min: 0, unit: 'Ω' }),
      iadjA: readOptionalNumber(adj, 'iadjA', p, { min: 0, unit: 'A' }) ?? 0,
    };
  }
  return model;
}
