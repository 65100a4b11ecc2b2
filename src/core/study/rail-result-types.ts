import type { BestThreshold, CellStatus, SensedVoltage, TapWorstCase } from '../rails';

/**
 * The dissipation map of the plan's device entry (all its parts together), W, over a grid
 * indexed [vout][iout]. null marks a cell a tap does not serve (outside its thresholds) or
 * cannot supply (over its capability or the element's current limit); `status` says which.
 */
export type RailMapLayer = { powerW: (number | null)[][]; status: CellStatus[][] };

export type RailMapResult = {
  voutV: number[];
  ioutA: number[];
  /** One layer per tap, in railPlan.taps order. */
  taps: RailMapLayer[];
  /** Per cell the highest power over the taps that may serve it (two inside a hysteresis band) and that tap (−1: none). */
  overall: RailMapLayer & { tap: number[][] };
};

export type RailWorstCases = { taps: (TapWorstCase | null)[]; overall: TapWorstCase | null };

/** A segment of the first pass with the tap selected for it. */
export type TapSegment = {
  /** Index in the expanded profile (groups laid out), its start and length, s. */
  index: number;
  timeS: number;
  durationS: number;
  label?: string;
  tap: number;
  tapName: string;
  /** The tap's voltage at the element's input, V; output reached and current delivered (all parts on). */
  vinV: number;
  voutV: number;
  currentA: number;
  /** What the comparator sees on this tap, V. */
  sensedV: number;
};

/** A rail plan's report (PHYSICS.md §2) and the taps its selection picks over the profile. */
export type RailPlanResult = {
  device: string;
  sensed: SensedVoltage;
  thresholdsV: number[];
  hysteresisV: number;
  taps: { name: string; openCircuitV: number; capabilityA: number; limitedBy: string; shareErrorA: number }[];
  map: RailMapResult;
  /** Worst case per tap and overall with the thresholds given, and with every threshold at its best value. */
  worst: RailWorstCases;
  thresholds: BestThreshold[];
  worstWithBest: RailWorstCases;
  /**
   * Rθsa the device's sink needs for the overall worst case with the given and the best
   * thresholds, K/W (PHYSICS.md §5, the device alone on its sink, at the study's highest
   * ambient and its target Tj,max − margin); null when the worst case dissipates nothing.
   */
  requiredRsa?: { givenKPerW: number | null; bestKPerW: number | null; ambientC: number; tjTargetC: number };
  /** With a relay: droop during a tap change at the top current of the map. */
  chatter?: { droopV: number; hysteresisV: number; chatterAboveA: number | null; chatters: boolean; message?: string };
  selection: {
    /** Segments of the first pass (at most MAX_LISTED_TAP_SEGMENTS) with their taps. */
    segments: TapSegment[];
    segmentsListedAll: boolean;
    /** Tap changes in the reported run (also in events). */
    changes: number;
  };
  warnings: string[];
};
