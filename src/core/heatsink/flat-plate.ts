import { AIR_300K, idealGasExpansion } from './air';
import { checkFinite, checkObject, checkPositive, checkRange } from './check';
import { notes, validity, type EstimateNotes } from './estimate';
import { finEfficiency } from './fin-efficiency';
import { checkMaterial, SINK_MATERIALS, type SinkMaterial } from './materials';
import type { EstimateOptions } from './plate-fin-natural';
import { radiationCoefficient } from './radiation';
import { riseAtPower } from './solve-rise';
import { rayleighNumber, verticalPlateNusselt } from './vertical-plate';

/**
 * A vertical flat plate or a PCB copper area used as a sink: heightM along gravity, widthM
 * across, metal thicknessM (35 µm for 1 oz copper), faces 2 when both sides shed heat.
 * emissivity ≈ 0.9 for solder mask, bare copper ≈ 0.05 (from memory).
 */
export type FlatPlateGeometry = {
  heightM: number;
  widthM: number;
  thicknessM: number;
  material: SinkMaterial;
  conductivityWPerMK?: number;
  emissivity: number;
  faces?: 1 | 2;
};

export type FlatPlateEstimate = EstimateNotes & {
  rsaKPerW: number;
  riseK: number;
  ambientC: number;
  rayleigh: number;
  nusselt: number;
  convectionHWPerM2K: number;
  radiationHWPerM2K: number;
  /**
   * How far from isothermal the plate is: the efficiency of the plate as a fin fed along its
   * vertical centre line (half-width long). Near 1 the isothermal result holds.
   */
  spreadingEfficiency: number;
  /** Rθsa with that efficiency applied, K/W: a first estimate of the spreading penalty. */
  rsaWithSpreadingKPerW: number;
  capacityJPerK: number;
};

const ASSUMPTIONS = [
  'Isothermal vertical plate, free convection on each shedding face by Churchill & Chu (1975), air properties at 300 K, β = 1/T_film.',
  'Radiation from each shedding face with view factor 1 to surroundings at ambient.',
  'Copper or metal spreading is left out of rsaKPerW; spreadingEfficiency treats the plate as a fin fed along its centre line to show how much that matters.',
  'Nothing else near the plate: a board among others or in a box sheds less.',
];

export function flatPlateAtRise(geometry: FlatPlateGeometry, riseK: number, options: EstimateOptions = {}): FlatPlateEstimate {
  const g = checkFlatPlate(geometry);
  checkPositive(riseK, 'riseK');
  const ambientC = options.ambientC === undefined ? 25 : checkFinite(options.ambientC, 'options.ambientC');
  const air = options.air ?? AIR_300K;
  const beta = idealGasExpansion(ambientC + riseK, ambientC);
  const ra = rayleighNumber(g.heightM, riseK, beta, air);
  const nu = verticalPlateNusselt(ra, air.pr);
  const hc = (nu * air.kWPerMK) / g.heightM;
  const hr = radiationCoefficient(g.emissivity, ambientC + riseK, ambientC);
  const area = g.heightM * g.widthM * g.faces;
  const rsa = 1 / ((hc + hr) * area);
  // finEfficiency takes m = √(2h/(k t)), both faces shedding; one face halves the h passed.
  const eta = finEfficiency(((hc + hr) * g.faces) / 2, g.conductivityWPerMK, g.thicknessM, g.widthM / 2);
  const mat = SINK_MATERIALS[g.material];
  const checks = [
    validity('Rayleigh number on the height', ra, null, 1e12, 'Churchill & Chu fitted data up to about 10¹² (Incropera & DeWitt §9.6)'),
    validity('spreading efficiency', eta, 0.9, null, 'isothermal-plate assumption holds within about 10 % (common practice)'),
  ];
  return {
    rsaKPerW: rsa,
    riseK,
    ambientC,
    rayleigh: ra,
    nusselt: nu,
    convectionHWPerM2K: hc,
    radiationHWPerM2K: hr,
    spreadingEfficiency: eta,
    rsaWithSpreadingKPerW: rsa / eta,
    capacityJPerK: g.heightM * g.widthM * g.thicknessM * mat.densityKgPerM3 * mat.specificHeatJPerKgK,
    ...notes(ASSUMPTIONS, checks),
  };
}

/** The plate shedding powerW: the rise is solved for (h depends on it). */
export function flatPlateAtPower(geometry: FlatPlateGeometry, powerW: number, options: EstimateOptions = {}): FlatPlateEstimate {
  checkFlatPlate(geometry);
  checkPositive(powerW, 'powerW');
  const { riseK } = riseAtPower(powerW, (rise) => flatPlateAtRise(geometry, rise, options).rsaKPerW);
  return flatPlateAtRise(geometry, riseK, options);
}

function checkFlatPlate(value: unknown, path = 'geometry'): Required<FlatPlateGeometry> {
  const g = checkObject(value, path);
  const material = checkMaterial(g.material, `${path}.material`);
  const faces = g.faces === undefined ? 2 : g.faces;
  if (faces !== 1 && faces !== 2) throw new RangeError(`${path}.faces: must be 1 or 2, got ${JSON.stringify(g.faces)}`);
  return {
    heightM: checkPositive(g.heightM, `${path}.heightM`),
    widthM: checkPositive(g.widthM, `${path}.widthM`),
    thicknessM: checkPositive(g.thicknessM, `${path}.thicknessM`),
    material,
    conductivityWPerMK: g.conductivityWPerMK === undefined ? SINK_MATERIALS[material].conductivityWPerMK : checkPositive(g.conductivityWPerMK, `${path}.conductivityWPerMK`),
    emissivity: checkRange(g.emissivity, `${path}.emissivity`, 0, 1),
    faces,
  };
}
