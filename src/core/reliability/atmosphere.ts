import {
  ISA_GAS_CONSTANT,
  ISA_GRAVITY,
  ISA_LAPSE_K_PER_M,
  ISA_MOLAR_MASS_KG_PER_MOL,
  ISA_SEA_LEVEL_K,
  ISA_SEA_LEVEL_KG_PER_M3,
  ISA_SEA_LEVEL_PA,
  ISA_TROPOPAUSE_M,
  MIN_SITE_ALTITUDE_M,
  STANDARD_EARTH_RADIUS_M,
} from './constants';

export type AtmosphereState = {
  /** Geopotential altitude of the geometric altitude given, m. */
  geopotentialM: number;
  temperatureK: number;
  pressurePa: number;
  densityKgPerM3: number;
  /** p/p0: also the air density ratio at one and the same air temperature. */
  pressureRatio: number;
  /** ρ/ρ0 of the standard day (with its colder air aloft). */
  densityRatio: number;
};

/** Exponent g0·M/(R*·L) of the troposphere's pressure law (≈ 5.2559). */
export const ISA_PRESSURE_EXPONENT = (ISA_GRAVITY * ISA_MOLAR_MASS_KG_PER_MOL) / (ISA_GAS_CONSTANT * ISA_LAPSE_K_PER_M);

/**
 * The standard atmosphere in the troposphere (U.S. Standard Atmosphere 1976, eq. 33a for a
 * layer of constant lapse rate; the same as ISO 2533 there): T = T0 − L·H,
 * p = p0 (T/T0)^(g0·M/(R*·L)), ρ = p·M/(R*·T), with the geopotential altitude
 * H = r0·Z/(r0 + Z) of the geometric altitude Z (height above sea level, m; eq. 18).
 * Z from −500 m to the tropopause (11 km geopotential).
 */
export function standardAtmosphere(altitudeM: number): AtmosphereState {
  const geopotentialM = (STANDARD_EARTH_RADIUS_M * altitudeM) / (STANDARD_EARTH_RADIUS_M + altitudeM);
  if (!(altitudeM >= MIN_SITE_ALTITUDE_M && geopotentialM <= ISA_TROPOPAUSE_M)) {
    throw new RangeError(`altitudeM: must lie from ${MIN_SITE_ALTITUDE_M} m to the tropopause (about 11,000 m), got ${altitudeM}`);
  }
  const temperatureK = ISA_SEA_LEVEL_K - ISA_LAPSE_K_PER_M * geopotentialM;
  const theta = temperatureK / ISA_SEA_LEVEL_K;
  const pressureRatio = Math.pow(theta, ISA_PRESSURE_EXPONENT);
  const densityRatio = pressureRatio / theta;
  return {
    geopotentialM,
    temperatureK,
    pressurePa: ISA_SEA_LEVEL_PA * pressureRatio,
    densityKgPerM3: ISA_SEA_LEVEL_KG_PER_M3 * densityRatio,
    pressureRatio,
    densityRatio,
  };
}
