import type { CheckedCandidate } from './candidate';
import { forcedAirRsa, type CurveRange } from './forced-air';

/**
 * How a candidate's Rθsa is found in a scenario: its natural-convection law (rise dependent),
 * a fixed value from its forced-air curve, or not at all.
 */
export type RsaMode =
  | { mode: 'natural'; note?: string }
  | { mode: 'forced'; rthKPerW: number; range: CurveRange; note?: string }
  | { mode: 'none'; reason: string };

/**
 * Still air (airSpeedMPerS = 0) needs the natural rating. In moving air the forced-air curve
 * is used (log–log, held at its ends); a sink with no curve keeps its still-air behaviour,
 * which moving air can only improve.
 */
export function candidateRsaMode(c: CheckedCandidate, airSpeedMPerS: number): RsaMode {
  if (airSpeedMPerS === 0) {
    if (c.natural) return { mode: 'natural' };
    return { mode: 'none', reason: 'no still-air rating (forced-air points only)' };
  }
  if (c.forcedAir) {
    const { rthKPerW, range } = forcedAirRsa(c.forcedAir, airSpeedMPerS);
    const first = c.forcedAir[0].airSpeedMPerS;
    const last = c.forcedAir[c.forcedAir.length - 1].airSpeedMPerS;
    if (range === 'below') return { mode: 'forced', rthKPerW, range, note: `air speed below the curve (from ${first} m/s): its slowest point is used, which is optimistic` };
    if (range === 'above') return { mode: 'forced', rthKPerW, range, note: `air speed above the curve (to ${last} m/s): its fastest point is used, which is conservative` };
    return { mode: 'forced', rthKPerW, range };
  }
  return { mode: 'natural', note: 'no forced-air curve: still-air Rθsa used (conservative)' };
}
