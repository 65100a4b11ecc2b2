import { deratingFactor } from './derating';
import type { LogPiece } from './log-piece';
import type { SoaCondition, SoaParameters } from './types';
import { zthJcAt } from './zth-jc';

const flat = (limit: LogPiece['limit'], lnI: number, x0 = 0, slope = 0): LogPiece => ({
  limit,
  x: [x0],
  y: [lnI],
  leftSlope: slope,
  rightSlope: slope,
});

/**
 * The limits of a parametric SOA at the case temperature and pulse width of `cond`
 * (PHYSICS.md §4): Ic,max; the thermal line Ic = Pmax/Vce with Pmax = (Tj,max − Tc)/Rθjc, or
 * Zθjc(tp) for a pulse; second breakdown I0 (Vce/V0)^(−n) × its derating. A pulse without
 * Zθjc data uses Rθjc, and without a pulse line the DC second breakdown: both conservative.
 */
export function parameterPieces(m: SoaParameters, cond: SoaCondition): LogPiece[] {
  const pulse = cond.pulseS !== 'dc';
  const pieces: LogPiece[] = [flat('current', Math.log(pulse && m.icPulseMaxA !== undefined ? m.icPulseMaxA : m.icMaxA))];
  const z = pulse && m.zthJc !== undefined ? zthJcAt(m.zthJc, cond.pulseS as number) : m.rthJcKPerW;
  const rise = m.tjMaxC - cond.caseC;
  // A pulse too short to reach the junction's first capacity (Zθjc ≈ 0) has no thermal line.
  if (rise <= 0) pieces.push(flat('thermal', -Infinity, 0, -1));
  else if (z > 0) pieces.push(flat('thermal', Math.log(rise / z), 0, -1));
  const sb = m.secondBreakdown;
  if (sb) {
    let i0 = sb.referenceIcA;
    if (pulse) {
      const covering = (sb.pulses ?? []).filter((q) => q.pulseS >= (cond.pulseS as number));
      if (covering.length > 0) i0 = covering.reduce((a, b) => (b.pulseS < a.pulseS ? b : a)).referenceIcA;
    }
    const f = deratingFactor(sb.derating, cond.caseC);
    pieces.push(flat('second-breakdown', f > 0 ? Math.log(i0 * f) : -Infinity, Math.log(sb.referenceVceV), -sb.exponent));
  }
  return pieces;
}
