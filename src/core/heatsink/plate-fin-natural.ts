import { AIR_300K, idealGasExpansion, type AirProperties } from './air';
import { checkFinite, checkPositive } from './check';
import { ELENBAAS_RANGE, LAMINAR_RAYLEIGH_LIMIT } from './constants';
import { notes, validity, type EstimateNotes } from './estimate';
import { finEfficiency } from './fin-efficiency';
import { elenbaasNumber, optimumPlateSpacing, parallelPlateNusselt } from './parallel-plates';
import { checkPlateFin, type PlateFinGeometry, type PlateFinShape } from './plate-fin-geometry';
import { radiationCoefficient } from './radiation';
import { riseAtPower } from './solve-rise';
import { rayleighNumber, verticalPlateNusselt } from './vertical-plate';

/** ambientC defaults to 25 °C; air to AIR_300K (the hook for altitude or another coolant). */
export type EstimateOptions = { ambientC?: number; air?: AirProperties };

export type PlateFinNatural = EstimateNotes & {
  rsaKPerW: number;
  riseK: number;
  ambientC: number;
  spacingM: number;
  /** Bar-Cohen & Rohsenow optimum spacing at this rise, m. */
  optimumSpacingM: number;
  elenbaas: number;
  channelNusselt: number;
  channelHWPerM2K: number;
  /** Outer faces of the end fins, as isolated vertical plates. */
  outerHWPerM2K: number;
  radiationHWPerM2K: number;
  finEfficiency: number;
  endFinEfficiency: number;
  convectionWPerK: number;
  radiationWPerK: number;
};

const ASSUMPTIONS = [
  'Fins vertical; channels open at the top, the bottom and the front.',
  'Isothermal base: no spreading or conduction resistance in it; the back face is mounted and sheds nothing.',
  'Channel h from the Bar-Cohen & Rohsenow composite correlation for symmetric isothermal parallel plates (the base closing each channel is left out).',
  'Fins by tanh(m Lc)/(m Lc) with Lc = H + t/2 (tip convection); each end fin uses the mean of the channel and outer-face h.',
  'Outer faces of the end fins as isolated vertical plates (Churchill & Chu).',
  'Radiation from the bounding box (front, sides, top, bottom) with the surface emissivity and view factor 1 to surroundings at ambient; fin faces see each other and are left out (conservative).',
  'Air properties at 300 K (Incropera & DeWitt Table A.4), β = 1/T_film.',
];

/** Plate-fin Rθsa in natural convection at a given rise (PHYSICS.md §5). */
export function plateFinNaturalAtRise(geometry: PlateFinGeometry, riseK: number, options: EstimateOptions = {}): PlateFinNatural {
  return naturalAtRise(checkPlateFin(geometry), checkPositive(riseK, 'riseK'), options);
}

/** Plate-fin Rθsa in natural convection when shedding powerW: the rise is solved for, since h depends on it. */
export function plateFinNaturalAtPower(geometry: PlateFinGeometry, powerW: number, options: EstimateOptions = {}): PlateFinNatural {
  const shape = checkPlateFin(geometry);
  checkPositive(powerW, 'powerW');
  const { riseK } = riseAtPower(powerW, (rise) => naturalAtRise(shape, rise, options).rsaKPerW);
  return naturalAtRise(shape, riseK, options);
}

export function naturalAtRise(shape: PlateFinShape, riseK: number, options: EstimateOptions): PlateFinNatural {
  const ambientC = options.ambientC === undefined ? 25 : checkFinite(options.ambientC, 'options.ambientC');
  const air = options.air ?? AIR_300K;
  const { spacingM: s, lengthM: L, finCount: N, finThicknessM: t, conductivityWPerMK: k } = shape;
  const beta = idealGasExpansion(ambientC + riseK, ambientC);

  const El = elenbaasNumber(s, L, riseK, beta, air);
  const Nu = parallelPlateNusselt(El);
  const hChannel = (Nu * air.kWPerMK) / s;
  const ra = rayleighNumber(L, riseK, beta, air);
  const hOuter = (verticalPlateNusselt(ra, air.pr) * air.kWPerMK) / L;
  const hr = radiationCoefficient(shape.emissivity, ambientC + riseK, ambientC);
  const eta = finEfficiency(hChannel, k, t, shape.correctedFinHeightM);
  const hEnd = 0.5 * (hChannel + hOuter);
  const etaEnd = finEfficiency(hEnd, k, t, shape.correctedFinHeightM);
  const convection = hChannel * shape.channelFloorAreaM2 + shape.finAreaEachM2 * ((N - 2) * eta * hChannel + 2 * etaEnd * hEnd);
  const radiation = hr * shape.envelopeAreaM2;

  const checks = [
    validity('Elenbaas number (set by the fin spacing)', El, ELENBAAS_RANGE[0], ELENBAAS_RANGE[1], 'range of the measurements behind the correlation (Elenbaas 1942; from memory)'),
    validity('Rayleigh number on the fin length', ra, null, LAMINAR_RAYLEIGH_LIMIT, 'laminar free convection on a vertical plate (Incropera & DeWitt §9.6)'),
    validity('fin Biot number h (t/2)/k', (hChannel * t) / (2 * k), null, 0.1, 'one-dimensional fin conduction (common practice)'),
    validity('fin height / spacing', shape.finHeightM / s, 1, null, 'channels deeper than wide, so the base may be left out (common practice)'),
  ];
  return {
    rsaKPerW: 1 / (convection + radiation),
    riseK,
    ambientC,
    spacingM: s,
    optimumSpacingM: optimumPlateSpacing(L, riseK, beta, air),
    elenbaas: El,
    channelNusselt: Nu,
    channelHWPerM2K: hChannel,
    outerHWPerM2K: hOuter,
    radiationHWPerM2K: hr,
    finEfficiency: eta,
    endFinEfficiency: etaEnd,
    convectionWPerK: convection,
    radiationWPerK: radiation,
    ...notes(ASSUMPTIONS, checks),
  };
}
