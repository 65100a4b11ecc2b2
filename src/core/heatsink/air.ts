import { KELVIN_OFFSET } from './constants';

/**
 * Properties of the cooling air. kWPerMK thermal conductivity, nuM2PerS kinematic viscosity,
 * alphaM2PerS thermal diffusivity, pr Prandtl number. Altitude or another gas enters here:
 * ν and α scale as 1/ρ, so with the pressure at altitude both grow by p0/p.
 */
export type AirProperties = { kWPerMK: number; nuM2PerS: number; alphaM2PerS: number; pr: number };

/** Air at 300 K and 1 atm: Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, Table A.4. */
export const AIR_300K: AirProperties = { kWPerMK: 0.0263, nuM2PerS: 15.89e-6, alphaM2PerS: 22.5e-6, pr: 0.707 };

/** Film temperature (Ts + T∞)/2, K, from surface and ambient in °C. */
export function filmTemperatureK(surfaceC: number, ambientC: number): number {
  return 0.5 * (surfaceC + ambientC) + KELVIN_OFFSET;
}

/** Expansion coefficient of an ideal gas, β = 1/T_film, 1/K (Incropera & DeWitt §9.1). */
export function idealGasExpansion(surfaceC: number, ambientC: number): number {
  return 1 / filmTemperatureK(surfaceC, ambientC);
}
