import type { SinkCandidate } from './candidate';
import { checkArray, checkPositive, checkString } from './check';
import { SINK_MATERIALS } from './materials';
import { plateFinForced, type PlateFinForced } from './plate-fin-forced';
import { checkPlateFin, type PlateFinGeometry } from './plate-fin-geometry';
import { naturalAtRise, type EstimateOptions, type PlateFinNatural } from './plate-fin-natural';

export type PlateFinCandidateOptions = EstimateOptions & {
  id: string;
  name?: string;
  /** Rise of the natural rating, K (default 50). */
  referenceRiseK?: number;
  /** Air speeds for forced-air points, m/s, increasing. */
  airSpeedsMPerS?: number[];
};

/**
 * A custom extrusion as a ranking candidate (or a study sink): its natural rating at the
 * reference rise with the exponent n of the model itself, n = ln(R(ΔT/2)/R(ΔT)) / ln 2;
 * forced-air points from the laminar-plate estimate; heat capacity ρ V cp of its metal;
 * volume the bounding box. The estimates ride along with their assumptions and checks.
 */
export function plateFinCandidate(
  geometry: PlateFinGeometry,
  options: PlateFinCandidateOptions,
): { candidate: SinkCandidate; natural: PlateFinNatural; forced: PlateFinForced[] } {
  const shape = checkPlateFin(geometry);
  const id = checkString(options.id, 'options.id');
  const ref = options.referenceRiseK === undefined ? 50 : checkPositive(options.referenceRiseK, 'options.referenceRiseK');
  const natural = naturalAtRise(shape, ref, options);
  const half = naturalAtRise(shape, ref / 2, options);
  const exponent = Math.min(1, Math.max(0, Math.log(half.rsaKPerW / natural.rsaKPerW) / Math.LN2));
  const material = SINK_MATERIALS[shape.material];
  const massKg = shape.metalVolumeM3 * material.densityKgPerM3;
  const speeds = options.airSpeedsMPerS === undefined ? [] : checkArray(options.airSpeedsMPerS, 'options.airSpeedsMPerS').map((v, i) => checkPositive(v, `options.airSpeedsMPerS[${i}]`));
  const forced = speeds.map((v) => plateFinForced(geometry, v, ref, options));
  const candidate: SinkCandidate = {
    id,
    natural: { rthKPerW: natural.rsaKPerW, referenceRiseK: ref, exponent },
    capacityJPerK: massKg * material.specificHeatJPerKgK,
    massKg,
    volumeM3: shape.envelopeVolumeM3,
  };
  if (options.name !== undefined) candidate.name = options.name;
  if (forced.length > 0) candidate.forcedAir = forced.map((f) => ({ airSpeedMPerS: f.airSpeedMPerS, rthKPerW: f.rsaKPerW }));
  return { candidate, natural, forced };
}
