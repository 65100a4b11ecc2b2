import { checkNumber, checkPulse } from './check';
import { SOA_REFERENCE_CASE_C, SOA_SAME_VCE_REL_TOL } from './constants';
import type { Derating, SoaModel, SoaParameters, SoaPoints, ZthJc } from './types';

const KINDS = ['bipolar', 'darlington', 'mosfet'];

/** Throws a RangeError / TypeError naming the field at fault; returns the model unchanged. */
export function checkSoaModel(model: SoaModel, path = 'model'): SoaModel {
  if (model == null || typeof model !== 'object') throw new TypeError(`${path}: expected an SOA model`);
  if (!KINDS.includes(model.transistor)) {
    throw new RangeError(`${path}.transistor: must be one of ${KINDS.join(', ')}, got ${String(model.transistor)}`);
  }
  checkNumber(model.tjMaxC, `${path}.tjMaxC`);
  if (model.zthJc !== undefined) checkZth(model.zthJc, `${path}.zthJc`);
  if (model.linearMode !== undefined) {
    if (typeof model.linearMode.dcRated !== 'boolean') throw new TypeError(`${path}.linearMode.dcRated: expected true or false`);
    if (model.linearMode.longestRatedPulseS !== undefined) {
      checkNumber(model.linearMode.longestRatedPulseS, `${path}.linearMode.longestRatedPulseS`, 0, true);
    }
  }
  if (model.kind === 'parameters') checkParameters(model, path);
  else if (model.kind === 'points') checkPoints(model, path);
  else throw new RangeError(`${path}.kind: must be "parameters" or "points"`);
  return model;
}

function checkParameters(m: SoaParameters, path: string): void {
  checkNumber(m.icMaxA, `${path}.icMaxA`, 0, true);
  if (m.icPulseMaxA !== undefined) checkNumber(m.icPulseMaxA, `${path}.icPulseMaxA`, 0, true);
  checkNumber(m.vceoV, `${path}.vceoV`, 0, true);
  checkNumber(m.rthJcKPerW, `${path}.rthJcKPerW`, 0, true);
  const sb = m.secondBreakdown;
  if (sb === undefined) return;
  const p = `${path}.secondBreakdown`;
  checkNumber(sb.referenceVceV, `${p}.referenceVceV`, 0, true);
  checkNumber(sb.referenceIcA, `${p}.referenceIcA`, 0, true);
  checkNumber(sb.exponent, `${p}.exponent`, 1, true);
  checkDerating(sb.derating, `${p}.derating`);
  sb.pulses?.forEach((q, i) => {
    checkNumber(q.pulseS, `${p}.pulses[${i}].pulseS`, 0, true);
    checkNumber(q.referenceIcA, `${p}.pulses[${i}].referenceIcA`, 0, true);
  });
}

function checkPoints(m: SoaPoints, path: string): void {
  // The curves are at 25 °C and derate with Tj,max − Tc: a maximum at or below 25 °C cannot be meant.
  checkNumber(m.tjMaxC, `${path}.tjMaxC`, SOA_REFERENCE_CASE_C, true);
  if (!Array.isArray(m.curves) || m.curves.length === 0) throw new RangeError(`${path}.curves: needs at least one curve`);
  const seen = new Set<string>();
  m.curves.forEach((c, i) => {
    const p = `${path}.curves[${i}]`;
    checkPulse(c.pulseS, `${p}.pulseS`);
    const key = String(c.pulseS);
    if (seen.has(key)) throw new RangeError(`${p}.pulseS: a second curve for ${key}`);
    seen.add(key);
    checkCurvePoints(c.points, `${p}.points`);
  });
  if (m.secondBreakdownDerating !== undefined) checkDerating(m.secondBreakdownDerating, `${path}.secondBreakdownDerating`);
}

function checkCurvePoints(points: SoaPoints['curves'][number]['points'], path: string): void {
  if (!Array.isArray(points) || points.length < 2) throw new RangeError(`${path}: needs at least two points`);
  points.forEach((q, j) => {
    checkNumber(q.vceV, `${path}[${j}].vceV`, 0, true);
    checkNumber(q.icA, `${path}[${j}].icA`, 0);
  });
  const last = points.length - 1;
  const vertical = sameVce(points[last].vceV, points[last - 1].vceV);
  const end = vertical ? last - 1 : last;
  if (end < 1) throw new RangeError(`${path}: needs two points before the vertical`);
  for (let j = 0; j <= end; j++) {
    if (!(points[j].icA > 0)) throw new RangeError(`${path}[${j}].icA: must be > 0 (only a closing vertical may reach 0)`);
    if (j === 0) continue;
    if (!(points[j].vceV > points[j - 1].vceV) || sameVce(points[j].vceV, points[j - 1].vceV)) {
      throw new RangeError(`${path}[${j}].vceV: must rise from the point before`);
    }
    if (points[j].icA > points[j - 1].icA) throw new RangeError(`${path}[${j}].icA: must not rise with Vce`);
  }
  if (vertical && points[last].icA > points[last - 1].icA) throw new RangeError(`${path}[${last}].icA: the vertical must go down`);
}

export const sameVce = (a: number, b: number): boolean => Math.abs(a - b) <= SOA_SAME_VCE_REL_TOL * Math.max(a, b);

function checkDerating(d: Derating, path: string): void {
  if (d == null || typeof d !== 'object') throw new TypeError(`${path}: expected a derating`);
  if (d.kind === 'linear') {
    checkNumber(d.fractionPerK, `${path}.fractionPerK`, 0);
    return;
  }
  if (d.kind !== 'points') throw new RangeError(`${path}.kind: must be "linear" or "points"`);
  if (!Array.isArray(d.points) || d.points.length === 0) throw new RangeError(`${path}.points: needs at least one point`);
  d.points.forEach((q, i) => {
    checkNumber(q.caseC, `${path}.points[${i}].caseC`);
    checkNumber(q.factor, `${path}.points[${i}].factor`, 0);
    if (i > 0 && !(q.caseC > d.points[i - 1].caseC)) throw new RangeError(`${path}.points[${i}].caseC: must rise`);
  });
}

function checkZth(z: ZthJc, path: string): void {
  if (Array.isArray(z)) {
    if (z.length === 0) throw new RangeError(`${path}: needs at least one Foster term`);
    z.forEach((t, i) => {
      checkNumber(t.rKPerW, `${path}[${i}].rKPerW`, 0);
      checkNumber(t.tauS, `${path}[${i}].tauS`, 0, true);
    });
    return;
  }
  const f = z as Exclude<ZthJc, readonly unknown[]>;
  if (typeof f.zthKPerW !== 'function') throw new TypeError(`${path}.zthKPerW: expected a function of time`);
  checkNumber(f.largestTauS, `${path}.largestTauS`, 0, true);
}
