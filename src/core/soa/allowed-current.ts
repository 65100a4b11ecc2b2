import { checkNumber, checkPulse } from './check';
import { checkSoaModel } from './check-model';
import { pieceLogCurrent, type LogPiece } from './log-piece';
import { soaPieces } from './soa-pieces';
import type { AllowedCurrent, SoaCondition, SoaModel } from './types';

/** Minimum over the pieces at Vce (above vceMaxV: 0, the voltage limit). Earlier pieces win ties. */
export function lowestLimit(pieces: readonly LogPiece[], vceMaxV: number, vceV: number): AllowedCurrent {
  if (vceV > vceMaxV) return { currentA: 0, limit: 'voltage' };
  const lx = vceV > 0 ? Math.log(vceV) : -Infinity;
  let best: AllowedCurrent = { currentA: Infinity, limit: 'current' };
  for (const p of pieces) {
    const i = Math.exp(pieceLogCurrent(p, lx));
    if (i < best.currentA) best = { currentA: i, limit: p.limit };
  }
  return best;
}

/**
 * Largest collector (drain) current the SOA allows at vceV, A, at the case temperature and
 * pulse width of `cond`, and which limit sets it. Vce above the voltage limit allows nothing.
 */
export function allowedCurrent(model: SoaModel, vceV: number, cond: SoaCondition): AllowedCurrent {
  checkSoaModel(model);
  checkNumber(vceV, 'vceV', 0);
  checkCondition(cond);
  const { pieces, vceMaxV } = soaPieces(model, cond);
  return lowestLimit(pieces, vceMaxV, vceV);
}

export function checkCondition(cond: SoaCondition, path = 'condition'): void {
  if (cond == null || typeof cond !== 'object') throw new TypeError(`${path}: expected { caseC, pulseS }`);
  checkNumber(cond.caseC, `${path}.caseC`);
  checkPulse(cond.pulseS, `${path}.pulseS`);
}
