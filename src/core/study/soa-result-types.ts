import type { PulseWidth, SoaBoundary, SoaLimit, TransistorKind } from '../soa';

/**
 * One operating point of a device's SOA check (one part): Vce = Vin − Vout, Ic = I/n, the
 * highest case temperature during the stretch. Identical stretches (same Vce, Ic and
 * duration) are merged into one point that stands at the hottest of them.
 */
export type SoaPointResult = {
  /** Start of the stretch, s; for a merged point, of its hottest occurrence (where its margin is lowest). */
  timeS: number;
  durationS: number;
  vceV: number;
  icA: number;
  caseC: number;
  /** The pulse width the stretch counts as, s, or 'dc'. */
  pulseS: PulseWidth;
  allowedA: number;
  /** Iallowed / Ic; below 1 the point lies outside the SOA. */
  margin: number;
  limit: SoaLimit;
  /** Stretches merged into this point, and the start of the first of them, s. */
  occurrences: number;
  firstTimeS: number;
};

export type SoaWarningResult = {
  code: 'mosfet-linear-mode';
  message: string;
  /** Stretches concerned, and when the first of them starts, s. */
  stretches: number;
  firstTimeS: number;
};

/** The SOA check of one device entry on its solved profile (PHYSICS.md §4). */
export type DeviceSoaResult = {
  device: string;
  transistor: TransistorKind;
  /** Every point has a margin of at least 1. */
  passed: boolean;
  /** Stretches with current, and the distinct points they merge into. */
  stretches: number;
  distinctPoints: number;
  /** Distinct points with a margin below 1. */
  failedPoints: number;
  /** At most MAX_LISTED_SOA_POINTS points in time order: the lowest margins when there are more. */
  points: SoaPointResult[];
  pointsListedAll: boolean;
  /** The lowest margin (earliest on a tie); null when no stretch carried current. */
  worst: SoaPointResult | null;
  warnings: SoaWarningResult[];
  /**
   * Boundary curves for a log-log chart (Ic against Vce) at the worst point's pulse width:
   * at its case temperature and at the 25 °C the datasheet gives; null without a worst point.
   */
  boundaries: { atWorstCase: SoaBoundary; atReference: SoaBoundary } | null;
};
