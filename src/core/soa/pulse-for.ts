import { SOA_DC_TAU_FACTOR } from './constants';
import type { PulseWidth, SoaModel } from './types';
import { largestTauS } from './zth-jc';

/**
 * The pulse width a stretch of durationS counts as: DC once it lasts SOA_DC_TAU_FACTOR of the
 * largest junction-case time constants. Without Zθjc data a parametric model treats every
 * stretch as DC (Rθjc ≥ Zθjc(tp), so conservative); a datasheet model picks its curve by
 * the duration itself.
 */
export function pulseFor(model: SoaModel, durationS: number): PulseWidth {
  if (model.zthJc !== undefined) return durationS >= SOA_DC_TAU_FACTOR * largestTauS(model.zthJc) ? 'dc' : durationS;
  if (model.kind === 'parameters') return 'dc';
  return durationS;
}
