/** Named constants and tolerances of the heatsink core (SI units unless stated). */

/** Stefan–Boltzmann constant, W/(m²·K⁴) (CODATA 2018; exact from the defined SI constants). */
export const STEFAN_BOLTZMANN = 5.670374419e-8;

/** Standard acceleration of gravity, m/s² (3rd CGPM 1901, ISO 80000-3). */
export const STANDARD_GRAVITY = 9.80665;

/** 0 °C in kelvin. */
export const KELVIN_OFFSET = 273.15;

/**
 * Below this rise natural-convection Rθsa is held at its value here: Rsa grows without
 * bound as the rise goes to zero.
 */
export const MIN_CONVECTION_RISE_K = 0.5;

/** Fixed-point iterations on a sink's rise stop when Rθsa moves less than this fraction. */
export const CONVECTION_REL_TOL = 0.01;

/** Most profile runs per candidate while its natural-convection Rθsa settles. */
export const MAX_CONVECTION_RUNS = 6;

/** Geometry estimates iterate the rise at a given power until it moves less than this, K. */
export const RISE_ABS_TOL_K = 1e-6;

/** Iteration cap of the geometry rise solve. */
export const MAX_RISE_ITERATIONS = 100;

/**
 * Ranking peaks are exact to this, K: a segment's interior is searched only when its bound
 * could raise the best peak so far by more than this, so a reported peak lies at most this
 * far below the exact one.
 */
export const PEAK_TOLERANCE_K = 1e-4;

/**
 * Modes whose rates differ by at most this fraction of their group's slowest are bounded
 * together: identical parts on one sink give pairs of near-equal rates whose large terms
 * cancel. It sets only how often a segment's interior is searched, never the answer.
 */
export const MODE_GROUP_REL_GAP = 0.05;

/**
 * Modes with λh above this have decayed within the segment: e^(−40) ≈ 4e-18, below the
 * rounding of any temperature, so e^(−λh) is taken as 0 without computing it.
 */
export const DECAYED_EXPONENT = 40;

/** The interior peak time is refined until its bracket is this fraction of the segment. */
export const PEAK_TIME_REL_TOL = 1e-12;

/** Iteration cap of the safeguarded Newton search for an interior peak. */
export const PEAK_MAX_ITERATIONS = 100;


/**
 * Transition Reynolds number of the flat-plate boundary layer, Re_x,c ≈ 5 × 10⁵
 * (Incropera & DeWitt §7.2; common practice).
 */
export const LAMINAR_REYNOLDS_LIMIT = 5e5;

/** Vertical-plate free convection turns turbulent near Ra_L ≈ 10⁹ (Incropera & DeWitt §9.6). */
export const LAMINAR_RAYLEIGH_LIMIT = 1e9;

/**
 * Range of Elenbaas numbers over which the parallel-plate correlation rests on measurements
 * (Elenbaas 1942 covered roughly 10⁻¹ … 10⁵; from memory). Outside it the estimate is flagged.
 */
export const ELENBAAS_RANGE: readonly [number, number] = [1e-1, 1e5];
