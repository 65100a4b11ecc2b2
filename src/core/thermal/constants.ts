/** Named tolerances and limits of the thermal core (dimensionless unless stated). */

/** Roots of exponential sums are refined until the bracket is this fraction of the segment. */
export const ROOT_TIME_REL_TOL = 1e-14;

/** Iteration cap of the safeguarded Newton refinement (bisection alone needs ~50). */
export const ROOT_MAX_ITERATIONS = 200;

/** Modal rates closer than this (relative) are merged before searching for roots. */
export const RATE_MERGE_REL_TOL = 1e-12;

/**
 * An interior peak search runs only when the cheap upper bound of a segment exceeds the
 * best value known so far by more than this, K. Below it a peak cannot change the answer.
 */
export const PEAK_SEARCH_ABS_TOL = 1e-12;

/**
 * Largest λmax/λmin accepted. The graded ordering in compileNetwork keeps ladders exact far
 * beyond it; the limit guards general networks, whose slowest mode may lose ~eps·λmax/λmin.
 */
export const STIFFNESS_LIMIT = 1e13;

/** Foster terms whose τ differ by less than this (relative) are merged. */
export const FOSTER_TAU_MERGE_REL_TOL = 1e-12;

/** Lanczos stops (the ladder is complete) when a new direction is this small, relative. */
export const LANCZOS_BREAKDOWN_REL_TOL = 1e-13;

/** Slots (a power of two) of runProfile's caches of x∞ per input vector and e^(−λh) per duration. */
export const PROFILE_CACHE_SIZE = 64;

/** Segments per block of runProfile's peaks-only loop (runSegmentsInBlocks). */
export const PROFILE_BLOCK_SIZE = 256;

/** Modal rates within this fraction of their cluster's slowest are bounded together. */
export const BOUND_CLUSTER_REL = 0.01;

/**
 * e^(−δ) for 0 ≤ δ ≤ SMALL_EXP_ARG comes from a Taylor polynomial of degree 8 instead of
 * Math.exp: runProfile uses it for slow modes (δ = λ_k h) and for a mode whose rate is
 * close to the previous one (δ = (λ_k − λ_(k−1)) h, then times that mode's factor). The
 * first neglected term, δ⁹/9!, is below 4.1e−17 relative (Taylor remainder bound).
 */
export const SMALL_EXP_ARG = 0.0625;
