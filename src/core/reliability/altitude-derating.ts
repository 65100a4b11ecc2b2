/**
 * How the convective part of a sink's Rθsa changes with the air density (PHYSICS.md §5).
 * Thermal conductivity, viscosity and Pr of air hardly depend on pressure, so ν = μ/ρ and
 * α = k/(ρ cp) scale as 1/ρ:
 * - natural convection, Nu = C·Ra^n with Ra = g β ΔT L³/(ν α) ∝ ρ²: h ∝ ρ^(2n); laminar
 *   n = 1/4 (vertical plate, Churchill & Chu 1975, laminar range) gives h ∝ ρ^(1/2), turbulent
 *   n = 1/3 gives ρ^(2/3). The sink's own exponent on the rise (h ∝ ΔT^n) is that same n.
 * - forced air over a laminar plate, Nu = 0.664 Re^(1/2) Pr^(1/3) with Re = v L/ν ∝ ρ at the
 *   same air speed (a fan moves about the same volume of thinner air): h ∝ ρ^(1/2).
 * The density ratio is the pressure ratio when the air temperature is the study's own
 * ambient (the catalogue rating holds at sea-level pressure and that temperature).
 */
export type ConvectionLaw = { kind: 'natural'; exponent: number } | { kind: 'forced' };

/** Laminar plate: h ∝ Re^(1/2) (Incropera & DeWitt eq. 7.30). */
export const FORCED_LAMINAR_RE_EXPONENT = 0.5;

/** h(ρ)/h(ρ0) for a density ratio ρ/ρ0. */
export function convectionRatio(law: ConvectionLaw, densityRatio: number): number {
  if (!(densityRatio > 0)) throw new RangeError(`densityRatio: must be greater than zero, got ${densityRatio}`);
  const power = law.kind === 'natural' ? 2 * law.exponent : FORCED_LAMINAR_RE_EXPONENT;
  return Math.pow(densityRatio, power);
}

/**
 * Factor on a sink's Rθsa at a density ratio, with `radiationShare` of its rated conductance
 * carried by radiation (which air density does not touch): 1/(s + (1 − s)·h/h0).
 */
export function rsaAltitudeFactor(law: ConvectionLaw, densityRatio: number, radiationShare = 0): number {
  if (!(radiationShare >= 0 && radiationShare < 1)) throw new RangeError(`radiationShare: must lie from 0 to below 1, got ${radiationShare}`);
  return 1 / (radiationShare + (1 - radiationShare) * convectionRatio(law, densityRatio));
}
