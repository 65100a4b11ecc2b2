import { checkCondition, lowestLimit } from './allowed-current';
import { checkNumber } from './check';
import { checkSoaModel } from './check-model';
import { LINEAR_MODE_MESSAGE, needsLinearModeWarning } from './linear-mode';
import { pulseFor } from './pulse-for';
import { parameterAllowed } from './parameter-pieces';
import { soaPieces } from './soa-pieces';
import type { AllowedCurrent, PulseWidth, SoaCheck, SoaCondition, SoaLimit, SoaModel, SoaOperatingPoint, SoaWarning, SoaWorstPoint } from './types';

const finiteAtLeast = (v: unknown, min: number) => typeof v === 'number' && Number.isFinite(v) && v >= min;

/**
 * The point's pulse width, after the argument checks; their messages (and the field path
 * they name) are built only for a point that fails them.
 */
function checkedPulse(model: SoaModel, p: SoaOperatingPoint, k: number): PulseWidth {
  if (finiteAtLeast(p.timeS, -Infinity) && finiteAtLeast(p.durationS, 0) && finiteAtLeast(p.vceV, 0) && finiteAtLeast(p.icA, 0) && finiteAtLeast(p.caseC, -Infinity)) {
    return pulseFor(model, p.durationS);
  }
  const path = `points[${k}]`;
  checkNumber(p.timeS, `${path}.timeS`);
  checkNumber(p.durationS, `${path}.durationS`, 0);
  checkNumber(p.vceV, `${path}.vceV`, 0);
  checkNumber(p.icA, `${path}.icA`, 0);
  const pulse = pulseFor(model, p.durationS);
  checkCondition({ caseC: p.caseC, pulseS: pulse === 0 ? Number.MIN_VALUE : pulse }, path);
  return pulse;
}

/** The allowed current at a point (a parametric model without building its pieces: this runs per point). */
function allowedAt(model: SoaModel, cond: SoaCondition, vceV: number): AllowedCurrent {
  if (model.kind === 'parameters') return parameterAllowed(model, cond, vceV);
  const { pieces, vceMaxV } = soaPieces(model, cond);
  return lowestLimit(pieces, vceMaxV, vceV);
}

/**
 * Checks every operating point against the SOA at its own case temperature and duration
 * (PHYSICS.md §4): margin Iallowed / Ic per point, the worst point and when it happens,
 * pass when every margin is at least 1. A stretch is a single pulse from the case
 * temperature it starts at; heat left from earlier stretches is in that case temperature.
 */
export function checkOperatingPoints(model: SoaModel, points: readonly SoaOperatingPoint[]): SoaCheck {
  checkSoaModel(model);
  if (!Array.isArray(points)) throw new TypeError('points: expected an array of operating points');
  const n = points.length;
  const allowedA = new Float64Array(n);
  const margin = new Float64Array(n);
  const limits: SoaLimit[] = new Array(n);
  const pulses: PulseWidth[] = new Array(n);
  let worst = -1;
  let failedCount = 0;
  let linear: SoaWarning | null = null;
  for (let k = 0; k < n; k++) {
    const p = points[k];
    const pulse = checkedPulse(model, p, k);
    // A zero-length stretch is a pulse of no width: nothing heats, only the current and voltage limits apply.
    const cond = { caseC: p.caseC, pulseS: pulse === 0 ? Number.MIN_VALUE : pulse };
    const a = allowedAt(model, cond, p.vceV);
    allowedA[k] = a.currentA;
    limits[k] = a.limit;
    pulses[k] = pulse;
    margin[k] = p.icA > 0 ? a.currentA / p.icA : Infinity;
    if (margin[k] < 1) failedCount++;
    if (worst < 0 || margin[k] < margin[worst] || (margin[k] === margin[worst] && p.timeS < points[worst].timeS)) worst = k;
    if (p.icA > 0 && needsLinearModeWarning(model, pulse, p.durationS)) {
      if (!linear) linear = { code: 'mosfet-linear-mode', message: LINEAR_MODE_MESSAGE, count: 0, firstIndex: k, firstTimeS: p.timeS };
      linear.count++;
      if (p.timeS < linear.firstTimeS) Object.assign(linear, { firstIndex: k, firstTimeS: p.timeS });
    }
  }
  const worstPoint: SoaWorstPoint | null =
    worst < 0
      ? null
      : { ...points[worst], index: worst, pulseS: pulses[worst], allowedA: allowedA[worst], margin: margin[worst], limit: limits[worst] };
  return { allowedA, margin, limits, pulses, worst: worstPoint, failedCount, passed: failedCount === 0, warnings: linear ? [linear] : [] };
}

/** An operating point from the drive of n identical parts sharing the load: Vce = Vin − Vout, Ic = Iload / n. */
export function operatingPointFromDrive(d: {
  timeS: number;
  durationS: number;
  vinV: number;
  voutV: number;
  iloadA: number;
  parts: number;
  caseC: number;
}): SoaOperatingPoint {
  checkNumber(d.parts, 'parts', 1);
  if (!Number.isInteger(d.parts)) throw new RangeError(`parts: must be a whole number, got ${d.parts}`);
  const vce = d.vinV - d.voutV;
  if (vce < 0) throw new RangeError(`voutV: lies above vinV (${d.voutV} V > ${d.vinV} V); a pass element cannot raise its output`);
  return { timeS: d.timeS, durationS: d.durationS, vceV: vce, icA: d.iloadA / d.parts, caseC: d.caseC };
}
