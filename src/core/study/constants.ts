/** Named tolerances and limits of the study pipeline (one place, so they are stated once). */

/** Target junction margin below Tj,max when a study gives none: 20–25 K is common practice. */
export const DEFAULT_MARGIN_K = 20;

/**
 * Re-linearisation tolerance of natural convection: a stretch is split where the sink rise
 * moves Rθsa by more than this fraction from the value the stretch was solved with.
 */
export const CONVECTION_TOLERANCE = 0.01;

/** Below this rise natural-convection Rθsa is held at its value here (it tends to ∞ at zero rise). */
export const MIN_CONVECTION_RISE_K = 0.5;

/** A linear ambient ramp is held constant over pieces whose ends differ by at most this. */
export const AMBIENT_RAMP_STEP_K = 0.05;

/** Most segments a profile may expand to (groups × repeat). */
export const MAX_EXPANDED_SEGMENTS = 10_000_000;

/** Most shutdown trips and resumes within one constant-input piece before the run is refused. */
export const MAX_TOGGLES_PER_PIECE = 1_000_000;

/**
 * Stretch budget of an interactive evaluation (the app's live results, the API): a few seconds
 * of work at most; the full MAX_SOLVED_PIECES is for the command line.
 */
export const INTERACTIVE_MAX_STRETCHES = 100_000;

/** Most constant-input pieces one evaluation may solve (events and splits included). */
export const MAX_SOLVED_PIECES = 50_000_000;

/** Chart series: at most this many points per node. */
export const DEFAULT_SERIES_POINTS = 2000;

/**
 * Chart series: a bucket's highest value may lie this far below the true maximum inside it,
 * K (a hundredth of a pixel on any chart here). The nodes' overall peaks are exact.
 */
export const SERIES_BUCKET_TOL_K = 1e-2;

/** Events kept in the result list; later ones are only counted. */
export const MAX_LISTED_EVENTS = 2000;

/** Iterated periodic steady state (with events or non-linear sinks): stop when a period's start moves less than this. */
export const PERIODIC_TOLERANCE_K = 1e-6;
export const MAX_PERIODIC_ITERATIONS = 2000;
/** …and stop iterating once the warm-up periods have solved this many stretches. */
export const MAX_PERIODIC_STRETCHES = 5_000_000;

/** Every node must end at or below this; a higher value means the inputs are not physical. */
export const MAX_PLAUSIBLE_TEMPERATURE_C = 1e6;

/** SOA: merged operating points held per device while solving (memory bound); the lower-margin half survives a cut. */
export const MAX_TRACKED_SOA_POINTS = 20_000;

/** SOA: operating points listed per device in the result (the lowest margins, in time order). */
export const MAX_LISTED_SOA_POINTS = 500;

/** Rail plan: segments of the first pass listed with their tap in the result. */
export const MAX_LISTED_TAP_SEGMENTS = 2000;

/** Two stretches meet when their ends lie this close (relative to the time), s/s. */
export const STRETCH_JOIN_REL_TOL = 1e-9;

/**
 * SOA: the case temperature of a stretch may be taken from the modal upper bound when that
 * lies within this of the larger end value, K (it errs hot; the exact search runs otherwise).
 */
export const SOA_CASE_TOL_K = 1e-3;

/** Lifetime: turning points of one junction history kept for rainflow counting (8 bytes each). */
export const MAX_HISTORY_TURNING_POINTS = 4_000_000;

/** Lifetime: cycles with a smaller range are left out of the counts reported (they carry no damage to speak of), K. */
export const MIN_REPORTED_RANGE_K = 0.1;

/** Lifetime: cycle classes listed per device, the most damaging first. */
export const MAX_LISTED_CYCLES = 5;

/** Lifetime: bars of the cycle histogram at most. */
export const HISTOGRAM_BINS = 20;
