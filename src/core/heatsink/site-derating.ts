import { rsaAltitudeFactor, standardAtmosphere } from '../reliability';
import type { CheckedCandidate } from './candidate';
import { checkObject } from './check';
import { LAMINAR_EXPONENT } from './natural-convection';

/** The study's site: altitude above sea level, m, and the share of a rating carried by radiation. */
export type RankingSite = { altitudeM: number; radiationShare?: number };

/**
 * How the site derated the candidates: the pressure ratio (air at the study's own ambient, so
 * also the density ratio) and the factor on Rθsa for laminar natural convection (n = 1/4) and
 * for forced air (laminar plate), which are the same, h ∝ ρ^(1/2) (PHYSICS.md §5).
 */
export type SiteDerating = { altitudeM: number; pressureRatio: number; radiationShare: number; rsaFactor: number; forcedRsaFactor: number };

export function siteDerating(site: RankingSite, path = 'options.site'): SiteDerating {
  const s = checkObject(site, path);
  const altitudeM = s.altitudeM as number;
  const radiationShare = s.radiationShare === undefined ? 0 : (s.radiationShare as number);
  let pressureRatio: number;
  let rsaFactor: number;
  let forcedRsaFactor: number;
  try {
    pressureRatio = standardAtmosphere(altitudeM).pressureRatio;
    rsaFactor = rsaAltitudeFactor({ kind: 'natural', exponent: LAMINAR_EXPONENT }, pressureRatio, radiationShare);
    forcedRsaFactor = rsaAltitudeFactor({ kind: 'forced' }, pressureRatio, radiationShare);
  } catch (err) {
    if (err instanceof RangeError) throw new RangeError(`${path}.${err.message}`);
    throw err;
  }
  return { altitudeM, pressureRatio, radiationShare, rsaFactor, forcedRsaFactor };
}

/**
 * A candidate at the site, as the study's own sinks are derated (src/core/study/site-adjust.ts):
 * its still-air reference Rθsa times the natural-convection factor at its own exponent (the
 * law keeps its shape), every forced-air point times the forced-air factor.
 */
export function derateCandidate(c: CheckedCandidate, d: SiteDerating): { candidate: CheckedCandidate; naturalFactor?: number; forcedFactor?: number } {
  const out: CheckedCandidate = { ...c };
  let naturalFactor: number | undefined;
  if (c.natural) {
    naturalFactor = rsaAltitudeFactor({ kind: 'natural', exponent: c.natural.exponent }, d.pressureRatio, d.radiationShare);
    out.natural = { ...c.natural, rthKPerW: c.natural.rthKPerW * naturalFactor };
  }
  let forcedFactor: number | undefined;
  if (c.forcedAir) {
    forcedFactor = d.forcedRsaFactor;
    out.forcedAir = c.forcedAir.map((p) => ({ ...p, rthKPerW: p.rthKPerW * d.forcedRsaFactor }));
  }
  return { candidate: out, naturalFactor, forcedFactor };
}
