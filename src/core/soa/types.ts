import type { FosterTerm } from '../thermal';

/**
 * Safe operating area of a pass transistor on log-log axes (Ic against Vce), PHYSICS.md §4.
 * Units: V, A, K/W, s; temperatures °C. Integrated regulators have no SOA model here: their
 * own protection (current limit, shutdown) is the electrical model's business.
 */

export type TransistorKind = 'bipolar' | 'darlington' | 'mosfet';

/** Which limit bounds the allowed current at a point of the boundary. */
export type SoaLimit = 'current' | 'thermal' | 'second-breakdown' | 'voltage';

/** A pulse width in s, or 'dc'. */
export type PulseWidth = number | 'dc';

/**
 * Junction-to-case thermal impedance for pulses: Foster terms (the case held at Tc), or any
 * Zθjc(t) function in K/W with the largest time constant it contains (to tell DC from a pulse).
 */
export type ZthJc = readonly FosterTerm[] | { zthKPerW: (tS: number) => number; largestTauS: number };

/**
 * Derating of second breakdown with case temperature, as the fraction of the 25 °C current
 * kept: linear (fraction lost per K above 25 °C, none below: datasheets give no uprating) or
 * datasheet points, interpolated linearly and held flat beyond the first and last.
 */
export type Derating =
  | { kind: 'linear'; fractionPerK: number }
  | { kind: 'points'; points: readonly { caseC: number; factor: number }[] };

/** Second breakdown Is/b = I0 (Vce/V0)^(−n) at 25 °C. */
export type SecondBreakdown = {
  referenceVceV: number;
  referenceIcA: number;
  exponent: number;
  derating: Derating;
  /** Reference currents for pulses; a pulse not covered uses the DC line (conservative). */
  pulses?: readonly { pulseS: number; referenceIcA: number }[];
};

/**
 * Linear-mode rating of a MOSFET: whether its DC SOA was rated in linear mode, and the
 * longest pulse its datasheet SOA covers in linear mode.
 */
export type LinearModeRating = { dcRated: boolean; longestRatedPulseS?: number };

type SoaCommon = {
  transistor: TransistorKind;
  tjMaxC: number;
  zthJc?: ZthJc;
  /** MOSFETs only; absent means no linear-mode rating at all. */
  linearMode?: LinearModeRating;
};

/** SOA from its parameters. */
export type SoaParameters = SoaCommon & {
  kind: 'parameters';
  icMaxA: number;
  /** Peak pulse current (Icm); pulses use icMaxA without it. */
  icPulseMaxA?: number;
  vceoV: number;
  rthJcKPerW: number;
  secondBreakdown?: SecondBreakdown;
};

export type SoaPoint = { vceV: number; icA: number };

/**
 * A datasheet boundary at 25 °C for one pulse width: Vce ascending, Ic not rising. The last
 * Vce is the voltage limit; a last point repeating it with a lower Ic (or 0) draws the
 * vertical and is optional.
 */
export type SoaCurve = { pulseS: PulseWidth; points: readonly SoaPoint[] };

/** SOA from datasheet boundary points at 25 °C, interpolated in log-log. */
export type SoaPoints = SoaCommon & {
  kind: 'points';
  curves: readonly SoaCurve[];
  /** Derating of the steep (second-breakdown) segments; default: the thermal derating (conservative). */
  secondBreakdownDerating?: Derating;
};

export type SoaModel = SoaParameters | SoaPoints;

export type SoaCondition = { caseC: number; pulseS: PulseWidth };

export type AllowedCurrent = { currentA: number; limit: SoaLimit };

/** One operating point of a solved profile. */
export type SoaOperatingPoint = {
  /** Start of the stretch on the profile, s. */
  timeS: number;
  /** Length of the stretch, s: a pulse of this width, or DC when long enough. */
  durationS: number;
  /** Vce = Vin − Vout across one part, V. */
  vceV: number;
  /** Ic = Iload / n in one part, A. */
  icA: number;
  /** Case temperature during the stretch (its highest, to be safe), °C. */
  caseC: number;
};

export type SoaWarning = {
  code: 'mosfet-linear-mode';
  message: string;
  /** Points the warning concerns, the first of them and when it happens. */
  count: number;
  firstIndex: number;
  firstTimeS: number;
};

export type SoaWorstPoint = SoaOperatingPoint & {
  index: number;
  pulseS: PulseWidth;
  allowedA: number;
  margin: number;
  limit: SoaLimit;
};

export type SoaCheck = {
  /** Per point, in input order. */
  allowedA: Float64Array;
  /** Iallowed / Ic (Infinity at Ic = 0). */
  margin: Float64Array;
  limits: SoaLimit[];
  pulses: PulseWidth[];
  /** Smallest margin (first in time among equals); null without points. */
  worst: SoaWorstPoint | null;
  failedCount: number;
  passed: boolean;
  warnings: SoaWarning[];
};

export type SoaBoundarySegment = { limit: SoaLimit; points: SoaPoint[] };

export type SoaBoundary = {
  condition: SoaCondition;
  /** Consecutive segments share their end points; each is straight on log-log axes between its points. */
  segments: SoaBoundarySegment[];
  vceMaxV: number;
};
