/** Constants and defaults of the reliability core: temperature-cycling life, site effects, touch limits. */

/** Boltzmann constant, eV/K (CODATA; the value PHYSICS.md §6 uses). */
export const BOLTZMANN_EV_PER_K = 8.617e-5;

/** 0 °C in kelvin. */
export const KELVIN_OFFSET = 273.15;

/** Days in a year for life in years (Julian year). */
export const DAYS_PER_YEAR = 365.25;

/**
 * Power-cycling life `Nf = A · ΔTj^(−α) · exp(Ea/(kB·Tjm))`: the Coffin–Manson–Arrhenius fit of
 * the LESIT study (Held, Jacob, Nicoletti, Scacco, Poech, "Fast power cycling test for IGBT
 * modules in traction application", PEDS 1997), from memory: A = 640 cycles·K^α, α = 5,
 * Q = 7.8e4 J/mol (Ea = Q/F = 0.808 eV). Fitted to wire-bonded IGBT modules, ΔTj 30–80 K:
 * for other packages it only ranks profiles against each other.
 */
export const LESIT_COEFFICIENT = 640;
export const LESIT_EXPONENT = 5;
export const LESIT_ACTIVATION_EV = 78000 / 96485.33212;

/**
 * Activation energy of the steady Arrhenius factor when the study gives none, eV: 0.7 eV is
 * the usual assumption for semiconductor wear-out without a known mechanism (common practice).
 */
export const DEFAULT_ARRHENIUS_EV = 0.7;

/**
 * U.S. Standard Atmosphere 1976 (identical to the ISA, ISO 2533:1975, below 32 km), lowest
 * layer: sea-level temperature, pressure and density, lapse rate, gravity, molar mass of air
 * and the gas constant as the 1976 standard defines them.
 */
export const ISA_SEA_LEVEL_K = 288.15;
export const ISA_SEA_LEVEL_PA = 101325;
export const ISA_SEA_LEVEL_KG_PER_M3 = 1.225;
export const ISA_LAPSE_K_PER_M = 0.0065;
export const ISA_GRAVITY = 9.80665;
export const ISA_MOLAR_MASS_KG_PER_MOL = 0.0289644;
export const ISA_GAS_CONSTANT = 8.31432;
/** Effective Earth radius r0 of the 1976 standard's geopotential altitude, m. */
export const STANDARD_EARTH_RADIUS_M = 6356766;
/** Top of the troposphere, where the constant-lapse formula ends, m (geopotential). */
export const ISA_TROPOPAUSE_M = 11000;
/** Lowest altitude the product accepts, m (the Dead Sea shore lies near −430 m). */
export const MIN_SITE_ALTITUDE_M = -500;

/**
 * Surfaces above about this can burn on contact (common practice, PHYSICS.md §7); every
 * sink above it gets the caution whatever limit the study sets.
 */
export const BURN_CAUTION_C = 60;
