import type { PulseWidth, SoaModel } from './types';

/**
 * Whether a MOSFET point needs the linear-mode warning: at low gate drive the drain current
 * rises with temperature and hot spots run away (Spirito et al., IEEE ISPSD 2002, from
 * memory; PHYSICS.md §4), so a DC SOA drawn from the thermal line can be far too generous.
 * Warn at DC without a DC linear-mode rating, and for pulses longer than the longest pulse
 * rated in linear mode.
 */
export function needsLinearModeWarning(model: SoaModel, pulse: PulseWidth, durationS: number): boolean {
  if (model.transistor !== 'mosfet') return false;
  const rating = model.linearMode;
  if (pulse === 'dc') return !rating?.dcRated;
  if (rating?.dcRated) return false;
  return rating?.longestRatedPulseS !== undefined && durationS > rating.longestRatedPulseS;
}

export const LINEAR_MODE_MESSAGE =
  'MOSFET in linear mode beyond its rating: at low gate drive the drain current rises with temperature ' +
  'and hot spots can run away well inside the thermal line (Spirito effect). Use a part with a DC ' +
  'linear-mode SOA, share the current over more parts, or shorten the stretch.';
