import { deratingFactor } from './derating';
import type { LogPiece } from './log-piece';
import type { AllowedCurrent, SoaCondition, SoaLimit, SoaParameters } from './types';
import { zthJcAt } from './zth-jc';

/**
 * The limits of a parametric SOA as straight lines in (ln Vce, ln Ic): ln I = y0 + slope (x − x0).
 * `count` of them are set, in the order current, thermal, second breakdown.
 */
type ParameterLines = { count: number; limit: SoaLimit[]; y0: Float64Array; x0: Float64Array; slope: Float64Array };

const lines = (): ParameterLines => ({ count: 0, limit: [], y0: new Float64Array(3), x0: new Float64Array(3), slope: new Float64Array(3) });

function push(out: ParameterLines, limit: SoaLimit, lnI: number, x0 = 0, slope = 0): void {
  const k = out.count++;
  out.limit[k] = limit;
  out.y0[k] = lnI;
  out.x0[k] = x0;
  out.slope[k] = slope;
}

/**
 * The limits of a parametric SOA at the case temperature and pulse width of `cond`
 * (PHYSICS.md §4): Ic,max; the thermal line Ic = Pmax/Vce with Pmax = (Tj,max − Tc)/Rθjc, or
 * Zθjc(tp) for a pulse; second breakdown I0 (Vce/V0)^(−n) × its derating. A pulse without
 * Zθjc data uses Rθjc, and without a pulse line the DC second breakdown: both conservative.
 */
function parameterLines(m: SoaParameters, cond: SoaCondition, out: ParameterLines): ParameterLines {
  out.count = 0;
  const pulse = cond.pulseS !== 'dc';
  push(out, 'current', Math.log(pulse && m.icPulseMaxA !== undefined ? m.icPulseMaxA : m.icMaxA));
  const z = pulse && m.zthJc !== undefined ? zthJcAt(m.zthJc, cond.pulseS as number) : m.rthJcKPerW;
  const rise = m.tjMaxC - cond.caseC;
  // A pulse too short to reach the junction's first capacity (Zθjc ≈ 0) has no thermal line.
  if (rise <= 0) push(out, 'thermal', -Infinity, 0, -1);
  else if (z > 0) push(out, 'thermal', Math.log(rise / z), 0, -1);
  const sb = m.secondBreakdown;
  if (sb) {
    let i0 = sb.referenceIcA;
    if (pulse && sb.pulses) {
      // The shortest pulse line that covers this pulse width.
      let shortest = Infinity;
      for (const q of sb.pulses) {
        if (q.pulseS >= (cond.pulseS as number) && q.pulseS < shortest) {
          shortest = q.pulseS;
          i0 = q.referenceIcA;
        }
      }
    }
    const f = deratingFactor(sb.derating, cond.caseC);
    push(out, 'second-breakdown', f > 0 ? Math.log(i0 * f) : -Infinity, Math.log(sb.referenceVceV), -sb.exponent);
  }
  return out;
}

export function parameterPieces(m: SoaParameters, cond: SoaCondition): LogPiece[] {
  const l = parameterLines(m, cond, lines());
  return Array.from({ length: l.count }, (_, k) => ({ limit: l.limit[k], x: [l.x0[k]], y: [l.y0[k]], leftSlope: l.slope[k], rightSlope: l.slope[k] }));
}

const scratch = lines();

/**
 * The allowed current at vceV of a parametric SOA: what lowestLimit gives on
 * parameterPieces, with the same arithmetic (so the same bits), without building the pieces.
 */
export function parameterAllowed(m: SoaParameters, cond: SoaCondition, vceV: number): AllowedCurrent {
  if (vceV > m.vceoV) return { currentA: 0, limit: 'voltage' };
  const l = parameterLines(m, cond, scratch);
  const lx = vceV > 0 ? Math.log(vceV) : -Infinity;
  let currentA = Infinity;
  let limit: SoaLimit = 'current';
  for (let k = 0; k < l.count; k++) {
    const y0 = l.y0[k];
    const slope = l.slope[k];
    // pieceLogCurrent of a one-point piece with equal slopes on both sides.
    const lnI = y0 === -Infinity ? -Infinity : slope === 0 ? y0 : y0 + slope * (lx - l.x0[k]);
    const i = Math.exp(lnI);
    if (i < currentA) {
      currentA = i;
      limit = l.limit[k];
    }
  }
  return { currentA, limit };
}
