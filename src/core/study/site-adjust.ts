import { rsaAltitudeFactor, standardAtmosphere, type ConvectionLaw } from '../reliability';
import type { Sink, StudyDocument } from './types';
import type { SiteResult } from './reliability-result-types';
import { DEFAULT_CONVECTION_EXPONENT } from './parse-sink';

/** Convection law of a sink: its forced-air curve, its natural-convection exponent, or laminar natural convection. */
function lawOf(sink: Sink): ConvectionLaw {
  if (sink.forcedAir) return { kind: 'forced' };
  return { kind: 'natural', exponent: sink.naturalConvection?.exponent ?? DEFAULT_CONVECTION_EXPONENT };
}

/**
 * The study at its site altitude: every sink's Rθsa (and forced-air curve) and the
 * enclosure's Rθ to the room scaled by the convection factor at the standard atmosphere's
 * pressure ratio (air at the study's own ambient temperature; PHYSICS.md §5). A natural-
 * convection law keeps its shape: the factor multiplies its reference Rθsa.
 */
export function siteAdjusted(doc: StudyDocument): { doc: StudyDocument; site: SiteResult } | null {
  if (!doc.site) return null;
  const { altitudeM, radiationShare } = doc.site;
  const atmosphere = standardAtmosphere(altitudeM);
  const ratio = atmosphere.pressureRatio;
  const site: SiteResult = {
    altitudeM,
    pressureRatio: ratio,
    standardDensityRatio: atmosphere.densityRatio,
    radiationShare,
    sinks: {},
  };
  const sinks = doc.sinks.map((sink): Sink => {
    const law = lawOf(sink);
    const factor = rsaAltitudeFactor(law, ratio, radiationShare);
    const used = sink.rthKPerW * factor;
    site.sinks[sink.id] = {
      law: law.kind,
      exponent: law.kind === 'natural' ? law.exponent : 0.5,
      factor,
      givenRthKPerW: sink.rthKPerW,
      usedRthKPerW: used,
    };
    const out: Sink = { ...sink, rthKPerW: used };
    if (sink.forcedAir) out.forcedAir = { ...sink.forcedAir, points: sink.forcedAir.points.map((p) => ({ ...p, rthKPerW: p.rthKPerW * factor })) };
    return out;
  });
  const adjusted: StudyDocument = { ...doc, sinks };
  if (doc.enclosure) {
    const factor = rsaAltitudeFactor({ kind: 'natural', exponent: DEFAULT_CONVECTION_EXPONENT }, ratio, radiationShare);
    const used = doc.enclosure.rthKPerW * factor;
    site.enclosure = { factor, givenRthKPerW: doc.enclosure.rthKPerW, usedRthKPerW: used };
    adjusted.enclosure = { ...doc.enclosure, rthKPerW: used };
  }
  return { doc: adjusted, site };
}
