/** Named tolerances and conventions of the SOA check. */

/** Datasheet SOA curves and the derating reference are given at this case temperature, °C. */
export const SOA_REFERENCE_CASE_C = 25;

/**
 * A stretch counts as DC when it lasts at least this many of the largest junction-case time
 * constants: after 5τ the slowest term has reached 1 − e^(−5) ≈ 99.3 % of its final value.
 */
export const SOA_DC_TAU_FACTOR = 5;

/** Log-log slopes of datasheet segments: flatter than this is the current limit. */
export const SOA_SLOPE_CURRENT_MIN = -0.5;

/** Between SOA_SLOPE_CURRENT_MIN and this is the thermal line (−1); steeper is second breakdown. */
export const SOA_SLOPE_THERMAL_MIN = -1.25;

/** Two datasheet Vce closer than this (relative) are the same voltage (a vertical). */
export const SOA_SAME_VCE_REL_TOL = 1e-9;

/** A boundary chart starts this many decades below its top voltage unless told otherwise. */
export const SOA_CHART_DECADES = 2;

/** The vertical at the voltage limit drops to this fraction of the current there. */
export const SOA_CHART_FLOOR_RATIO = 0.1;

/** Boundary points where the log-log slope changes by less than this are dropped from charts. */
export const SOA_STRAIGHT_SLOPE_TOL = 1e-9;
