/** Named tolerances and defaults of the rail-plan core. */

/** Reference voltage of the common adjustable three-terminal regulator, V (common practice). */
export const ADJUSTABLE_VREF_V = 1.25;

/** Currents sampled from 0 to the highest one when looking for a tap's worst dissipation. */
export const WORST_CASE_CURRENT_SAMPLES = 64;

/** Bisection steps that locate the highest current the element's limit lets through. */
export const CURRENT_LIMIT_BISECTIONS = 60;

/** Default grid of the dissipation map: output voltages and output currents (0 to the top). */
export const MAP_VOUT_STEPS = 61;
export const MAP_IOUT_STEPS = 26;

/** A threshold this close above its best value (V) still counts as safe (rounding of entered values). */
export const THRESHOLD_SAFE_TOL_V = 1e-9;
