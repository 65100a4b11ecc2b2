import { AIR_300K } from './air';
import { checkFinite, checkPositive } from './check';
import { LAMINAR_REYNOLDS_LIMIT } from './constants';
import { notes, validity, type EstimateNotes } from './estimate';
import { finEfficiency } from './fin-efficiency';
import { laminarBoundaryLayerM, laminarPlateNusselt } from './laminar-plate';
import { checkPlateFin, type PlateFinGeometry } from './plate-fin-geometry';
import type { EstimateOptions } from './plate-fin-natural';
import { radiationCoefficient } from './radiation';

export type PlateFinForced = EstimateNotes & {
  rsaKPerW: number;
  airSpeedMPerS: number;
  riseK: number;
  reynolds: number;
  nusselt: number;
  hWPerM2K: number;
  finEfficiency: number;
  /** hA of the surfaces before and after the air's own warming is accounted for, W/K. */
  surfaceConductanceWPerK: number;
  convectionWPerK: number;
  radiationWPerK: number;
  /** Laminar boundary-layer thickness at the trailing edge, m. */
  boundaryLayerM: number;
};

const ASSUMPTIONS = [
  'Air flows along the fins at the given speed through every channel (ducted: no bypass).',
  'Mean h of a flat plate in laminar flow, Nu_L = 0.664 Re_L^(1/2) Pr^(1/3), on every surface; boundary layers of neighbouring fins do not merge.',
  'The air warms along the channels: Q = ṁ cp (1 − e^(−hA/(ṁ cp))) ΔT_in for an isothermal surface (Incropera & DeWitt §8.3), ρ cp = k/α.',
  'Isothermal base; fins by tanh(m Lc)/(m Lc) with Lc = H + t/2.',
  'Radiation from the bounding box with view factor 1 to surroundings at ambient.',
  'Air properties at 300 K (Incropera & DeWitt Table A.4).',
];

/** Plate-fin Rθsa in forced air (PHYSICS.md §5); riseK sets only the radiation part. */
export function plateFinForced(geometry: PlateFinGeometry, airSpeedMPerS: number, riseK = 50, options: EstimateOptions = {}): PlateFinForced {
  const shape = checkPlateFin(geometry);
  const v = checkPositive(airSpeedMPerS, 'airSpeedMPerS');
  checkPositive(riseK, 'riseK');
  const ambientC = options.ambientC === undefined ? 25 : checkFinite(options.ambientC, 'options.ambientC');
  const air = options.air ?? AIR_300K;
  const { lengthM: L, finCount: N, spacingM: s, finHeightM: H } = shape;

  const re = (v * L) / air.nuM2PerS;
  const nu = laminarPlateNusselt(re, air.pr);
  const h = (nu * air.kWPerMK) / L;
  const eta = finEfficiency(h, shape.conductivityWPerMK, shape.finThicknessM, shape.correctedFinHeightM);
  const surface = h * (shape.channelFloorAreaM2 + N * eta * shape.finAreaEachM2);
  const capacityRate = (air.kWPerMK / air.alphaM2PerS) * v * (N - 1) * s * H;
  const convection = capacityRate * -Math.expm1(-surface / capacityRate);
  const radiation = radiationCoefficient(shape.emissivity, ambientC + riseK, ambientC) * shape.envelopeAreaM2;
  const delta = laminarBoundaryLayerM(L, re);

  const checks = [
    validity('Reynolds number on the fin length', re, null, LAMINAR_REYNOLDS_LIMIT, 'laminar boundary layer, transition near 5 × 10⁵ (Incropera & DeWitt §7.2)'),
    validity('boundary layer / half spacing', delta / (s / 2), null, 1, 'developing flow between the fins (Blasius δ ≈ 5x/Re_x^(1/2))'),
    validity('fin Biot number h (t/2)/k', (h * shape.finThicknessM) / (2 * shape.conductivityWPerMK), null, 0.1, 'one-dimensional fin conduction (common practice)'),
  ];
  return {
    rsaKPerW: 1 / (convection + radiation),
    airSpeedMPerS: v,
    riseK,
    reynolds: re,
    nusselt: nu,
    hWPerM2K: h,
    finEfficiency: eta,
    surfaceConductanceWPerK: surface,
    convectionWPerK: convection,
    radiationWPerK: radiation,
    boundaryLayerM: delta,
    ...notes(ASSUMPTIONS, checks),
  };
}
